/**
 * Which entries of a square matrix may be non-zero, column by column (compressed sparse
 * columns, rows ascending within each column). The diagonal is always present, so that the
 * ordering sees every unknown and a zero diagonal (a branch-current row) has its slot.
 * The pattern only grows; `version` counts the growths so that factorizations know when
 * their analysis is out of date.
 */
export class SparsePattern {
  /** Start of column j's rows in `rows`; `colStart[size]` is the entry count. */
  colStart: Int32Array;
  rows: Int32Array;
  version = 0;

  constructor(readonly size: number) {
    this.colStart = Int32Array.from({ length: size + 1 }, (_, j) => j);
    this.rows = Int32Array.from({ length: size }, (_, j) => j);
  }

  get count(): number {
    return this.colStart[this.size];
  }

  /** Index of entry (row, col) in the value array, or -1 when it is not in the pattern. */
  slot(row: number, col: number): number {
    const rows = this.rows;
    let lo = this.colStart[col];
    let hi = this.colStart[col + 1];
    // Circuit columns hold a handful of entries: a linear scan beats bisection there.
    if (hi - lo <= 16) {
      for (; lo < hi; lo++) if (rows[lo] === row) return lo;
      return -1;
    }
    while (lo < hi) {
      const mid = (lo + hi) >> 1;
      const r = rows[mid];
      if (r === row) return mid;
      if (r < row) lo = mid + 1;
      else hi = mid;
    }
    return -1;
  }

  /**
   * Add the entries `keys` (row·size + col each, not yet present). Returns where each old
   * slot moved: `moved[oldSlot] = newSlot`.
   */
  grow(keys: readonly number[]): Int32Array {
    const n = this.size;
    const oldStart = this.colStart;
    const oldRows = this.rows;
    const added = new Int32Array(n);
    for (const key of keys) added[key % n]++;
    const colStart = new Int32Array(n + 1);
    for (let j = 0; j < n; j++) colStart[j + 1] = colStart[j] + (oldStart[j + 1] - oldStart[j]) + added[j];
    const rows = new Int32Array(colStart[n]);
    // Old entries first at the head of each column, the new ones after; then sort each
    // column that received some, carrying the old slots along.
    const moved = new Int32Array(oldRows.length);
    const origin = new Int32Array(colStart[n]).fill(-1);
    const fill = colStart.slice(0, n);
    for (let j = 0; j < n; j++) {
      for (let p = oldStart[j]; p < oldStart[j + 1]; p++) {
        rows[fill[j]] = oldRows[p];
        origin[fill[j]++] = p;
      }
    }
    for (const key of keys) {
      const j = key % n;
      rows[fill[j]++] = (key - j) / n;
    }
    for (let j = 0; j < n; j++) {
      if (added[j] === 0) continue;
      const start = colStart[j];
      const order = Array.from({ length: colStart[j + 1] - start }, (_, i) => start + i).sort((a, b) => rows[a] - rows[b]);
      const sortedRows = order.map((p) => rows[p]);
      const sortedOrigin = order.map((p) => origin[p]);
      rows.set(sortedRows, start);
      origin.set(sortedOrigin, start);
    }
    for (let p = 0; p < origin.length; p++) if (origin[p] >= 0) moved[origin[p]] = p;
    this.colStart = colStart;
    this.rows = rows;
    this.version++;
    return moved;
  }
}
