import type { Comparison, EnvelopeTrace, Trace } from '@voltcast/core';
import { formatSI } from '@voltcast/core';
import { colour, violationColour } from './palette.ts';
import type { Figure, Series } from './series.ts';

/**
 * `voltcast compare --plot`: the expected band and nominal, the capture moved onto the
 * envelope's time axis by the shift, and every violation circled.
 */
export function compareFigure(name: string, measured: Trace, limits: EnvelopeTrace, verdict: Comparison, files: string): Figure {
  const shifted = Float64Array.from(measured.time as ArrayLike<number>, (t) => t - verdict.shift);
  const series: Series[] = [
    { kind: 'band', name: 'expected min..max', time: limits.time, low: limits.min, high: limits.max },
    { kind: 'line', name: 'expected nominal', time: limits.time, values: limits.nominal, dashed: true },
    { kind: 'line', name: 'measured', time: shifted, values: measured.values },
  ];
  const colours = [colour(0), colour(0), colour(1)];
  if (verdict.violations.length > 0) {
    series.push({ kind: 'marks', name: `violations (${verdict.violations.length})`, time: verdict.violations.map((v) => v.envelopeTime), values: verdict.violations.map((v) => v.value) });
    colours.push(violationColour);
  }
  const outcome = verdict.pass ? 'PASS' : `FAIL, first violation at ${formatSI(verdict.firstViolation?.time ?? NaN, 's')}`;
  const inside = `${(verdict.fractionInside * 100).toFixed(2)}% inside`;
  return { title: `${name}: ${outcome}`, subtitle: `${files}: shift ${formatSI(verdict.shift, 's')}, ${inside}`, panels: [{ title: name, unit: 'V', series, colours }] };
}
