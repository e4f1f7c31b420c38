/**
 * Response of a first-order lag (time constant tau, unity gain) to an input that is 0 until
 * t0, ramps linearly to `level` at t1, then holds. Closed form by superposition of two ramp
 * responses, r(t) = k·(t - tau·(1 - e^(-t/tau))) (any circuit theory textbook, first-order
 * response to a ramp).
 */
export function lagThroughEdge(t: number, tau: number, t0: number, t1: number, level: number): number {
  const k = level / (t1 - t0);
  const ramp = (s: number): number => (s <= 0 ? 0 : k * (s - tau * (1 - Math.exp(-s / tau))));
  return ramp(t - t0) - ramp(t - t1);
}
