import type { OutputGrid } from './output-grid.ts';
import { valueAt } from '../parts/solution.ts';

/**
 * Writes the recorded' values at each output row: into Float64Array columns when they are
 * kept, and to the row callback. The row array handed to the callback is reused.
 */
export class OutputRecorder {
  readonly time: Float64Array;
  readonly columns: Float64Array[];
  private readonly row: Float64Array;

  constructor(
    private readonly grid: OutputGrid,
    /** Unknown index per recorded node (-1 for gnd). */
    private readonly recorded: Int32Array,
    private readonly keep: boolean,
    private readonly onRow?: (time: number, values: Float64Array) => void,
  ) {
    const rows = keep ? grid.rows : 0;
    this.time = new Float64Array(rows);
    this.columns = Array.from(recorded, () => new Float64Array(rows));
    this.row = new Float64Array(recorded.length);
  }

  /** Record output row `index` from the solution `x` at that row's time. */
  record(index: number, x: Float64Array): void {
    const t = this.grid.time(index);
    for (let p = 0; p < this.recorded.length; p++) this.row[p] = valueAt(x, this.recorded[p]);
    if (this.keep) {
      this.time[index] = t;
      for (let p = 0; p < this.recorded.length; p++) this.columns[p][index] = this.row[p];
    }
    this.onRow?.(t, this.row);
  }
}
