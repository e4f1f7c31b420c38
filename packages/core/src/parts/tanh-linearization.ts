/**
 * Linearizing a tanh stage for Newton-Raphson: where to linearize, given the new argument
 * and the point the last iteration used.
 */

/** Newton may move a tanh stage's normalized argument by at most this per iteration. */
const TANH_STEP_LIMIT = 4;

/**
 * Device bypass: keep the last linearization of a tanh stage when the new point would change
 * it negligibly (argument within 1e-3, or value and slope both within 1e-9 deep in a flat
 * side). The matrix then stays the same and so does its factorization; the current error is
 * below 1e-6 of the stage's limit.
 */
export function bypasses(u: number, last: number): boolean {
  if (Math.abs(u - last) < 1e-3) return true;
  const a = Math.tanh(u);
  const b = Math.tanh(last);
  return Math.abs(a - b) < 1e-9 && Math.abs(a * a - b * b) < 1e-9;
}

/**
 * Newton step limiting for a tanh characteristic, in the spirit of junction limiting: in the
 * flat parts the slope vanishes and a full Newton step can fling the argument from one
 * saturated side to the other forever. The argument moves at most TANH_STEP_LIMIT from where
 * the last iteration linearized, unless both lie deep on the same flat side.
 */
export function limitTanhArgument(u: number, last: number): number {
  if (Math.abs(u) > 3 && Math.abs(last) > 3 && Math.sign(u) === Math.sign(last)) return u;
  if (Math.abs(u - last) <= TANH_STEP_LIMIT) return u;
  return last + Math.sign(u - last) * TANH_STEP_LIMIT;
}
