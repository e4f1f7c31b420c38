import { quantities } from '../units/quantity.ts';
import { gaussianSample } from './gaussian-samples.ts';
import type { Wave, WaveKind } from './wave.ts';

/** Samples per second, per hertz of bandwidth: the kernel's transition band fits between the bandwidth and half this. */
const RATE_PER_BANDWIDTH = 2.5;
/** The kernel reaches this many samples either side. */
const HALF_TAPS = 20;
/** Table points per sample spacing: linear interpolation between them errs by ~1e-5 of the peak. */
const TABLE_RESOLUTION = 512;
/** Kaiser window shape for about 60 dB in the stopband (Kaiser's design formula, β = 0.1102·(60 − 8.7)). */
const KAISER_BETA = 5.65;
/** Cutoff in cycles per sample: midway between the bandwidth (0.4) and the stopband edge (0.5). */
const CUTOFF = 0.45;
/** The noise streams of `run --noise` are numbered from 0: waves use a stream of their own. */
const WAVE_STREAM = -1;

/**
 * Band-limited Gaussian noise as a pure function of time: independent Gaussian samples at
 * 2.5 × `bandwidth` (each hashed from the seed and its index), joined by a Kaiser-windowed sinc
 * of 40 taps (band-limited interpolation). Its spectrum is continuous and flat within 0.01 dB
 * up to `bandwidth`, falls through a transition band, and is 60 dB down from 1.25 × `bandwidth`
 * on; so averages over a run converge to the density's integral however narrow the circuit's
 * band. The same seed gives the same wave on every machine, in every worker and for any
 * sequence of steps.
 */
export class NoiseWave implements Wave {
  private readonly rate: number;
  private readonly scale: number;

  constructor(
    readonly rms: number,
    readonly bandwidth: number,
    readonly seed: number,
  ) {
    this.rate = RATE_PER_BANDWIDTH * bandwidth;
    this.scale = rms / Math.sqrt(kernel().energy);
  }

  value(t: number): number {
    const { table } = kernel();
    const position = t * this.rate;
    const first = Math.floor(position) - HALF_TAPS + 1;
    let total = 0;
    for (let k = first; k < first + 2 * HALF_TAPS; k++) {
      const at = Math.abs(position - k) * TABLE_RESOLUTION;
      const j = Math.floor(at);
      if (j >= table.length - 1) continue;
      const weight = table[j] + (at - j) * (table[j + 1] - table[j]);
      total += weight * gaussianSample(this.seed, WAVE_STREAM, k);
    }
    return this.scale * total;
  }

  nextCorner(): number {
    return Infinity;
  }

  timescale(): number {
    return 1 / this.bandwidth;
  }

  holdsFrom(): number {
    return Infinity;
  }
}

interface Kernel {
  /** The kernel at 0, 1/RESOLUTION, ... HALF_TAPS sample spacings. */
  readonly table: Float64Array;
  /** ∫ kernel² over all offsets, in sample spacings: the variance of the sum per unit-variance sample, averaged over time. */
  readonly energy: number;
}

let shared: Kernel | undefined;

/** The interpolation kernel, tabulated once: 2·CUTOFF·sinc(2·CUTOFF·u), Kaiser-windowed to ±HALF_TAPS. */
function kernel(): Kernel {
  if (shared !== undefined) return shared;
  const table = new Float64Array(HALF_TAPS * TABLE_RESOLUTION + 1);
  for (let j = 0; j < table.length; j++) {
    const u = j / TABLE_RESOLUTION;
    const x = 2 * CUTOFF * u;
    const sinc = x === 0 ? 1 : Math.sin(Math.PI * x) / (Math.PI * x);
    const r = u / HALF_TAPS;
    table[j] = 2 * CUTOFF * sinc * (besselI0(KAISER_BETA * Math.sqrt(Math.max(0, 1 - r * r))) / besselI0(KAISER_BETA));
  }
  let energy = 0;
  for (let j = 0; j < table.length - 1; j++) energy += (table[j] ** 2 + table[j + 1] ** 2) / 2;
  shared = { table, energy: (2 * energy) / TABLE_RESOLUTION };
  return shared;
}

/** The modified Bessel function I₀ by its power series (textbook), ample for arguments up to 10. */
function besselI0(x: number): number {
  let term = 1;
  let total = 1;
  for (let k = 1; k < 40; k++) {
    term *= (x / (2 * k)) ** 2;
    total += term;
  }
  return total;
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
