/** Thresholds of the saturation tracker. */
export interface SaturationOptions {
  /** Fragments of the same kind closer than this merge into one interval, seconds. Default: 2 output steps. */
  mergeGap?: number;
  /** Intervals shorter than this (after merging) are dropped, seconds. Default 0: keep all. */
  minDuration?: number;
}

/** Common fields of every interval: when it held and on which amplifier. */
export interface Interval {
  /** Op-amp part name. */
  readonly part: string;
  /** First accepted solution in the state, seconds. */
  readonly start: number;
  /** First accepted solution out of it again (the run's end if it never left), seconds. */
  readonly end: number;
  readonly duration: number;
  /** Pieces merged into this interval (1 when it was never interrupted). */
  readonly fragments: number;
}

/** The output held at a rail (supply less headroom). */
export interface SaturationInterval extends Interval {
  readonly rail: 'high' | 'low';
  /** Clamp level of that rail during the interval (at its start), volts. */
  readonly limit: number;
  /**
   * Largest |v(plus) - v(minus) + offset| seen in the interval, volts: how hard the loop
   * pushed against the rail.
   */
  readonly worstInputError: number;
  /**
   * Estimate of how far the demanded output went past `limit`, volts: worstInputError times
   * the stage's resistive noise gain (1/beta). Present only when the feedback network is
   * recognized (see docs/guide-reports.md).
   */
  readonly overdrive?: number;
}

/** The input stage delivered (nearly) its full current: the output moved at the slew rate. */
export interface SlewInterval extends Interval {
  readonly direction: 'rising' | 'falling';
  /** Output change over the interval divided by its duration, V/s. */
  readonly averageRate: number;
}

/** The output current sat at the part's `current-limit`. */
export interface CurrentLimitInterval extends Interval {
  /** Largest |output voltage| seen in the interval, volts. */
  readonly worstOutput: number;
}
