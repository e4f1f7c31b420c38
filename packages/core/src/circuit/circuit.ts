import type { PartSpecBase } from '../parts/part-kind.ts';
import type { AdcSpec } from './adc-spec.ts';

/** How to step through time; every value in SI base units. */
export interface SimulateSettings {
  /** End time of the run (the run starts at 0). */
  readonly duration: number;
  /** Spacing of output rows; the stepper lands on each row time exactly. */
  readonly outputStep: number;
  /** Cap on the internal step. */
  readonly maxStep: number;
  /** When set, every step has this size (no error control): for convergence studies. */
  readonly fixedStep?: number;
  /** How closely each step follows the exact solution. */
  readonly accuracy: Accuracy;
  /** Temperature of every part, °C (diode junctions, noise). */
  readonly temperature: number;
  /**
   * Present when `output-step` was not written and a part's drive changes faster than
   * duration / 1000 allows rows to show: that part and its timescale set the rows
   * (`simulateDefaults.rowsPerTimescale` rows in it), unless the row count reached
   * `simulateDefaults.mostDefaultRows` (`capped`).
   */
  readonly rowsSetBy?: RowsSetBy;
}

/** The part whose drive set the default output rows. */
export interface RowsSetBy {
  readonly part: string;
  /** Its shortest feature, seconds: a period, a level's hold, a segment of points. */
  readonly timescale: number;
  /** True when rows would have been finer than the row cap allows: they do not resolve it. */
  readonly capped: boolean;
}

/** `simulate: accuracy:`: the tolerances of the local truncation error per step. */
export interface Accuracy {
  /** Relative tolerance. */
  readonly relative: number;
  /** Absolute floor for node voltages, volts. */
  readonly volts: number;
  /** Absolute floor for branch currents, amperes. */
  readonly amps: number;
}

/** `response:`: the frequency sweep of `voltcast response` and `frequencyResponse`. */
export interface ResponseSettings {
  /** Name of the voltage or current source that carries the 1 V (1 A) test signal. */
  readonly input: string;
  /** Lowest frequency, Hz. */
  readonly from: number;
  /** Highest frequency, Hz. */
  readonly to: number;
  /** Log-spaced points per decade. */
  readonly perDecade: number;
}

/**
 * `noise:`: the band `voltcast noise` and `noiseAnalysis` integrate over. Each key is optional;
 * an absent one takes its default where the band is used (1 Hz; the highest converter's
 * Nyquist rate or 1 MHz; 20 per decade), since the defaults depend on the `adc:` section.
 */
export interface NoiseBand {
  /** Lowest frequency, Hz. */
  readonly from?: number;
  /** Highest frequency, Hz. */
  readonly to?: number;
  /** Log-spaced points per decade. */
  readonly perDecade?: number;
}

/** A validated circuit: what the parser returns and what `simulate` takes. */
export interface Circuit {
  readonly name: string;
  readonly parts: readonly PartSpecBase[];
  readonly simulate: SimulateSettings;
  /** Node names recorded as output columns, in order. */
  readonly recorded: readonly string[];
  /** Every node name except `gnd`, in order of first appearance. */
  readonly nodes: readonly string[];
  /** Converters of the `adc:` section; their sampling parts are among `parts`. */
  readonly adcs: readonly AdcSpec[];
  /** The `response:` section, when the file has one. */
  readonly response?: ResponseSettings;
  /** The `noise:` section, when the file has one. */
  readonly noise?: NoiseBand;
}

/** Defaults for `simulate:` keys the file leaves out. */
export const simulateDefaults = {
  /** Output rows when `output-step` is absent: duration / 1000. */
  rowsWhenUnset: 1000,
  /** Rows in the shortest timescale of the parts' drives, when `output-step` is absent. */
  rowsPerTimescale: 20,
  /** At most this many rows are chosen by default. */
  mostDefaultRows: 100_000,
  accuracy: { relative: 1e-4, volts: 1e-6, amps: 1e-9 },
  /** °C: the temperature data sheets state typical figures at. */
  temperature: 25,
} as const;
