import { quantities } from '../units/quantity.ts';
import { readStimulus } from '../waves/index.ts';
import type { Wave } from '../waves/wave.ts';
import { stampBranchIncidence, stampBranchVoltage } from './stamps.ts';
import type { Binder, ComplexMna, Device, Link, Mna, StepInfo } from './device.ts';
import type { PartKind, PartSpecBase } from './part-kind.ts';
import { sourceTolerance } from './source-tolerance.ts';
import { nodeOf, readBetween } from './pins.ts';

export interface VoltageSourceSpec extends PartSpecBase {
  readonly kind: 'voltage';
  /** v(a) - v(b) as a function of time. */
  readonly wave: Wave;
}

/** `voltage: 5` or `voltage: { points: [...] }`, `between: [plus, minus]`. */
export const voltageSource: PartKind<VoltageSourceSpec> = {
  key: 'voltage',
  summary: 'independent voltage source: `voltage: 5` or a wave, `between: [plus, minus]`',
  read: (name, main, options, context) => ({
    kind: 'voltage',
    name,
    wave: readStimulus(main, quantities.voltage, context),
    pins: readBetween(options),
  }),
  create: (spec) => new VoltageSourceDevice(spec),
  timescale: (spec) => spec.wave.timescale(),
  holdsFrom: (spec) => spec.wave.holdsFrom(),
  tolerable: [sourceTolerance<VoltageSourceSpec>('voltage', quantities.voltage)],
};

/** Its branch current flows from `a` through the source into `b`. */
class VoltageSourceDevice implements Device {
  readonly kind = 'voltage';
  readonly name: string;
  private a = -1;
  private b = -1;
  private k = -1;
  constructor(private readonly spec: VoltageSourceSpec) {
    this.name = spec.name;
  }
  bind(binder: Binder): void {
    this.a = binder.node(nodeOf(this.spec.pins, 'a'));
    this.b = binder.node(nodeOf(this.spec.pins, 'b'));
    this.k = binder.branch(`${this.name} current`);
  }
  stampStatic(m: Mna): void {
    stampBranchIncidence(m, this.a, this.b, this.k);
    stampBranchVoltage(m, this.k, this.a, this.b);
  }
  stampRhs(m: Mna, step: StepInfo): void {
    m.rhs(this.k, this.spec.wave.value(step.t) * step.sourceScale);
  }
  /** Zero in the small-signal circuit: a short held by its branch row. */
  stampSmallSignal(m: ComplexMna): void {
    this.stampStatic(m);
  }
  stampTestSignal(m: ComplexMna): void {
    m.rhs(this.k, 1);
  }
  nextCorner(t: number): number {
    return this.spec.wave.nextCorner(t);
  }
  links(): readonly Link[] {
    return [{ a: this.a, b: this.b, kind: 'voltage' }];
  }
}
