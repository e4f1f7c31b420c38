import type { Device, Link, Mna, NoiseSource, StepInfo } from '../parts/device.ts';
import { stampCurrent } from '../parts/stamps.ts';
import { NoiseSignal, SAMPLES_PER_PERIOD } from './noise-signal.ts';

/** `simulate`'s option for noise in the time domain. */
export interface TransientNoise {
  /** Same seed, same noise: on every machine, in every worker, for any step sequence. */
  readonly seed: number;
  /**
   * Hz up to which the noise is flat (within 0.6 dB; half power at 2.3 times, gone at 10 times).
   * Default: the upper end of the circuit's noise band (`noise: to`, else the highest
   * converter's Nyquist rate, else 1 MHz).
   */
  readonly bandwidth?: number;
}

/** Steps per noise sample spacing: the stepper resolves the noise's highest frequencies. */
const STEPS_PER_SAMPLE = 2;

/** The largest step that resolves noise flat to `bandwidth`: half the spacing of its samples. */
export function noiseMaxStep(bandwidth: number): number {
  return 1 / (SAMPLES_PER_PERIOD * bandwidth * STEPS_PER_SAMPLE);
}

/**
 * The noise of every part as currents on the right-hand side: each device's noise
 * generators (Device contract item 10), taken at the operating point when it is accepted,
 * drive seeded band-limited white currents of their white density; the 1/f rise below an
 * amplifier's corner is left out (it matters over seconds, not over a converter's samples).
 * The operating point itself is found without noise.
 */
export class NoiseInjection implements Device {
  readonly kind = 'noise';
  readonly name = 'noise';
  private signals: NoiseSignal[] = [];
  private sources: readonly NoiseSource[] = [];
  private started = false;

  constructor(
    private readonly devices: readonly Device[],
    private readonly seed: number,
    private readonly bandwidth: number,
    private readonly kelvin: number,
  ) {}

  bind(): void {}

  stampRhs(m: Mna, step: StepInfo): void {
    for (let k = 0; k < this.sources.length; k++) {
      const source = this.sources[k];
      stampCurrent(m, source.from, source.into, this.signals[k].value(step.t));
    }
  }

  accept(x: Float64Array): void {
    if (this.started) return;
    this.started = true;
    this.sources = this.devices.flatMap((d) => d.noiseSources?.(x, this.kelvin) ?? []).filter((s) => s.white > 0);
    this.signals = this.sources.map((s, k) => new NoiseSignal(s.white, this.bandwidth, this.seed, k));
  }

  links(): readonly Link[] {
    return [];
  }
}
