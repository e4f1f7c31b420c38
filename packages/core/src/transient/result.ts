import type { StepObserver } from './observer.ts';
import type { TransientNoise } from './noise-injection.ts';

/** Work counters, kept for every run (as a mature ODE suite keeps them). */
export interface RunStats {
  acceptedSteps: number;
  rejectedSteps: number;
  /** LU factorizations performed (a linear circuit at a constant step reuses one). */
  factorizations: number;
  /** Linear solves (forward and back substitution). */
  solves: number;
  /** Newton iterations summed over all steps (1 per step for a linear circuit). */
  newtonIterations: number;
  /** Steps rejected because Newton did not converge. */
  newtonFailures: number;
  /** Backward-Euler steps taken to damp after corners. */
  dampingSteps: number;
  /** Accepted steps that were exact (matrix exponential over a linear stretch). */
  exactSteps: number;
  /** Exact-step maps built (one per step size and linearization). */
  propagators: number;
  /** Smallest and largest accepted step, seconds. */
  minStep: number;
  maxStep: number;
}

/** Output of a transient run: one Float64Array column per recorded node on the output grid. */
export interface TransientResult {
  readonly time: Float64Array;
  /** Column per recorded node, same length as `time`. */
  readonly columns: ReadonlyMap<string, Float64Array>;
  readonly recorded: readonly string[];
  /**
   * Per recorded node (in `recorded` order), its smallest and largest value over every step
   * the simulation accepted, so a peak between rows still counts. Where exact steps carry a
   * linear stretch the steps are the rows (and corners, and ADC instants).
   */
  readonly minimum: Float64Array;
  readonly maximum: Float64Array;
  /**
   * Node `name`'s value at time `t`, interpolated linearly between rows (exact at a row).
   * Throws a RangeError for a node not recorded or kept, or a time outside the run.
   */
  valueAt(name: string, t: number): number;
  readonly stats: RunStats;
  /** The DC operating point: voltage of every named node at t = 0. */
  readonly operatingPoint: ReadonlyMap<string, number>;
}

/** Options for `simulate`. */
export interface SimulateOptions {
  /** Watchers inside the step loop (ADC samplers, saturation trackers). */
  observers?: readonly StepObserver[];
  /**
   * Called once per output row with the row's time and recorded values (in `recorded` order).
   * The array is reused between calls: copy it to keep it.
   */
  onRow?: (time: number, values: Float64Array) => void;
  /**
   * Called now and then (every 1% of simulated time, and every 2,000 step attempts) with the
   * fraction done, 0..1. A callback may throw to stop the run; the error comes out of `simulate`.
   */
  onProgress?: (fraction: number) => void;
  /** When false, columns are not kept (use `onRow` to stream long runs). Default true. */
  keepColumns?: boolean;
  /**
   * Storage of the circuit matrix: `dense`, `sparse`, or `auto` (the default: dense for
   * small circuits, sparse from a few dozen unknowns on). The waveforms agree to rounding.
   */
  matrix?: 'dense' | 'sparse' | 'auto';
  /**
   * When false, linear stretches are stepped like the rest (trapezoidal, with error control)
   * instead of exactly: for comparing the two. Default true.
   */
  exactSteps?: boolean;
  /**
   * Seeded noise of every resistor (4kTR) and amplifier (input voltage and current noise,
   * white part) as currents in the run, band-limited and resolved by the steps: the step is
   * held to 1/(20·bandwidth). Absent: no noise.
   */
  noise?: TransientNoise;
}
