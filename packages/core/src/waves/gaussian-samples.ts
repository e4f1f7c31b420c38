/**
 * Standard Gaussian sample number `index` of stream `stream` under `seed`: a pure function of
 * its arguments (Box–Muller on two uniforms hashed from them), so noise built from these
 * samples has the same value at any instant whatever steps reached it, on any machine and in
 * any worker.
 */
export function gaussianSample(seed: number, stream: number, index: number): number {
  const low = index | 0;
  const high = Math.floor(index / 4294967296) | 0;
  const a = mix(mix(mix(seed ^ 0x5bd1e995, stream), low), high);
  const b = mix(a, 0x27d4eb2f);
  const u1 = ((a >>> 0) + 0.5) / 4294967296;
  const u2 = ((b >>> 0) + 0.5) / 4294967296;
  return Math.sqrt(-2 * Math.log(u1)) * Math.cos(2 * Math.PI * u2);
}

/** One round of a 32-bit integer hash: fold in `value`, then MurmurHash3's finalizer (a published mixer). */
function mix(state: number, value: number): number {
  let h = Math.imul(state ^ value, 0x9e3779b1);
  h ^= h >>> 16;
  h = Math.imul(h, 0x85ebca6b);
  h ^= h >>> 13;
  h = Math.imul(h, 0xc2b2ae35);
  h ^= h >>> 16;
  return h;
}
