import type { MapReader, ValueReader } from '../reading/reader.ts';
import { quantities } from '../units/quantity.ts';
import { formatSI } from '../units/format.ts';
import type { Wave, WaveKind } from './wave.ts';
import { nextPeriodicCorner, timeInPeriod } from './periodic.ts';

/**
 * Straight lines between given points; the first value holds before the first point and the
 * last value after the last point. With a period (`every:`) the pattern (including that hold)
 * restarts at every multiple of the period, going back to the first value on a straight edge
 * over the period's last millionth: a true jump has no step short enough to cross it within
 * the error tolerance, so the simulation would stop there.
 */
export class PiecewiseLinearWave implements Wave {
  /** Corner offsets within one period: 0 and every point time below the period. */
  private readonly periodCorners: Float64Array;
  private readonly times: Float64Array;
  private readonly values: Float64Array;

  constructor(
    times: Float64Array,
    values: Float64Array,
    /** Infinity when the pattern does not repeat. */
    private readonly period: number,
  ) {
    [this.times, this.values] = period < Infinity ? withWrapEdge(times, values, period) : [times, values];
    const inside = Array.from(this.times).filter((t) => t > 0 && t < period);
    this.periodCorners = Float64Array.from([0, ...inside]);
  }

  value(t: number): number {
    const u = this.period < Infinity && t >= 0 ? timeInPeriod(t, 0, this.period) : t;
    const times = this.times;
    const last = times.length - 1;
    if (!(u > times[0])) return this.values[0];
    if (u >= times[last]) return this.values[last];
    // Binary search for the segment times[lo] <= u < times[lo + 1].
    let lo = 0;
    let hi = last;
    while (hi - lo > 1) {
      const mid = (lo + hi) >> 1;
      if (times[mid] <= u) lo = mid;
      else hi = mid;
    }
    const v0 = this.values[lo];
    return v0 + ((this.values[lo + 1] - v0) * (u - times[lo])) / (times[lo + 1] - times[lo]);
  }

  /**
   * The narrowest peak or valley: for each turn of direction, from the start of the segment
   * that leads into it to the end of the one that leads out (a level between counts in). A
   * single edge has none: steps land on its corners, and rows on either side show it.
   */
  timescale(): number {
    const { times, values } = this;
    let narrowest = Infinity;
    let previous = -1;
    let direction = 0;
    for (let i = 0; i + 1 < times.length; i++) {
      const d = Math.sign(values[i + 1] - values[i]);
      if (d === 0) continue;
      if (d === -direction) narrowest = Math.min(narrowest, times[i + 1] - times[previous]);
      previous = i;
      direction = d;
    }
    // A repeating pattern that changes at all comes back every period.
    return this.period < Infinity && direction !== 0 ? Math.min(narrowest, this.period) : narrowest;
  }

  /** The last point's time; a repeating pattern never holds. */
  holdsFrom(): number {
    return this.period < Infinity ? Infinity : this.times[this.times.length - 1];
  }

  nextCorner(t: number): number {
    if (this.period < Infinity) return nextPeriodicCorner(t, 0, this.period, this.periodCorners);
    const times = this.times;
    if (!(t < times[times.length - 1])) return Infinity;
    let lo = 0;
    let hi = times.length - 1;
    // First index with times[i] > t.
    while (lo < hi) {
      const mid = (lo + hi) >> 1;
      if (times[mid] > t) hi = mid;
      else lo = mid + 1;
    }
    return times[lo];
  }
}

/** The edge back to the first value takes this share of the period. */
const WRAP_EDGE = 1e-6;

/**
 * The points of one period, ending with a straight edge from the pattern's value at
 * period·(1 − WRAP_EDGE) to the first value at the period.
 */
function withWrapEdge(times: Float64Array, values: Float64Array, period: number): [Float64Array, Float64Array] {
  const last = times.length - 1;
  if (values[last] === values[0]) return [times, values];
  const start = period * (1 - WRAP_EDGE);
  // Interpolate the edge's start on the pattern as written (a hold after the last point, or its last segment).
  const at = new PiecewiseLinearWave(times, values, Infinity).value(start);
  const kept = Array.from(times).filter((t) => t < start).length;
  return [
    Float64Array.from([...times.subarray(0, kept), start, period]),
    Float64Array.from([...values.subarray(0, kept), at, values[0]]),
  ];
}

/**
 * Check the times of a point list: the first at or after 0, each strictly after the one before.
 * `report(i, message, hint)` names point i (0-based). NaN times were reported when read.
 */
export function checkTimes(times: readonly number[], report: (index: number, message: string, hint: string) => void): void {
  if (times[0] < 0) report(0, `point 1 has a negative time, ${formatSI(times[0], 's')}`, 'time starts at 0: write the first point at 0 or later');
  for (let i = 1; i < times.length; i++) {
    if (times[i] > times[i - 1] || Number.isNaN(times[i]) || Number.isNaN(times[i - 1])) continue;
    report(
      i,
      `time of point ${i + 1} (${formatSI(times[i], 's')}) is not after the time of point ${i} (${formatSI(times[i - 1], 's')})`,
      'times must increase strictly; for a jump, put the two points a short time apart',
    );
  }
}

/** The optional `every:` period next to a point list; Infinity when absent or invalid. */
export function readPeriod(options: MapReader, lastTime: number): number {
  const value = options.get('every');
  if (value === undefined) return Infinity;
  const period = value.number(quantities.time, { above: 0 });
  if (period < lastTime) {
    value.fail(
      `every: ${formatSI(period, 's')} is shorter than the last point's time ${formatSI(lastTime, 's')}`,
      'the period must be at least the time of the last point',
    );
  }
  return period >= lastTime ? period : Infinity;
}

/** `points: [[0, 0], [1m, 5], [2m, 5]]`, optional `every: 4m`. */
export const points: WaveKind = {
  key: 'points',
  summary: 'straight lines through [time, value] points; optional `every: period`',
  read(main: ValueReader, options: MapReader, _context, quantity): Wave {
    const items = main.list();
    if (items.length === 0 && main.kind() === 'list') main.fail('a point list needs at least one point', 'write points: [[0, 0], [1m, 5]]');
    const times: number[] = [];
    const values: number[] = [];
    const timeReaders: ValueReader[] = [];
    items.forEach((item, i) => {
      const pair = item.list();
      if (pair.length === 2) {
        times.push(pair[0].number(quantities.time));
        values.push(pair[1].number(quantity));
        timeReaders.push(pair[0]);
        return;
      }
      if (item.kind() === 'list') item.fail(`point ${i + 1} needs two numbers, [time, value], found ${pair.length}`, 'write each point as [time, value], e.g. [1m, 5]');
      // Keep the numbering of later points; NaN times are skipped by the checks.
      times.push(NaN);
      values.push(NaN);
      timeReaders.push(item);
    });
    checkTimes(times, (i, message, hint) => timeReaders[i].fail(message, hint));
    const period = readPeriod(options, times.length > 0 ? times[times.length - 1] : 0);
    return pointsWave(times, values, period);
  },
};

/** A piecewise-linear wave of the checked points (a zero wave stands in when there are none). */
export function pointsWave(times: readonly number[], values: readonly number[], period: number): Wave {
  return times.length === 0
    ? new PiecewiseLinearWave(Float64Array.of(0), Float64Array.of(0), Infinity)
    : new PiecewiseLinearWave(Float64Array.from(times), Float64Array.from(values), period);
}
