import { quantities } from '../units/quantity.ts';
import { stampBranchIncidence, stampBranchVoltage } from './stamps.ts';
import type { Binder, ComplexMna, Device, Link, Mna } from './device.ts';
import type { PartKind, PartSpecBase } from './part-kind.ts';
import { tolerableField } from './tolerance.ts';
import { nodeOf, pinRef, readBetween } from './pins.ts';

export interface VcvsSpec extends PartSpecBase {
  readonly kind: 'vcvs';
  /** v(a) - v(b) = gain · (v(p) - v(n)). */
  readonly gain: number;
}

/** `vcvs: 10` (the gain), `sense: [p, n]`, `between: [a, b]`. */
export const vcvs: PartKind<VcvsSpec> = {
  key: 'vcvs',
  summary: 'voltage-controlled voltage source: `vcvs: 10` (gain), `sense: [p, n]`, `between: [a, b]`',
  read: (name, main, options) => {
    const pins = readBetween(options);
    const sense = options.need('sense', 'write `sense: [p, n]`: the node pair whose voltage difference is amplified');
    const senseItems = sense?.list() ?? [];
    if (sense !== undefined && senseItems.length !== 2) sense.fail('`sense` needs exactly two node names', 'write `sense: [p, n]`');
    return {
      kind: 'vcvs',
      name,
      gain: main.number(quantities.gain),
      pins: senseItems.length === 2 ? [...pins, pinRef('p', senseItems[0]), pinRef('n', senseItems[1])] : pins,
    };
  },
  create: (spec) => new VcvsDevice(spec),
  tolerable: [tolerableField<VcvsSpec, 'gain'>('vcvs', 'gain', quantities.gain)],
};

class VcvsDevice implements Device {
  readonly kind = 'vcvs';
  readonly name: string;
  private a = -1;
  private b = -1;
  private p = -1;
  private n = -1;
  private k = -1;
  constructor(private readonly spec: VcvsSpec) {
    this.name = spec.name;
  }
  bind(binder: Binder): void {
    const pins = this.spec.pins;
    this.a = binder.node(nodeOf(pins, 'a'));
    this.b = binder.node(nodeOf(pins, 'b'));
    this.p = binder.node(nodeOf(pins, 'p'));
    this.n = binder.node(nodeOf(pins, 'n'));
    this.k = binder.branch(`${this.name} current`);
  }
  stampStatic(m: Mna): void {
    stampBranchIncidence(m, this.a, this.b, this.k);
    stampBranchVoltage(m, this.k, this.a, this.b);
    m.add(this.k, this.p, -this.spec.gain);
    m.add(this.k, this.n, this.spec.gain);
  }
  stampSmallSignal(m: ComplexMna): void {
    this.stampStatic(m);
  }
  links(): readonly Link[] {
    return [{ a: this.a, b: this.b, kind: 'voltage' }];
  }
}
