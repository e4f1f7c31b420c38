import { xoroshiro128plus } from 'pure-rand/generator/xoroshiro128plus';

/** Up to this many toleranced values every corner is run: 2^10 = 1024 runs. */
export const exhaustiveCornerLimit = 10;
/** Beyond the limit, this many corners: all low, all high, and sampled vertices. */
export const sampledCorners = 1 << exhaustiveCornerLimit;

/** How many worst-case corners a circuit with `k` toleranced values gets. */
export function cornerCount(k: number): number {
  if (k === 0) return 0;
  return k <= exhaustiveCornerLimit ? 2 ** k : sampledCorners;
}

/**
 * Worst-case corners: every toleranced value at its lower or upper limit. With k values up to
 * `exhaustiveCornerLimit`, corner j puts value i high when bit i of j is set, so all 2^k
 * combinations are run (for a monotonic circuit the extremes are among them: extreme value
 * analysis). With more values the number of combinations explodes; then corner 0 is all low,
 * corner 1 all high, and the rest are vertices drawn from the seed. That fallback can miss
 * the worst combination: it reports a likely, not a guaranteed, worst case.
 */
export function* cornerDeviations(k: number, seed: number, first: number, end: number): Generator<Float64Array> {
  if (k <= exhaustiveCornerLimit) {
    for (let j = first; j < end; j++) yield Float64Array.from({ length: k }, (_, i) => ((j >>> i) & 1 ? 1 : -1));
    return;
  }
  // Vertex j's signs come from the seed's generator jumped j times (independent of the split).
  const stream = xoroshiro128plus(seed ^ 0x5c0ffee);
  for (let j = 0; j < first; j++) stream.jump();
  for (let j = first; j < end; j++) {
    const rng = stream.clone();
    stream.jump();
    if (j < 2) yield new Float64Array(k).fill(j === 0 ? -1 : 1);
    else yield Float64Array.from({ length: k }, () => (rng.next() < 0 ? -1 : 1));
  }
}
