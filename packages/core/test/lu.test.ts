import { describe, expect, it } from 'vitest';
import { Matrix, solve } from 'ml-matrix';
import { LuSolver } from '../src/solver/lu.ts';
import { uniformNoise } from './support/lcg.ts';


describe('in-place LU against ml-matrix (reference library from the npm registry)', () => {
  it.each([2, 5, 12, 40])('solves random systems of %i unknowns like ml-matrix within 1e-10', (n) => {
    const random = uniformNoise(n);
    const a = Float64Array.from({ length: n * n }, random);
    const b = Float64Array.from({ length: n }, random);
    const lu = new LuSolver(n);
    expect(lu.factor(a)).toBe(-1);
    const x = new Float64Array(n);
    lu.solve(b, x);
    const reference = solve(new Matrix(Array.from({ length: n }, (_, r) => Array.from(a.subarray(r * n, r * n + n)))), Matrix.columnVector(Array.from(b)));
    for (let i = 0; i < n; i++) expect(Math.abs(x[i] - reference.get(i, 0))).toBeLessThan(1e-10 * Math.max(1, Math.abs(reference.get(i, 0))));
  });

  it('needs row interchanges: a zero on the diagonal', () => {
    const lu = new LuSolver(2);
    expect(lu.factor(Float64Array.of(0, 1, 1, 0))).toBe(-1);
    const x = new Float64Array(2);
    lu.solve(Float64Array.of(3, 4), x);
    expect(Array.from(x)).toEqual([4, 3]);
  });

  it('judges each pivot against its own column: a 1e20 column leaves the others solvable (was refused as singular)', () => {
    // A huge capacitor's C/h beside millisiemens: against the matrix's largest entry every other
    // pivot looked like rounding; scaled column by column the system is well conditioned.
    const a = [2e20, -1e-3, 0, -1e20, 2e-3, -1e-3, 0, -1e-3, 2e-3];
    const b = [1, 0, 1e-3];
    const lu = new LuSolver(3);
    expect(lu.factor(Float64Array.from(a))).toBe(-1);
    const x = new Float64Array(3);
    lu.solve(Float64Array.from(b), x);
    const reference = solve(new Matrix([a.slice(0, 3), a.slice(3, 6), a.slice(6, 9)]), Matrix.columnVector(b));
    for (let i = 0; i < 3; i++) expect(Math.abs(x[i] / reference.get(i, 0) - 1)).toBeLessThan(1e-12);
  });

  it('reports the column a singular matrix leaves undetermined', () => {
    // Second and third columns equal: column 2 has no pivot left.
    const lu = new LuSolver(3);
    expect(lu.factor(Float64Array.of(1, 2, 2, 0, 1, 1, 3, 1, 1))).toBe(2);
  });
});
