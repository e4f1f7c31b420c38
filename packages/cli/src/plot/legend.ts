import type { Series } from './series.ts';
import { element, text } from './svg.ts';

export const legendRowHeight = 16;
/** About 6.6 px per character of the 11 px sans-serif face; 7.4 for the 12 px bold titles. */
const charWidth = 6.6;
export const titleCharWidth = 7.4;
/** Swatch and its gap before the name; gap between items. */
const swatchWidth = 20;
const itemGap = 14;

/** Where each series' key goes: its row (0 is the title's) and its left edge. */
export interface LegendLayout {
  readonly rows: number;
  readonly items: readonly { readonly row: number; readonly x: number }[];
}

/**
 * A key to a panel's series above its plotting area, never on the data: items in rows
 * aligned to the panel's right edge, the first row beside the panel's title (which takes
 * `titleWidth` from `left`), further rows below it.
 */
export function layoutLegend(series: readonly Series[], left: number, right: number, titleWidth: number): LegendLayout {
  const widths = series.map((s) => swatchWidth + charWidth * s.name.length);
  const rows: number[][] = [[]];
  let used = 0;
  widths.forEach((width, i) => {
    const room = right - left - (rows.length === 1 ? titleWidth + itemGap : 0);
    const needed = used === 0 ? width : used + itemGap + width;
    if (needed > room && used > 0) {
      rows.push([i]);
      used = width;
    } else {
      rows.at(-1)!.push(i);
      used = needed;
    }
  });
  const items: { row: number; x: number }[] = [];
  rows.forEach((members, row) => {
    let x = right - members.reduce((sum, i) => sum + widths[i], 0) - itemGap * (members.length - 1);
    for (const i of members) {
      items[i] = { row, x };
      x += widths[i] + itemGap;
    }
  });
  return { rows: rows.length, items };
}

/** The key as laid out, row 0 on `baseline` and each further row one row lower. */
export function legend(series: readonly Series[], colours: readonly string[], layout: LegendLayout, baseline: number): string {
  const keys = series.map((s, i) => {
    const { row, x } = layout.items[i];
    const y = baseline + row * legendRowHeight - 4;
    const swatch =
      s.kind === 'band' || s.kind === 'spans'
        ? element('rect', { x, y: y - 5, width: 14, height: 10, fill: colours[i], 'fill-opacity': s.kind === 'spans' ? 0.12 : 0.22, stroke: colours[i], 'stroke-opacity': 0.5 })
        : s.kind === 'rules'
          ? element('line', { x1: x + 7, x2: x + 7, y1: y - 6, y2: y + 6, stroke: colours[i], 'stroke-width': 1.5, 'stroke-dasharray': '2 2' })
          : s.kind === 'marks'
            ? element('circle', { cx: x + 7, cy: y, r: 3.5, fill: 'none', stroke: colours[i], 'stroke-width': 1.5 })
            : element('line', { x1: x, x2: x + 14, y1: y, y2: y, stroke: colours[i], 'stroke-width': 2, 'stroke-dasharray': s.dashed ? '5 3' : undefined });
    return swatch + text(x + swatchWidth, y + 4, s.name);
  });
  return element('g', { class: 'legend', 'font-size': 11, fill: '#333333' }, ...keys);
}
