import type { Factorization } from './assembly.ts';
import { minimumDegreeOrder } from './minimum-degree.ts';
import type { SparsePattern } from './sparse-pattern.ts';

/** The matrix a sparse LU factors: entries in a pattern's slots (the sparse system). */
export interface SparseMatrix {
  readonly size: number;
  readonly pattern: SparsePattern;
  readonly values: Float64Array;
  /** Merge entries stamped outside the pattern. */
  settle(): void;
}

/** A candidate pivot on the diagonal is taken if it is at least this fraction of the column's largest. */
const DIAGONAL_PREFERENCE = 0.1;
/** A refactorization keeps the old pivot sequence while each pivot is at least this fraction of its column's largest. */
const REFACTOR_PIVOT_RATIO = 1e-3;
/**
 * A pivot this small against its column's largest entry leaves its unknown undetermined.
 * Per column, not against the whole matrix: elimination adds to a column only multiples of its
 * own entries, and a huge capacitor's C/h in one column leaves the others' pivots as they were.
 */
const SINGULAR_RATIO = 1e-13;

/**
 * Sparse LU, `P·A·Q = L·U`, for the sparse system's matrix.
 *
 * - Column order Q: approximate minimum degree on A + Aᵀ, computed once per pattern.
 * - First factorization: left-looking, column by column (Gilbert and Peierls, "Sparse partial
 *   pivoting in time proportional to arithmetic operations", SIAM J. Sci. Stat. Comput. 9(5),
 *   1988): each column of L and U is a sparse triangular solve whose pattern a depth-first
 *   search finds, with threshold partial pivoting that keeps the diagonal when it is large
 *   enough (MNA has zero diagonals in branch-current rows, so rows must be exchanged).
 * - Later factorizations of the same pattern reuse the row order and the patterns of L and U
 *   (no search): only arithmetic, allocation-free. When a pivot has become too small against
 *   its column, a fresh pivoting factorization replaces the sequence.
 */
export class SparseLu implements Factorization {
  private readonly n: number;
  /** `columnOrder[k]`: the unknown eliminated at step k. */
  private columnOrder: Int32Array = new Int32Array(0);
  private analysedVersion = -1;
  /** True while a pivot sequence and the L and U patterns exist for the current pattern. */
  private structured = false;
  /** Step at which each row became the pivot, -1 before. */
  private readonly rowStep: Int32Array;
  /** `pivotRow[k]`: the row chosen at step k. */
  private readonly pivotRow: Int32Array;
  /** Strictly lower L by columns (unit diagonal implied); row indices are steps. */
  private readonly lStart: Int32Array;
  private lRows = new Int32Array(0);
  private lValues = new Float64Array(0);
  /** Strictly upper U by columns, each column's rows in an order fit for the triangular solve. */
  private readonly uStart: Int32Array;
  private uRows = new Int32Array(0);
  private uValues = new Float64Array(0);
  private readonly diagonal: Float64Array;
  private readonly work: Float64Array;
  private readonly reached: Int32Array;
  private readonly stack: Int32Array;
  private readonly next: Int32Array;
  private readonly mark: Int32Array;

  constructor(private readonly system: SparseMatrix) {
    const n = system.size;
    this.n = n;
    this.rowStep = new Int32Array(n);
    this.pivotRow = new Int32Array(n);
    this.lStart = new Int32Array(n + 1);
    this.uStart = new Int32Array(n + 1);
    this.diagonal = new Float64Array(n);
    this.work = new Float64Array(n);
    this.reached = new Int32Array(n);
    this.stack = new Int32Array(n);
    this.next = new Int32Array(n);
    this.mark = new Int32Array(n);
  }

  factor(): number {
    const system = this.system;
    system.settle();
    const pattern = system.pattern;
    if (pattern.version !== this.analysedVersion) {
      this.columnOrder = minimumDegreeOrder(pattern);
      this.analysedVersion = pattern.version;
      this.structured = false;
    }
    if (this.structured && this.refactor()) return -1;
    return this.pivotingFactor();
  }

  /** Numeric factorization with the kept pivot sequence; false when a pivot became unfit. */
  private refactor(): boolean {
    const { n, columnOrder, rowStep, lStart, lRows, lValues, uStart, uRows, uValues, diagonal } = this;
    const x = this.work;
    const { colStart, rows } = this.system.pattern;
    const values = this.system.values;
    for (let k = 0; k < n; k++) {
      for (let p = uStart[k]; p < uStart[k + 1]; p++) x[uRows[p]] = 0;
      for (let p = lStart[k]; p < lStart[k + 1]; p++) x[lRows[p]] = 0;
      x[k] = 0;
      const col = columnOrder[k];
      let scale = 0;
      for (let p = colStart[col]; p < colStart[col + 1]; p++) {
        x[rowStep[rows[p]]] += values[p];
        scale = Math.max(scale, Math.abs(values[p]));
      }
      for (let p = uStart[k]; p < uStart[k + 1]; p++) {
        const j = uRows[p];
        const u = x[j];
        uValues[p] = u;
        if (u === 0) continue;
        for (let q = lStart[j]; q < lStart[j + 1]; q++) x[lRows[q]] -= lValues[q] * u;
      }
      const pivot = x[k];
      let largest = 0;
      for (let p = lStart[k]; p < lStart[k + 1]; p++) largest = Math.max(largest, Math.abs(x[lRows[p]]));
      const size = Math.abs(pivot);
      if (!(size > scale * SINGULAR_RATIO) || size < REFACTOR_PIVOT_RATIO * largest) {
        this.structured = false;
        return false;
      }
      diagonal[k] = pivot;
      for (let p = lStart[k]; p < lStart[k + 1]; p++) lValues[p] = x[lRows[p]] / pivot;
    }
    return true;
  }

  /** Factorization that chooses pivots and finds the patterns of L and U; -1 or the undetermined unknown. */
  private pivotingFactor(): number {
    const { n, columnOrder, rowStep, pivotRow, lStart, uStart, diagonal, mark } = this;
    const x = this.work;
    const reached = this.reached;
    const { colStart, rows } = this.system.pattern;
    const values = this.system.values;
    rowStep.fill(-1);
    mark.fill(-1);
    this.structured = false;
    let lCount = 0;
    let uCount = 0;
    for (let k = 0; k < n; k++) {
      lStart[k] = lCount;
      uStart[k] = uCount;
      this.reserve(lCount + n, uCount + n);
      const col = columnOrder[k];
      const top = this.reach(col, k);
      for (let p = top; p < n; p++) x[reached[p]] = 0;
      let scale = 0;
      for (let p = colStart[col]; p < colStart[col + 1]; p++) {
        x[rows[p]] += values[p];
        scale = Math.max(scale, Math.abs(values[p]));
      }
      // Rows reached are in topological order: each pivotal one is final when its turn comes.
      const lRows = this.lRows;
      const lValues = this.lValues;
      for (let p = top; p < n; p++) {
        const j = reached[p];
        const step = rowStep[j];
        if (step < 0) continue;
        const u = x[j];
        if (u === 0) continue;
        for (let q = lStart[step]; q < lStart[step + 1]; q++) x[lRows[q]] -= lValues[q] * u;
      }
      let best = -1;
      let largest = -1;
      for (let p = top; p < n; p++) {
        const i = reached[p];
        if (rowStep[i] >= 0) {
          this.uRows[uCount] = rowStep[i];
          this.uValues[uCount++] = x[i];
        } else if (Math.abs(x[i]) > largest) {
          largest = Math.abs(x[i]);
          best = i;
        }
      }
      if (best < 0 || !(largest > scale * SINGULAR_RATIO)) return col;
      if (mark[col] === k && rowStep[col] < 0 && Math.abs(x[col]) >= DIAGONAL_PREFERENCE * largest) best = col;
      const pivot = x[best];
      diagonal[k] = pivot;
      rowStep[best] = k;
      pivotRow[k] = best;
      for (let p = top; p < n; p++) {
        const i = reached[p];
        if (rowStep[i] >= 0) continue;
        lRows[lCount] = i;
        lValues[lCount++] = x[i] / pivot;
      }
    }
    lStart[n] = lCount;
    uStart[n] = uCount;
    // L's rows were kept as original rows while their steps were unknown: number them by step.
    for (let p = 0; p < lCount; p++) this.lRows[p] = rowStep[this.lRows[p]];
    this.structured = true;
    return -1;
  }

  /**
   * Rows of the current column's solve (Gilbert–Peierls): every row reachable from the
   * column's entries through the columns of L found so far. Leaves them in
   * `reached[top..n-1]` in topological order and returns `top`; `mark[i] === k` marks them.
   */
  private reach(col: number, k: number): number {
    const { n, rowStep, lStart, mark, stack, next } = this;
    const lRows = this.lRows;
    const { colStart, rows } = this.system.pattern;
    let top = n;
    for (let p = colStart[col]; p < colStart[col + 1]; p++) {
      const start = rows[p];
      if (mark[start] === k) continue;
      let depth = 0;
      stack[0] = start;
      mark[start] = k;
      next[0] = rowStep[start] >= 0 ? lStart[rowStep[start]] : 0;
      while (depth >= 0) {
        const j = stack[depth];
        const step = rowStep[j];
        const end = step >= 0 ? lStart[step + 1] : 0;
        let descended = false;
        for (let q = next[depth]; q < end; q++) {
          const i = lRows[q];
          if (mark[i] === k) continue;
          next[depth] = q + 1;
          mark[i] = k;
          stack[++depth] = i;
          next[depth] = rowStep[i] >= 0 ? lStart[rowStep[i]] : 0;
          descended = true;
          break;
        }
        if (!descended) {
          depth--;
          this.reached[--top] = j;
        }
      }
    }
    return top;
  }

  /** Room for `lCount` and `uCount` entries in L and U (grown by doubling: only while patterns are found). */
  private reserve(lCount: number, uCount: number): void {
    if (this.lRows.length < lCount) {
      const size = Math.max(lCount, 2 * this.lRows.length);
      const rows = new Int32Array(size);
      rows.set(this.lRows);
      const values = new Float64Array(size);
      values.set(this.lValues);
      this.lRows = rows;
      this.lValues = values;
    }
    if (this.uRows.length < uCount) {
      const size = Math.max(uCount, 2 * this.uRows.length);
      const rows = new Int32Array(size);
      rows.set(this.uRows);
      const values = new Float64Array(size);
      values.set(this.uValues);
      this.uRows = rows;
      this.uValues = values;
    }
  }

  solve(b: Float64Array, x: Float64Array): void {
    const { n, pivotRow, columnOrder, lStart, lRows, lValues, uStart, uRows, uValues, diagonal } = this;
    const y = this.work;
    for (let k = 0; k < n; k++) y[k] = b[pivotRow[k]];
    for (let k = 0; k < n; k++) {
      const v = y[k];
      if (v === 0) continue;
      for (let p = lStart[k]; p < lStart[k + 1]; p++) y[lRows[p]] -= lValues[p] * v;
    }
    for (let k = n - 1; k >= 0; k--) {
      const v = (y[k] /= diagonal[k]);
      if (v === 0) continue;
      for (let p = uStart[k]; p < uStart[k + 1]; p++) y[uRows[p]] -= uValues[p] * v;
    }
    for (let k = 0; k < n; k++) x[columnOrder[k]] = y[k];
  }

  /**
   * `x = (Aᵀ)⁻¹·b` with the last factorization (the adjoint solve). `P·A·Q = L·U`, so
   * `Aᵀ = Q·Uᵀ·Lᵀ·P`: Uᵀ forward and Lᵀ backward, each column of U and L read as a row of
   * its transpose (dot products, in the columns' stored order).
   */
  solveTransposed(b: Float64Array, x: Float64Array): void {
    const { n, pivotRow, columnOrder, lStart, lRows, lValues, uStart, uRows, uValues, diagonal } = this;
    const y = this.work;
    for (let k = 0; k < n; k++) {
      let s = b[columnOrder[k]];
      for (let p = uStart[k]; p < uStart[k + 1]; p++) s -= uValues[p] * y[uRows[p]];
      y[k] = s / diagonal[k];
    }
    for (let k = n - 1; k >= 0; k--) {
      let s = y[k];
      for (let p = lStart[k]; p < lStart[k + 1]; p++) s -= lValues[p] * y[lRows[p]];
      y[k] = s;
    }
    for (let k = 0; k < n; k++) x[pivotRow[k]] = y[k];
  }
}
