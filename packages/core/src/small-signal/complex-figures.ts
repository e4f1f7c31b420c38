/** Gain in dB of the complex ratio `re + j·im` (-Infinity for zero). */
export function decibels(re: number, im: number): number {
  return 10 * Math.log10(re * re + im * im);
}

/** Phase of `re + j·im` in degrees, in (-180, 180]. */
export function degrees(re: number, im: number): number {
  return (Math.atan2(im, re) * 180) / Math.PI;
}

/** The angle `principal` plus the whole turns that bring it within 180° of `near`. */
export function nearestTurn(principal: number, near: number): number {
  return principal + 360 * Math.round((near - principal) / 360);
}

/**
 * Unwrap a phase curve in place: every point moves by whole turns to lie within 180° of the
 * point before it, so the curve is continuous across the sweep (the grid must be fine
 * enough that the true phase moves less than 180° between points).
 */
export function unwrapDegrees(phase: Float64Array): void {
  for (let i = 1; i < phase.length; i++) phase[i] = nearestTurn(phase[i], phase[i - 1]);
}
