/**
 * Time arithmetic shared by repeating waves. Period k starts at `origin + k·period`, always
 * computed by that one expression, so that a corner the stepper landed on exactly is placed in
 * the same period again (no accumulation, no drift over many periods).
 */

/** k with origin + k·period <= t < origin + (k+1)·period, for t >= origin. */
export function periodIndex(t: number, origin: number, period: number): number {
  let k = Math.max(0, Math.floor((t - origin) / period));
  // The division can be off by one next to a period boundary: settle on the defining inequality.
  if (origin + (k + 1) * period <= t) k += 1;
  else if (k > 0 && origin + k * period > t) k -= 1;
  return k;
}

/** Time since the start of the period holding t (t >= origin). */
export function timeInPeriod(t: number, origin: number, period: number): number {
  return t - (origin + periodIndex(t, origin, period) * period);
}

/**
 * The first corner strictly after t of a pattern whose corners sit at `offsets` (ascending,
 * starting with 0, all below `period`) in every period from `origin` on.
 */
export function nextPeriodicCorner(t: number, origin: number, period: number, offsets: Float64Array): number {
  if (t < origin) return origin;
  const k = periodIndex(t, origin, period);
  const start = origin + k * period;
  for (let i = 0; i < offsets.length; i++) {
    const corner = start + offsets[i];
    if (corner > t) return corner;
  }
  return origin + (k + 1) * period;
}
