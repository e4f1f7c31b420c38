import { quantities } from '../units/quantity.ts';
import { stampAdmittance, stampBranchIncidence, stampBranchVoltage } from './stamps.ts';
import { CapacitorCompanion } from './capacitor-companion.ts';
import { across } from './solution.ts';
import type { Binder, ComplexMna, Device, Link, Mna, StepInfo } from './device.ts';
import type { PartKind, PartSpecBase } from './part-kind.ts';
import { tolerableField } from './tolerance.ts';
import { nodeOf, readBetween } from './pins.ts';

export interface CapacitorSpec extends PartSpecBase {
  readonly kind: 'capacitor';
  /** Farads, > 0. */
  readonly capacitance: number;
  /** Voltage a-b held at the operating point, when given. */
  readonly initial?: number;
}

/** `capacitor: 100n, between: [a, b]`, optional `initial: 1.2V`. */
export const capacitor: PartKind<CapacitorSpec> = {
  key: 'capacitor',
  summary: 'linear capacitor: `capacitor: 100n`, `between: [a, b]`, optional `initial:` volts',
  read: (name, main, options) => {
    const initial = options.get('initial');
    return {
      kind: 'capacitor',
      name,
      capacitance: main.number(quantities.capacitance, { above: 0 }),
      ...(initial !== undefined ? { initial: initial.number(quantities.voltage) } : {}),
      pins: readBetween(options),
    };
  },
  create: (spec) => new CapacitorDevice(spec),
  tolerable: [tolerableField<CapacitorSpec, 'capacitance'>('capacitor', 'capacitance', quantities.capacitance, { above: 0 })],
};

/**
 * A capacitor is a companion model per step. With an `initial` voltage it carries its own
 * branch current so that the operating point can hold that voltage as a source would.
 */
class CapacitorDevice implements Device {
  readonly kind = 'capacitor';
  readonly name: string;
  private a = -1;
  private b = -1;
  /** Branch-current unknown, only with `initial`. */
  private k = -1;
  private readonly companion: CapacitorCompanion;
  constructor(private readonly spec: CapacitorSpec) {
    this.name = spec.name;
    this.companion = new CapacitorCompanion(spec.capacitance);
  }
  bind(binder: Binder): void {
    this.a = binder.node(nodeOf(this.spec.pins, 'a'));
    this.b = binder.node(nodeOf(this.spec.pins, 'b'));
    if (this.spec.initial !== undefined) this.k = binder.branch(`${this.name} current`);
  }
  stampStatic(m: Mna): void {
    if (this.k >= 0) stampBranchIncidence(m, this.a, this.b, this.k);
  }
  stampStep(m: Mna, step: StepInfo): void {
    if (this.k < 0) {
      this.companion.stampStep(m, this.a, this.b, step);
      return;
    }
    this.companion.update(step);
    if (step.method === 'dc') {
      stampBranchVoltage(m, this.k, this.a, this.b);
      return;
    }
    // Branch row: g·(va - vb) - i = history.
    const g = this.companion.g;
    m.add(this.k, this.a, g);
    m.add(this.k, this.b, -g);
    m.add(this.k, this.k, -1);
  }
  stampRhs(m: Mna, step: StepInfo): void {
    if (this.k < 0) this.companion.stampRhs(m, this.a, this.b, step);
    else m.rhs(this.k, step.method === 'dc' ? this.spec.initial ?? 0 : this.companion.history(step));
  }
  /** Admittance j·omega·C; with a branch current, the branch row j·omega·C·(va - vb) - i = 0. */
  stampSmallSignal(m: ComplexMna, _x: Float64Array, omega: number): void {
    const susceptance = omega * this.spec.capacitance;
    if (this.k < 0) {
      stampAdmittance(m, this.a, this.b, 0, susceptance);
      return;
    }
    this.stampStatic(m);
    m.add(this.k, this.a, 0, susceptance);
    m.add(this.k, this.b, 0, -susceptance);
    m.add(this.k, this.k, -1);
  }
  accept(x: Float64Array, step: StepInfo): void {
    this.companion.accept(across(x, this.a, this.b), step, this.k >= 0 ? x[this.k] : undefined);
  }
  links(): readonly Link[] {
    return [{ a: this.a, b: this.b, kind: this.k >= 0 ? 'voltage' : 'none' }];
  }
}
