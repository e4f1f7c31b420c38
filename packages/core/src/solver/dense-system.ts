import { Assembly, type Factorization } from './assembly.ts';
import { LuSolver } from './lu.ts';

/** The dense system: an n×n row-major matrix. Fastest for small circuits. */
export class DenseSystem extends Assembly {
  readonly values: Float64Array;

  constructor(size: number) {
    super(size);
    this.values = new Float64Array(size * size);
  }

  add(row: number, col: number, value: number): void {
    if (row >= 0 && col >= 0) this.values[row * this.size + col] += value;
  }

  factorization(): Factorization {
    const lu = new LuSolver(this.size);
    return {
      factor: () => lu.factor(this.values),
      solve: (b, x) => lu.solve(b, x),
    };
  }
}
