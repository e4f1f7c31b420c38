import type { ScaleContinuousNumeric, ScaleLinear } from 'd3-scale';
import { siLabel } from './si-format.ts';
import { element, text } from './svg.ts';

const tickLength = 5;
const gridColour = '#e3e3e3';
const minorGridColour = '#f1f1f1';
const inkColour = '#333333';

/**
 * The shared abscissa under a panel, with grid lines up through it: time on a linear scale,
 * or frequency on a log scale (a grid line at every 1..9 of each decade, labels at the
 * powers of ten).
 */
export function abscissaAxis(x: ScaleContinuousNumeric<number, number>, axis: 'time' | 'frequency', top: number, bottom: number, label: boolean): string {
  const parts: string[] = [];
  const ticks = axis === 'time' ? x.ticks(8) : x.ticks();
  const decades = axis === 'frequency' && Math.log10(x.domain()[1] / x.domain()[0]) > 1;
  for (const tick of ticks) {
    const px = x(tick);
    const labelled = !decades || Math.abs(Math.log10(tick) - Math.round(Math.log10(tick))) < 1e-9;
    parts.push(element('line', { x1: px, x2: px, y1: top, y2: bottom, stroke: labelled ? gridColour : minorGridColour }));
    if (!labelled) continue;
    parts.push(element('line', { x1: px, x2: px, y1: bottom, y2: bottom + tickLength, stroke: inkColour }));
    parts.push(text(px, bottom + tickLength + 12, siLabel(tick, axis === 'time' ? 's' : 'Hz'), { 'text-anchor': 'middle' }));
  }
  if (label) parts.push(text((x.range()[0] + x.range()[1]) / 2, bottom + 38, axis, { 'text-anchor': 'middle', fill: '#666' }));
  return element('g', { class: `axis ${axis}`, 'font-size': 11, fill: inkColour }, ...parts);
}

/** Value axis left of a panel, with grid lines across it. */
export function valueAxis(y: ScaleLinear<number, number>, left: number, right: number, unit: string): string {
  const parts: string[] = [];
  // Codes are whole numbers: a narrow range of codes must not get ticks at half codes.
  const ticks = unit === '' ? y.ticks(5).filter(Number.isInteger) : y.ticks(5);
  for (const tick of ticks) {
    const py = y(tick);
    parts.push(element('line', { x1: left, x2: right, y1: py, y2: py, stroke: gridColour }));
    parts.push(element('line', { x1: left - tickLength, x2: left, y1: py, y2: py, stroke: inkColour }));
    parts.push(text(left - tickLength - 3, py + 4, siLabel(tick, unit), { 'text-anchor': 'end' }));
  }
  return element('g', { class: 'axis value', 'font-size': 11, fill: inkColour }, ...parts);
}
