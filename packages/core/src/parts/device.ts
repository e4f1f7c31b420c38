/**
 * The engine's view of a part. A device stamps itself into the modified nodal equations
 * `G·x = b`; it never sees the step control. The contract, in the order the stepper calls:
 *
 * 1. `bind` once: resolve pins to unknown indices and reserve extra unknowns (branch
 *    currents, internal nodes). Index -1 is ground; stamps to it are dropped by `Mna`.
 * 2. `stampStatic` once: matrix entries that never change in a run (resistors, the incidence
 *    of voltage-defined branches).
 * 3. `stampStep` whenever the step size or method changes: companion conductances. A device
 *    with corners of its own (a scheduled switch) may also stamp conductances that change only
 *    at those corners: the step layer is then rebuilt after every corner. With `step.method === 'dc'` it stamps the operating-point form
 *    (capacitor open, inductor short).
 * 4. `stampRhs` every step attempt: source values at `step.t` (scaled by `step.sourceScale`)
 *    and companion history terms.
 * 5. `stampNewton` every Newton iteration, for nonlinear devices only: the linearization at
 *    the current iterate `x` (matrix and right-hand side). It returns true when it limited
 *    the step and linearized elsewhere than at `x`: that iteration cannot count as converged.
 * 6. `accept` when a step (or the operating point) is accepted: update history from `x`.
 *
 * Devices allocate nothing after `bind`: steps 2 to 6 run in the per-step loop.
 *
 * The small-signal analyses (frequency response, loop gain, noise) call, after the operating
 * point `x` has been found with steps 1 to 6:
 *
 * 7. `stampSmallSignal` once per frequency: the device linearized at `x`, as complex
 *    admittances at angular frequency `omega` (a capacitance adds j·omega·C, an inductor's
 *    branch row -j·omega·L; a nonlinear device stamps the slopes of its characteristic at
 *    `x`, a piecewise one the piece `x` lies in). Matrix entries only: independent sources are
 *    zero in the small-signal circuit, so nothing goes on the right-hand side. A
 *    `ComplexMna` is also an `Mna` whose entries are real, so frequency-independent parts
 *    reuse `stampStatic` and the helpers of `stamps.ts`. Allocates nothing.
 * 8. `stampTestSignal`, sources only: the right-hand side of the 1 V (1 A) test signal at zero
 *    phase, for the source named as the response's input.
 * 9. `gainStage`, amplifiers only: the controlled source inside the device where the loop-gain
 *    analysis breaks the loop to measure its return ratio, linearized at `x`.
 * 10. `noiseSources`, parts that make noise: each noise generator as a current between two
 *    unknowns with its one-sided density at the operating point `x` and `kelvin` (a
 *    resistor's 4kT/R; an amplifier's input voltage noise as the current it makes its gain
 *    stage deliver). The noise analysis finds each one's way to the outputs; the transient
 *    with noise drives each one with a seeded random current of that density.
 *
 * A device without `stampSmallSignal` makes the small-signal analyses refuse the circuit
 * with a message naming it.
 */
export interface Device {
  readonly name: string;
  /** The kind key, e.g. `resistor`. */
  readonly kind: string;
  bind(binder: Binder): void;
  stampStatic?(m: Mna): void;
  stampStep?(m: Mna, step: StepInfo): void;
  stampRhs?(m: Mna, step: StepInfo): void;
  stampNewton?(m: Mna, x: Float64Array, step: StepInfo): boolean;
  accept?(x: Float64Array, step: StepInfo): void;
  /**
   * For piecewise devices: a small integer naming the piece the solution `x` lies in (an
   * amplifier at a rail: -1, 0, 1). A change between steps is an event: the stepper narrows
   * the step down onto it and damps after it as after a corner.
   */
  region?(x: Float64Array): number;
  /** First corner of this device's stimulus strictly after `t`, or Infinity. */
  nextCorner?(t: number): number;
  /** How the device connects its pins, for diagnosing a singular matrix by cause. */
  links(): readonly Link[];
  /**
   * Pins the device leaves with nothing conducting at DC at times (an open-drain output that
   * is off): reading a circuit checks that another part on each of their nodes conducts.
   */
  openPins?(): readonly OpenPin[];
  /**
   * Unknowns whose local truncation error the step control watches besides node voltages
   * (inductor currents).
   */
  stateUnknowns?(): readonly number[];
  /** The linearization at the operating point `x` at angular frequency `omega` (contract item 7). */
  stampSmallSignal?(m: ComplexMna, x: Float64Array, omega: number): void;
  /** The 1 V or 1 A test signal of a source used as the response's input (contract item 8). */
  stampTestSignal?(m: ComplexMna): void;
  /** Where to break an amplifier's loop for its return ratio, at the operating point `x` (contract item 9). */
  gainStage?(x: Float64Array): GainStage;
  /** The device's noise generators at the operating point `x` and temperature `kelvin` (contract item 10). */
  noiseSources?(x: Float64Array, kelvin: number): readonly NoiseSource[];
}

/**
 * One noise generator of a device: a random current entering unknown `into` and leaving
 * `from` (-1 is ground), uncorrelated with every other, whose one-sided power density is
 * `white · (1 + corner / f)` in A²/Hz: white above `corner`, rising as 1/f below it.
 */
export interface NoiseSource {
  /** What makes it, for reports: `thermal`, `voltage`, `current at plus`, ... */
  readonly source: string;
  readonly into: number;
  readonly from: number;
  /** A²/Hz. */
  readonly white: number;
  /** The 1/f corner, Hz; 0 for white noise alone. */
  readonly corner: number;
}

/**
 * `conductive`: conducts at DC (resistor, inductor, source output). `voltage`: fixes the voltage
 * between its ends (voltage source, inductor at DC, amplifier output); a loop of these is
 * singular. `none`: does not conduct at DC (capacitor, current source).
 */
export interface Link {
  readonly a: number;
  readonly b: number;
  readonly kind: 'conductive' | 'voltage' | 'none';
}

/** A pin that needs another part conducting at DC on its node, with why and what to do, for the message. */
export interface OpenPin {
  readonly pin: string;
  readonly why: string;
  readonly hint: string;
}

export type Method = 'dc' | 'be' | 'trap';

/** The step being attempted. Reused by the stepper, never retained by devices. */
export interface StepInfo {
  /** Time at the end of the step (the time being solved for). */
  t: number;
  /** Step size; 0 for the operating point. */
  h: number;
  method: Method;
  /** Homotopy factor for the operating point: independent sources are scaled by it. */
  sourceScale: number;
}

/** Resolves pins and reserves unknowns while devices bind. */
export interface Binder {
  /** Index of a node by name; `gnd` is -1. */
  node(name: string): number;
  /** Reserve a branch-current unknown, labelled for messages (e.g. `L1 current`). */
  branch(label: string): number;
  /** Reserve an internal node voltage unknown, labelled for messages. */
  internal(label: string): number;
}

/** Assembly target. Index -1 (ground) is ignored in both calls. */
export interface Mna {
  readonly size: number;
  /** Add `value` to the matrix entry at (row, col). */
  add(row: number, col: number, value: number): void;
  /** Add `value` to the right-hand side at `row`. */
  rhs(row: number, value: number): void;
}

/**
 * Complex assembly target of the small-signal analyses: entries `re + j·im`. With `im` left
 * out an entry is real, so a `ComplexMna` serves wherever an `Mna` is taken.
 */
export interface ComplexMna extends Mna {
  /** Add `re + j·im` to the matrix entry at (row, col). */
  add(row: number, col: number, re: number, im?: number): void;
  /** Add `re + j·im` to the right-hand side at `row`. */
  rhs(row: number, re: number, im?: number): void;
}

/**
 * A voltage-controlled current source inside a device, linearized at the operating point: the
 * current `transconductance · (v(p) - v(n))` enters unknown `into` and leaves `from` (-1 is
 * ground). The loop-gain analysis replaces its controlling voltage by a test signal and reads
 * what returns to `p` and `n`.
 */
export interface GainStage {
  readonly into: number;
  readonly from: number;
  readonly p: number;
  readonly n: number;
  readonly transconductance: number;
  /** The amplifier's output pin, where its open-loop gain is read. */
  readonly output: number;
}
