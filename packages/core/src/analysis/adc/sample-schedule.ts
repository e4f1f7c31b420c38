import type { SampleTimes } from '../../circuit/adc-spec.ts';

/**
 * The sample instants of one converter within a run of `duration`. Instant k of a rate is
 * always `start + k / rate`, one expression, so that long runs do not drift.
 */
export class SampleSchedule {
  /** Number of instants at or before the end of the run. */
  readonly count: number;
  private readonly listed?: Float64Array;
  private readonly start: number;
  private readonly period: number;

  constructor(times: SampleTimes, duration: number) {
    const slack = duration * 1e-12;
    if ('times' in times) {
      this.listed = Float64Array.from(times.times.filter((t) => t <= duration + slack));
      this.count = this.listed.length;
      this.start = 0;
      this.period = Infinity;
    } else {
      this.start = times.start;
      this.period = 1 / times.rate;
      this.count = times.start > duration + slack ? 0 : Math.floor((duration + slack - times.start) * times.rate) + 1;
    }
  }

  /** Instant k, 0-based. */
  instant(k: number): number {
    return this.listed !== undefined ? this.listed[k] : this.start + k * this.period;
  }
}
