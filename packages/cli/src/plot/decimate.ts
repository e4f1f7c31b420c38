/** A trace as plain arrays, ready for d3-shape. */
export interface Points {
  readonly x: number[];
  readonly values: number[];
}

/**
 * Thin a trace to about four points per pixel column: per column its first, lowest, highest
 * and last sample, in order along x. The drawn shape is the same (spikes and edges survive),
 * and a long run does not make a plot of millions of points. `column` maps an abscissa to its
 * pixel column (the figure's scale, linear or log); `columns` is the plot's width in pixels.
 */
export function decimate(x: ArrayLike<number>, values: ArrayLike<number>, column: (x: number) => number, columns: number): Points {
  const n = x.length;
  if (n <= 4 * columns) return { x: Array.from(x), values: Array.from(values) };
  const out: Points = { x: [], values: [] };
  let start = 0;
  while (start < n) {
    const here = Math.floor(column(x[start]));
    let end = start;
    let low = start;
    let high = start;
    while (end + 1 < n && Math.floor(column(x[end + 1])) === here) {
      end++;
      if (values[end] < values[low]) low = end;
      if (values[end] > values[high]) high = end;
    }
    for (const i of [...new Set([start, low, high, end])].sort((a, b) => a - b)) {
      out.x.push(x[i]);
      out.values.push(values[i]);
    }
    start = end + 1;
  }
  return out;
}
