import type { SampleTimes } from '../../circuit/adc-spec.ts';
import { decimalRounded } from '../../units/decimal.ts';

/**
 * The sample instants of one converter within a run of `duration`. Instant k of a rate is
 * always `start + k / rate`, one expression, so that long runs do not drift and the times
 * read as written (3 / 10 kS/s is 0.0003, not 0.00030000000000000003). A rate converts on
 * [start, duration): 10 ms at 10 kS/s is 100 samples, as a firmware loop counts them.
 */
export class SampleSchedule {
  /** Number of instants in the run: before its end for a rate, at or before it for listed times. */
  readonly count: number;
  private readonly listed?: Float64Array;
  private readonly start: number;
  private readonly rate: number;

  constructor(times: SampleTimes, duration: number) {
    const slack = duration * 1e-12;
    if ('times' in times) {
      this.listed = Float64Array.from(times.times.filter((t) => t <= duration + slack));
      this.count = this.listed.length;
      this.start = 0;
      this.rate = 0;
    } else {
      this.start = times.start;
      this.rate = times.rate;
      // Instants strictly before the end; one that lands on it by rounding only is not one.
      const span = (duration - times.start) * times.rate;
      this.count = span > 0 ? Math.ceil(span - 1e-9 * Math.max(1, span)) : 0;
    }
  }

  /** Instant k, 0-based. */
  instant(k: number): number {
    return this.listed !== undefined ? this.listed[k] : decimalRounded(this.start + k / this.rate);
  }
}
