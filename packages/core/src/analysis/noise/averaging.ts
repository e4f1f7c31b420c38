import { bandPower, densityAt } from './band-power.ts';

/** Points per lobe of the averaging's response when integrating through it. */
const POINTS_PER_LOBE = 8;
/** The peak-to-peak span of Gaussian noise taken as 6.6 σ (99.9% of samples; common practice). */
export const PEAK_TO_PEAK_SIGMAS = 6.6;

/**
 * Variance of the mean of `count` consecutive samples taken at `rate` from noise of density
 * `s` (V²/Hz on the grid `f`): ∫ s(f)·D(f)² df with D(f) = sin(π·N·f/rate) / (N·sin(π·f/rate)),
 * the response of an N-sample moving average (a textbook identity). Samples closer together
 * than the noise's correlation time average out less than 1/N; this integral says by how much.
 */
export function averagedVariance(f: Float64Array, s: Float64Array, rate: number, count: number): number {
  if (count === 1) return bandPower(f, s);
  const spacing = rate / count / POINTS_PER_LOBE;
  let total = 0;
  for (let i = 0; i + 1 < f.length; i++) {
    const steps = Math.max(1, Math.ceil((f[i + 1] - f[i]) / spacing));
    const h = (f[i + 1] - f[i]) / steps;
    for (let k = 0; k <= steps; k++) {
      const at = f[i] + k * h;
      const weight = k === 0 || k === steps ? h / 2 : h;
      total += weight * densityAt(f, s, i, at) * movingAverage(at / rate, count) ** 2;
    }
  }
  return total;
}

/** |D| of an N-sample moving average at `x` = f / rate. */
function movingAverage(x: number, count: number): number {
  const below = Math.sin(Math.PI * x);
  if (Math.abs(below) < 1e-12) return 1;
  return Math.sin(Math.PI * count * x) / (count * below);
}

/**
 * The fewest consecutive samples whose mean stays within ±`halfSpan` (6.6 σ of the mean at
 * most 2·halfSpan); null when none up to `most` do (the 1/f part does not average away).
 * Found by doubling, then bisection, on the averaged variance.
 */
export function samplesToAverage(f: Float64Array, s: Float64Array, rate: number, halfSpan: number, most: number): number | null {
  const enough = (count: number): boolean => PEAK_TO_PEAK_SIGMAS * Math.sqrt(averagedVariance(f, s, rate, count)) <= 2 * halfSpan;
  if (enough(1)) return 1;
  let low = 1;
  let high = 2;
  while (!enough(high)) {
    if (high >= most) return null;
    low = high;
    high = Math.min(high * 2, most);
  }
  while (high - low > 1) {
    const middle = Math.floor((low + high) / 2);
    if (enough(middle)) high = middle;
    else low = middle;
  }
  return high;
}
