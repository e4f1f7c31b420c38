import type { Circuit } from '../../circuit/circuit.ts';
import type { ObserverContext, StepObserver } from '../../transient/observer.ts';
import { OutputGrid } from '../../transient/output-grid.ts';
import { OutputRecorder } from '../../transient/output-recorder.ts';

/**
 * Records chosen nodes at the output row times, whether or not the run keeps its columns
 * (the command line streams rows and keeps none). The stepper lands on every row time, so
 * the values are the solution there, not an interpolation.
 */
export class RowRecorder implements StepObserver {
  private readonly grid: OutputGrid;
  private readonly eps: number;
  private output: OutputRecorder | undefined;
  private row = 0;

  constructor(
    circuit: Circuit,
    private readonly nodes: readonly string[],
  ) {
    this.grid = new OutputGrid(circuit.simulate.outputStep, circuit.simulate.duration);
    this.eps = circuit.simulate.duration * 1e-12;
  }

  bind(context: ObserverContext): void {
    this.output = new OutputRecorder(this.grid, Int32Array.from(this.nodes, (n) => context.node(n)), true);
  }

  accepted(t: number, x: Float64Array): void {
    while (this.row < this.grid.rows && this.grid.time(this.row) <= t + this.eps) this.output!.record(this.row++, x);
  }

  get time(): Float64Array {
    return this.bound().time;
  }

  get columns(): Map<string, Float64Array> {
    const columns = this.bound().columns;
    return new Map(this.nodes.map((n, i) => [n, columns[i]] as const));
  }

  /** Rows recorded so far (all of them once the run has finished). */
  get rows(): number {
    return this.row;
  }

  private bound(): OutputRecorder {
    if (this.output === undefined) throw new Error('RowRecorder: read before the run bound it');
    return this.output;
  }
}
