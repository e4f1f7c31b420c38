import type { Circuit } from '../../circuit/circuit.ts';
import { valueAt } from '../../parts/solution.ts';
import type { ObserverContext, StepObserver } from '../../transient/observer.ts';
import { OutputGrid } from '../../transient/output-grid.ts';
import { StimulusCorners } from './events.ts';
import { RingingSearch, type RingingResult } from './ringing-search.ts';
import type { RingingEvent, RingingOptions } from './types.ts';

/**
 * The ringing search inside a run: chosen nodes at the output row times, whether or not the
 * run keeps its columns (the command line streams rows and keeps none), with the stimulus
 * corners as events, and whatever else `event` is told (rail exits). The stepper lands on
 * every row time, so the values are the solution there, not an interpolation.
 */
export class RingingWatch implements StepObserver {
  private readonly grid: OutputGrid;
  private readonly eps: number;
  private readonly corners: StimulusCorners;
  private readonly search: RingingSearch;
  private readonly values: Float64Array;
  private indices = new Int32Array(0);
  private row = 0;
  private readonly tell = (e: RingingEvent): void => this.search.event(e);

  constructor(
    circuit: Circuit,
    private readonly nodes: readonly string[],
    options: RingingOptions = {},
    /** Events other than corners are told at most this long after they happen, seconds. */
    private readonly lag = 0,
  ) {
    const { outputStep, duration } = circuit.simulate;
    this.grid = new OutputGrid(outputStep, duration);
    this.eps = duration * 1e-12;
    this.corners = new StimulusCorners(circuit.parts, duration);
    this.search = new RingingSearch(nodes, outputStep, options, Math.ceil(lag / outputStep) + 1);
    this.values = new Float64Array(nodes.length);
  }

  bind(context: ObserverContext): void {
    this.indices = Int32Array.from(this.nodes, (n) => context.node(n));
  }

  accepted(t: number, x: Float64Array): void {
    const frontier = t - this.lag;
    this.corners.take(frontier, this.tell);
    for (let time = this.grid.time(this.row); this.row < this.grid.rows && time <= t + this.eps; time = this.grid.time(++this.row)) {
      for (let p = 0; p < this.indices.length; p++) this.values[p] = valueAt(x, this.indices[p]);
      this.search.row(time, this.values, frontier);
    }
  }

  /** An event after which to look for ringing, told no later than `lag` after its time. */
  event(e: RingingEvent): void {
    this.search.event(e);
  }

  /** After the run, and after every event has been told. */
  finish(): RingingResult {
    this.corners.take(Infinity, this.tell);
    return this.search.finish();
  }

  /** Output rows seen so far (all of them once the run has finished). */
  get rows(): number {
    return this.row;
  }

  /** Wall time spent examining windows so far, seconds. */
  get examineSeconds(): number {
    return this.search.examineSeconds;
  }
}
