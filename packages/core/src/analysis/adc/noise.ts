import { xoroshiro128plus } from 'pure-rand/generator/xoroshiro128plus';
import { uniformFloat64 } from 'pure-rand/distribution/uniformFloat64';
import type { RandomGenerator } from 'pure-rand/types/RandomGenerator';

/**
 * Normally distributed noise of a given rms from a seeded generator (xoroshiro128+ of
 * pure-rand), so that a seed gives the same sequence bit for bit on every machine.
 * Box-Muller transform; each pair of uniforms gives two values.
 */
export class SeededNoise {
  private readonly random: RandomGenerator;
  private spare = NaN;

  constructor(
    seed: number,
    private readonly rms: number,
  ) {
    this.random = xoroshiro128plus(seed);
  }

  next(): number {
    if (this.rms === 0) return 0;
    if (!Number.isNaN(this.spare)) {
      const value = this.spare;
      this.spare = NaN;
      return value;
    }
    // 1 - u lies in (0, 1]: its logarithm is finite.
    const radius = this.rms * Math.sqrt(-2 * Math.log(1 - uniformFloat64(this.random)));
    const angle = 2 * Math.PI * uniformFloat64(this.random);
    this.spare = radius * Math.sin(angle);
    return radius * Math.cos(angle);
  }
}
