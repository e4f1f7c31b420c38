import type { ResponseSettings } from '../../circuit/circuit.ts';
import type { FrequencySweep, LoopResponse } from '../../small-signal/types.ts';
import type { Hint } from '../report/hints.ts';

/** Options for `frequencyResponse`: each sweep setting overrides the circuit's `response:` section. */
export interface ResponseOptions extends Partial<ResponseSettings> {
  /** Phase margin the hints aim for, degrees (default 60). */
  targetMargin?: number;
}

/** An amplifier's loop with, when its phase margin is short of the target, the change that restores it. */
export type LoopFinding = LoopResponse & { readonly hint?: Hint };

/** Something that makes a loop's figures absent or doubtful: what, and what to do. */
export interface ResponseWarning {
  readonly part: string;
  readonly message: string;
  readonly hint: string;
}

/** The frequency response of a circuit, its loops' margins, and what to do about short ones. */
export interface FrequencyResponse extends FrequencySweep {
  readonly loops: readonly LoopFinding[];
  /** The phase margin the hints aim for, degrees. */
  readonly targetMargin: number;
  readonly warnings: readonly ResponseWarning[];
}
