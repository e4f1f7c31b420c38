import type { Mna } from '../parts/device.ts';

/** A factorization of an assembly's matrix, reused for as many solves as the matrix allows. */
export interface Factorization {
  /**
   * Factor the assembly's current matrix. Returns -1 on success, or the unknown that the
   * equations leave undetermined (the column with no usable pivot).
   */
  factor(): number;
  /** `x = A⁻¹·b` with the last factorization; `b` is left unchanged. */
  solve(b: Float64Array, x: Float64Array): void;
}

/**
 * The system `G·x = b` that devices stamp into, dense or sparse, with numbered layers: saved
 * copies of the matrix entries that the equations restore instead of stamping again.
 */
export abstract class Assembly implements Mna {
  readonly b: Float64Array;
  /** The matrix entries in the storage's own order. */
  abstract readonly values: Float64Array;
  protected readonly layers: Float64Array[] = [];

  constructor(readonly size: number) {
    this.b = new Float64Array(size);
  }

  abstract add(row: number, col: number, value: number): void;
  /** A new factorization of this assembly's matrix (it reads the entries when it factors). */
  abstract factorization(): Factorization;
  /** Bring entries stamped outside the known storage into it (sparse patterns grow). */
  settle(): void {}

  rhs(row: number, value: number): void {
    if (row >= 0) this.b[row] += value;
  }

  /** Copy the matrix into layer `k`. */
  save(k: number): void {
    this.settle();
    const values = this.values;
    if (this.layers[k]?.length !== values.length) this.layers[k] = new Float64Array(values.length);
    this.layers[k].set(values);
  }

  /** Replace the matrix by layer `k`. */
  load(k: number): void {
    this.settle();
    this.values.set(this.layers[k]);
  }

  /** True when the matrix equals layer `k` entry for entry. */
  equals(k: number): boolean {
    this.settle();
    const a = this.values;
    const b = this.layers[k];
    if (b === undefined || b.length !== a.length) return false;
    for (let i = 0; i < a.length; i++) if (a[i] !== b[i]) return false;
    return true;
  }
}
