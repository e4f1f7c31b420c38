/** A trace as plain arrays, ready for d3-shape. */
export interface Points {
  readonly time: number[];
  readonly values: number[];
}

/**
 * Thin a trace to about four points per pixel column: per column its first, lowest, highest
 * and last sample, in time order. The drawn shape is the same (spikes and edges survive),
 * and a long run does not make a plot of millions of points.
 */
export function decimate(time: ArrayLike<number>, values: ArrayLike<number>, columns: number): Points {
  const n = time.length;
  if (n <= 4 * columns) return { time: Array.from(time), values: Array.from(values) };
  const out: Points = { time: [], values: [] };
  const t0 = time[0];
  const width = (time[n - 1] - t0) / columns;
  let start = 0;
  while (start < n) {
    const column = Math.floor((time[start] - t0) / width);
    let end = start;
    let low = start;
    let high = start;
    while (end + 1 < n && Math.floor((time[end + 1] - t0) / width) === column) {
      end++;
      if (values[end] < values[low]) low = end;
      if (values[end] > values[high]) high = end;
    }
    for (const i of [...new Set([start, low, high, end])].sort((a, b) => a - b)) {
      out.time.push(time[i]);
      out.values.push(values[i]);
    }
    start = end + 1;
  }
  return out;
}
