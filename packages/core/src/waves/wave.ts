import type { MapReader, ReadContext, ValueReader } from '../reading/reader.ts';
import type { Quantity } from '../units/quantity.ts';

/**
 * A stimulus as a function of time. Waves are immutable and allocate nothing when
 * evaluated: the stepper calls them once per step.
 */
export interface Wave {
  /** Value at time `t` in seconds. */
  value(t: number): number;
  /**
   * The first corner strictly after `t`: a jump in value or slope that the stepper must land
   * on and damp after. `Infinity` when there is none.
   */
  nextCorner(t: number): number;
  /**
   * The shortest time over which the wave changes shape: its period when smooth, the
   * shortest spacing of its corners when piecewise; Infinity for a constant. Default output
   * rows are chosen to resolve it.
   */
  timescale(): number;
  /**
   * The time from which the wave holds its value for good; Infinity when it never does (a
   * periodic wave, noise). Tells when a circuit's drive has gone quiet.
   */
  holdsFrom(): number;
}

/**
 * A wave kind: one YAML key (`points`, `sine`, ...) and how to read it. In a circuit file a
 * wave is a map whose one kind key selects the kind; that key's value is `main`, the sibling
 * keys are `options`. Adding a kind is one file plus one line in `waves/index.ts`.
 */
export interface WaveKind {
  readonly key: string;
  /** One line for docs and "did you mean" lists. */
  readonly summary: string;
  /** `quantity` is what the wave's values are (volts for a voltage source, amperes for a current source). */
  read(main: ValueReader, options: MapReader, context: ReadContext, quantity: Quantity): Wave;
}
