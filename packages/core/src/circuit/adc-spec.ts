/** How a converter rounds the scaled input to a code. */
export type AdcRounding = 'nearest' | 'down';
/** How a code is written: `unsigned` and `offset-binary` count from 0 at `low`; `twos-complement` is signed, 0 at mid-scale. */
export type AdcCoding = 'unsigned' | 'offset-binary' | 'twos-complement';

/** When the converter samples: every 1/rate from `start`, or at listed instants. */
export type SampleTimes = { readonly rate: number; readonly start: number } | { readonly times: readonly number[] };

/**
 * The sampling capacitor the converter connects to its input for `acquisition` seconds
 * before each instant, through `resistance` (switch plus input path).
 */
export interface SamplingSpec {
  readonly capacitance: number;
  readonly resistance: number;
  readonly acquisition: number;
  /** Volts the capacitor is set to between samples (other channels, conversion); absent: it keeps the last sample. */
  readonly precharge?: number;
}

/** One converter of the `adc:` section, validated; every value in SI base units or LSB. */
export interface AdcSpec {
  readonly name: string;
  /** Nodes whose difference is the true input: [input, 'gnd'] when single-ended. */
  readonly input: readonly [string, string];
  /** Nodes whose difference is converted: the input, or the sampling capacitor with `sampling`. */
  readonly held: readonly [string, string];
  readonly bits: number;
  /**
   * The input volts of code 0 and of full scale: a number, or a node's name (a ratiometric
   * converter whose reference is that node): its voltage at each sample instant.
   */
  readonly low: number | string;
  readonly high: number | string;
  readonly times: SampleTimes;
  readonly rounding: AdcRounding;
  readonly coding: AdcCoding;
  /** Static offset, LSB. */
  readonly offset: number;
  /** Gain error, LSB at full scale. */
  readonly gainError: number;
  /** Additive noise, LSB rms; 0 for none. */
  readonly noise: number;
  /** Seed of the noise sequence. */
  readonly seed: number;
  /** Consecutive samples averaged into each reported code. */
  readonly average: number;
  readonly sampling?: SamplingSpec;
}
