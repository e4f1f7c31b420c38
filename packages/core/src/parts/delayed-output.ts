/** Flips that may wait out a comparator's delay at once; a longer burst loses its newest pairs. */
const PENDING = 64;

/**
 * The level of a comparator's output in time, 0 (low) to 1 (high): each decision of the input
 * stage takes effect `delay` later and moves the level at 1/`edge` per second (a jump with
 * `edge` 0). Flips still waiting out the delay sit in a ring of fixed size, so that a burst of
 * decisions shorter than the delay is delayed as a whole, as in a real part. The start of every
 * movement and its end are corners: the stepper lands on them.
 */
export class DelayedOutput {
  private readonly pending = new Float64Array(PENDING);
  private head = 0;
  private count = 0;
  /** The current movement: from `from` at time `since` towards `target`. */
  private since = 0;
  private from = 0;
  private target = 0;

  constructor(
    private readonly delay: number,
    private readonly edge: number,
  ) {}

  /** Hold `level` (0 or 1) with nothing pending: the state at the operating point. */
  hold(level: number): void {
    this.head = this.count = 0;
    this.since = 0;
    this.from = this.target = level;
  }

  /** The level at time t (within the current movement: t at or after the last flip taken). */
  level(t: number): number {
    if (!(t > this.since)) return this.from;
    if (this.edge === 0) return this.target;
    const moved = (t - this.since) / this.edge;
    return this.target > this.from ? Math.min(this.target, this.from + moved) : Math.max(this.target, this.from - moved);
  }

  /** The input decided anew at `crossing`; the step that found it ended at `now`. */
  decide(crossing: number, now: number): void {
    const at = Math.max(now, crossing + this.delay);
    if (this.count === PENDING) {
      // Full: the newest pending flip and this one cancel, keeping the final level right.
      this.count--;
      return;
    }
    this.pending[(this.head + this.count) % PENDING] = at;
    this.count++;
  }

  /** Take every pending flip due at or before `t` (an accepted step's end). */
  advance(t: number): void {
    while (this.count > 0 && this.pending[this.head] <= t) {
      const at = this.pending[this.head];
      this.from = this.level(at);
      this.since = at;
      this.target = 1 - this.target;
      this.head = (this.head + 1) % PENDING;
      this.count--;
    }
  }

  /** The first corner strictly after t: a pending flip, or the end of the current movement. */
  nextCorner(t: number): number {
    let corner = this.count > 0 && this.pending[this.head] > t ? this.pending[this.head] : Infinity;
    const end = this.since + Math.abs(this.target - this.from) * this.edge;
    if (end > t && end < corner) corner = end;
    return corner;
  }
}
