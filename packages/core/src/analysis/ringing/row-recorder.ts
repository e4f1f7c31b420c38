import type { Circuit } from '../../circuit/circuit.ts';
import type { ObserverContext, StepObserver } from '../../transient/observer.ts';
import { OutputGrid } from '../../transient/output-grid.ts';

/**
 * Records chosen nodes at the output row times, whether or not the run keeps its columns
 * (the command line streams rows and keeps none). The stepper lands on every row time, so
 * the values are the solution there, not an interpolation.
 */
export class RowRecorder implements StepObserver {
  private readonly grid: OutputGrid;
  private readonly eps: number;
  readonly time: Float64Array;
  readonly columns: Map<string, Float64Array>;
  private indices = new Int32Array(0);
  private arrays: Float64Array[] = [];
  private row = 0;

  constructor(
    circuit: Circuit,
    private readonly nodes: readonly string[],
  ) {
    this.grid = new OutputGrid(circuit.simulate.outputStep, circuit.simulate.duration);
    this.eps = circuit.simulate.duration * 1e-12;
    this.time = new Float64Array(this.grid.rows);
    this.columns = new Map(nodes.map((n) => [n, new Float64Array(this.grid.rows)] as const));
  }

  bind(context: ObserverContext): void {
    this.indices = Int32Array.from(this.nodes, (n) => context.node(n));
    this.arrays = this.nodes.map((n) => this.columns.get(n)!);
  }

  accepted(t: number, x: Float64Array): void {
    while (this.row < this.grid.rows && this.grid.time(this.row) <= t + this.eps) {
      this.time[this.row] = this.grid.time(this.row);
      for (let i = 0; i < this.indices.length; i++) this.arrays[i][this.row] = this.indices[i] >= 0 ? x[this.indices[i]] : 0;
      this.row++;
    }
  }

  /** Rows recorded so far (all of them once the run has finished). */
  get rows(): number {
    return this.row;
  }
}
