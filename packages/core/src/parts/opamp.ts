import { stampAdmittance, stampBranchIncidence, stampConductance, stampCurrent, stampTransconductance } from './stamps.ts';
import { CapacitorCompanion } from './capacitor-companion.ts';
import { across, valueAt } from './solution.ts';
import type { Binder, ComplexMna, Device, GainStage, Link, Mna, NoiseSource, StepInfo } from './device.ts';
import type { PartKind } from './part-kind.ts';
import { nodeOf } from './pins.ts';
import { readOpamp } from './opamp-read.ts';
import type { OpampSpec, OpampStatus } from './opamp-spec.ts';
import { opampTolerable } from './opamp-tolerable.ts';
import { bypasses, limitTanhArgument } from './tanh-linearization.ts';

export type { OpampSpec, OpampStatus, Supply } from './opamp-spec.ts';

/**
 * `opamp: general-purpose` or `opamp: { preset: jfet-input, gbw: 5MHz, ... }`, with
 * `plus`, `minus`, `out` and `supply: [low, high]` (volts or node names).
 */
export const opamp: PartKind<OpampSpec> = {
  key: 'opamp',
  summary: 'op-amp macro-model: `opamp: <preset>` or `{ preset, gain, gbw, slew, headroom, rout, offset, bias, second-pole, current-limit, noise-voltage, noise-corner, noise-current }`, `plus`, `minus`, `out`, `supply: [low, high]`',
  read: readOpamp,
  create: (spec) => new OpampDevice(spec),
  tolerable: opampTolerable,
};

/** True for op-amp devices, which report their status. */
export function isOpamp(device: Device): device is Device & { status(x: Float64Array): OpampStatus; readonly spec: OpampSpec } {
  return device.kind === 'opamp';
}

/** Internal capacitance that scales the macro-model's currents; any value gives the same terminal behaviour. */
const C1 = 1e-9;
/** The clamp lets the internal node past its limit by at most this much at full slew current. */
const CLAMP_OVERSHOOT = 1e-3;
/** Conductance of the second-pole stage; its capacitor sets the pole. */
const G2 = 1e-3;

/**
 * The macro-model (docs/guide-opamp.md): the differential input plus offset drives a transconductance
 * stage whose current is limited to ±Imax by a tanh (Imax/C1 is the slew rate) into an
 * internal node with R1 ∥ C1 to ground (gm·R1 is the open-loop gain, gm/(2π·C1) the
 * gain-bandwidth). That node is clamped between the supplies less their headroom, so the
 * amplifier recovers from saturation at its slew rate. An optional unity-gain lag adds a
 * second pole; a unity buffer then drives the output through rout, optionally with a tanh
 * current limit. The clamp is piecewise: entering or leaving it is an event.
 *
 * Small-signal, each nonlinear piece contributes its slope at the operating point: the input
 * stage gm·(1 - tanh²), the clamp's conductance when the gain node sits beyond it, and the
 * current limit's (1 - tanh²)/rout. The transconductance stage is where the loop-gain
 * analysis breaks the loop.
 */
class OpampDevice implements Device {
  readonly kind = 'opamp';
  readonly name: string;
  private p = -1;
  private m = -1;
  private out = -1;
  private low = -1;
  private high = -1;
  /** Gain node, second-pole node, drive node, buffer branch current. */
  private n1 = -1;
  private n2 = -1;
  private drive = -1;
  private k = -1;
  private readonly gm: number;
  private readonly r1: number;
  private readonly imax: number;
  private readonly gClamp: number;
  private readonly c1 = new CapacitorCompanion(C1);
  private readonly c2: CapacitorCompanion | null;
  /** Normalized arguments at which the last Newton iteration linearized the input stage and the output limit. */
  private uLast = 0;
  private wLast = 0;
  private readonly current: { -readonly [K in keyof OpampStatus]: OpampStatus[K] } & { limits: [number, number] } = {
    rail: 0,
    slewing: false,
    currentLimited: false,
    inputError: 0,
    output: 0,
    limits: [0, 0],
  };

  constructor(readonly spec: OpampSpec) {
    this.name = spec.name;
    const q = spec.parameters;
    this.gm = 2 * Math.PI * q.gbw * C1;
    this.r1 = q.gain / this.gm;
    this.imax = q.slew * C1;
    this.gClamp = Math.max(this.imax / CLAMP_OVERSHOOT, 1e-3);
    this.c2 = q.secondPole !== undefined ? new CapacitorCompanion(G2 / (2 * Math.PI * q.secondPole)) : null;
  }

  bind(binder: Binder): void {
    const pins = this.spec.pins;
    this.p = binder.node(nodeOf(pins, 'plus'));
    this.m = binder.node(nodeOf(pins, 'minus'));
    this.out = binder.node(nodeOf(pins, 'out'));
    const supply = this.spec.supply;
    if (supply !== undefined) {
      if ('node' in supply[0]) this.low = binder.node(supply[0].node);
      if ('node' in supply[1]) this.high = binder.node(supply[1].node);
    }
    this.n1 = binder.internal(`${this.name} gain node`);
    if (this.c2 !== null) this.n2 = binder.internal(`${this.name} second-pole node`);
    this.drive = this.spec.parameters.rout > 0 ? binder.internal(`${this.name} drive node`) : this.out;
    this.k = binder.branch(`${this.name} output current`);
  }

  stampStatic(m: Mna): void {
    stampConductance(m, this.n1, -1, 1 / this.r1);
    const last = this.c2 !== null ? this.n2 : this.n1;
    if (this.c2 !== null) {
      m.add(this.n2, this.n2, G2);
      m.add(this.n2, this.n1, -G2);
    }
    // Unity buffer: v(drive) = v(last), its current k leaving `drive`.
    stampBranchIncidence(m, this.drive, -1, this.k);
    m.add(this.k, this.drive, 1);
    m.add(this.k, last, -1);
    const q = this.spec.parameters;
    if (q.rout > 0 && q.currentLimit === undefined) stampConductance(m, this.drive, this.out, 1 / q.rout);
  }

  stampStep(m: Mna, step: StepInfo): void {
    this.c1.stampStep(m, this.n1, -1, step);
    this.c2?.stampStep(m, this.n2, -1, step);
  }

  stampRhs(m: Mna, step: StepInfo): void {
    this.c1.stampRhs(m, this.n1, -1, step);
    this.c2?.stampRhs(m, this.n2, -1, step);
    const bias = this.spec.parameters.bias * step.sourceScale;
    if (bias !== 0) {
      stampCurrent(m, this.p, -1, bias);
      stampCurrent(m, this.m, -1, bias);
    }
  }

  stampNewton(m: Mna, x: Float64Array): boolean {
    const q = this.spec.parameters;
    // Input stage: i = Imax·tanh(u), u = gm·vd / Imax, linearized at a limited u.
    const vd = across(x, this.p, this.m) + q.offset;
    const u = (this.gm * vd) / this.imax;
    const inputBypassed = bypasses(u, this.uLast);
    const uLin = inputBypassed ? this.uLast : limitTanhArgument(u, this.uLast);
    this.uLast = uLin;
    const th = Math.tanh(uLin);
    const i0 = this.imax * th;
    const g = this.gm * (1 - th * th);
    const vdLin = (uLin * this.imax) / this.gm;
    // Current i0 + g·(vp - vm + offset - vdLin) enters n1.
    stampTransconductance(m, this.n1, -1, this.p, this.m, g);
    m.rhs(this.n1, i0 + g * (q.offset - vdLin));

    this.stampClamp(m, x);
    const outputLimited = q.currentLimit !== undefined && this.stampCurrentLimit(m, x, q.rout, q.currentLimit);
    return (!inputBypassed && uLin !== u) || outputLimited;
  }

  /** Piecewise clamp of the gain node at the rails less headroom: a stiff conductance beyond them. */
  private stampClamp(m: Mna, x: Float64Array): void {
    const region = this.region(x);
    if (region === 0) return;
    const rail = this.spec.supply![region > 0 ? 1 : 0];
    const headroom = this.spec.parameters.headroom[region > 0 ? 1 : 0] * region;
    // i = gClamp·(v1 - (v(rail) - headroom)) leaves n1.
    this.stampClampSlope(m, region);
    m.rhs(this.n1, this.gClamp * (('volts' in rail ? rail.volts : 0) - headroom));
  }

  /** The clamp's conductance from the gain node to the rail of `region` (1 high, -1 low). */
  private stampClampSlope(m: Mna, region: number): void {
    const node = region > 0 ? this.high : this.low;
    m.add(this.n1, this.n1, this.gClamp);
    m.add(this.n1, node, -this.gClamp);
  }

  /** Slope of the input stage's current against the differential input at `x`: gm·(1 - tanh²). */
  private inputSlope(x: Float64Array): number {
    const th = Math.tanh((this.gm * (across(x, this.p, this.m) + this.spec.parameters.offset)) / this.imax);
    return this.gm * (1 - th * th);
  }

  stampSmallSignal(m: ComplexMna, x: Float64Array, omega: number): void {
    this.stampStatic(m);
    stampAdmittance(m, this.n1, -1, 0, omega * C1);
    if (this.c2 !== null) stampAdmittance(m, this.n2, -1, 0, omega * this.c2.capacitance);
    stampTransconductance(m, this.n1, -1, this.p, this.m, this.inputSlope(x));
    const region = this.region(x);
    if (region !== 0) this.stampClampSlope(m, region);
    const q = this.spec.parameters;
    if (q.currentLimit !== undefined) {
      const th = Math.tanh(across(x, this.drive, this.out) / (q.rout * q.currentLimit));
      stampConductance(m, this.drive, this.out, (1 - th * th) / q.rout);
    }
  }

  gainStage(x: Float64Array): GainStage {
    return { into: this.n1, from: -1, p: this.p, n: this.m, transconductance: this.inputSlope(x), output: this.out };
  }

  /**
   * Input voltage noise en in series with the plus input makes the gain stage deliver g·en
   * into the gain node (the macro-model's input draws no current, so that is the whole
   * effect); current noise in flows into each input that is not ground.
   */
  noiseSources(x: Float64Array): readonly NoiseSource[] {
    const q = this.spec.parameters;
    const sources: NoiseSource[] = [];
    if (q.noiseVoltage > 0) sources.push({ source: 'voltage', into: this.n1, from: -1, white: (this.inputSlope(x) * q.noiseVoltage) ** 2, corner: q.noiseCorner });
    if (q.noiseCurrent > 0) {
      if (this.p >= 0) sources.push({ source: 'current at plus', into: this.p, from: -1, white: q.noiseCurrent ** 2, corner: 0 });
      if (this.m >= 0) sources.push({ source: 'current at minus', into: this.m, from: -1, white: q.noiseCurrent ** 2, corner: 0 });
    }
    return sources;
  }

  /** Output current i = Ilim·tanh(v/(rout·Ilim)) from drive to out, linearized; true when limited. */
  private stampCurrentLimit(m: Mna, x: Float64Array, rout: number, limit: number): boolean {
    const scale = rout * limit;
    const w = across(x, this.drive, this.out) / scale;
    const bypassed = bypasses(w, this.wLast);
    const wLin = bypassed ? this.wLast : limitTanhArgument(w, this.wLast);
    this.wLast = wLin;
    const th = Math.tanh(wLin);
    const g = (1 - th * th) / rout;
    stampConductance(m, this.drive, this.out, g);
    stampCurrent(m, this.drive, this.out, limit * th - g * wLin * scale);
    return !bypassed && wLin !== w;
  }

  region(x: Float64Array): number {
    const supply = this.spec.supply;
    if (supply === undefined) return 0;
    const v1 = x[this.n1];
    if (v1 > this.limit(x, 1)) return 1;
    return v1 < this.limit(x, -1) ? -1 : 0;
  }

  /** Clamp level on the high (1) or low (-1) side at solution x. */
  private limit(x: Float64Array, side: 1 | -1): number {
    const supply = this.spec.supply;
    if (supply === undefined) return side * Infinity;
    const rail = supply[side > 0 ? 1 : 0];
    const volts = 'volts' in rail ? rail.volts : x[side > 0 ? this.high : this.low];
    return volts - side * this.spec.parameters.headroom[side > 0 ? 1 : 0];
  }

  /** Status at solution `x`. Observers call this every step, so the object is reused: read it before the next call. */
  status(x: Float64Array): OpampStatus {
    const q = this.spec.parameters;
    const s = this.current;
    s.inputError = across(x, this.p, this.m) + q.offset;
    const outputCurrent = q.currentLimit !== undefined ? Math.abs(Math.tanh(across(x, this.drive, this.out) / (q.rout * q.currentLimit))) : 0;
    s.rail = this.region(x) as -1 | 0 | 1;
    s.slewing = Math.abs(Math.tanh((this.gm * s.inputError) / this.imax)) > 0.9;
    s.currentLimited = outputCurrent > 0.9;
    s.output = valueAt(x, this.out);
    s.limits[0] = this.limit(x, -1);
    s.limits[1] = this.limit(x, 1);
    return s;
  }

  accept(x: Float64Array, step: StepInfo): void {
    this.c1.accept(x[this.n1], step);
    if (this.c2 !== null) this.c2.accept(x[this.n2], step);
  }

  links(): readonly Link[] {
    return [
      { a: this.n1, b: -1, kind: 'conductive' },
      { a: this.n2, b: -1, kind: this.n2 >= 0 ? 'conductive' : 'none' },
      { a: this.drive, b: -1, kind: 'voltage' },
      { a: this.drive, b: this.out, kind: this.drive === this.out ? 'none' : 'conductive' },
    ];
  }
}
