import type { Mna } from '../parts/device.ts';

/** The dense system `G·x = b` that devices stamp into; row-major, ground rows dropped. */
export class MnaSystem implements Mna {
  readonly matrix: Float64Array;
  readonly b: Float64Array;
  constructor(readonly size: number) {
    this.matrix = new Float64Array(size * size);
    this.b = new Float64Array(size);
  }
  add(row: number, col: number, value: number): void {
    if (row >= 0 && col >= 0) this.matrix[row * this.size + col] += value;
  }
  rhs(row: number, value: number): void {
    if (row >= 0) this.b[row] += value;
  }
}
