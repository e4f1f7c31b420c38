/** A run of consecutive samples, from the first instant to the last. */
export interface TimeInterval {
  readonly from: number;
  readonly to: number;
}

/** Samples whose input lay beyond one end of the range, so that the code stuck at that end. */
export interface ClippedSamples {
  readonly count: number;
  readonly intervals: readonly TimeInterval[];
}

/** A reported code against the code an error-free converter would give. */
export interface CodeError {
  /** Code read minus ideal code. */
  readonly codes: number;
  /** Row of the readout, its time, and the two codes. */
  readonly index: number;
  readonly time: number;
  readonly read: number;
  readonly ideal: number;
}

/** What one converter read over the run, for report.txt and report.json. */
export interface AdcReport {
  readonly name: string;
  /** Volts per code; for a ratiometric range (a node's voltage), the mean over the conversions. */
  readonly lsb: number;
  /** Conversions made (samples), and codes reported (samples / average). */
  readonly samples: number;
  readonly codes: number;
  /** Smallest and largest code reported, as written in the ADC's coding; absent with no codes. */
  readonly codeRange?: readonly [number, number];
  /** Samples at code 0 with the input below the range. */
  readonly clippedLow: ClippedSamples;
  /** Samples at full scale (2^N - 1) with the input above the range. */
  readonly clippedHigh: ClippedSamples;
  /**
   * The reported code furthest from the ideal code of the true input at that instant (the
   * input node's voltage at the instant through an error-free converter): acquisition,
   * offset, gain and noise errors together. Absent with no codes.
   */
  readonly largestError?: CodeError;
  /**
   * With `sampling`: the reported code furthest from the ideal code of the input as it was
   * just before the acquisition window opened, before this sample loaded it. A source too
   * weak to charge the capacitor drags its own node down with the capacitor; this shows it.
   * A signal that moves during the window adds its own change over the window.
   */
  readonly largestErrorBeforeWindow?: CodeError;
  /** Largest |held voltage - input voltage| at a sample instant, volts (0 without `sampling`). */
  readonly largestHeldError: number;
}
