import type { PartKind, PartSpecBase } from './part-kind.ts';
import { resistor } from './resistor.ts';
import { capacitor } from './capacitor.ts';
import { inductor } from './inductor.ts';
import { voltageSource } from './voltage-source.ts';
import { currentSource } from './current-source.ts';
import { vcvs } from './vcvs.ts';
import { opamp } from './opamp.ts';
import { timedSwitch } from './switch.ts';
import { diode } from './diode.ts';
import { comparator } from './comparator.ts';

export type { Device, Binder, Mna, ComplexMna, GainStage, NoiseSource, StepInfo, Method, Link, OpenPin } from './device.ts';
export type { PartKind, PartSpecBase, PinRef, Conditions } from './part-kind.ts';

/** Every part kind, by its YAML key. Adding a kind: one file and one line here. */
export const partKinds: readonly PartKind<any>[] = [
  resistor,
  capacitor,
  inductor,
  voltageSource,
  currentSource,
  vcvs,
  opamp,
  timedSwitch,
  diode,
  comparator,
];

/** The kind for a spec's `kind` key. */
export function partKind(key: string): PartKind<PartSpecBase> {
  const kind = partKinds.find((k) => k.key === key);
  if (kind === undefined) throw new Error(`internal: unknown part kind ${key}`);
  return kind;
}
