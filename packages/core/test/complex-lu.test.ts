import { describe, expect, it } from 'vitest';
import { Matrix, solve } from 'ml-matrix';
import { ComplexLu } from '../src/small-signal/complex-lu.ts';
import { uniformNoise } from './support/lcg.ts';

describe('complex LU against ml-matrix (reference library from the npm registry)', () => {
  // (A + jB)(x + jy) = c + jd is the real system [[A, -B], [B, A]]·[x; y] = [c; d] of twice
  // the size (a textbook identity), which ml-matrix solves.
  it.each([1, 3, 8, 30])('solves a random complex system of size %i like ml-matrix on the real equivalent, within 1e-10', (n) => {
    const random = uniformNoise(100 + n);
    const aRe = Float64Array.from({ length: n * n }, random);
    const aIm = Float64Array.from({ length: n * n }, random);
    const bRe = Float64Array.from({ length: n }, random);
    const bIm = Float64Array.from({ length: n }, random);
    const lu = new ComplexLu(n);
    expect(lu.factor(aRe, aIm)).toBe(-1);
    const xRe = new Float64Array(n);
    const xIm = new Float64Array(n);
    lu.solve(bRe, bIm, xRe, xIm);
    const real = Array.from({ length: 2 * n }, (_, r) =>
      Array.from({ length: 2 * n }, (_, c) => {
        const [i, j] = [r % n, c % n];
        const re = aRe[i * n + j];
        const im = aIm[i * n + j];
        return r < n ? (c < n ? re : -im) : c < n ? im : re;
      }),
    );
    const reference = solve(new Matrix(real), Matrix.columnVector([...bRe, ...bIm]));
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
