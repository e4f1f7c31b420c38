import type { PartSpecBase } from './part-kind.ts';
import type { OpampParameters, OpampPresetName } from './opamp-presets.ts';
import type { Supply } from './supply.ts';

export type { Supply } from './supply.ts';

export interface OpampSpec extends PartSpecBase {
  readonly kind: 'opamp';
  readonly preset: OpampPresetName;
  readonly parameters: OpampParameters;
  /** Low and high supply; absent only for the `ideal` preset (then the output is unclamped). */
  readonly supply?: readonly [Supply, Supply];
}

/** What an amplifier is doing at one solution, for saturation reports. */
export interface OpampStatus {
  /** -1 at the low clamp, 1 at the high clamp, 0 in between. */
  readonly rail: -1 | 0 | 1;
  /** The input stage delivers over 90% of its current limit: the output moves at the slew rate. */
  readonly slewing: boolean;
  /** The output current is over 90% of `current-limit`. */
  readonly currentLimited: boolean;
  /** v(plus) - v(minus) + offset: how hard the loop is pushing, volts. */
  readonly inputError: number;
  /** Output pin voltage. */
  readonly output: number;
  /** Output clamp levels (supply less headroom) at this solution; ±Infinity without supplies. */
  readonly limits: readonly [low: number, high: number];
}
