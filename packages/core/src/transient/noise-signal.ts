import { gaussianSample } from '../waves/gaussian-samples.ts';

/** Samples per 1/bandwidth: the interpolated noise is flat within 0.6 dB up to the bandwidth. */
export const SAMPLES_PER_PERIOD = 10;
/** ∫ sinc⁸: the variance of a cubic B-spline through unit-variance samples, averaged over time (151/315). */
const SPLINE_VARIANCE = 151 / 315;

/**
 * Gaussian white noise of one-sided density `density` (unit²/Hz), band-limited, as a pure
 * function of time: independent Gaussian samples every Δ = 1/(10·bandwidth), each drawn from
 * a hash of (seed, stream, sample index), joined by a uniform cubic B-spline. So the value at
 * any t is the same whatever steps reached it, on any machine and in any worker, and the
 * signal is smooth (twice differentiable), with no corners for the stepper to stop at.
 *
 * The spline through samples of variance σ² has the power spectrum σ²·Δ·sinc⁸(f·Δ) (two-sided;
 * the B-spline's transform is sinc⁴): flat at 2σ²Δ one-sided near 0, 0.57 dB down at the
 * bandwidth, 3 dB down at 2.3 times it, nothing left at 1/Δ. Its variance is 151/315 of σ²,
 * within ±5% of that at every instant. Unlike a sum of sinusoids its spectrum is continuous,
 * so averages over a run converge to the density's integral however narrow the circuit's band.
 */
export class NoiseSignal {
  readonly spacing: number;
  private readonly sigma: number;

  constructor(
    readonly density: number,
    readonly bandwidth: number,
    private readonly seed: number,
    private readonly stream: number,
  ) {
    this.spacing = 1 / (SAMPLES_PER_PERIOD * bandwidth);
    this.sigma = Math.sqrt(density / (2 * this.spacing));
  }

  /** Variance of the signal averaged over time: the density's integral through sinc⁸. */
  get variance(): number {
    return this.sigma * this.sigma * SPLINE_VARIANCE;
  }

  value(t: number): number {
    const position = t / this.spacing;
    const i = Math.floor(position);
    const u = position - i;
    const u2 = u * u;
    const u3 = u2 * u;
    // Uniform cubic B-spline weights of samples i-1 .. i+2 (textbook).
    const w0 = (1 - u) ** 3 / 6;
    const w1 = (3 * u3 - 6 * u2 + 4) / 6;
    const w2 = (-3 * u3 + 3 * u2 + 3 * u + 1) / 6;
    const w3 = u3 / 6;
    return this.sigma * (w0 * this.sample(i - 1) + w1 * this.sample(i) + w2 * this.sample(i + 1) + w3 * this.sample(i + 2));
  }

  private sample(index: number): number {
    return gaussianSample(this.seed, this.stream, index);
  }
}
