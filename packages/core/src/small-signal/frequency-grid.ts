/**
 * Log-spaced frequencies from `from` to `to`, `perDecade` per decade, both ends included.
 * Each point is computed from its index (never accumulated), so the grid is the same however
 * long the sweep; when the span is not a whole number of steps the last one is shorter.
 */
export function frequencyGrid(from: number, to: number, perDecade: number): Float64Array {
  const steps = Math.max(1, Math.ceil(Math.log10(to / from) * perDecade - 1e-9));
  const grid = new Float64Array(steps + 1);
  for (let i = 0; i < steps; i++) grid[i] = from * 10 ** (i / perDecade);
  grid[steps] = to;
  return grid;
}
