import { LuSolver } from '../solver/lu.ts';

/** Finest level: the step is cut into 2^FINEST backward-Euler substeps. */
const FINEST = 12;
/** Levels of Richardson extrapolation (2^FINEST, 2^(FINEST-1), ... substeps). */
const LEVELS = 4;

/**
 * The exact discretization of a linear circuit over one step of length H, for a drive that
 * is linear in time across the step (a piecewise-linear stimulus between its corners):
 *
 *   C·x' + G·x = p(τ),  p(τ) = p₀ + q·τ   ⇒   x(H) = A·x(0) + B·p₀ + D·q
 *
 * A is the matrix exponential of the circuit over H, B and D its response to a held and to a
 * ramping drive (the exponential integrator's φ-functions, in the form of Van Loan's
 * augmented matrix: x, p and q as one state with p' = q, q' = 0). C may be singular (nodes
 * without capacitance, branch currents): the equations are a differential-algebraic system,
 * so the exponential is taken as the limit of backward Euler, which projects the algebraic
 * part exactly, over 2^k substeps: one substep's map is built from one LU factorization of
 * C/δ + G, doubled k times by squaring, and Richardson extrapolation over four k (backward
 * Euler's error expands in powers of δ) removes the error terms δ, δ², δ³. Each level is a
 * power of an L-stable map, so no level can grow: the extrapolation only combines bounded
 * results. Modes faster than about 2^k/H are damped where the true solution would keep them
 * for longer than a step; the step is capped by `max-step` for circuits with such modes.
 */
export class Propagator {
  readonly a: Float64Array;
  readonly b: Float64Array;
  readonly d: Float64Array;
  /** The prepared stretch's constant and ramp terms, and its name (-1: none). */
  private readonly u: Float64Array;
  private readonly w: Float64Array;
  private prepared = -1;
  /** Scratch for the build. */
  private readonly levels: { a: Float64Array; b: Float64Array; d: Float64Array }[];
  private readonly product: Float64Array;
  private readonly matrix: Float64Array;
  private readonly column: Float64Array;
  private readonly solved: Float64Array;
  private readonly lu: LuSolver;

  constructor(readonly size: number) {
    const n2 = size * size;
    this.a = new Float64Array(n2);
    this.b = new Float64Array(n2);
    this.d = new Float64Array(n2);
    this.u = new Float64Array(size);
    this.w = new Float64Array(size);
    this.levels = Array.from({ length: LEVELS }, () => ({ a: new Float64Array(n2), b: new Float64Array(n2), d: new Float64Array(n2) }));
    this.product = new Float64Array(n2);
    this.matrix = new Float64Array(n2);
    this.column = new Float64Array(size);
    this.solved = new Float64Array(size);
    this.lu = new LuSolver(size);
  }

  /**
   * Build the maps for step `h` from G (`g`) and C (`c`), both row-major. Returns false when
   * C/δ + G is singular (the caller keeps to trapezoidal steps).
   */
  build(g: Float64Array, c: Float64Array, h: number): boolean {
    this.prepared = -1;
    for (let level = 0; level < LEVELS; level++) {
      const doublings = FINEST - level;
      if (!this.substep(g, c, h / 2 ** doublings, this.levels[level])) return false;
      for (let k = 0; k < doublings; k++) this.square(this.levels[level], h / 2 ** (doublings - k));
    }
    // Richardson: T(m) at level i from levels i and i+1 of T(m-1), error ratio 2^m.
    for (let m = 1; m < LEVELS; m++) {
      const f = 1 / (2 ** m - 1);
      for (let i = 0; i < LEVELS - m; i++) {
        const fine = this.levels[i];
        const coarse = this.levels[i + 1];
        for (const key of ['a', 'b', 'd'] as const) {
          const x = fine[key];
          const y = coarse[key];
          for (let j = 0; j < x.length; j++) x[j] += (x[j] - y[j]) * f;
        }
      }
    }
    this.a.set(this.levels[0].a);
    for (let r = 0; r < this.size; r++) this.a[r * this.size + r] += 1;
    this.b.set(this.levels[0].b);
    this.d.set(this.levels[0].d);
    return true;
  }

  /**
   * Fix the drive of a stretch, p(τ) = p₀ + q·(τ - τ₀) with τ₀ its start: a step from τ is then
   * x(τ + H) = A·x + u + (τ - τ₀)·w with u = B·p₀ + D·q and w = B·q, so that each step costs one
   * product instead of three. `stretch` names the stretch: a second call for it does nothing.
   */
  prepare(stretch: number, p0: Float64Array, q: Float64Array): void {
    if (stretch === this.prepared) return;
    this.prepared = stretch;
    const n = this.size;
    const { b, d } = this;
    for (let r = 0; r < n; r++) {
      const row = r * n;
      let u = 0;
      let w = 0;
      for (let k = 0; k < n; k++) {
        u += b[row + k] * p0[k] + d[row + k] * q[k];
        w += b[row + k] * q[k];
      }
      this.u[r] = u;
      this.w[r] = w;
    }
  }

  /** x(τ + H) = A·x + u + (τ - τ₀)·w into `out` (which must not be `x`), after `prepare`. */
  apply(x: Float64Array, sinceStart: number, out: Float64Array): void {
    const n = this.size;
    const a = this.a;
    for (let r = 0; r < n; r++) {
      const row = r * n;
      let s = this.u[r] + sinceStart * this.w[r];
      for (let k = 0; k < n; k++) s += a[row + k] * x[k];
      out[r] = s;
    }
  }

  /** One backward-Euler substep δ: x₁ = M⁻¹·(C/δ·x₀ + p₀ + δ·q), M = C/δ + G. */
  private substep(g: Float64Array, c: Float64Array, delta: number, into: { a: Float64Array; b: Float64Array; d: Float64Array }): boolean {
    const n = this.size;
    const m = this.matrix;
    for (let j = 0; j < m.length; j++) m[j] = c[j] / delta + g[j];
    if (this.lu.factor(m) >= 0) return false;
    for (let col = 0; col < n; col++) {
      // Column `col` of M⁻¹ (for B and D) and of M⁻¹·C/δ (for A).
      this.column.fill(0);
      this.column[col] = 1;
      this.lu.solve(this.column, this.solved);
      for (let r = 0; r < n; r++) {
        into.b[r * n + col] = this.solved[r];
        into.d[r * n + col] = this.solved[r] * delta;
      }
      // E = A - I = M⁻¹·(C/δ - M) = -M⁻¹·G: kept apart from I, it keeps its precision.
      for (let r = 0; r < n; r++) this.column[r] = -g[r * n + col];
      this.lu.solve(this.column, this.solved);
      for (let r = 0; r < n; r++) into.a[r * n + col] = this.solved[r];
    }
    return true;
  }

  /**
   * Two steps of `tau` each as one: (A, B, D) ← (A², A·B + B, A·D + τ·B + D), with A held
   * as E = A - I: E ← 2E + E², B ← 2B + E·B, D ← 2D + E·D + τ·B. A substep's map is I plus a
   * small part; squaring I + E as such would round the small part away.
   */
  private square(t: { a: Float64Array; b: Float64Array; d: Float64Array }, tau: number): void {
    const { a: e, b, d } = t;
    this.multiply(e, d);
    for (let j = 0; j < d.length; j++) d[j] = 2 * d[j] + this.product[j] + tau * b[j];
    this.multiply(e, b);
    for (let j = 0; j < b.length; j++) b[j] = 2 * b[j] + this.product[j];
    this.multiply(e, e);
    for (let j = 0; j < e.length; j++) e[j] = 2 * e[j] + this.product[j];
  }

  /** product = x·y. */
  private multiply(x: Float64Array, y: Float64Array): void {
    const n = this.size;
    const p = this.product;
    p.fill(0);
    for (let r = 0; r < n; r++) {
      for (let k = 0; k < n; k++) {
        const v = x[r * n + k];
        if (v === 0) continue;
        for (let c = 0; c < n; c++) p[r * n + c] += v * y[k * n + c];
      }
    }
  }
}
