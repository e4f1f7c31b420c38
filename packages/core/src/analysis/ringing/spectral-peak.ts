import FFT from 'fft.js';

/**
 * Frequency of the largest spectral peak of `values[from..to)` sampled every `dt`, after
 * removing `center` and applying a Hann window; zero-padded to at least 8 times the length
 * so that the peak bin is fine, and refined by a parabola through the peak's log magnitude
 * and its neighbours. Runs once per candidate oscillation, never in the step loop.
 */
export function spectralPeak(values: Float64Array, from: number, to: number, center: number, dt: number): number {
  const length = to - from;
  let size = 256;
  while (size < 8 * length) size *= 2;
  const fft = new FFT(size);
  const input = new Array<number>(size).fill(0);
  for (let i = 0; i < length; i++) {
    const hann = 0.5 - 0.5 * Math.cos((2 * Math.PI * i) / Math.max(1, length - 1));
    input[i] = (values[from + i] - center) * hann;
  }
  const out = fft.createComplexArray() as number[];
  fft.realTransform(out, input);
  let best = 1;
  let bestPower = -1;
  const power = (k: number): number => out[2 * k] * out[2 * k] + out[2 * k + 1] * out[2 * k + 1];
  for (let k = 1; k < size / 2; k++) {
    const p = power(k);
    if (p > bestPower) {
      bestPower = p;
      best = k;
    }
  }
  let shift = 0;
  if (best > 1 && best < size / 2 - 1) {
    const a = Math.log(power(best - 1) + 1e-300);
    const b = Math.log(bestPower + 1e-300);
    const c = Math.log(power(best + 1) + 1e-300);
    const denominator = a - 2 * b + c;
    if (denominator < 0) shift = (0.5 * (a - c)) / denominator;
  }
  return (best + shift) / (size * dt);
}
