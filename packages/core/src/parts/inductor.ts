import { quantities } from '../units/quantity.ts';
import { stampBranchIncidence, stampBranchVoltage } from './stamps.ts';
import { across } from './solution.ts';
import type { Binder, ComplexMna, Device, Link, Mna, StepInfo } from './device.ts';
import type { PartKind, PartSpecBase } from './part-kind.ts';
import { tolerableField } from './tolerance.ts';
import { nodeOf, readBetween } from './pins.ts';

export interface InductorSpec extends PartSpecBase {
  readonly kind: 'inductor';
  /** Henries, > 0. */
  readonly inductance: number;
  /** Current a→b forced at the operating point, when given. */
  readonly initial?: number;
}

/** `inductor: 10u, between: [a, b]`, optional `initial: 5mA`. */
export const inductor: PartKind<InductorSpec> = {
  key: 'inductor',
  summary: 'linear inductor: `inductor: 10u`, `between: [a, b]`, optional `initial:` amperes',
  read: (name, main, options) => {
    const initial = options.get('initial');
    return {
      kind: 'inductor',
      name,
      inductance: main.number(quantities.inductance, { above: 0 }),
      ...(initial !== undefined ? { initial: initial.number(quantities.current) } : {}),
      pins: readBetween(options),
    };
  },
  create: (spec) => new InductorDevice(spec),
  tolerable: [tolerableField<InductorSpec, 'inductance'>('inductor', 'inductance', quantities.inductance, { above: 0 })],
};

/**
 * Branch-current form: v = L·di/dt. Trapezoidal: v - (2L/h)·i = -(2L/h)·i₀ - v₀;
 * backward Euler: v - (L/h)·i = -(L/h)·i₀. At the operating point a short (or a forced
 * current with `initial`).
 */
class InductorDevice implements Device {
  readonly kind = 'inductor';
  readonly name: string;
  private a = -1;
  private b = -1;
  private k = -1;
  private r = 0;
  private vPrev = 0;
  private iPrev = 0;
  constructor(private readonly spec: InductorSpec) {
    this.name = spec.name;
  }
  bind(binder: Binder): void {
    this.a = binder.node(nodeOf(this.spec.pins, 'a'));
    this.b = binder.node(nodeOf(this.spec.pins, 'b'));
    this.k = binder.branch(`${this.name} current`);
  }
  stampStatic(m: Mna): void {
    stampBranchIncidence(m, this.a, this.b, this.k);
  }
  stampStep(m: Mna, step: StepInfo): void {
    if (step.method === 'dc' && this.spec.initial !== undefined) {
      m.add(this.k, this.k, 1);
      return;
    }
    stampBranchVoltage(m, this.k, this.a, this.b);
    this.r = step.method === 'dc' ? 0 : (step.method === 'trap' ? 2 : 1) * this.spec.inductance / step.h;
    if (this.r !== 0) m.add(this.k, this.k, -this.r);
  }
  stampRhs(m: Mna, step: StepInfo): void {
    if (step.method === 'dc') {
      if (this.spec.initial !== undefined) m.rhs(this.k, this.spec.initial);
      return;
    }
    m.rhs(this.k, -this.r * this.iPrev - (step.method === 'trap' ? this.vPrev : 0));
  }
  /** Branch row v(a) - v(b) - j·omega·L·i = 0, whatever `initial` held at the operating point. */
  stampSmallSignal(m: ComplexMna, _x: Float64Array, omega: number): void {
    this.stampStatic(m);
    stampBranchVoltage(m, this.k, this.a, this.b);
    m.add(this.k, this.k, 0, -omega * this.spec.inductance);
  }
  accept(x: Float64Array): void {
    this.vPrev = across(x, this.a, this.b);
    this.iPrev = x[this.k];
  }
  stateUnknowns(): readonly number[] {
    return [this.k];
  }
  links(): readonly Link[] {
    return [{ a: this.a, b: this.b, kind: this.spec.initial !== undefined ? 'none' : 'voltage' }];
  }
}
