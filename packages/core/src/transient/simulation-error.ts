/**
 * The simulation itself failed: at what time (or, in a small-signal analysis, at what
 * frequency), and which nodes or parts were involved.
 */
export class SimulationError extends Error {
  constructor(
    message: string,
    /** Simulated time of the failure in seconds; NaN for the operating point and for small-signal analyses. */
    readonly time: number,
    /** Nodes (or unknown labels) involved, most to blame first. */
    readonly nodes: readonly string[],
    /** What the user can try. */
    readonly hint: string,
    /** Parts involved, when the cause is a set of parts (a loop of sources). */
    readonly parts: readonly string[] = [],
    /** Frequency in Hz at which a small-signal analysis failed; NaN otherwise. */
    readonly frequency = NaN,
  ) {
    super(message);
    this.name = 'SimulationError';
  }
}
