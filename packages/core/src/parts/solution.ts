/** Value of unknown `i` in a solution vector; ground (-1) reads 0. */
export function valueAt(x: Float64Array, i: number): number {
  return i >= 0 ? x[i] : 0;
}

/** v(a) - v(b) from a solution vector. */
export function across(x: Float64Array, a: number, b: number): number {
  return valueAt(x, a) - valueAt(x, b);
}
