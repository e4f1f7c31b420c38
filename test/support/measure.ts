/** Time at which `v` first crosses `level` in the given direction after `from`, linearly interpolated. */
export function crossing(time: Float64Array, v: Float64Array, level: number, rising: boolean, from = 0): number {
  for (let i = 1; i < v.length; i++) {
    if (time[i] <= from) continue;
    const a = v[i - 1] - level;
    const b = v[i] - level;
    if (rising ? a < 0 && b >= 0 : a > 0 && b <= 0) return time[i - 1] + (a / (a - b)) * (time[i] - time[i - 1]);
  }
  return NaN;
}

/** Value of a column at the row nearest to time t. */
export function at(time: Float64Array, v: Float64Array, t: number): number {
  let best = 0;
  for (let i = 0; i < time.length; i++) if (Math.abs(time[i] - t) < Math.abs(time[best] - t)) best = i;
  return v[best];
}

/** Least-squares slope of v over rows with time in [t0, t1]. */
export function slope(time: Float64Array, v: Float64Array, t0: number, t1: number): number {
  let n = 0, st = 0, sv = 0, stt = 0, stv = 0;
  for (let i = 0; i < time.length; i++) {
    if (time[i] < t0 || time[i] > t1) continue;
    n++;
    st += time[i];
    sv += v[i];
    stt += time[i] * time[i];
    stv += time[i] * v[i];
  }
  return (n * stv - st * sv) / (n * stt - st * st);
}

/** Largest forward-difference slope magnitude over rows in [t0, t1]. */
export function maxSlope(time: Float64Array, v: Float64Array, t0: number, t1: number): number {
  let m = 0;
  for (let i = 1; i < time.length; i++) {
    if (time[i - 1] < t0 || time[i] > t1) continue;
    m = Math.max(m, Math.abs((v[i] - v[i - 1]) / (time[i] - time[i - 1])));
  }
  return m;
}

/** Local extrema of v - center in [from, until]: [time, deviation] pairs. */
export function swings(time: Float64Array, v: Float64Array, center: number, from: number, until = Infinity): [number, number][] {
  const out: [number, number][] = [];
  for (let i = 1; i < v.length - 1; i++) {
    if (time[i] < from || time[i] > until) continue;
    const d = v[i] - center;
    if ((d > 0 && v[i] >= v[i - 1] && v[i] > v[i + 1]) || (d < 0 && v[i] <= v[i - 1] && v[i] < v[i + 1])) out.push([time[i], d]);
  }
  return out;
}
