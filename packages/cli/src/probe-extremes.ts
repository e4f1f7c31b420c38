/** Smallest, largest and last value of one probe over a run. */
export interface ProbeExtremes {
  readonly probe: string;
  readonly min: number;
  readonly max: number;
  readonly final: number;
}

/**
 * Per-probe minimum, maximum and final value, gathered row by row so that the run need not
 * keep its columns in memory.
 */
export class ExtremesTracker {
  readonly #probes: readonly string[];
  readonly #min: Float64Array;
  readonly #max: Float64Array;
  readonly #last: Float64Array;

  constructor(probes: readonly string[]) {
    this.#probes = probes;
    this.#min = new Float64Array(probes.length).fill(Infinity);
    this.#max = new Float64Array(probes.length).fill(-Infinity);
    this.#last = new Float64Array(probes.length).fill(NaN);
  }

  add(values: Float64Array): void {
    for (let i = 0; i < values.length; i++) {
      const v = values[i];
      if (v < this.#min[i]) this.#min[i] = v;
      if (v > this.#max[i]) this.#max[i] = v;
      this.#last[i] = v;
    }
  }

  results(): ProbeExtremes[] {
    return this.#probes.map((probe, i) => ({ probe, min: this.#min[i], max: this.#max[i], final: this.#last[i] }));
  }
}
