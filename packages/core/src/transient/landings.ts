import type { ObserverHub } from './observer-hub.ts';
import type { OutputGrid } from './output-grid.ts';
import type { OutputRecorder } from './output-recorder.ts';

/**
 * The points a step must end on exactly besides stimulus corners (output rows and observers'
 * instants), and what happens when an accepted step reaches time t: observers see the
 * solution, rows due are recorded, progress is reported.
 */
export class Landings {
  private row = 1;
  /** The time of `row`, kept: a row's time is rounded to its decimal, too dear to redo every step. */
  private rowTime: number;
  private instant: number;
  private nextProgress = 0.01;

  constructor(
    private readonly grid: OutputGrid,
    private readonly output: OutputRecorder,
    private readonly observers: ObserverHub,
    /** Times closer than this are the same instant. */
    private readonly eps: number,
    private readonly duration: number,
    private readonly onProgress?: (fraction: number) => void,
  ) {
    this.instant = observers.nextInstant(eps);
    this.rowTime = grid.time(this.row);
  }

  /** The next landing point after the last accepted time. */
  next(): number {
    return Math.min(this.instant, this.rowTime);
  }

  /** An accepted step reached time `t` with solution `x`. */
  passed(t: number, x: Float64Array): void {
    this.observers.accepted(t, x);
    if (t >= this.instant - this.eps) this.instant = this.observers.nextInstant(t + this.eps);
    while (this.row < this.grid.rows && this.rowTime <= t + this.eps) {
      this.output.record(this.row++, x);
      this.rowTime = this.row < this.grid.rows ? this.grid.time(this.row) : Infinity;
    }
    if (this.onProgress && t >= this.nextProgress * this.duration) {
      this.onProgress(t / this.duration);
      this.nextProgress = Math.floor((t / this.duration) * 100 + 1) / 100;
    }
  }
}
