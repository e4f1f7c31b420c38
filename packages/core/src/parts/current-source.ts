import { quantities } from '../units/quantity.ts';
import { readStimulus } from '../waves/index.ts';
import type { Wave } from '../waves/wave.ts';
import { stampCurrent } from './stamps.ts';
import type { Binder, ComplexMna, Device, Link, Mna, StepInfo } from './device.ts';
import type { PartKind, PartSpecBase } from './part-kind.ts';
import { sourceTolerance } from './source-tolerance.ts';
import { nodeOf, readBetween } from './pins.ts';

export interface CurrentSourceSpec extends PartSpecBase {
  readonly kind: 'current';
  /** Current from `a` through the source into `b`, as a function of time. */
  readonly wave: Wave;
}

/** `current: 1m` or a wave, `between: [a, b]`: drives its current from a through itself into b. */
export const currentSource: PartKind<CurrentSourceSpec> = {
  key: 'current',
  summary: 'independent current source: `current: 1m` or a wave, `between: [from, into]`',
  read: (name, main, options, context) => ({
    kind: 'current',
    name,
    wave: readStimulus(main, quantities.current, context),
    pins: readBetween(options),
  }),
  create: (spec) => new CurrentSourceDevice(spec),
  timescale: (spec) => spec.wave.timescale(),
  holdsFrom: (spec) => spec.wave.holdsFrom(),
  tolerable: [sourceTolerance<CurrentSourceSpec>('current', quantities.current)],
};

class CurrentSourceDevice implements Device {
  readonly kind = 'current';
  readonly name: string;
  private a = -1;
  private b = -1;
  constructor(private readonly spec: CurrentSourceSpec) {
    this.name = spec.name;
  }
  bind(binder: Binder): void {
    this.a = binder.node(nodeOf(this.spec.pins, 'a'));
    this.b = binder.node(nodeOf(this.spec.pins, 'b'));
  }
  stampRhs(m: Mna, step: StepInfo): void {
    stampCurrent(m, this.a, this.b, this.spec.wave.value(step.t) * step.sourceScale);
  }
  /** Zero in the small-signal circuit: an open, so nothing to stamp. */
  stampSmallSignal(): void {}
  stampTestSignal(m: ComplexMna): void {
    stampCurrent(m, this.a, this.b, 1);
  }
  nextCorner(t: number): number {
    return this.spec.wave.nextCorner(t);
  }
  links(): readonly Link[] {
    return [{ a: this.a, b: this.b, kind: 'none' }];
  }
}
