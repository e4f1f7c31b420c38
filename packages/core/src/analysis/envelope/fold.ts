import type { CircuitRun } from '../run-circuit.ts';

/**
 * Lowest and highest value per probe and output row, and lowest and highest code per ADC
 * and conversion, over a set of runs (probes and ADCs in the circuit's order). Minimum and
 * maximum do not depend on the order runs arrive in, so bounds folded in any split (one
 * worker or many) are bit for bit the same.
 */
export interface EnvelopeBounds {
  readonly min: readonly Float64Array[];
  readonly max: readonly Float64Array[];
  readonly codeMin: readonly Int32Array[];
  readonly codeMax: readonly Int32Array[];
  /** Runs folded in. */
  readonly runs: number;
}

/** Folds runs of one circuit (same output grid, same conversions) into `EnvelopeBounds`. */
export class EnvelopeFold {
  readonly #min: Float64Array[];
  readonly #max: Float64Array[];
  readonly #codeMin: Int32Array[];
  readonly #codeMax: Int32Array[];
  #runs = 0;

  /** `conversions`: how many codes each ADC returns in a run. */
  constructor(
    private readonly probes: readonly string[],
    private readonly rows: number,
    conversions: readonly number[],
  ) {
    this.#min = probes.map(() => new Float64Array(rows).fill(Infinity));
    this.#max = probes.map(() => new Float64Array(rows).fill(-Infinity));
    this.#codeMin = conversions.map((n) => new Int32Array(n).fill(2 ** 31 - 1));
    this.#codeMax = conversions.map((n) => new Int32Array(n).fill(-(2 ** 31)));
  }

  add(run: CircuitRun): void {
    const { transient, adcs } = run;
    if (transient.time.length !== this.rows) throw new Error(`internal: a varied run has ${transient.time.length} rows, the nominal ${this.rows}`);
    this.probes.forEach((probe, p) => {
      const column = transient.columns.get(probe)!;
      widen(this.#min[p], this.#max[p], column, column);
    });
    adcs.forEach((adc, a) => {
      if (adc.code.length !== this.#codeMin[a].length) throw new Error(`internal: ADC ${adc.spec.name} returned ${adc.code.length} codes in a varied run, ${this.#codeMin[a].length} in the nominal`);
      widen(this.#codeMin[a], this.#codeMax[a], adc.code, adc.code);
    });
    this.#runs++;
  }

  merge(bounds: EnvelopeBounds): void {
    this.probes.forEach((_, p) => widen(this.#min[p], this.#max[p], bounds.min[p], bounds.max[p]));
    this.#codeMin.forEach((min, a) => widen(min, this.#codeMax[a], bounds.codeMin[a], bounds.codeMax[a]));
    this.#runs += bounds.runs;
  }

  bounds(): EnvelopeBounds {
    return { min: this.#min, max: this.#max, codeMin: this.#codeMin, codeMax: this.#codeMax, runs: this.#runs };
  }
}

function widen<T extends Float64Array | Int32Array>(min: T, max: T, low: ArrayLike<number>, high: ArrayLike<number>): void {
  for (let i = 0; i < min.length; i++) {
    if (low[i] < min[i]) min[i] = low[i];
    if (high[i] > max[i]) max[i] = high[i];
  }
}
