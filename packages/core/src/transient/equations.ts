import type { Device, StepInfo } from '../parts/device.ts';
import type { Assembly, Factorization } from '../solver/assembly.ts';
import { DenseSystem } from '../solver/dense-system.ts';
import { SparseSystem } from '../solver/sparse-system.ts';
import { diagnoseSingular } from '../solver/diagnose.ts';
import { allFinite } from './all-finite.ts';
import type { Topology } from '../solver/topology.ts';
import type { RunStats, SimulateOptions } from './result.ts';
import { SimulationError } from './simulation-error.ts';

/** Newton limits: iterations per solve, and the convergence test on every unknown. */
export interface NewtonSettings {
  maxIterations: number;
  relative: number;
  voltage: number;
  current: number;
}

/** Storage of the matrix: chosen by size unless forced. */
export type MatrixStorage = NonNullable<SimulateOptions['matrix']>;

/**
 * From this many unknowns on, the sparse matrix is the faster: `pnpm bench matrix` solves an
 * RC ladder both ways, and sparse wins from 14 to 18 unknowns on (dense is ahead at 6, level
 * at 10). Circuits as small as the fixtures (up to a dozen unknowns) stay dense.
 */
export const SPARSE_FROM = 16;

/** Matrix layers kept by the equations. */
const STATIC = 0;
const STEP = 1;
const FACTORED = 2;

/**
 * The circuit's equations at one step: assembles `G·x = b` from the devices and solves it,
 * with Newton-Raphson when some device is nonlinear. The matrix is kept in three layers so
 * that work is done only when something changed: static stamps (once), step stamps (when h
 * or the method changes) and Newton stamps (per iteration). A factorization is reused for
 * as long as the assembled matrix is unchanged.
 */
export class Equations {
  readonly size: number;
  /** Dense or sparse, whichever is faster at this size. */
  private readonly mna: Assembly;
  private lu: Factorization;
  /**
   * For linear circuits, the factorization of the step before last, with its step size and
   * method: after each corner the method goes backward Euler → trapezoidal at an unchanged
   * step, and this spares refactoring for the way back.
   */
  private spare: Factorization | null;
  private spareH = NaN;
  private spareMethod = '';
  private readonly changesAtCorners: boolean;
  private readonly rhsBase: Float64Array;
  private readonly next: Float64Array;
  private readonly tolerance: Float64Array;
  private readonly nonlinear: Device[];
  private readonly withRhs: Device[];
  private readonly withStep: Device[];
  private readonly withAccept: Device[];
  private readonly withCorners: Device[];
  private readonly withRegions: Device[];
  private stepH = NaN;
  private stepMethod = '';
  private factorValid = false;

  constructor(
    readonly devices: readonly Device[],
    readonly topology: Topology,
    private readonly newton: NewtonSettings,
    private readonly stats: RunStats,
    storage: MatrixStorage = 'auto',
  ) {
    const n = topology.size;
    this.size = n;
    const sparse = storage === 'auto' ? n >= SPARSE_FROM : storage === 'sparse';
    this.mna = sparse ? new SparseSystem(n) : new DenseSystem(n);
    this.lu = this.mna.factorization();
    this.changesAtCorners = devices.some((d) => d.stampStep !== undefined && d.nextCorner !== undefined);
    this.rhsBase = new Float64Array(n);
    this.next = new Float64Array(n);
    this.tolerance = Float64Array.from(topology.isCurrent, (c) => (c ? newton.current : newton.voltage));
    this.nonlinear = devices.filter((d) => d.stampNewton !== undefined);
    this.spare = this.nonlinear.length === 0 ? this.mna.factorization() : null;
    this.withRhs = devices.filter((d) => d.stampRhs !== undefined);
    this.withStep = devices.filter((d) => d.stampStep !== undefined);
    this.withAccept = devices.filter((d) => d.accept !== undefined);
    this.withCorners = devices.filter((d) => d.nextCorner !== undefined);
    this.withRegions = devices.filter((d) => d.region !== undefined);
    for (const d of devices) d.stampStatic?.(this.mna);
    this.mna.save(STATIC);
  }

  /**
   * A corner was passed: devices whose step stamps change at their own corners (a scheduled
   * switch) need the step layer rebuilt, and no kept factorization is valid any more.
   */
  cornerPassed(): void {
    if (!this.changesAtCorners) return;
    this.stepH = NaN;
    this.spareH = NaN;
  }

  /**
   * The step changed: for a linear circuit, keep the current factorization as the spare and
   * take the spare if it was made for this step.
   */
  private swapSpare(step: StepInfo): void {
    let reuse = false;
    if (this.spare !== null && this.factorValid) {
      reuse = step.h === this.spareH && step.method === this.spareMethod;
      const kept = this.lu;
      this.lu = this.spare;
      this.spare = kept;
      this.spareH = this.stepH;
      this.spareMethod = this.stepMethod;
    }
    this.stepH = step.h;
    this.stepMethod = step.method;
    this.factorValid = reuse;
  }

  /**
   * Solve for the step's end. `x` holds the starting guess on entry and the solution on
   * return. Returns false when Newton did not converge (the caller cuts the step); throws
   * SimulationError when the matrix is singular.
   */
  solve(step: StepInfo, x: Float64Array): boolean {
    const m = this.mna;
    if (step.h !== this.stepH || step.method !== this.stepMethod) {
      m.load(STATIC);
      for (const d of this.withStep) d.stampStep!(m, step);
      m.save(STEP);
      this.swapSpare(step);
    }
    m.b.fill(0);
    for (const d of this.withRhs) d.stampRhs!(m, step);
    if (this.nonlinear.length === 0) {
      // The matrix holds the step layer: nothing else stamps it in a linear circuit.
      if (!this.factorValid) this.factor(step);
      this.lu.solve(m.b, x);
      this.stats.solves++;
      this.stats.newtonIterations++;
      return allFinite(x);
    }
    this.rhsBase.set(m.b);
    for (let iteration = 1; iteration <= this.newton.maxIterations; iteration++) {
      m.load(STEP);
      m.b.set(this.rhsBase);
      let limited = false;
      for (const d of this.nonlinear) if (d.stampNewton!(m, x, step)) limited = true;
      if (!this.factorValid || !m.equals(FACTORED)) this.factor(step);
      this.lu.solve(m.b, this.next);
      this.stats.solves++;
      this.stats.newtonIterations++;
      if (!allFinite(this.next)) return false;
      const converged = !limited && this.converged(x, this.next);
      x.set(this.next);
      if (converged) return true;
    }
    return false;
  }

  /** Index of the unknown that moved most (relative to its tolerance) in the last iteration. */
  worstUnknowns(a: Float64Array, b: Float64Array, count: number): string[] {
    const order = Array.from({ length: this.size }, (_, i) => i).sort(
      (i, j) => Math.abs(b[j] - a[j]) / this.tolerance[j] - Math.abs(b[i] - a[i]) / this.tolerance[i],
    );
    return order.slice(0, count).map((i) => this.topology.labels[i]);
  }

  /** Update every device's history from the accepted solution. */
  accept(x: Float64Array, step: StepInfo): void {
    for (const d of this.withAccept) d.accept!(x, step);
  }

  /** First stimulus corner strictly after `t`. */
  nextCorner(t: number): number {
    let c = Infinity;
    for (const d of this.withCorners) {
      const dc = d.nextCorner!(t);
      if (dc < c) c = dc;
    }
    return c;
  }

  /** True when some piecewise device lies in a different piece at `a` than at `b`. */
  regionChanged(a: Float64Array, b: Float64Array): boolean {
    for (const d of this.withRegions) if (d.region!(a) !== d.region!(b)) return true;
    return false;
  }

  /** Unknowns whose truncation error the step control watches. */
  watchedUnknowns(): Int32Array {
    const watched = new Set<number>();
    for (let i = 0; i < this.size; i++) if (!this.topology.isCurrent[i]) watched.add(i);
    for (const d of this.devices) for (const k of d.stateUnknowns?.() ?? []) watched.add(k);
    return Int32Array.from([...watched].sort((a, b) => a - b));
  }

  /** True when every unknown moved less than Newton's tolerance from `previous` to `next`. */
  converged(previous: Float64Array, next: Float64Array): boolean {
    const rel = this.newton.relative;
    for (let i = 0; i < this.size; i++) {
      const limit = rel * Math.max(Math.abs(previous[i]), Math.abs(next[i])) + this.tolerance[i];
      if (!(Math.abs(next[i] - previous[i]) <= limit)) return false;
    }
    return true;
  }

  private factor(step: StepInfo): void {
    const singular = this.lu.factor();
    this.stats.factorizations++;
    if (singular >= 0) {
      const cause = diagnoseSingular(this.devices, this.topology, singular, step.method !== 'dc');
      // The time travels in the error's `time` field (NaN for the operating point).
      throw new SimulationError(cause.message, step.method === 'dc' ? NaN : step.t, cause.nodes, cause.hint, cause.parts);
    }
    this.mna.save(FACTORED);
    this.factorValid = true;
  }
}
