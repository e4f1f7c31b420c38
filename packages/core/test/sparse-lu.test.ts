import { describe, expect, it } from 'vitest';
import { lusolve, slu, sparse } from 'mathjs';
import { SparseSystem } from '../src/solver/sparse-system.ts';
import { minimumDegreeOrder } from '../src/solver/minimum-degree.ts';
import { SparsePattern } from '../src/solver/sparse-pattern.ts';
import type { SparseLu } from '../src/solver/sparse-lu.ts';
import { uniformNoise } from './support/lcg.ts';

interface Entry {
  row: number;
  col: number;
  value: number;
}

/**
 * A random sparse system shaped like modified nodal equations: a conductance-like block
 * with a few entries per column, plus `branches` voltage-defined branches whose rows and
 * columns have a zero diagonal, so that rows must be exchanged.
 */
function randomSystem(seed: number, nodes: number, branches: number): { n: number; entries: Entry[]; b: Float64Array } {
  const random = uniformNoise(seed);
  const n = nodes + branches;
  const entries: Entry[] = [];
  const pick = () => Math.floor((random() + 0.5) * nodes);
  for (let i = 0; i < nodes; i++) {
    entries.push({ row: i, col: i, value: 1 + random() });
    for (let e = 0; e < 2; e++) {
      const j = pick();
      if (j !== i) entries.push({ row: i, col: j, value: random() }, { row: j, col: i, value: random() });
    }
  }
  for (let k = nodes; k < n; k++) {
    const a = pick();
    const c = (a + 1 + Math.floor((random() + 0.5) * (nodes - 1))) % nodes;
    entries.push({ row: a, col: k, value: 1 }, { row: c, col: k, value: -1 }, { row: k, col: a, value: 1 }, { row: k, col: c, value: -1 });
  }
  return { n, entries, b: Float64Array.from({ length: n }, random) };
}

function stamp(system: SparseSystem, entries: readonly Entry[]): void {
  system.values.fill(0);
  for (const e of entries) system.add(e.row, e.col, e.value);
  system.settle();
}

/** mathjs's sparse LU (`slu` with its own column ordering, then `lusolve`): the reference library from the npm registry. */
function reference(n: number, entries: readonly Entry[], b: Float64Array): number[] {
  const dense = Array.from({ length: n }, () => new Array<number>(n).fill(0));
  for (const e of entries) dense[e.row][e.col] += e.value;
  const solution = lusolve(slu(sparse(dense), 1, 1), Array.from(b)) as unknown as { valueOf(): number[][] };
  return solution.valueOf().map((row) => row[0]);
}

function expectClose(x: Float64Array, expected: readonly number[], tolerance: number): void {
  for (let i = 0; i < expected.length; i++) expect(Math.abs(x[i] - expected[i])).toBeLessThan(tolerance * Math.max(1, Math.abs(expected[i])));
}

describe('sparse LU against mathjs slu/lusolve (reference library from the npm registry)', () => {
  it.each([
    [1, 20, 0],
    [2, 60, 8],
    [3, 150, 30],
    [4, 400, 40],
  ])('random system %i: %i nodes, %i zero-diagonal branches, within 1e-10', (seed, nodes, branches) => {
    const { n, entries, b } = randomSystem(seed, nodes, branches);
    const system = new SparseSystem(n);
    stamp(system, entries);
    const lu = system.factorization();
    expect(lu.factor()).toBe(-1);
    const x = new Float64Array(n);
    lu.solve(b, x);
    expectClose(x, reference(n, entries, b), 1e-10);
  });

  it.each([
    [6, 30, 4],
    [7, 200, 25],
  ])('solves the transposed system %i (%i nodes, %i branches) like mathjs on the transposed matrix, within 1e-10', (seed, nodes, branches) => {
    const { n, entries, b } = randomSystem(seed, nodes, branches);
    const system = new SparseSystem(n);
    stamp(system, entries);
    const lu = system.factorization() as SparseLu;
    expect(lu.factor()).toBe(-1);
    const x = new Float64Array(n);
    lu.solveTransposed(b, x);
    const transposed = entries.map((e) => ({ row: e.col, col: e.row, value: e.value }));
    expectClose(x, reference(n, transposed, b), 1e-10);
  });

  it('refactors new values on the kept pivot sequence and still matches', () => {
    const { n, entries, b } = randomSystem(5, 80, 10);
    const system = new SparseSystem(n);
    stamp(system, entries);
    const lu = system.factorization();
    expect(lu.factor()).toBe(-1);
    const random = uniformNoise(55);
    // Same pattern, new conductances (the branch incidences stay ±1): a refactorization.
    const changed = entries.map((e) => (e.row < 80 && e.col < 80 ? { ...e, value: e.value * (1 + 0.2 * random()) } : e));
    stamp(system, changed);
    expect(lu.factor()).toBe(-1);
    const x = new Float64Array(n);
    lu.solve(b, x);
    expectClose(x, reference(n, changed, b), 1e-10);
  });

  it('takes a fresh pivot sequence when a kept pivot falls to zero', () => {
    // [[1, 1], [1, 0]] pivots on the diagonal first; then the (0,0) entry goes to 0.
    const system = new SparseSystem(2);
    const lu = system.factorization();
    const x = new Float64Array(2);
    stamp(system, [{ row: 0, col: 0, value: 1 }, { row: 0, col: 1, value: 1 }, { row: 1, col: 0, value: 1 }]);
    expect(lu.factor()).toBe(-1);
    stamp(system, [{ row: 0, col: 0, value: 0 }, { row: 0, col: 1, value: 2 }, { row: 1, col: 0, value: 3 }]);
    expect(lu.factor()).toBe(-1);
    lu.solve(Float64Array.of(4, 6), x);
    // 2·x1 = 4, 3·x0 = 6 (worked by hand).
    expect(Array.from(x)).toEqual([2, 2]);
  });

  it('judges each pivot against its own column: a 1e20 column leaves the others solvable (was refused as singular)', () => {
    const entries = [
      { row: 0, col: 0, value: 2e20 },
      { row: 1, col: 0, value: -1e20 },
      { row: 0, col: 1, value: -1e-3 },
      { row: 1, col: 1, value: 2e-3 },
      { row: 2, col: 1, value: -1e-3 },
      { row: 1, col: 2, value: -1e-3 },
      { row: 2, col: 2, value: 2e-3 },
    ];
    const b = Float64Array.of(1, 0, 1e-3);
    const system = new SparseSystem(3);
    stamp(system, entries);
    const lu = system.factorization();
    expect(lu.factor()).toBe(-1);
    const x = new Float64Array(3);
    lu.solve(b, x);
    const expected = reference(3, entries, b);
    for (let i = 0; i < 3; i++) expect(Math.abs(x[i] / expected[i] - 1)).toBeLessThan(1e-12);
  });

  it('reports the unknown a singular matrix leaves undetermined, by its own index', () => {
    // Unknown 2 appears in no equation: its column is empty whatever the order.
    const system = new SparseSystem(4);
    stamp(system, [
      { row: 0, col: 0, value: 2 },
      { row: 1, col: 1, value: 1 },
      { row: 0, col: 1, value: -1 },
      { row: 3, col: 3, value: 1 },
      { row: 2, col: 3, value: 1 },
    ]);
    expect(system.factorization().factor()).toBe(2);
  });
});

/** Fill-in of eliminating the graph of `pattern` + its transpose in `order`, counted by eliminating it (common practice). */
function fillOf(pattern: SparsePattern, order: ArrayLike<number>): number {
  const n = pattern.size;
  const adjacent = Array.from({ length: n }, () => new Set<number>());
  for (let j = 0; j < n; j++) {
    for (let p = pattern.colStart[j]; p < pattern.colStart[j + 1]; p++) {
      const i = pattern.rows[p];
      if (i !== j) {
        adjacent[i].add(j);
        adjacent[j].add(i);
      }
    }
  }
  let fill = 0;
  for (let k = 0; k < n; k++) {
    const v = order[k];
    const neighbours = [...adjacent[v]];
    for (const a of neighbours) {
      adjacent[a].delete(v);
      for (const b of neighbours) {
        if (a < b && !adjacent[a].has(b)) {
          adjacent[a].add(b);
          adjacent[b].add(a);
          fill++;
        }
      }
    }
  }
  return fill;
}

function natural(n: number): Int32Array {
  return Int32Array.from({ length: n }, (_, i) => i);
}

describe('approximate minimum degree order', () => {
  it('orders every unknown once, with far less fill than the natural order', () => {
    const { n, entries } = randomSystem(7, 300, 20);
    const system = new SparseSystem(n);
    stamp(system, entries);
    const order = minimumDegreeOrder(system.pattern);
    expect(new Set(order).size).toBe(n);
    expect(fillOf(system.pattern, order)).toBeLessThan(0.5 * fillOf(system.pattern, natural(n)));
  });

  it('puts an arrow matrix hub last: no fill, where hub first fills everything', () => {
    // Common practice: ordering the dense row and column of an arrow matrix last gives no fill.
    const n = 30;
    const pattern = new SparsePattern(n);
    pattern.grow(Array.from({ length: n - 1 }, (_, i) => [0 * n + (i + 1), (i + 1) * n + 0]).flat());
    expect(fillOf(pattern, natural(n))).toBe(((n - 1) * (n - 2)) / 2);
    expect(fillOf(pattern, minimumDegreeOrder(pattern))).toBe(0);
  });

  it('orders a grid with less fill than the natural (banded) order', () => {
    // A 20×20 five-point grid: the natural order fills the band, about side³ entries.
    const side = 20;
    const n = side * side;
    const pattern = new SparsePattern(n);
    const keys: number[] = [];
    for (let r = 0; r < side; r++) {
      for (let c = 0; c < side; c++) {
        const i = r * side + c;
        if (c + 1 < side) keys.push(i * n + i + 1, (i + 1) * n + i);
        if (r + 1 < side) keys.push(i * n + i + side, (i + side) * n + i);
      }
    }
    pattern.grow(keys);
    expect(fillOf(pattern, minimumDegreeOrder(pattern))).toBeLessThan(0.6 * fillOf(pattern, natural(n)));
  });
});
