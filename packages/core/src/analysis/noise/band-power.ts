/**
 * ∫ s(f) df over the grid `f` for a density `s` known at the grid points (V²/Hz): each
 * interval as the power law through its two ends, exact for the 1/f, white and 1/f² stretches
 * that noise spectra are made of; where an end is zero, the straight line.
 */
export function bandPower(f: ArrayLike<number>, s: ArrayLike<number>): number {
  let total = 0;
  for (let i = 0; i + 1 < f.length; i++) total += intervalPower(f[i], f[i + 1], s[i], s[i + 1]);
  return total;
}

/** ∫ of the power law from (f0, s0) to (f1, s1). */
export function intervalPower(f0: number, f1: number, s0: number, s1: number): number {
  if (!(s0 > 0 && s1 > 0)) return ((s0 + s1) / 2) * (f1 - f0);
  const ratio = f1 / f0;
  const slope = Math.log(s1 / s0) / Math.log(ratio);
  if (Math.abs(slope + 1) < 1e-9) return s0 * f0 * Math.log(ratio);
  return ((s0 * f0) / (slope + 1)) * (ratio ** (slope + 1) - 1);
}

/** The density at `f` between grid points, on the power law through its neighbours. */
export function densityAt(grid: ArrayLike<number>, s: ArrayLike<number>, i: number, f: number): number {
  const [f0, f1, s0, s1] = [grid[i], grid[i + 1], s[i], s[i + 1]];
  if (!(s0 > 0 && s1 > 0)) return s0 + ((s1 - s0) * (f - f0)) / (f1 - f0);
  return s0 * (f / f0) ** (Math.log(s1 / s0) / Math.log(f1 / f0));
}
