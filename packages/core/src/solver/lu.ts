import { LuDecomposition, Matrix } from 'ml-matrix';

/**
 * Dense LU with partial pivoting. ml-matrix factors; the factors are then copied into flat
 * typed arrays so that the per-step solve (forward and back substitution) allocates nothing
 * and a factorization can be reused for as long as the matrix is unchanged.
 */
export class LuSolver {
  private readonly lu: Float64Array;
  private readonly perm: Int32Array;
  private readonly work: Float64Array;
  private readonly scratch: Matrix;

  constructor(readonly size: number) {
    this.lu = new Float64Array(size * size);
    this.perm = new Int32Array(size);
    this.work = new Float64Array(size);
    this.scratch = new Matrix(size, size);
  }

  /**
   * Factor the row-major matrix `a`. Returns -1 on success, or the first column whose pivot
   * is negligible against the matrix's largest entry (the unknown that is not determined).
   */
  factor(a: Float64Array): number {
    const n = this.size;
    let largest = 0;
    for (let r = 0; r < n; r++) {
      for (let c = 0; c < n; c++) {
        const v = a[r * n + c];
        this.scratch.set(r, c, v);
        if (Math.abs(v) > largest) largest = Math.abs(v);
      }
    }
    const decomposition = new LuDecomposition(this.scratch);
    // ml-matrix keeps its factors in these fields; the getters would copy them again.
    const { LU, pivotVector } = decomposition as unknown as { LU: Matrix; pivotVector: ArrayLike<number> };
    const floor = largest * n * 1e-15;
    let singular = -1;
    for (let r = 0; r < n; r++) {
      this.perm[r] = pivotVector[r];
      for (let c = 0; c < n; c++) this.lu[r * n + c] = LU.get(r, c);
      if (singular < 0 && !(Math.abs(this.lu[r * n + r]) > floor)) singular = r;
    }
    return singular;
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
