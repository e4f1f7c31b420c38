/** Smallest, largest and last value of one recorded node over a run. */
export interface NodeExtremes {
  readonly node: string;
  readonly min: number;
  readonly max: number;
  readonly final: number;
}

/**
 * Per-node minimum, maximum and final value, gathered row by row so that the run need not
 * keep its columns in memory.
 */
export class ExtremesTracker {
  readonly #recorded: readonly string[];
  readonly #min: Float64Array;
  readonly #max: Float64Array;
  readonly #last: Float64Array;

  constructor(recorded: readonly string[]) {
    this.#recorded = recorded;
    this.#min = new Float64Array(recorded.length).fill(Infinity);
    this.#max = new Float64Array(recorded.length).fill(-Infinity);
    this.#last = new Float64Array(recorded.length).fill(NaN);
  }

  add(values: Float64Array): void {
    for (let i = 0; i < values.length; i++) {
      const v = values[i];
      if (v < this.#min[i]) this.#min[i] = v;
      if (v > this.#max[i]) this.#max[i] = v;
      this.#last[i] = v;
    }
  }

  results(): NodeExtremes[] {
    return this.#recorded.map((node, i) => ({ node, min: this.#min[i], max: this.#max[i], final: this.#last[i] }));
  }
}
