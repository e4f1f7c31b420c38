import type { ClippedSamples, TimeInterval } from './adc-report.ts';

/**
 * Runs of consecutive samples clipped at one end of an ADC's range, gathered sample by sample
 * so that nothing is kept per sample: a count, and one interval per run.
 */
export class ClippedRuns {
  private count = 0;
  private readonly intervals: TimeInterval[] = [];
  /** Instant of the open run's first and latest sample; NaN with no run open. */
  private from = NaN;
  private to = NaN;

  /** Sample at `instant`: clipped at this end or not. */
  add(instant: number, clipped: boolean): void {
    if (clipped) {
      this.count++;
      if (Number.isNaN(this.from)) this.from = instant;
      this.to = instant;
    } else if (!Number.isNaN(this.from)) {
      this.close();
    }
  }

  /** The runs so far, an open one ending at its latest sample. */
  result(): ClippedSamples {
    if (!Number.isNaN(this.from)) this.close();
    return { count: this.count, intervals: [...this.intervals] };
  }

  private close(): void {
    this.intervals.push({ from: this.from, to: this.to });
    this.from = this.to = NaN;
  }
}
