import type { Comparison, EnvelopeTrace, Trace, Violation } from '@voltcast/core';
import { formatSI } from '@voltcast/core';
import { colour, violationColour } from './palette.ts';
import type { Figure, Series } from './series.ts';

/** Violations circled one by one; past these, circles would hide the capture, so the rest are shaded. */
export const circledViolations = 20;

/**
 * `voltcast compare --plot`: the expected band and nominal, the capture moved onto the
 * envelope's time axis by the shift, the first violations circled and the time spans of the
 * others shaded. `kind` 'code' draws an axis of plain codes.
 */
export function compareFigure(name: string, kind: 'voltage' | 'code', measured: Trace, limits: EnvelopeTrace, verdict: Comparison, files: string): Figure {
  const shifted = Float64Array.from(measured.time as ArrayLike<number>, (t) => t - verdict.shift);
  const series: Series[] = [
    { kind: 'band', name: 'expected min..max', x: limits.time, low: limits.min, high: limits.max, stepped: kind === 'code' },
    { kind: kind === 'code' ? 'steps' : 'line', name: 'expected nominal', x: limits.time, values: limits.nominal, dashed: true },
    { kind: kind === 'code' ? 'steps' : 'line', name: 'measured', x: shifted, values: measured.values },
  ];
  const colours = [colour(0), colour(0), colour(1)];
  const { violations } = verdict;
  const circled = violations.slice(0, circledViolations);
  if (circled.length > 0) {
    const first = circled.length === violations.length ? `violations (${violations.length})` : `first ${circled.length} violations`;
    series.push({ kind: 'marks', name: first, x: circled.map((v) => v.envelopeTime), values: circled.map((v) => v.value) });
    colours.push(violationColour);
  }
  if (violations.length > circled.length) {
    const spans = runsOf(measured.time, violations.slice(circled.length), verdict.shift);
    series.push({ kind: 'spans', name: `${violations.length - circled.length} more violations`, ...spans });
    colours.push(violationColour);
  }
  const outcome = verdict.pass ? 'PASS' : `FAIL, first violation at ${formatSI(verdict.firstViolation?.time ?? NaN, 's')}`;
  const inside = `${(verdict.fractionInside * 100).toFixed(2)}% inside`;
  const title = kind === 'code' ? `${name} (ADC codes)` : name;
  return { title: `${name}: ${outcome}`, subtitle: `${files}: shift ${formatSI(verdict.shift, 's')}, ${inside}`, panels: [{ title, unit: kind === 'code' ? '' : 'V', series, colours }] };
}

/**
 * Time spans (on the envelope's axis) of consecutive violating samples: a run ends at the
 * first sample of the capture that is not a violation. Both lists are in time order.
 */
function runsOf(time: ArrayLike<number>, violations: readonly Violation[], shift: number): { starts: number[]; ends: number[] } {
  const starts: number[] = [];
  const ends: number[] = [];
  let k = 0;
  let open = false;
  for (let i = 0; i < time.length && k < violations.length; i++) {
    if (time[i] !== violations[k].time) {
      open = false;
      continue;
    }
    if (open) ends[ends.length - 1] = time[i] - shift;
    else starts.push(time[i] - shift), ends.push(time[i] - shift);
    open = true;
    k++;
  }
  return { starts, ends };
}
