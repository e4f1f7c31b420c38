import { crossingBetween, maximumBetween } from './refine.ts';
import type { ResponsePeak } from './types.ts';

/** A response starts flat when its gain moves less than this at the low end, dB per decade. */
const FLAT_SLOPE = 1;
/** "-3 dB" is half power: 10·log10(2) = 3.0103 dB below (common practice). */
const HALF_POWER_DB = 10 * Math.log10(2);
/** A local maximum counts as a peak when it stands this far above the lower ground on both sides, dB. */
const PEAK_PROMINENCE = 0.1;

/**
 * The −3 dB bandwidth of a response that starts flat: where the gain first falls to half power
 * (3.01 dB) below its value at the lowest frequency, refined on `gain` (dB at any frequency). Null when the
 * response does not start flat or never falls that far within the sweep.
 */
export function bandwidth(frequency: Float64Array, dB: Float64Array, gain: (f: number) => number): number | null {
  if (frequency.length < 2 || !Number.isFinite(dB[0])) return null;
  const slope = (dB[1] - dB[0]) / Math.log10(frequency[1] / frequency[0]);
  if (!(Math.abs(slope) < FLAT_SLOPE)) return null;
  const level = dB[0] - HALF_POWER_DB;
  for (let i = 1; i < dB.length; i++) {
    if (dB[i] < level) return crossingBetween(frequency[i - 1], frequency[i], level, gain);
  }
  return null;
}

/**
 * Local maxima of a gain curve that stand at least PEAK_PROMINENCE above the higher of the
 * lowest points on either side before a taller point (their topographic prominence within
 * the sweep), each refined between its neighbours on `gain`.
 */
export function peaks(node: string, frequency: Float64Array, dB: Float64Array, gain: (f: number) => number): ResponsePeak[] {
  const found: ResponsePeak[] = [];
  for (let i = 1; i + 1 < dB.length; i++) {
    if (!(dB[i] > dB[i - 1] && dB[i] >= dB[i + 1])) continue;
    if (dB[i] - Math.max(lowestBefore(dB, i, -1), lowestBefore(dB, i, 1)) < PEAK_PROMINENCE) continue;
    const f = maximumBetween(frequency[i - 1], frequency[i + 1], gain);
    found.push({ node, frequency: f, dB: gain(f) });
  }
  return found;
}

/** The lowest gain walking from `i` in `direction` until a point taller than `i` or the sweep's end. */
function lowestBefore(dB: Float64Array, i: number, direction: 1 | -1): number {
  let lowest = dB[i];
  for (let j = i + direction; j >= 0 && j < dB.length && dB[j] <= dB[i]; j += direction) lowest = Math.min(lowest, dB[j]);
  return lowest;
}
