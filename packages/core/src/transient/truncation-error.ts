/**
 * Local truncation error by Milne's device: compare the corrector's solution with a
 * polynomial predictor through the last accepted points. For the trapezoidal rule
 * (error -h³/12·x''') and a quadratic predictor (error x'''/6·h(h+h₁)(h+h₁+h₂)) the
 * corrector's own error is the difference scaled by (h³/12) / (h³/12 + h(h+h₁)(h+h₁+h₂)/6);
 * for backward Euler (error h²/2·x'') with a linear predictor the scale is h / (2h + h₁).
 * Points are counted from the last corner: a predictor never reaches across one.
 */
export class TruncationError {
  /** Accepted times, newest first. */
  private readonly times = new Float64Array(3);
  /** Accepted solutions, newest first. */
  private readonly points: Float64Array[];
  /** Largest magnitude seen per unknown: the scale for the relative tolerance. */
  private readonly scale: Float64Array;
  /** Accepted points since (and including) the last corner. */
  private count = 0;

  constructor(
    size: number,
    private readonly watched: Int32Array,
    private readonly relative: number,
    /** Absolute tolerance per unknown. */
    private readonly absolute: Float64Array,
  ) {
    this.points = [new Float64Array(size), new Float64Array(size), new Float64Array(size)];
    this.scale = new Float64Array(size);
  }

  /** Start afresh at a corner (or at t = 0) with its solution. */
  restart(t: number, x: Float64Array): void {
    this.count = 0;
    this.push(t, x);
  }

  /** Record an accepted point. */
  push(t: number, x: Float64Array): void {
    const oldest = this.points[2];
    this.points[2] = this.points[1];
    this.points[1] = this.points[0];
    this.points[0] = oldest;
    oldest.set(x);
    this.times[2] = this.times[1];
    this.times[1] = this.times[0];
    this.times[0] = t;
    this.count = Math.min(this.count + 1, 3);
    for (let j = 0; j < this.watched.length; j++) {
      const i = this.watched[j];
      const a = Math.abs(x[i]);
      if (a > this.scale[i]) this.scale[i] = a;
    }
  }

  /**
   * Error of the candidate `x` at time `t` relative to the tolerance (≤ 1 passes), for a
   * method of `order` 1 (backward Euler) or 2 (trapezoidal). Returns 0 when too few points
   * since the corner allow an estimate. `worst` receives the index of the worst unknown.
   */
  ratio(t: number, x: Float64Array, order: 1 | 2, worst?: { index: number }): number {
    if (this.count < order + 1) return 0;
    const t0 = this.times[0];
    const t1 = this.times[1];
    const t2 = this.times[2];
    const x0 = this.points[0];
    const x1 = this.points[1];
    const x2 = this.points[2];
    const h = t - t0;
    const h1 = t0 - t1;
    let factor: number;
    let w0: number;
    let w1: number;
    let w2 = 0;
    if (order === 1) {
      factor = h / (2 * h + h1);
      w0 = 1 + h / h1;
      w1 = -h / h1;
    } else {
      const h2 = t1 - t2;
      const lte = (h * h * h) / 12;
      factor = lte / (lte + (h * (h + h1) * (h + h1 + h2)) / 6);
      // Lagrange weights of the quadratic through (t0, t1, t2), evaluated at t.
      w0 = ((t - t1) * (t - t2)) / ((t0 - t1) * (t0 - t2));
      w1 = ((t - t0) * (t - t2)) / ((t1 - t0) * (t1 - t2));
      w2 = ((t - t0) * (t - t1)) / ((t2 - t0) * (t2 - t1));
    }
    let largest = 0;
    for (let j = 0; j < this.watched.length; j++) {
      const i = this.watched[j];
      const predicted = w0 * x0[i] + w1 * x1[i] + (order === 2 ? w2 * x2[i] : 0);
      const tolerance = this.relative * Math.max(this.scale[i], Math.abs(x[i])) + this.absolute[i];
      const r = (Math.abs(x[i] - predicted) * factor) / tolerance;
      if (r > largest) {
        largest = r;
        if (worst) worst.index = i;
      }
    }
    return largest;
  }
}
