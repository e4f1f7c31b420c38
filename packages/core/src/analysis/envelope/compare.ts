import { estimateDelay } from './time-alignment.ts';

/** A sampled waveform: times in seconds, increasing; values in the signal's unit. */
export interface Trace {
  readonly time: ArrayLike<number>;
  readonly values: ArrayLike<number>;
}

/** Expected limits of one signal on their time grid (increasing times). */
export interface EnvelopeTrace {
  readonly time: ArrayLike<number>;
  readonly min: ArrayLike<number>;
  readonly nominal: ArrayLike<number>;
  readonly max: ArrayLike<number>;
}

export interface CompareOptions {
  /**
   * Delay of the capture against the envelope, seconds: a sample at time t is checked at
   * t - shift. `'auto'` finds it by cross-correlation with the nominal. Default 0.
   */
  shift?: 'auto' | number;
  /** Largest delay `'auto'` considers, either way (default: half the envelope's span). */
  maxShift?: number;
  /** Widen the limits by this much on both sides (signal unit), for measurement noise. Default 0. */
  margin?: number;
  /** Check each sample against the widest limits within ± this time (seconds), for jitter. Default 0. */
  timeMargin?: number;
}

/** A captured sample outside its limits. */
export interface Violation {
  /** Time of the sample as captured. */
  readonly time: number;
  /** The same instant on the envelope's time axis (time - shift). */
  readonly envelopeTime: number;
  readonly value: number;
  readonly min: number;
  readonly max: number;
}

export interface Comparison {
  readonly pass: boolean;
  /** The shift used, seconds (found or given). */
  readonly shift: number;
  /** Samples checked (inside the envelope's span after shifting). */
  readonly compared: number;
  /** Samples outside the envelope's span, not checked. */
  readonly skipped: number;
  readonly inside: number;
  /** inside / compared (0 when nothing was compared). */
  readonly fractionInside: number;
  readonly firstViolation?: Violation;
  /** Every violation, in time order. */
  readonly violations: readonly Violation[];
}

/**
 * Check a captured waveform against an expected envelope: each sample, shifted, must lie
 * within the limits linearly interpolated at its instant (widened by the margins). Passes
 * when at least one sample was compared and none is outside.
 */
export function compare(measured: Trace, envelope: EnvelopeTrace, options: CompareOptions = {}): Comparison {
  const shift = options.shift === 'auto' ? estimateDelay(measured, { time: envelope.time, values: envelope.nominal }, options.maxShift) : (options.shift ?? 0);
  const margin = options.margin ?? 0;
  const timeMargin = options.timeMargin ?? 0;
  const et = envelope.time;
  const start = et[0];
  const end = et[et.length - 1];
  const violations: Violation[] = [];
  let compared = 0;
  let skipped = 0;
  let row = 0;
  const limits = { min: 0, max: 0 };
  for (let i = 0; i < measured.time.length; i++) {
    const t = measured.time[i] - shift;
    const value = measured.values[i];
    if (t < start || t > end || Number.isNaN(value)) {
      skipped++;
      continue;
    }
    compared++;
    if (et[row] > t) row = 0;
    while (row < et.length - 2 && et[row + 1] <= t) row++;
    limitsAround(envelope, row, t, timeMargin, limits);
    if (value < limits.min - margin || value > limits.max + margin) violations.push({ time: measured.time[i], envelopeTime: t, value, min: limits.min - margin, max: limits.max + margin });
  }
  const inside = compared - violations.length;
  return {
    pass: compared > 0 && violations.length === 0,
    shift,
    compared,
    skipped,
    inside,
    fractionInside: compared > 0 ? inside / compared : 0,
    ...(violations.length > 0 ? { firstViolation: violations[0] } : {}),
    violations,
  };
}

/**
 * Limits at t, into `out`. With a time margin, the lowest min and highest max over
 * [t - timeMargin, t + timeMargin]: the limits are linear between rows, so those extremes lie
 * at the window's two ends or at a row inside it.
 */
function limitsAround(envelope: EnvelopeTrace, r: number, t: number, timeMargin: number, out: { min: number; max: number }): void {
  const { time, min, max } = envelope;
  out.min = interpolate(time, min, r, t);
  out.max = interpolate(time, max, r, t);
  if (timeMargin <= 0) return;
  const last = time.length - 1;
  let k = r;
  for (; k > 0 && time[k] > t - timeMargin; k--) (out.min = Math.min(out.min, min[k])), (out.max = Math.max(out.max, max[k]));
  const early = Math.max(time[0], t - timeMargin);
  out.min = Math.min(out.min, interpolate(time, min, k, early));
  out.max = Math.max(out.max, interpolate(time, max, k, early));
  for (k = r + 1; k < last && time[k] < t + timeMargin; k++) (out.min = Math.min(out.min, min[k])), (out.max = Math.max(out.max, max[k]));
  const late = Math.min(time[last], t + timeMargin);
  const row = Math.max(0, Math.min(k, last) - 1);
  out.min = Math.min(out.min, interpolate(time, min, row, late));
  out.max = Math.max(out.max, interpolate(time, max, row, late));
}

/** values at t, linear between row r and r + 1 (t within them, or clamped to them). */
function interpolate(time: ArrayLike<number>, values: ArrayLike<number>, r: number, t: number): number {
  const next = Math.min(r + 1, time.length - 1);
  if (next === r || time[next] === time[r]) return values[r];
  const f = Math.min(1, Math.max(0, (t - time[r]) / (time[next] - time[r])));
  return values[r] + f * (values[next] - values[r]);
}
