import type { MapReader } from '../reading/reader.ts';
import { quantities } from '../units/quantity.ts';
import { across } from './solution.ts';
import type { Binder, ComplexMna, Device, Link, Mna, OpenPin, StepInfo } from './device.ts';
import type { PartKind, PartSpecBase } from './part-kind.ts';
import { nodeOf, readNamedPins } from './pins.ts';
import { readPresetOrMap } from './preset.ts';
import { readSupply, type Supply } from './supply.ts';
import { comparatorOutputs, comparatorPresetNames, comparatorPresets, type ComparatorParameters, type ComparatorPresetName } from './comparator-presets.ts';
import { DelayedOutput } from './delayed-output.ts';

export interface ComparatorSpec extends PartSpecBase {
  readonly kind: 'comparator';
  readonly preset: ComparatorPresetName;
  readonly parameters: ComparatorParameters;
  readonly supply: readonly [Supply, Supply];
}

/** Conductance of an open-drain output that is off: leakage, and a well-conditioned matrix. */
const OFF_CONDUCTANCE = 1e-9;

/**
 * `comparator: general-purpose` or `comparator: { preset, hysteresis, delay, edge, output,
 * rout }`, with `plus`, `minus`, `out` and `supply: [low, high]` (volts or node names).
 */
export const comparator: PartKind<ComparatorSpec> = {
  key: 'comparator',
  summary: 'comparator: `comparator: <class>` or `{ preset, hysteresis, delay, edge, output: push-pull | open-drain, rout }`, `plus`, `minus`, `out`, `supply: [low, high]`',
  read: (name, main, options) => {
    const { preset, overrides } = readPresetOrMap(main, comparatorPresetNames, 'comparator', 'general-purpose', false);
    const parameters = overrides === undefined ? comparatorPresets[preset] : readOverrides(overrides, comparatorPresets[preset]);
    const pins = readNamedPins(options, ['plus', 'minus', 'out']);
    const supply = readSupply(options, true, pins) ?? [{ volts: 0 }, { volts: 1 }];
    return { kind: 'comparator', name, preset, parameters, supply, pins };
  },
  create: (spec) => new ComparatorDevice(spec),
};

function readOverrides(m: MapReader, base: ComparatorParameters): ComparatorParameters {
  const parameters: ComparatorParameters = {
    hysteresis: m.numberOr('hysteresis', quantities.voltage, base.hysteresis, { min: 0 }),
    delay: m.numberOr('delay', quantities.time, base.delay, { min: 0 }),
    edge: m.numberOr('edge', quantities.time, base.edge, { min: 0 }),
    output: m.choiceOr('output', comparatorOutputs, base.output),
    rout: m.numberOr('rout', quantities.resistance, base.rout, { above: 0 }),
  };
  m.finish();
  return parameters;
}

/**
 * The input stage decides high when v(plus) − v(minus) rises above half the hysteresis and
 * low when it falls below minus half of it. That decision is piecewise: a change of it is an
 * event (`region`), which the stepper narrows down onto, so the crossing is located, never
 * stepped across blindly. The output follows the decision after the delay, with straight
 * edges (DelayedOutput): a push-pull output is a source of `rout` whose level moves between
 * the supplies, an open-drain one a conductance of 1/`rout` to the low supply that opens.
 * Like the op-amp's output, it draws its current from ground, not from the supply nodes.
 */
class ComparatorDevice implements Device {
  readonly kind = 'comparator';
  readonly name: string;
  private plus = -1;
  private minus = -1;
  private out = -1;
  private low = -1;
  private high = -1;
  private readonly output: DelayedOutput;
  /** Accepted decision, 1 high or 0 low; and the one the operating point is iterating on. */
  private decision = 0;
  private dcDecision = 0;
  /** Input difference and time of the last accepted solution, to place a crossing inside a step. */
  private lastDifference = 0;
  private lastTime = 0;

  constructor(private readonly spec: ComparatorSpec) {
    this.name = spec.name;
    this.output = new DelayedOutput(spec.parameters.delay, spec.parameters.edge);
  }

  bind(binder: Binder): void {
    const pins = this.spec.pins;
    this.plus = binder.node(nodeOf(pins, 'plus'));
    this.minus = binder.node(nodeOf(pins, 'minus'));
    this.out = binder.node(nodeOf(pins, 'out'));
    const [low, high] = this.spec.supply;
    if ('node' in low) this.low = binder.node(low.node);
    if ('node' in high) this.high = binder.node(high.node);
  }

  /**
   * At the operating point the decision is the sign of the input difference, iterated until it
   * holds (a flip means this iteration cannot count as converged). In time, the output level
   * depends on time alone, so the stamps are linear.
   */
  stampNewton(m: Mna, x: Float64Array, step: StepInfo): boolean {
    let level: number;
    let flipped = false;
    if (step.method === 'dc') {
      const decision = across(x, this.plus, this.minus) > 0 ? 1 : 0;
      flipped = decision !== this.dcDecision;
      this.dcDecision = level = decision;
    } else {
      level = this.output.level(step.t);
    }
    this.stampOutput(m, level, true);
    return flipped;
  }

  /**
   * In the small-signal circuit the output holds its decided level: its conductances to the
   * rails stay, the rails' fixed voltages do not (sources are zero there), and the inputs
   * have no effect.
   */
  stampSmallSignal(m: ComplexMna): void {
    this.stampOutput(m, this.decision, false);
  }

  /** The output at `level` (0 low, 1 high, between during an edge) through rout to the rails. */
  private stampOutput(m: Mna, level: number, withSources: boolean): void {
    const g = 1 / this.spec.parameters.rout;
    if (this.spec.parameters.output === 'push-pull') {
      this.stampRail(m, this.spec.supply[0], this.low, g * (1 - level), withSources);
      this.stampRail(m, this.spec.supply[1], this.high, g * level, withSources);
    } else {
      this.stampRail(m, this.spec.supply[0], this.low, g * (1 - level) + OFF_CONDUCTANCE, withSources);
    }
  }

  /** A conductance g from the output to a rail, on the output's row only. */
  private stampRail(m: Mna, rail: Supply, index: number, g: number, withSources: boolean): void {
    m.add(this.out, this.out, g);
    if (!('volts' in rail)) m.add(this.out, index, -g);
    else if (withSources) m.rhs(this.out, g * rail.volts);
  }

  /** The decision at solution x, from the accepted one (hysteresis: the band keeps it). */
  region(x: Float64Array): number {
    return this.decide(across(x, this.plus, this.minus));
  }

  private decide(difference: number): number {
    const half = this.spec.parameters.hysteresis / 2;
    if (this.decision === 1) return difference < -half ? 0 : 1;
    return difference > half ? 1 : 0;
  }

  accept(x: Float64Array, step: StepInfo): void {
    const difference = across(x, this.plus, this.minus);
    if (step.method === 'dc') {
      this.decision = this.dcDecision;
      this.output.hold(this.decision);
    } else {
      const decision = this.decide(difference);
      if (decision !== this.decision) {
        // Where the difference crossed the threshold inside the step, by linear interpolation.
        const threshold = ((decision === 1 ? 1 : -1) * this.spec.parameters.hysteresis) / 2;
        const span = difference - this.lastDifference;
        const fraction = span !== 0 ? Math.min(1, Math.max(0, (threshold - this.lastDifference) / span)) : 1;
        this.output.decide(this.lastTime + fraction * (step.t - this.lastTime), step.t);
        this.decision = decision;
      }
      this.output.advance(step.t);
    }
    this.lastDifference = difference;
    this.lastTime = step.t;
  }

  nextCorner(t: number): number {
    return this.output.nextCorner(t);
  }

  openPins(): readonly OpenPin[] {
    if (this.spec.parameters.output !== 'open-drain') return [];
    const high = this.spec.supply[1];
    const to = 'node' in high ? high.node : `a node at ${high.volts} V`;
    const example = `{ resistor: 10k, between: [${nodeOf(this.spec.pins, 'out')}, ${'node' in high ? high.node : 'vcc'}] }`;
    return [{ pin: 'out', why: 'an open-drain output only pulls low', hint: `add a pull-up resistor to ${to}, e.g. R_PULLUP: ${example}, or write \`output: push-pull\`` }];
  }

  links(): readonly Link[] {
    return [{ a: this.out, b: this.low, kind: this.spec.parameters.output === 'push-pull' ? 'conductive' : 'none' }];
  }
}
