import FFT from 'fft.js';

/**
 * Most samples transformed: the FFT (8 times this, zero-padded) stays a few milliseconds, and
 * a cold process pays little to build and compile it.
 */
const MAX_SAMPLES = 4096;
/** Fewest samples per period kept when a long stretch is thinned. */
const SAMPLES_PER_PERIOD = 16;

/** One transform size with its buffers, made once and reused. */
interface Transform {
  readonly fft: FFT;
  readonly input: Float64Array;
  readonly output: Float64Array;
}

/**
 * Frequency of the largest spectral peak of a stretch of rows, after removing a center value
 * and applying a Hann window; zero-padded to at least 8 times the length so that the peak bin
 * is fine, and refined by a parabola through the peak's log magnitude and its neighbours.
 * Runs once per candidate oscillation, never in the step loop. Keeps each transform size it
 * has used, with its buffers: building them costs more than a transform.
 */
export class SpectralPeak {
  private readonly transforms = new Map<number, Transform>();

  /**
   * The peak of `values[from..to)` sampled every `dt`, about `center`. A stretch longer than
   * 4,096 rows is thinned to every k-th row, keeping at least 16 per period of the expected
   * oscillation (`rowsPerPeriod`), and what is still longer is cut: thousands of samples over
   * hundreds of cycles confirm a frequency as well as millions do.
   */
  frequency(values: Float64Array, from: number, to: number, center: number, dt: number, rowsPerPeriod = Infinity): number {
    const stride = to - from <= MAX_SAMPLES ? 1 : Math.max(1, Math.min(Math.ceil((to - from) / MAX_SAMPLES), Math.floor(rowsPerPeriod / SAMPLES_PER_PERIOD)));
    const length = Math.min(MAX_SAMPLES, Math.floor((to - from - 1) / stride) + 1);
    let size = 256;
    while (size < 8 * length) size *= 2;
    const { fft, input, output } = this.transform(size);
    for (let i = 0; i < length; i++) {
      const hann = 0.5 - 0.5 * Math.cos((2 * Math.PI * i) / Math.max(1, length - 1));
      input[i] = (values[from + i * stride] - center) * hann;
    }
    input.fill(0, length);
    fft.realTransform(output, input);
    let best = 1;
    let bestPower = -1;
    const power = (k: number): number => output[2 * k] * output[2 * k] + output[2 * k + 1] * output[2 * k + 1];
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
    return (best + shift) / (size * dt * stride);
  }

  private transform(size: number): Transform {
    let t = this.transforms.get(size);
    if (t === undefined) {
      t = { fft: new FFT(size), input: new Float64Array(size), output: new Float64Array(2 * size) };
      this.transforms.set(size, t);
    }
    return t;
  }
}
