import type { SparsePattern } from './sparse-pattern.ts';

/**
 * Fill-reducing elimination order for the pattern of A + Aᵀ: approximate minimum degree
 * (Amestoy, Davis and Duff, "An approximate minimum degree ordering algorithm", SIAM J.
 * Matrix Anal. Appl. 17(4), 1996) on the quotient graph, with element absorption and
 * aggressive absorption; supervariables are not detected, which costs speed on matrices
 * with many identical rows, not the order's quality on circuit matrices.
 *
 * The graph keeps, for every uneliminated variable, its variable neighbours and the elements
 * (eliminated variables) it touches; an element lists its variables. Eliminating p merges p's
 * elements into one element whose variables are p's reach; the degree of each of them is
 * bounded above as in the paper: min(n - k, d_old + |Lp \ i|, |Ai \ i| + |Lp \ i| + Σ |Le \ Lp|).
 *
 * Returns `order`, where `order[k]` is the k-th unknown to eliminate. Runs once per pattern.
 */
export function minimumDegreeOrder(pattern: SparsePattern): Int32Array {
  const n = pattern.size;
  const variables = symmetricNeighbours(pattern);
  const elements: number[][] = Array.from({ length: n }, () => []);
  const members: (number[] | null)[] = new Array(n).fill(null);
  /** 0 variable, 1 element, 2 absorbed into another element. */
  const state = new Uint8Array(n);
  const degree = Int32Array.from(variables, (v) => v.length);
  const buckets = new DegreeBuckets(n, degree);
  const mark = new Int32Array(n);
  let markValue = 0;
  const outside = new Int32Array(n);
  const outsideMark = new Int32Array(n);
  const order = new Int32Array(n);

  for (let k = 0; k < n; k++) {
    const p = buckets.popMinimum();
    order[k] = p;
    state[p] = 1;
    // Lp: the variables p reaches directly or through its elements, which p absorbs.
    markValue++;
    mark[p] = markValue;
    const reach: number[] = [];
    for (const v of variables[p]) {
      if (state[v] === 0 && mark[v] !== markValue) {
        mark[v] = markValue;
        reach.push(v);
      }
    }
    for (const e of elements[p]) {
      if (state[e] !== 1) continue;
      for (const v of members[e]!) {
        if (state[v] === 0 && mark[v] !== markValue) {
          mark[v] = markValue;
          reach.push(v);
        }
      }
      state[e] = 2;
      members[e] = null;
    }
    members[p] = reach;
    variables[p] = [];
    elements[p] = [];
    // |Le \ Lp| for every other element touching Lp.
    for (const i of reach) {
      buckets.remove(i);
      for (const e of elements[i]) {
        if (state[e] !== 1) continue;
        if (outsideMark[e] !== markValue) {
          outsideMark[e] = markValue;
          outside[e] = members[e]!.length;
        }
        outside[e]--;
      }
    }
    const remaining = n - k - 1;
    for (const i of reach) {
      // Elements wholly inside Lp add nothing: absorb them (aggressive absorption).
      let external = 0;
      const kept: number[] = [];
      for (const e of elements[i]) {
        if (state[e] !== 1) continue;
        if (outside[e] === 0 && outsideMark[e] === markValue) {
          state[e] = 2;
          members[e] = null;
          continue;
        }
        kept.push(e);
        external += outsideMark[e] === markValue ? outside[e] : members[e]!.length;
      }
      kept.push(p);
      elements[i] = kept;
      // Variable neighbours now reached through p are dropped.
      variables[i] = variables[i].filter((v) => state[v] === 0 && mark[v] !== markValue);
      const bound = variables[i].length + reach.length - 1 + external;
      degree[i] = Math.min(remaining, degree[i] + reach.length - 1, bound);
      buckets.insert(i, degree[i]);
    }
  }
  return order;
}

/** Neighbours of each unknown in the pattern of A + Aᵀ, without the diagonal. */
function symmetricNeighbours(pattern: SparsePattern): number[][] {
  const n = pattern.size;
  const neighbours: number[][] = Array.from({ length: n }, () => []);
  const seen = new Int32Array(n).fill(-1);
  for (let j = 0; j < n; j++) {
    for (let p = pattern.colStart[j]; p < pattern.colStart[j + 1]; p++) {
      const i = pattern.rows[p];
      if (i === j) continue;
      neighbours[i].push(j);
      neighbours[j].push(i);
    }
  }
  for (let i = 0; i < n; i++) {
    const unique: number[] = [];
    for (const j of neighbours[i]) {
      if (seen[j] === i) continue;
      seen[j] = i;
      unique.push(j);
    }
    neighbours[i] = unique;
  }
  return neighbours;
}

/** Uneliminated variables by degree, as doubly linked lists, with the smallest found fast. */
class DegreeBuckets {
  private readonly head: Int32Array;
  private readonly next: Int32Array;
  private readonly previous: Int32Array;
  private readonly at: Int32Array;
  private minimum = 0;

  constructor(n: number, degree: Int32Array) {
    this.head = new Int32Array(n + 1).fill(-1);
    this.next = new Int32Array(n).fill(-1);
    this.previous = new Int32Array(n).fill(-1);
    this.at = new Int32Array(n).fill(-1);
    // Inserted from the last unknown down, so that ties go to the lowest index first.
    for (let i = n - 1; i >= 0; i--) this.insert(i, degree[i]);
  }

  insert(i: number, d: number): void {
    const first = this.head[d];
    this.next[i] = first;
    this.previous[i] = -1;
    if (first >= 0) this.previous[first] = i;
    this.head[d] = i;
    this.at[i] = d;
    if (d < this.minimum) this.minimum = d;
  }

  remove(i: number): void {
    const d = this.at[i];
    if (d < 0) return;
    const before = this.previous[i];
    const after = this.next[i];
    if (before >= 0) this.next[before] = after;
    else this.head[d] = after;
    if (after >= 0) this.previous[after] = before;
    this.at[i] = -1;
  }

  popMinimum(): number {
    while (this.head[this.minimum] < 0) this.minimum++;
    const i = this.head[this.minimum];
    this.remove(i);
    return i;
  }
}
