import { Assembly } from './assembly.ts';
import { SparsePattern } from './sparse-pattern.ts';
import { SparseLu } from './sparse-lu.ts';

/**
 * The sparse system: entries stored by a `SparsePattern`, so assembly and every layer cost
 * the number of entries, never n². The pattern is found by stamping: an entry outside it is
 * held aside and merged in at the next `settle` (the first steps, and a part entering a new
 * piece such as an amplifier reaching a rail). Between growths nothing is allocated.
 */
export class SparseSystem extends Assembly {
  readonly pattern: SparsePattern;
  values: Float64Array;
  /** Entries stamped outside the pattern since the last settle, by row·size + col. */
  private readonly pending = new Map<number, number>();

  constructor(size: number) {
    super(size);
    this.pattern = new SparsePattern(size);
    this.values = new Float64Array(this.pattern.count);
  }

  add(row: number, col: number, value: number): void {
    if (row < 0 || col < 0) return;
    const slot = this.pattern.slot(row, col);
    if (slot >= 0) {
      this.values[slot] += value;
      return;
    }
    const key = row * this.size + col;
    this.pending.set(key, (this.pending.get(key) ?? 0) + value);
  }

  override settle(): void {
    if (this.pending.size === 0) return;
    const keys = [...this.pending.keys()];
    const moved = this.pattern.grow(keys);
    const remap = (old: Float64Array): Float64Array => {
      const grown = new Float64Array(this.pattern.count);
      for (let p = 0; p < old.length; p++) grown[moved[p]] = old[p];
      return grown;
    };
    this.values = remap(this.values);
    for (let k = 0; k < this.layers.length; k++) if (this.layers[k] !== undefined) this.layers[k] = remap(this.layers[k]);
    for (const [key, value] of this.pending) {
      const col = key % this.size;
      this.values[this.pattern.slot((key - col) / this.size, col)] += value;
    }
    this.pending.clear();
  }

  factorization(): SparseLu {
    return new SparseLu(this);
  }
}
