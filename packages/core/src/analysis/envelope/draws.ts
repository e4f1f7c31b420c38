import { xoroshiro128plus } from 'pure-rand/generator/xoroshiro128plus';
import { uniformFloat64 } from 'pure-rand/distribution/uniformFloat64';
import type { JumpableRandomGenerator } from 'pure-rand/types/JumpableRandomGenerator';
import type { Distribution } from '../../parts/tolerance.ts';

/** Normal draws are cut at 3 sigma, where the tolerance's limits are. */
const sigmasAtLimit = 3;

/**
 * The deviations of Monte Carlo runs `first`, `first + 1`, ... for one seed. Run i draws from
 * its own stream, the seed's generator jumped i times (2^64 steps each), so its values depend
 * on (seed, i) alone: any split of the runs among workers gives bit for bit the same runs.
 */
export class RunDraws {
  readonly #stream: JumpableRandomGenerator;

  constructor(
    seed: number,
    first: number,
    private readonly distributions: readonly Distribution[],
  ) {
    this.#stream = xoroshiro128plus(seed);
    for (let i = 0; i < first; i++) this.#stream.jump();
  }

  /** The next run's deviations, one per toleranced value, each in [-1, 1]. */
  next(): Float64Array {
    const rng = this.#stream.clone();
    this.#stream.jump();
    return Float64Array.from(this.distributions, (distribution) => (distribution === 'uniform' ? 2 * uniformFloat64(rng) - 1 : truncatedNormal(rng) / sigmasAtLimit));
  }
}

/**
 * A standard normal draw within ±3 (Box-Muller; draws outside are drawn again, as a part
 * outside its tolerance would be rejected at incoming inspection).
 */
function truncatedNormal(rng: JumpableRandomGenerator): number {
  for (;;) {
    const u = 1 - uniformFloat64(rng); // (0, 1]: the logarithm stays finite
    const z = Math.sqrt(-2 * Math.log(u)) * Math.cos(2 * Math.PI * uniformFloat64(rng));
    if (Math.abs(z) <= sigmasAtLimit) return z;
  }
}
