import type { MapReader, ReadContext, ValueReader } from '../reading/reader.ts';
import type { Device } from './device.ts';
import type { TolerableValue, Tolerance } from './tolerance.ts';

/** A node a part connects to, with where it was written (for messages). */
export interface PinRef {
  readonly pin: string;
  readonly node: string;
  readonly path: readonly (string | number)[];
  readonly position?: { line: number; column: number };
}

/** What every part description carries; each kind adds its own values. */
export interface PartSpecBase {
  readonly kind: string;
  readonly name: string;
  readonly pins: readonly PinRef[];
  /** What `tolerance:` lets vary, for envelopes; absent when nothing may. */
  readonly tolerances?: readonly Tolerance[];
}

/** The conditions a run puts every part in, besides its own values. */
export interface Conditions {
  /** °C (`simulate: temperature`). */
  readonly temperature: number;
}

/**
 * A part kind: one YAML key (`resistor`, `capacitor`, ...), how to read it and how to make
 * its device. In a circuit file a part is a map whose kind key's value is `main` (the value,
 * preset or wave) and whose sibling keys (`between`, `initial`, ...) are read from `options`.
 * Adding a part kind is one file plus one line in `parts/index.ts`.
 */
export interface PartKind<Spec extends PartSpecBase = PartSpecBase> {
  readonly key: string;
  /** One line for docs and "did you mean" lists. */
  readonly summary: string;
  read(name: string, main: ValueReader, options: MapReader, context: ReadContext): Spec;
  create(spec: Spec, conditions: Conditions): Device;
  /**
   * Values that `tolerance:` may vary, for envelopes (Monte Carlo and worst-case corners).
   * Absent: the kind has no tolerance. The first entry is the main value when its key is `key`.
   */
  readonly tolerable?: readonly TolerableValue<Spec>[];
  /**
   * The shortest time over which the part's own drive changes shape (a source's wave, a
   * switch's schedule), for choosing default output rows; absent or Infinity when it has none.
   */
  timescale?(spec: Spec): number;
  /**
   * The time from which the part's own drive no longer changes (Infinity when it never stops,
   * as a periodic one); absent when it has none. Tells when a circuit's drive has gone quiet.
   */
  holdsFrom?(spec: Spec): number;
}
