/**
 * The latest output rows of a few nodes, each column one contiguous stretch so that a window
 * of rows is read in place. Rows are named by their absolute index since the run's start.
 * When the buffer is full, the caller drops the rows it no longer needs and the rest move to
 * the front: with room for twice what is ever needed, each row moves about once, and
 * the memory is fixed by the capacity whatever the length of the run.
 */
export class SlidingRows {
  readonly time: Float64Array;
  readonly columns: Float64Array[];
  /** Absolute index of the row held at position 0. */
  private offset = 0;
  private held = 0;

  constructor(
    nodes: number,
    private readonly capacity: number,
  ) {
    this.time = new Float64Array(capacity);
    this.columns = Array.from({ length: nodes }, () => new Float64Array(capacity));
  }

  /** Rows added so far: the absolute index the next row gets. */
  get end(): number {
    return this.offset + this.held;
  }

  /** Time of the newest row; -Infinity before the first. */
  get lastTime(): number {
    return this.held > 0 ? this.time[this.held - 1] : -Infinity;
  }

  /** No room for another row until `dropBefore`. */
  get full(): boolean {
    return this.held === this.capacity;
  }

  /** Add one row (there must be room). */
  push(time: number, values: ArrayLike<number>): void {
    const at = this.held++;
    this.time[at] = time;
    for (let p = 0; p < this.columns.length; p++) this.columns[p][at] = values[p];
  }

  /** Position in the arrays of absolute row `row`, which must still be held. */
  at(row: number): number {
    if (row < this.offset || row > this.end) throw new Error(`SlidingRows: row ${row} is no longer held (rows ${this.offset}..${this.end - 1} are)`);
    return row - this.offset;
  }

  /** Absolute index of the first held row at or after `t - tolerance`; `end` when none is held yet. */
  rowAtOrAfter(t: number, tolerance: number): number {
    let lo = 0;
    let hi = this.held;
    while (lo < hi) {
      const mid = (lo + hi) >> 1;
      if (this.time[mid] < t - tolerance) lo = mid + 1;
      else hi = mid;
    }
    return this.offset + lo;
  }

  /** Let go of the rows before absolute row `keepFrom`, moving the rest to the front. */
  dropBefore(keepFrom: number): void {
    const from = Math.min(Math.max(keepFrom - this.offset, 0), this.held);
    if (from === 0) throw new Error(`SlidingRows: all ${this.capacity} rows are still needed; the window is longer than the buffer`);
    this.time.copyWithin(0, from, this.held);
    for (const column of this.columns) column.copyWithin(0, from, this.held);
    this.offset += from;
    this.held -= from;
  }
}
