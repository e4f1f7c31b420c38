import type { Device, StepInfo } from '../parts/device.ts';
import { DenseSystem } from '../solver/dense-system.ts';
import { allFinite } from './all-finite.ts';
import { Propagator } from './propagator.ts';

/** Propagators kept: per step size (rows, partial steps onto corners and sample instants) and per system. */
const KEPT = 12;
/** Systems (C, G) kept: a switch that opens and closes alternates between two. */
const SYSTEMS = 4;
/**
 * A propagator costs about 250·n³ operations, an exact step about 3·n²: beyond the first few,
 * builds are allowed only as exact steps pay for them, one per STEPS_PER_BUILD_PER_UNKNOWN·n.
 */
const FREE_BUILDS = 2;
const STEPS_PER_BUILD_PER_UNKNOWN = 8;
/** Fractions of a stretch where the drive must lie on the line through its ends. */
const SAMPLES = [0.1234, 0.5, 0.8765];
/** Relative departure from that line still counted as linear (rounding of the wave's own arithmetic). */
const LINEAR_TOLERANCE = 1e-12;

/**
 * Exact steps over a linear stretch: between two corners of the drive, a circuit whose parts
 * are linear (or whose nonlinear parts keep their linearization, as an amplifier well inside
 * its linear range does) and whose stimuli are piecewise linear obeys C·x' + G·x = p₀ + q·τ
 * exactly, and a step of any length is the matrix exponential (see Propagator): no truncation
 * error, no phase error however long the circuit rings, so the step is as long as the output
 * rows, corners and sample instants allow.
 *
 * C, G and the drive are read from the devices' own stamps (backward Euler at two step sizes
 * tells C from G); the devices' step state is put back afterwards, so the trapezoidal stepper
 * continues as if nothing happened. Each exact step checks that no device changed piece and
 * that every nonlinear device would keep its linearization (its bypass holds): otherwise the
 * stepper returns to trapezoidal steps.
 */
export class LinearStretch {
  private readonly n: number;
  private readonly layer: DenseSystem;
  private readonly staticLayer: Float64Array;
  private readonly g: Float64Array;
  private readonly c: Float64Array;
  /** Systems met so far, most recent use last; `system` is the current one's id. */
  private readonly systems: { g: Float64Array; c: Float64Array; id: number; used: number }[] = [];
  private system = 0;
  private nextId = 0;
  private readonly newtonRhs: Float64Array;
  private readonly history: Float64Array;
  private readonly p0: Float64Array;
  private readonly slope: Float64Array;
  private readonly p: Float64Array;
  private readonly ends: Float64Array;
  /** The nonlinear devices' linearization the stretch began with: matrix and right-hand side. */
  private readonly frozen: DenseSystem;
  /** Scratch for stamps that are compared or thrown away. */
  private readonly scratch: DenseSystem;
  private readonly nonlinear: Device[];
  private readonly withStep: Device[];
  private readonly withRhs: Device[];
  private readonly kept: { h: number; system: number; propagator: Propagator; used: number }[] = [];
  private readonly info: StepInfo = { t: 0, h: 0, method: 'be', sourceScale: 1 };
  private t0 = 0;
  /** Stretches begun: names the drive a propagator was prepared for. */
  private stretches = 0;
  /** End of the current stretch. */
  private end = 0;
  private clock = 0;
  /** True when no device is nonlinear: every stretch with a straight drive is linear. */
  readonly linear: boolean;
  /** Propagators built so far, and exact steps taken. */
  builds = 0;
  steps = 0;

  constructor(readonly devices: readonly Device[], size: number) {
    const n = size;
    this.n = n;
    this.layer = new DenseSystem(n);
    for (const d of devices) d.stampStatic?.(this.layer);
    this.staticLayer = Float64Array.from(this.layer.values);
    this.g = new Float64Array(n * n);
    this.c = new Float64Array(n * n);
    this.newtonRhs = new Float64Array(n);
    this.history = new Float64Array(n);
    this.p0 = new Float64Array(n);
    this.slope = new Float64Array(n);
    this.p = new Float64Array(n);
    this.ends = new Float64Array(n);
    // Devices only ever see DenseSystem targets here, as in the equations: their stamp code stays monomorphic.
    this.frozen = new DenseSystem(n);
    this.scratch = new DenseSystem(n);
    this.nonlinear = devices.filter((d) => d.stampNewton !== undefined);
    this.linear = this.nonlinear.length === 0;
    this.withStep = devices.filter((d) => d.stampStep !== undefined);
    this.withRhs = devices.filter((d) => d.stampRhs !== undefined);
  }

  /**
   * Begin a stretch at time `t` with the accepted solution `x` (the devices' history holds
   * it), lasting at most to `end`. Returns false when the circuit is not linear there (a
   * drive that is not a straight line until `end`). `restore` is the step the trapezoidal
   * stepper last solved: the devices' step state is set back to it.
   */
  begin(t: number, x: Float64Array, end: number, restore: StepInfo): boolean {
    const n = this.n;
    const m = this.layer;
    const span = end - t;
    if (!(span > 0)) return false;
    // Linearization of the nonlinear devices at x: matrix into G, constants into the drive.
    this.info.t = t;
    this.info.h = span;
    this.stampNewton(this.frozen, x);
    this.g.set(this.frozen.values);
    this.newtonRhs.set(this.frozen.b);
    // Step layers at h and h/2 (ending at `end`, so that a device's midpoint lies in the stretch): C = (S(h/2) - S(h))·h, G += 2·S(h) - S(h/2).
    const h = span / 2;
    this.stampSteps(end, h / 2);
    for (let j = 0; j < n * n; j++) {
      this.c[j] = m.values[j];
      this.g[j] += this.staticLayer[j] - m.values[j];
    }
    this.stampSteps(end, h);
    for (let j = 0; j < n * n; j++) {
      this.c[j] = (this.c[j] - m.values[j]) * h;
      this.g[j] += 2 * m.values[j];
    }
    this.selectSystem();
    // The drive, with backward Euler's history (C/h)·x taken out: at the ends, then checked inside.
    for (let r = 0; r < n; r++) {
      let s = 0;
      for (let k = 0; k < n; k++) s += this.c[r * n + k] * x[k];
      this.history[r] = s / h;
    }
    this.drive(t, this.p0);
    this.drive(end, this.ends);
    let linear = true;
    for (let r = 0; r < n; r++) this.slope[r] = (this.ends[r] - this.p0[r]) / span;
    let scale = 0;
    for (let r = 0; r < n; r++) scale = Math.max(scale, Math.abs(this.p0[r]), Math.abs(this.ends[r]));
    for (const f of SAMPLES) {
      this.drive(t + f * span, this.p);
      for (let r = 0; r < n; r++) {
        if (Math.abs(this.p[r] - (this.p0[r] + this.slope[r] * f * span)) > LINEAR_TOLERANCE * scale) linear = false;
      }
    }
    this.t0 = t;
    this.end = end;
    this.stretches++;
    for (const d of this.withStep) d.stampStep!(this.scratch, restore);
    return linear;
  }

  /**
   * The exact solution at `t + h` from `x` at `t` into `out`. False when the step's propagator
   * cannot be built, or when the step overflows (a stretch that grows, as positive feedback
   * does, faster than the step can follow): trapezoidal steps then follow it under error control.
   */
  step(t: number, h: number, x: Float64Array, out: Float64Array): boolean {
    const propagator = this.propagatorFor(h, (this.end - t) / h);
    if (propagator === null) return false;
    this.steps++;
    propagator.prepare(this.stretches, this.p0, this.slope);
    propagator.apply(x, t - this.t0, out);
    return allFinite(out);
  }

  /**
   * True when every nonlinear device keeps, at solution `x` at time `t`, the linearization the
   * stretch began with (a device whose stamps move with time, as a comparator's output edge,
   * does not).
   */
  holds(x: Float64Array, t: number): boolean {
    if (this.nonlinear.length === 0) return true;
    this.info.t = t;
    this.info.method = 'be';
    this.stampNewton(this.scratch, x);
    return sameEntries(this.scratch.values, this.frozen.values) && sameEntries(this.scratch.b, this.frozen.b);
  }

  private stampNewton(into: DenseSystem, x: Float64Array): void {
    into.values.fill(0);
    into.b.fill(0);
    for (const d of this.nonlinear) d.stampNewton!(into, x, this.info);
  }

  /** Stamp every device's step layer (only) for backward Euler at step h ending at `end`. */
  private stampSteps(end: number, h: number): void {
    const m = this.layer;
    m.values.fill(0);
    this.info.t = end;
    this.info.h = h;
    this.info.method = 'be';
    for (const d of this.withStep) d.stampStep!(m, this.info);
  }

  /** The drive at `t`: the right-hand side at the last stamped step, less its history, plus the linearization's constants. */
  private drive(t: number, into: Float64Array): void {
    const m = this.layer;
    m.b.fill(0);
    this.info.t = t;
    for (const d of this.withRhs) d.stampRhs!(m, this.info);
    for (let r = 0; r < this.n; r++) into[r] = m.b[r] - this.history[r] + this.newtonRhs[r];
  }

  /** Make the system just assembled current, reusing a kept one with the same C and G. */
  private selectSystem(): void {
    this.clock++;
    let oldest = 0;
    for (let i = 0; i < this.systems.length; i++) {
      const s = this.systems[i];
      if (sameEntries(s.g, this.g) && sameEntries(s.c, this.c)) {
        s.used = this.clock;
        this.system = s.id;
        return;
      }
      if (s.used < this.systems[oldest].used) oldest = i;
    }
    let entry = this.systems.length < SYSTEMS ? undefined : this.systems[oldest];
    if (entry === undefined) {
      entry = { g: new Float64Array(this.g.length), c: new Float64Array(this.c.length), id: 0, used: 0 };
      this.systems.push(entry);
    } else {
      // Its propagators go with it.
      for (let i = this.kept.length - 1; i >= 0; i--) if (this.kept[i].system === entry.id) this.kept.splice(i, 1);
    }
    entry.g.set(this.g);
    entry.c.set(this.c);
    entry.id = ++this.nextId;
    entry.used = this.clock;
    this.system = entry.id;
  }

  /**
   * The kept propagator for step h of the current system, or a new one in place of the least
   * recently used; null when it cannot be built, or would not pay for itself (`uses`: steps of
   * this size the stretch has left), or builds have outrun the steps that pay for them.
   */
  private propagatorFor(h: number, uses: number): Propagator | null {
    this.clock++;
    let oldest = 0;
    for (let i = 0; i < this.kept.length; i++) {
      const k = this.kept[i];
      if (k.system === this.system && Math.abs(k.h - h) <= h * 1e-9) {
        k.used = this.clock;
        return k.propagator;
      }
      if (k.used < this.kept[oldest].used) oldest = i;
    }
    // A new one must pay for itself: enough steps left in this stretch, and within the budget.
    if (uses < STEPS_PER_BUILD_PER_UNKNOWN * this.n && this.builds >= FREE_BUILDS) return null;
    if (this.builds >= FREE_BUILDS + this.steps / (STEPS_PER_BUILD_PER_UNKNOWN * this.n)) return null;
    let entry = this.kept.length < KEPT ? undefined : this.kept[oldest];
    if (entry === undefined) {
      entry = { h, system: 0, propagator: new Propagator(this.n), used: 0 };
      this.kept.push(entry);
    }
    entry.h = h;
    entry.system = this.system;
    entry.used = this.clock;
    this.builds++;
    if (entry.propagator.build(this.g, this.c, h)) return entry.propagator;
    this.kept.splice(this.kept.indexOf(entry), 1);
    return null;
  }
}

function sameEntries(a: Float64Array, b: Float64Array): boolean {
  for (let i = 0; i < a.length; i++) if (a[i] !== b[i]) return false;
  return true;
}
