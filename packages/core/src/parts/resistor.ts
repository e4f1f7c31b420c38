import { quantities } from '../units/quantity.ts';
import { stampConductance } from './stamps.ts';
import { BOLTZMANN } from '../units/constants.ts';
import type { Binder, ComplexMna, Device, Link, Mna, NoiseSource } from './device.ts';
import type { PartKind, PartSpecBase } from './part-kind.ts';
import { tolerableField } from './tolerance.ts';
import { nodeOf, readBetween } from './pins.ts';

export interface ResistorSpec extends PartSpecBase {
  readonly kind: 'resistor';
  /** Ohms, > 0. */
  readonly resistance: number;
}

/** `resistor: 10k, between: [a, b]`. */
export const resistor: PartKind<ResistorSpec> = {
  key: 'resistor',
  summary: 'linear resistor: `resistor: 10k`, `between: [a, b]`',
  read: (name, main, options) => ({
    kind: 'resistor',
    name,
    resistance: main.number(quantities.resistance, { above: 0 }),
    pins: readBetween(options),
  }),
  create: (spec) => new ResistorDevice(spec),
  tolerable: [tolerableField<ResistorSpec, 'resistance'>('resistor', 'resistance', quantities.resistance, { above: 0 })],
};

class ResistorDevice implements Device {
  readonly kind = 'resistor';
  readonly name: string;
  private a = -1;
  private b = -1;
  constructor(private readonly spec: ResistorSpec) {
    this.name = spec.name;
  }
  bind(binder: Binder): void {
    this.a = binder.node(nodeOf(this.spec.pins, 'a'));
    this.b = binder.node(nodeOf(this.spec.pins, 'b'));
  }
  stampStatic(m: Mna): void {
    stampConductance(m, this.a, this.b, 1 / this.spec.resistance);
  }
  stampSmallSignal(m: ComplexMna): void {
    this.stampStatic(m);
  }
  /** Johnson–Nyquist thermal noise: a current of density 4kT/R across the resistor. */
  noiseSources(_x: Float64Array, kelvin: number): readonly NoiseSource[] {
    return [{ source: 'thermal', into: this.a, from: this.b, white: (4 * BOLTZMANN * kelvin) / this.spec.resistance, corner: 0 }];
  }
  links(): readonly Link[] {
    return [{ a: this.a, b: this.b, kind: 'conductive' }];
  }
}
