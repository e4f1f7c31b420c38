/** Smallest swing about the settling value that counts, volts. */
const MIN_SWING = 1e-6;
/** Fewest rows after an event worth examining. */
const MIN_ROWS = 16;
/** Fewest zero crossings that make an oscillation (two full lobes between them). */
const MIN_CROSSINGS = 3;
/** Largest spread of the half-periods, relative to their mean, for a regular oscillation. */
const MAX_SPREAD = 0.3;

/** Zero crossings and the extremum of each lobe between them, about `center`. */
interface Lobes {
  /** Interpolated crossing times. */
  crossings: number[];
  /** Row index at or after each crossing. */
  crossingRows: number[];
  /** Extremum value (interpolated) of each lobe between consecutive crossings. */
  peaks: number[];
}

/** What one stretch of rows after an event shows, before the caller's guards. */
export interface Oscillation {
  frequency: number;
  dampingRatio: number;
  logDecrement: number;
  overshoot: number;
  settlingValue: number;
  step: number;
  settlingTime: number | null;
  cycles: number;
  /** Rows from the first to the last crossing: where the spectral check looks. */
  from: number;
  to: number;
}

/**
 * Look for a damped oscillation in rows [i0, i1) that follow an event at `eventTime`;
 * `before` is the node's value just before the event. Returns null when there is none:
 * fewer than three crossings of the settling value (a first-order approach, a ramp), or
 * crossings too irregular to be one frequency (noise).
 *
 * The settling value starts as the mean of the stretch's last quarter and is refined from the
 * first three extrema (for p_k = c + A(-r)^k, c = (p0 p2 - p1^2)/(p0 + p2 - 2 p1)). The damping
 * comes from the peak-to-peak amplitudes |p_k - p_k+1|, which decay by the same ratio per half
 * cycle and do not depend on the settling value: a least-squares line through their logarithms
 * gives the decrement per half cycle; doubled, the logarithmic decrement delta per cycle, and
 * zeta = delta / sqrt(4 pi^2 + delta^2).
 */
export function oscillationFigures(
  time: Float64Array,
  values: Float64Array,
  i0: number,
  i1: number,
  before: number,
  eventTime: number,
  settleBand: number,
): Oscillation | null {
  if (i1 - i0 < MIN_ROWS) return null;
  const tailFrom = i0 + Math.floor(0.75 * (i1 - i0));
  let center = 0;
  for (let i = tailFrom; i < i1; i++) center += values[i];
  center /= i1 - tailFrom;

  let deviation = 0;
  for (let i = i0; i < i1; i++) deviation = Math.max(deviation, Math.abs(values[i] - center));
  const reference = (c: number): number => (Math.abs(c - before) > 1e-3 * deviation ? Math.abs(c - before) : deviation);
  const noise = noiseLevel(values, tailFrom, i1);
  // Swings under a microvolt (the solver's default voltage tolerance) are no finding.
  const hysteresis = (c: number): number => Math.max(0.25 * settleBand * reference(c), 4 * noise, MIN_SWING);

  let lobes = findLobes(time, values, i0, i1, center, hysteresis(center));
  if (lobes.crossings.length < MIN_CROSSINGS) return null;
  if (lobes.peaks.length >= 3) {
    const [p0, p1, p2] = lobes.peaks;
    const denominator = p0 + p2 - 2 * p1;
    if (denominator !== 0) {
      const refined = (p0 * p2 - p1 * p1) / denominator;
      // Trust the refinement only inside the first lobes' span (it is exact for a damped sinusoid).
      if (Math.abs(refined - center) < Math.abs(p0 - p1)) center = refined;
      lobes = findLobes(time, values, i0, i1, center, hysteresis(center));
      if (lobes.crossings.length < MIN_CROSSINGS) return null;
    }
  }
  const { crossings, peaks } = lobes;

  const halves: number[] = [];
  for (let k = 1; k < crossings.length; k++) halves.push(crossings[k] - crossings[k - 1]);
  const mean = halves.reduce((a, b) => a + b, 0) / halves.length;
  if ((Math.max(...halves) - Math.min(...halves)) / mean > MAX_SPREAD) return null;
  const frequency = (crossings.length - 1) / (2 * (crossings[crossings.length - 1] - crossings[0]));

  const halfDecrement = decrementPerHalfCycle(peaks, center, 4 * hysteresis(center));
  const logDecrement = Math.max(0, 2 * halfDecrement);
  const dampingRatio = logDecrement / Math.sqrt(4 * Math.PI * Math.PI + logDecrement * logDecrement);

  const step = center - before;
  const direction = step >= 0 ? 1 : -1;
  let overshoot = 0;
  for (const p of peaks) overshoot = Math.max(overshoot, ((p - center) * direction) / reference(center));

  const band = settleBand * reference(center);
  let last = -1;
  for (let i = i1 - 1; i >= i0; i--) {
    if (Math.abs(values[i] - center) > band) {
      last = i;
      break;
    }
  }
  const settlingTime = last === i1 - 1 ? null : last < 0 ? 0 : time[last + 1] - eventTime;

  return {
    frequency,
    dampingRatio,
    logDecrement,
    overshoot,
    settlingValue: center,
    step,
    settlingTime,
    cycles: (crossings.length - 1) / 2,
    from: lobes.crossingRows[0],
    to: lobes.crossingRows[lobes.crossingRows.length - 1],
  };
}

/**
 * Standard deviation of white noise on rows [from, to), from their second differences: for
 * white noise the variance of v[i+1] - 2 v[i] + v[i-1] is 6 sigma^2, while a smooth signal (or
 * an oscillation sampled at many rows per period) contributes almost nothing to them.
 */
function noiseLevel(values: Float64Array, from: number, to: number): number {
  let sum = 0;
  let n = 0;
  for (let i = from + 1; i < to - 1; i++) {
    const d2 = values[i + 1] - 2 * values[i] + values[i - 1];
    sum += d2 * d2;
    n++;
  }
  return n > 0 ? Math.sqrt(sum / n / 6) : 0;
}

/**
 * Crossings of `center` counted with hysteresis (the value must get `h` beyond it on the
 * other side), each placed by linear interpolation between the two rows around it.
 */
function findLobes(time: Float64Array, values: Float64Array, i0: number, i1: number, center: number, h: number): Lobes {
  const crossings: number[] = [];
  const crossingRows: number[] = [];
  let side = 0;
  for (let i = i0; i < i1; i++) {
    const d = values[i] - center;
    const now = d > h ? 1 : d < -h ? -1 : 0;
    if (now === 0) continue;
    if (side !== 0 && now !== side) {
      let k = i;
      while (k > i0 && (values[k - 1] - center) * now > 0) k--;
      const a = values[k - 1] - center;
      const b = values[k] - center;
      crossings.push(time[k - 1] + ((time[k] - time[k - 1]) * a) / (a - b));
      crossingRows.push(k);
    }
    side = now;
  }
  const peaks: number[] = [];
  for (let c = 1; c < crossingRows.length; c++) {
    let best = crossingRows[c - 1];
    for (let i = best; i < crossingRows[c]; i++) if (Math.abs(values[i] - center) > Math.abs(values[best] - center)) best = i;
    peaks.push(parabolicPeak(values, best, i0, i1));
  }
  return { crossings, crossingRows, peaks };
}

/** Extreme value of the parabola through rows best-1, best, best+1 (uniform spacing assumed). */
function parabolicPeak(values: Float64Array, best: number, i0: number, i1: number): number {
  if (best <= i0 || best >= i1 - 1) return values[best];
  const a = values[best - 1];
  const b = values[best];
  const c = values[best + 1];
  const denominator = a - 2 * b + c;
  if (denominator === 0) return b;
  const shift = (0.5 * (a - c)) / denominator;
  return b - 0.25 * (a - c) * shift;
}

/**
 * Least-squares slope of ln|p_k - p_k+1| against k, negated: the decrement per half cycle.
 * Amplitudes below `floor` are left out (hysteresis and rounding decide them). With a single
 * usable pair it falls back to the ratio of the first two peaks' distances from the center.
 */
function decrementPerHalfCycle(peaks: readonly number[], center: number, floor: number): number {
  const logs: number[] = [];
  for (let k = 0; k + 1 < peaks.length; k++) {
    const a = Math.abs(peaks[k] - peaks[k + 1]);
    if (a <= floor) break;
    logs.push(Math.log(a));
  }
  if (logs.length >= 2) {
    const n = logs.length;
    const meanK = (n - 1) / 2;
    const meanL = logs.reduce((a, b) => a + b, 0) / n;
    let num = 0;
    let den = 0;
    logs.forEach((l, k) => {
      num += (k - meanK) * (l - meanL);
      den += (k - meanK) * (k - meanK);
    });
    return -num / den;
  }
  if (peaks.length >= 2) return Math.log(Math.abs(peaks[0] - center) / Math.abs(peaks[1] - center));
  return 0;
}
