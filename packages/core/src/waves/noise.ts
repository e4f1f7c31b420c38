import { xoroshiro128plus } from 'pure-rand/generator/xoroshiro128plus';
import { uniformFloat64 } from 'pure-rand/distribution/uniformFloat64';
import { quantities } from '../units/quantity.ts';
import type { Wave, WaveKind } from './wave.ts';

/** Sinusoids in a noise wave: enough for a Gaussian spread of values (central limit), few enough to stay cheap. */
const COMPONENTS = 128;

/**
 * Band-limited noise as a pure function of time: the sum of COMPONENTS sinusoids of equal
 * amplitude rms·√(2/N), one in each 1/N of the band (0, bandwidth) at a seeded random
 * frequency within it, each with a seeded random phase. The spectrum is flat up to
 * `bandwidth` and empty above it; values spread as a Gaussian to close approximation. The
 * same seed gives the same wave on every machine, in every worker and for any sequence of
 * steps; in runs longer than N/bandwidth the spectrum resolves into its N lines.
 */
export class NoiseWave implements Wave {
  private readonly omega = new Float64Array(COMPONENTS);
  private readonly phase = new Float64Array(COMPONENTS);
  private readonly amplitude: number;

  constructor(
    readonly rms: number,
    readonly bandwidth: number,
    readonly seed: number,
  ) {
    const random = xoroshiro128plus(seed);
    for (let i = 0; i < COMPONENTS; i++) {
      this.omega[i] = (2 * Math.PI * bandwidth * (i + uniformFloat64(random))) / COMPONENTS;
      this.phase[i] = 2 * Math.PI * uniformFloat64(random);
    }
    this.amplitude = rms * Math.sqrt(2 / COMPONENTS);
  }

  value(t: number): number {
    let total = 0;
    for (let i = 0; i < COMPONENTS; i++) total += Math.sin(this.omega[i] * t + this.phase[i]);
    return this.amplitude * total;
  }

  nextCorner(): number {
    return Infinity;
  }
}

/** `noise: { rms: 10m, bandwidth: 20k, seed: 7 }`. */
export const noise: WaveKind = {
  key: 'noise',
  summary: 'band-limited Gaussian noise: `rms`, `bandwidth`, optional `seed` (1)',
  read(main, _options, _context, quantity): Wave {
    const keys = main.map();
    const example = 'write noise: { rms: 10m, bandwidth: 20k }';
    const rms = keys.need('rms', example)?.number(quantity, { min: 0 }) ?? NaN;
    const bandwidth = keys.need('bandwidth', example)?.number(quantities.frequency, { above: 0 }) ?? NaN;
    const seed = keys.numberOr('seed', quantities.count, 1, { min: 0, max: 2 ** 31 - 1, integer: true });
    keys.finish();
    return new NoiseWave(rms, bandwidth, seed);
  },
};
