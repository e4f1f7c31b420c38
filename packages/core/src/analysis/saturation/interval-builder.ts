/** One finished interval as the builder keeps it. */
export interface RawInterval {
  start: number;
  end: number;
  /** Largest `measure` seen inside. */
  worst: number;
  /** The watched value at `start` and at `end`. */
  startValue: number;
  endValue: number;
  fragments: number;
}

/**
 * Collects the intervals of one on/off state (an amplifier at one rail, slewing one way)
 * from the sequence of accepted solutions. A fragment that starts within `mergeGap` of the
 * previous one's end extends it. Called once per accepted step: allocates only when a state
 * begins.
 */
export class IntervalBuilder {
  private open: RawInterval | null = null;
  private readonly closed: RawInterval[] = [];
  /** Closed intervals already handed out by `settle`: they merge with nothing any more. */
  private settled = 0;

  constructor(private readonly mergeGap: number) {}

  /** The state holds at `t`; `measure` is how strongly, `value` the watched quantity. */
  on(t: number, measure: number, value: number): void {
    if (this.open !== null) {
      if (measure > this.open.worst) this.open.worst = measure;
      return;
    }
    const last = this.closed[this.closed.length - 1];
    if (last !== undefined && this.closed.length > this.settled && t - last.end <= this.mergeGap) {
      this.open = this.closed.pop()!;
      this.open.fragments++;
      if (measure > this.open.worst) this.open.worst = measure;
    } else {
      this.open = { start: t, end: t, worst: measure, startValue: value, endValue: value, fragments: 1 };
    }
  }

  /** The state does not hold at `t` (the first solution out of it); `value` is the watched quantity there. */
  off(t: number, value: number): void {
    if (this.open === null) return;
    this.open.end = t;
    this.open.endValue = value;
    this.closed.push(this.open);
    this.open = null;
  }

  /**
   * Hand each closed interval that ended at or before `t` to `each`, once. Called with `t` a
   * merge gap before the latest solution, these are final: no later fragment can join them.
   */
  settle(t: number, each: (interval: RawInterval) => void): void {
    while (this.settled < this.closed.length && this.closed[this.settled].end <= t) each(this.closed[this.settled++]);
  }

  /** All intervals, an open one closed at `end`; those shorter than `minDuration` dropped. */
  finish(end: number, value: number, minDuration: number): RawInterval[] {
    this.off(end, value);
    return this.closed.filter((i) => i.end - i.start >= minDuration);
  }
}
