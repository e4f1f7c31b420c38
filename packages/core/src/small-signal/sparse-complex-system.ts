import { SparseSystem } from '../solver/sparse-system.ts';
import type { SparseLu } from '../solver/sparse-lu.ts';
import type { ComplexSystem } from './complex-system.ts';

/**
 * The complex system stored sparse, as its real equivalent of twice the size:
 * (A + jB)(x + jy) = c + jd is [[A, -B], [B, A]]·[x; y] = [c; d] (a textbook identity). So the
 * transient's sparse matrix, ordering and LU serve the frequency sweep unchanged, and the cost
 * per frequency follows the circuit's entries, not the square of its size. Every stamp fills
 * all four blocks, zeros included, so the pattern is the same at every frequency and the
 * ordering and pivot sequence are found once.
 */
export class SparseComplexSystem implements ComplexSystem {
  readonly bRe: Float64Array;
  readonly bIm: Float64Array;
  private readonly real: SparseSystem;
  private readonly lu: SparseLu;
  private readonly b: Float64Array;
  private readonly x: Float64Array;

  constructor(readonly size: number) {
    this.bRe = new Float64Array(size);
    this.bIm = new Float64Array(size);
    this.real = new SparseSystem(2 * size);
    this.lu = this.real.factorization();
    this.b = new Float64Array(2 * size);
    this.x = new Float64Array(2 * size);
  }

  add(row: number, col: number, re: number, im = 0): void {
    if (row < 0 || col < 0) return;
    const n = this.size;
    this.real.add(row, col, re);
    this.real.add(row + n, col + n, re);
    this.real.add(row, col + n, -im);
    this.real.add(row + n, col, im);
  }

  rhs(row: number, re: number, im = 0): void {
    if (row < 0) return;
    this.bRe[row] += re;
    this.bIm[row] += im;
  }

  clear(): void {
    this.real.values.fill(0);
    this.bRe.fill(0);
    this.bIm.fill(0);
  }

  factor(): number {
    const k = this.lu.factor();
    return k < 0 ? k : k % this.size;
  }

  solve(xRe: Float64Array, xIm: Float64Array): void {
    const n = this.size;
    this.b.set(this.bRe, 0);
    this.b.set(this.bIm, n);
    this.lu.solve(this.b, this.x);
    xRe.set(this.x.subarray(0, n));
    xIm.set(this.x.subarray(n));
  }

  /**
   * Yᵀ·z = c is the conjugate system Yᴴ·z̄ = c̄, and Yᴴ's real equivalent is the transpose of
   * Y's: so one transposed real solve with the imaginary parts negated on the way in and out.
   */
  solveTransposed(bRe: Float64Array, bIm: Float64Array, xRe: Float64Array, xIm: Float64Array): void {
    const n = this.size;
    const b = this.b;
    for (let i = 0; i < n; i++) {
      b[i] = bRe[i];
      b[n + i] = -bIm[i];
    }
    this.lu.solveTransposed(b, this.x);
    for (let i = 0; i < n; i++) {
      xRe[i] = this.x[i];
      xIm[i] = -this.x[n + i];
    }
  }
}
