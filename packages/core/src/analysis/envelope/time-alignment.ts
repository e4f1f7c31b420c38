import { LinearLookup } from './linear-lookup.ts';

/** Both traces are resampled onto this many points to find the delay. */
const alignmentPoints = 4096;

/**
 * The delay of `measured` against `expected` (measured(t) ≈ expected(t - delay)), found where
 * their cross-correlation peaks. Both are resampled on a uniform grid over the expected span;
 * each lag is scored by the correlation coefficient over the samples the two traces share at
 * that lag (so the traces' offsets and scales do not matter), weighted by the share of the
 * grid they overlap on: a periodic signal matches itself one period away too, but over less
 * of the span, so the nearer alignment wins. The peak is refined by a parabola through its
 * neighbours. Delays are searched
 * up to `maxDelay` either way (default: half the expected span).
 */
export function estimateDelay(
  measured: { readonly time: ArrayLike<number>; readonly values: ArrayLike<number> },
  expected: { readonly time: ArrayLike<number>; readonly values: ArrayLike<number> },
  maxDelay?: number,
): number {
  const start = expected.time[0];
  const span = expected.time[expected.time.length - 1] - start;
  // A fixed, fine grid (upsampled when the envelope has fewer rows) resolves sub-row delays.
  const n = alignmentPoints;
  if (expected.time.length < 3 || !(span > 0)) return 0;
  const dt = span / (n - 1);
  const e = resample(expected, start, dt, n);
  const m = resample(measured, start, dt, n);
  const maxLag = Math.min(n - 2, Math.floor((maxDelay ?? span / 2) / dt));
  const weighted = new Float64Array(2 * maxLag + 1);
  const plain = new Float64Array(2 * maxLag + 1);
  let best = 0;
  for (let lag = -maxLag; lag <= maxLag; lag++) {
    const { r, share } = overlapCorrelation(m, e, lag);
    plain[lag + maxLag] = r;
    weighted[lag + maxLag] = r * share;
    if (weighted[lag + maxLag] > weighted[best]) best = lag + maxLag;
  }
  // The weight picks the peak; the plain coefficient, which the weight's slope does not
  // bias, places it: climb to its local maximum, then fit the parabola there.
  while (best > 0 && plain[best - 1] > plain[best]) best--;
  while (best < plain.length - 1 && plain[best + 1] > plain[best]) best++;
  let lag = best - maxLag;
  if (best > 0 && best < plain.length - 1) {
    const [y0, y1, y2] = [plain[best - 1], plain[best], plain[best + 1]];
    const curvature = y0 - 2 * y1 + y2;
    if (curvature < 0) lag += (0.5 * (y0 - y2)) / curvature;
  }
  return lag * dt;
}

/** Values at start + k·dt; NaN outside the trace's own span. */
function resample(trace: { readonly time: ArrayLike<number>; readonly values: ArrayLike<number> }, start: number, dt: number, n: number): Float64Array {
  const lookup = new LinearLookup(trace.time, trace.values);
  const first = trace.time[0];
  const last = trace.time[trace.time.length - 1];
  return Float64Array.from({ length: n }, (_, k) => {
    const t = start + k * dt;
    return t < first || t > last ? NaN : lookup.at(t);
  });
}

/** Pearson correlation `r` of m[k] with e[k - lag] over the k where both exist (-1 when flat), and the share of the grid those k are. */
function overlapCorrelation(m: Float64Array, e: Float64Array, lag: number): { r: number; share: number } {
  let count = 0;
  let sa = 0;
  let sb = 0;
  let sab = 0;
  let saa = 0;
  let sbb = 0;
  for (let k = Math.max(0, lag); k < Math.min(m.length, m.length + lag); k++) {
    const a = m[k];
    if (Number.isNaN(a)) continue;
    const b = e[k - lag];
    count++;
    sa += a;
    sb += b;
    sab += a * b;
    saa += a * a;
    sbb += b * b;
  }
  const covariance = sab - (sa * sb) / count;
  const spread = Math.sqrt((saa - (sa * sa) / count) * (sbb - (sb * sb) / count));
  return { r: count > 1 && spread > 0 ? covariance / spread : -1, share: count / m.length };
}
