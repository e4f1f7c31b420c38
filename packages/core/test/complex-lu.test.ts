import { describe, expect, it } from 'vitest';
import { Matrix, solve } from 'ml-matrix';
import { ComplexLu } from '../src/small-signal/complex-lu.ts';
import { uniformNoise } from './support/lcg.ts';

/** A (or Aᵀ) + jB as the real system [[A, -B], [B, A]] of twice the size. */
function realEquivalent(aRe: Float64Array, aIm: Float64Array, n: number, transposed: boolean): Matrix {
  return new Matrix(
    Array.from({ length: 2 * n }, (_, r) =>
      Array.from({ length: 2 * n }, (_, c) => {
        const [i, j] = transposed ? [c % n, r % n] : [r % n, c % n];
        const re = aRe[i * n + j];
        const im = aIm[i * n + j];
        return r < n ? (c < n ? re : -im) : c < n ? im : re;
      }),
    ),
  );
}

describe('complex LU against ml-matrix (reference library from the npm registry)', () => {
  // (A + jB)(x + jy) = c + jd is the real system [[A, -B], [B, A]]·[x; y] = [c; d] of twice
  // the size (a textbook identity), which ml-matrix solves.
  // Aᵀ's real equivalent is the transpose of A's: the same identity checks the adjoint solve.
  it.each([
    [1, false],
    [3, false],
    [8, false],
    [30, false],
    [1, true],
    [4, true],
    [12, true],
  ])('solves a random complex system of size %i (transposed: %s) like ml-matrix on the real equivalent, within 1e-10', (n, transposed) => {
    const random = uniformNoise((transposed ? 300 : 100) + n);
    const aRe = Float64Array.from({ length: n * n }, random);
    const aIm = Float64Array.from({ length: n * n }, random);
    const bRe = Float64Array.from({ length: n }, random);
    const bIm = Float64Array.from({ length: n }, random);
    const lu = new ComplexLu(n);
    expect(lu.factor(aRe, aIm)).toBe(-1);
    const xRe = new Float64Array(n);
    const xIm = new Float64Array(n);
    if (transposed) lu.solveTransposed(bRe, bIm, xRe, xIm);
    else lu.solve(bRe, bIm, xRe, xIm);
    const reference = solve(realEquivalent(aRe, aIm, n, transposed), Matrix.columnVector([...bRe, ...bIm]));
    for (let i = 0; i < n; i++) {
      expect(Math.abs(xRe[i] - reference.get(i, 0))).toBeLessThan(1e-10 * Math.max(1, Math.abs(reference.get(i, 0))));
      expect(Math.abs(xIm[i] - reference.get(n + i, 0))).toBeLessThan(1e-10 * Math.max(1, Math.abs(reference.get(n + i, 0))));
    }
  });

  it('pivots on the entry of largest modulus: a purely imaginary one off the diagonal', () => {
    // [[0, j], [1, 0]]·x = [1, 2]: x = [2, -j] (by hand).
    const lu = new ComplexLu(2);
    expect(lu.factor(Float64Array.of(0, 0, 1, 0), Float64Array.of(0, 1, 0, 0))).toBe(-1);
    const xRe = new Float64Array(2);
    const xIm = new Float64Array(2);
    lu.solve(Float64Array.of(1, 2), Float64Array.of(0, 0), xRe, xIm);
    expect([...xRe, ...xIm]).toEqual([2, 0, 0, -1]);
  });

  it('reports the column a singular matrix leaves undetermined', () => {
    // The second column is j times the first: no pivot left in column 1.
    const lu = new ComplexLu(2);
    expect(lu.factor(Float64Array.of(1, 0, 2, 0), Float64Array.of(0, 1, 0, 2))).toBe(1);
  });
});
