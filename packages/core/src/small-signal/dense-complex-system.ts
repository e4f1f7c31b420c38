import { ComplexLu } from './complex-lu.ts';
import type { ComplexSystem } from './complex-system.ts';

/** The complex system stored dense: row-major, real and imaginary parts in separate typed arrays. */
export class DenseComplexSystem implements ComplexSystem {
  readonly re: Float64Array;
  readonly im: Float64Array;
  readonly bRe: Float64Array;
  readonly bIm: Float64Array;
  private readonly lu: ComplexLu;

  constructor(readonly size: number) {
    this.re = new Float64Array(size * size);
    this.im = new Float64Array(size * size);
    this.bRe = new Float64Array(size);
    this.bIm = new Float64Array(size);
    this.lu = new ComplexLu(size);
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

  clear(): void {
    this.re.fill(0);
    this.im.fill(0);
    this.bRe.fill(0);
    this.bIm.fill(0);
  }

  factor(): number {
    return this.lu.factor(this.re, this.im);
  }

  solve(xRe: Float64Array, xIm: Float64Array): void {
    this.lu.solve(this.bRe, this.bIm, xRe, xIm);
  }

  solveTransposed(bRe: Float64Array, bIm: Float64Array, xRe: Float64Array, xIm: Float64Array): void {
    this.lu.solveTransposed(bRe, bIm, xRe, xIm);
  }
}
