/** Thresholds of the ringing search. */
export interface RingingOptions {
  /** Settling band as a fraction of the step: settled once within ±band·|step| for good. Default 0.01. */
  settleBand?: number;
  /** Damping ratio below which an oscillation counts as sustained. Default 0.01. */
  sustainedBelow?: number;
  /** Events closer together than this are one event, seconds. Default 4 output steps. */
  eventGap?: number;
  /** Relative disagreement allowed between the crossing and the spectral frequency. Default 0.15. */
  spectralTolerance?: number;
  /**
   * Output rows examined after each event, at most (fewer when the next event comes first).
   * Bounds the memory and the time of the analysis whatever the run's length. Default 32,768.
   */
  windowRows?: number;
}

/** A damped (or sustained) oscillation seen on one node after one event. */
export interface RingingFinding {
  /** Node name (a recorded node or an op-amp output). */
  readonly node: string;
  /** Time of the event the oscillation follows, seconds. */
  readonly start: number;
  /** What the event was, e.g. `corner of RAMP` or `AMP left the high rail`. */
  readonly cause: string;
  /** Oscillation frequency from the zero crossings about the settling value, Hz (the damped frequency). */
  readonly frequency: number;
  /** Frequency of the spectral peak (fft.js) over the same stretch, Hz: the confirmation. */
  readonly spectralFrequency: number;
  /** From the logarithmic decrement: zeta = delta / sqrt(4 pi^2 + delta^2). */
  readonly dampingRatio: number;
  /** Logarithmic decrement per full cycle, ln(A_k / A_k+1). */
  readonly logDecrement: number;
  /** Largest excursion past the settling value in the step's direction, as a fraction of the step. */
  readonly overshoot: number;
  /** Settling value about which the node oscillates, volts. */
  readonly settlingValue: number;
  /** Settling value less the value before the event, volts. */
  readonly step: number;
  /** From the event until the node stays within the band, seconds; null when it never settles before the next event. */
  readonly settlingTime: number | null;
  /** Full cycles between the first and the last zero crossing counted. */
  readonly cycles: number;
  /** True when the oscillation does not decay (damping ratio below `sustainedBelow`). */
  readonly sustained: boolean;
  /** Output rows per period; under 8 the figures are coarse (a warning says so). */
  readonly rowsPerPeriod: number;
  /** Later events after which the same node rang at the same frequency (within 5%). */
  readonly repeats: number;
}

/** Something the designer should know that is not a finding about the circuit. */
export interface ReportWarning {
  readonly kind: 'solver' | 'resolution' | 'adc' | 'balance' | 'duration';
  readonly message: string;
  readonly time?: number;
  readonly node?: string;
  readonly part?: string;
}

/** An instant after which ringing is looked for. */
export interface RingingEvent {
  readonly time: number;
  readonly cause: string;
}
