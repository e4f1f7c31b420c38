import type { CircuitRun } from '../run-circuit.ts';

/**
 * Lowest and highest value per recorded node and output row, and lowest and highest code per ADC
 * and conversion, over a set of runs (recorded and ADCs in the circuit's order). Minimum and
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
    private readonly recorded: readonly string[],
    private readonly rows: number,
    conversions: readonly number[],
  ) {
    this.#min = recorded.map(() => new Float64Array(rows).fill(Infinity));
    this.#max = recorded.map(() => new Float64Array(rows).fill(-Infinity));
    this.#codeMin = conversions.map((n) => new Int32Array(n).fill(2 ** 31 - 1));
    this.#codeMax = conversions.map((n) => new Int32Array(n).fill(-(2 ** 31)));
  }

  add(run: CircuitRun): void {
    const { transient, adcs } = run;
    if (transient.time.length !== this.rows) throw new Error(`internal: a varied run has ${transient.time.length} rows, the nominal ${this.rows}`);
    this.recorded.forEach((node, p) => {
      const column = transient.columns.get(node)!;
      widen(this.#min[p], this.#max[p], column, column);
    });
    adcs.forEach((adc, a) => {
      if (adc.code.length !== this.#codeMin[a].length) throw new Error(`internal: ADC ${adc.spec.name} returned ${adc.code.length} codes in a varied run, ${this.#codeMin[a].length} in the nominal`);
      widen(this.#codeMin[a], this.#codeMax[a], adc.code, adc.code);
    });
    this.#runs++;
  }

  merge(bounds: EnvelopeBounds): void {
    this.recorded.forEach((_, p) => widen(this.#min[p], this.#max[p], bounds.min[p], bounds.max[p]));
    this.#codeMin.forEach((min, a) => widen(min, this.#codeMax[a], bounds.codeMin[a], bounds.codeMax[a]));
    this.#runs += bounds.runs;
  }

  bounds(): EnvelopeBounds {
    return { min: this.#min, max: this.#max, codeMin: this.#codeMin, codeMax: this.#codeMax, runs: this.#runs };
  }
}

/**
 * Fold partial bounds of one plan (from worker slices or from shards run on other machines)
 * into one. Empty parts (no runs) are skipped; the result does not depend on their order.
 */
export function mergeBounds(parts: readonly EnvelopeBounds[]): EnvelopeBounds {
  const filled = parts.filter((part) => part.runs > 0);
  if (filled.length === 0) return { min: [], max: [], codeMin: [], codeMax: [], runs: 0 };
  const [first, ...rest] = filled;
  const copy = <T extends Float64Array | Int32Array>(arrays: readonly T[]) => arrays.map((a) => a.slice() as T);
  const merged = { min: copy(first.min), max: copy(first.max), codeMin: copy(first.codeMin), codeMax: copy(first.codeMax), runs: first.runs };
  for (const part of rest) {
    merged.min.forEach((min, p) => widen(min, merged.max[p], part.min[p], part.max[p]));
    merged.codeMin.forEach((min, a) => widen(min, merged.codeMax[a], part.codeMin[a], part.codeMax[a]));
    merged.runs += part.runs;
  }
  return merged;
}

function widen<T extends Float64Array | Int32Array>(min: T, max: T, low: ArrayLike<number>, high: ArrayLike<number>): void {
  for (let i = 0; i < min.length; i++) {
    if (low[i] < min[i]) min[i] = low[i];
    if (high[i] > max[i]) max[i] = high[i];
  }
}
