/**
 * A small linear congruential generator (constants from Numerical Recipes, from memory):
 * seeded, repeatable values uniform in [-0.5, 0.5) for test data.
 */
export function uniformNoise(seed: number): () => number {
  let state = seed >>> 0;
  return () => {
    state = (Math.imul(state, 1664525) + 1013904223) >>> 0;
    return state / 2 ** 32 - 0.5;
  };
}
