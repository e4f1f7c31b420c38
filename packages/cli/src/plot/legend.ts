import type { Series } from './series.ts';
import { element, text } from './svg.ts';

const rowHeight = 16;

/** A key to a panel's series at its top right: a swatch (never a path) and the name. */
export function legend(series: readonly Series[], colours: readonly string[], right: number, top: number): string {
  // Room for the swatch, then about 6.6 px per character of an 11 px sans-serif face.
  const width = 34 + 6.6 * Math.max(...series.map((s) => s.name.length));
  const left = right - width - 6;
  const rows = series.map((s, i) => {
    const y = top + 10 + i * rowHeight;
    const swatch =
      s.kind === 'band' || s.kind === 'spans'
        ? element('rect', { x: left + 6, y: y - 5, width: 14, height: 10, fill: colours[i], 'fill-opacity': s.kind === 'spans' ? 0.12 : 0.22, stroke: colours[i], 'stroke-opacity': 0.5 })
        : s.kind === 'marks'
          ? element('circle', { cx: left + 13, cy: y, r: 3.5, fill: 'none', stroke: colours[i], 'stroke-width': 1.5 })
          : element('line', { x1: left + 6, x2: left + 20, y1: y, y2: y, stroke: colours[i], 'stroke-width': 2, 'stroke-dasharray': s.kind === 'line' && s.dashed ? '5 3' : undefined });
    return swatch + text(left + 26, y + 4, s.name);
  });
  const box = element('rect', { x: left, y: top, width, height: series.length * rowHeight + 4, fill: 'white', 'fill-opacity': 0.85, stroke: '#cccccc' });
  return element('g', { class: 'legend', 'font-size': 11, fill: '#333333' }, box, ...rows);
}
