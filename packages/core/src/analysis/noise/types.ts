import type { Hint } from '../report/hints.ts';
import type { SmallSignalStats } from '../../small-signal/linearized-circuit.ts';

/** Options for `noiseAnalysis`: each overrides the circuit's `noise:` section or `simulate: temperature`. */
export interface NoiseOptions {
  /** Lowest frequency of the band, Hz (default 1). */
  from?: number;
  /** Highest frequency, Hz (default: the highest converter's Nyquist rate, or 1 MHz without one). */
  to?: number;
  /** Log-spaced points per decade (default 20). */
  perDecade?: number;
  /** °C (default: the circuit's `simulate: temperature`). */
  temperature?: number;
  /** Work out the changes that would halve each output's noise (default true; each costs a further sweep). */
  hints?: boolean;
}

/** The band integrated over. */
export interface NoiseBandUsed {
  readonly from: number;
  readonly to: number;
  readonly perDecade: number;
}

/** One part's noise generator as it arrives at an output. */
export interface NoiseContribution {
  readonly part: string;
  /** `thermal` (a resistor's 4kTR), `voltage` (an amplifier's input voltage noise), `current at plus`, `current at minus`. */
  readonly source: string;
  /** Integrated over the band, volts rms. */
  readonly rms: number;
  /** Share of the output's noise power, 0..1. */
  readonly share: number;
  /** Density at the output per frequency, V/√Hz. */
  readonly density: Float64Array;
}

/** The noise at one output (a recorded node, or a converter's input). */
export interface OutputNoiseFigures {
  /** The node, or `plus - minus` for a differential converter input. */
  readonly node: string;
  /** Total density per frequency, V/√Hz. */
  readonly density: Float64Array;
  /** Integrated over the band, volts rms. */
  readonly rms: number;
  /** Largest first. */
  readonly contributions: readonly NoiseContribution[];
  /** Changes that would halve `rms`: a quieter resistor or amplifier class for the largest contributor, and the low-pass corner. */
  readonly hints: readonly Hint[];
}

/** What a converter will see of the noise. */
export interface AdcNoise {
  readonly name: string;
  /** The node it converts (`plus - minus` when differential). */
  readonly node: string;
  /** Volts rms at its input over the band. */
  readonly rmsVolts: number;
  /** Volts per code (a range end that is a node taken at the operating point). */
  readonly lsb: number;
  /** rmsVolts / lsb. */
  readonly lsbRms: number;
  /** 6.6 σ in LSB: the span 99.9% of samples of Gaussian noise fall in (common practice). */
  readonly peakToPeakLsb: number;
  /** log2(full scale / peak-to-peak volts), at most the converter's bits: the bits that do not flicker. */
  readonly noiseFreeBits: number;
  /**
   * Consecutive samples to average so that the mean stays within ±1 LSB (6.6 σ of the mean
   * at most 2 LSB), from the noise spectrum and the sample rate (correlated samples count for
   * less); 1 when single samples already do; null when no average within 1/from seconds gets
   * there (1/f noise) or the converter samples at listed instants.
   */
  readonly averagingFor1Lsb: number | null;
  /**
   * Noise power above the band as a fraction of the power in it, extrapolating the density's
   * fall over the band's last interval (a converter folds all of it into its samples); null
   * when the density is not falling faster than 1/f there, so the band cuts off noise that
   * goes on. Above 0.05 (2.5% in rms) or null, raise the band's `to`.
   */
  readonly beyondBand: number | null;
  /** The converter's own noise (`noise:` of the ADC), LSB rms, which adds to lsbRms in quadrature in a run. */
  readonly converterLsbRms: number;
}

/** Noise of a circuit linearized at its t = 0 operating point. */
export interface NoiseAnalysis {
  /** °C. */
  readonly temperature: number;
  readonly band: NoiseBandUsed;
  /** Hz, log-spaced. */
  readonly frequency: Float64Array;
  /** Per recorded node, in `record:` order, then each differential converter input. */
  readonly nodes: readonly OutputNoiseFigures[];
  /** Per converter, in `adc:` order. */
  readonly adc: readonly AdcNoise[];
  /** Voltage of every named node at the operating point. */
  readonly operatingPoint: ReadonlyMap<string, number>;
  readonly stats: SmallSignalStats;
}
