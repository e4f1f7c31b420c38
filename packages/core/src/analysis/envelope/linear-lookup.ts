/**
 * Linear interpolation in a sampled trace (times increasing). Lookups at increasing times
 * walk forward from the last position, so a pass over a whole trace is linear in its length.
 */
export class LinearLookup {
  #i = 0;

  constructor(
    private readonly time: ArrayLike<number>,
    private readonly values: ArrayLike<number>,
  ) {}

  /** Row index r with time[r] <= t < time[r + 1] (clamped to the ends). */
  row(t: number): number {
    const { time } = this;
    const last = time.length - 1;
    if (this.#i > last || time[this.#i] > t) this.#i = 0;
    while (this.#i < last - 1 && time[this.#i + 1] <= t) this.#i++;
    return this.#i;
  }

  at(t: number): number {
    const r = this.row(t);
    const { time, values } = this;
    if (time.length === 1) return values[0];
    const t0 = time[r];
    const t1 = time[r + 1];
    const f = t1 > t0 ? Math.min(1, Math.max(0, (t - t0) / (t1 - t0))) : 0;
    return values[r] + f * (values[r + 1] - values[r]);
  }
}
