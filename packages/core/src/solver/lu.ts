/**
 * Dense LU factorization with partial pivoting (Doolittle, row interchanges), in place on
 * flat typed arrays. The factorization and the per-step solves allocate nothing, and a
 * factorization is reused for as long as the matrix is unchanged.
 *
 * ml-matrix's LuDecomposition was the first choice; `pnpm bench` showed it taking about half
 * of the op-amp case's time (3.4 µs per 8×8 factorization, a fresh matrix copy each time,
 * about three factorizations per Newton step), so the hot loop uses this one and the tests
 * check it against ml-matrix.
 */
export class LuSolver {
  private readonly lu: Float64Array;
  private readonly perm: Int32Array;
  private readonly work: Float64Array;
  /** Each column's largest entry before elimination: the scale its pivot is judged against. */
  private readonly columnLargest: Float64Array;

  constructor(readonly size: number) {
    this.lu = new Float64Array(size * size);
    this.perm = new Int32Array(size);
    this.work = new Float64Array(size);
    this.columnLargest = new Float64Array(size);
  }

  /**
   * Factor the row-major matrix `a` (left unchanged). Returns -1 on success, or the first
   * column whose pivot is negligible against that column's own largest entry: the unknown
   * that the equations do not determine. Judged per column, not against the whole matrix: a
   * huge capacitor's C/h in its own column leaves the others' pivots as good as they were.
   */
  factor(a: Float64Array): number {
    const n = this.size;
    const lu = this.lu;
    const columnLargest = this.columnLargest;
    lu.set(a);
    columnLargest.fill(0);
    for (let r = 0; r < n; r++) {
      for (let c = 0; c < n; c++) columnLargest[c] = Math.max(columnLargest[c], Math.abs(lu[r * n + c]));
    }
    for (let r = 0; r < n; r++) this.perm[r] = r;
    for (let k = 0; k < n; k++) {
      let p = k;
      let best = Math.abs(lu[k * n + k]);
      for (let r = k + 1; r < n; r++) {
        const v = Math.abs(lu[r * n + k]);
        if (v > best) {
          best = v;
          p = r;
        }
      }
      // Elimination adds to column k only multiples (at most 1, with partial pivoting) of its own entries.
      if (!(best > columnLargest[k] * n * 1e-15)) return k;
      if (p !== k) {
        for (let c = 0; c < n; c++) {
          const t = lu[k * n + c];
          lu[k * n + c] = lu[p * n + c];
          lu[p * n + c] = t;
        }
        const t = this.perm[k];
        this.perm[k] = this.perm[p];
        this.perm[p] = t;
      }
      const pivot = lu[k * n + k];
      for (let r = k + 1; r < n; r++) {
        const row = r * n;
        const factor = lu[row + k] / pivot;
        lu[row + k] = factor;
        if (factor === 0) continue;
        const pivotRow = k * n;
        for (let c = k + 1; c < n; c++) lu[row + c] -= factor * lu[pivotRow + c];
      }
    }
    return -1;
  }

  /** Solve with the last factorization: `x = A⁻¹·b`. `b` is left unchanged. */
  solve(b: Float64Array, x: Float64Array): void {
    const n = this.size;
    const lu = this.lu;
    const y = this.work;
    for (let r = 0; r < n; r++) {
      let s = b[this.perm[r]];
      const row = r * n;
      for (let c = 0; c < r; c++) s -= lu[row + c] * y[c];
      y[r] = s;
    }
    for (let r = n - 1; r >= 0; r--) {
      let s = y[r];
      const row = r * n;
      for (let c = r + 1; c < n; c++) s -= lu[row + c] * x[c];
      x[r] = s / lu[row + r];
    }
  }
}
