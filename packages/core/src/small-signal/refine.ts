/**
 * Searches between two neighbouring sweep points, on the true small-signal function rather
 * than on an interpolation of the grid: each evaluation is a solve at that frequency. Both
 * work in log frequency, where responses are smooth.
 */

/** Iterations of a bisection: the bracket shrinks by 2^-48, far below any figure's precision. */
const BISECTIONS = 48;

/**
 * The frequency in [f1, f2] where `value(f)` crosses `level`, given that it lies on
 * different sides of it at the two ends (bisection).
 */
export function crossingBetween(f1: number, f2: number, level: number, value: (f: number) => number): number {
  let lo = Math.log(f1);
  let hi = Math.log(f2);
  const below = value(f1) < level;
  for (let i = 0; i < BISECTIONS; i++) {
    const mid = (lo + hi) / 2;
    if (value(Math.exp(mid)) < level === below) lo = mid;
    else hi = mid;
  }
  return Math.exp((lo + hi) / 2);
}

/** Golden-section iterations: the bracket shrinks by 0.618^60, about 3e-13. */
const GOLDEN_STEPS = 60;
const INVERSE_PHI = (Math.sqrt(5) - 1) / 2;

/** The frequency in [f1, f2] where `value(f)` is largest, given a single maximum inside (golden-section search). */
export function maximumBetween(f1: number, f2: number, value: (f: number) => number): number {
  let a = Math.log(f1);
  let b = Math.log(f2);
  let c = b - INVERSE_PHI * (b - a);
  let d = a + INVERSE_PHI * (b - a);
  let fc = value(Math.exp(c));
  let fd = value(Math.exp(d));
  for (let i = 0; i < GOLDEN_STEPS; i++) {
    if (fc > fd) {
      b = d;
      d = c;
      fd = fc;
      c = b - INVERSE_PHI * (b - a);
      fc = value(Math.exp(c));
    } else {
      a = c;
      c = d;
      fc = fd;
      d = a + INVERSE_PHI * (b - a);
      fd = value(Math.exp(d));
    }
  }
  return Math.exp((a + b) / 2);
}
