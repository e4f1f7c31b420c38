import type { ComplexMna } from '../parts/device.ts';

/**
 * The complex system `Y·x = b` that devices stamp into at one frequency: row-major, real and
 * imaginary parts in separate typed arrays, ground rows and columns dropped.
 */
export class ComplexSystem implements ComplexMna {
  readonly re: Float64Array;
  readonly im: Float64Array;
  readonly bRe: Float64Array;
  readonly bIm: Float64Array;

  constructor(readonly size: number) {
    this.re = new Float64Array(size * size);
    this.im = new Float64Array(size * size);
    this.bRe = new Float64Array(size);
    this.bIm = new Float64Array(size);
  }

  add(row: number, col: number, re: number, im = 0): void {
    if (row < 0 || col < 0) return;
    const k = row * this.size + col;
    this.re[k] += re;
    this.im[k] += im;
  }

  rhs(row: number, re: number, im = 0): void {
    if (row < 0) return;
    this.bRe[row] += re;
    this.bIm[row] += im;
  }

  /** Zero the matrix and the right-hand side before the next assembly. */
  clear(): void {
    this.re.fill(0);
    this.im.fill(0);
    this.bRe.fill(0);
    this.bIm.fill(0);
  }
}
