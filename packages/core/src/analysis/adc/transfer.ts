import type { AdcSpec } from '../../circuit/adc-spec.ts';

/**
 * The converter's transfer function, from volts to a code 0 .. 2^N - 1. The ideal one is
 * that of IEEE Std 1241: LSB = (high - low) / 2^N; rounding `nearest` puts the first code
 * transition 1/2 LSB above `low`, rounding `down` puts it 1 LSB above. The static errors
 * then move the scaled input: `offset` adds LSB everywhere, `gain-error` scales it so that
 * full scale reads that many LSB more; noise adds LSB per sample.
 */
export class Transfer {
  readonly lsb: number;
  /** Largest code, 2^N - 1. */
  readonly top: number;
  private readonly low: number;
  private readonly half: number;
  private readonly gain: number;
  private readonly offset: number;

  constructor(spec: Pick<AdcSpec, 'bits' | 'low' | 'high' | 'rounding' | 'offset' | 'gainError'>) {
    const levels = 2 ** spec.bits;
    this.lsb = (spec.high - spec.low) / levels;
    this.top = levels - 1;
    this.low = spec.low;
    this.half = spec.rounding === 'nearest' ? 0.5 : 0;
    this.gain = 1 + spec.gainError / levels;
    this.offset = spec.offset;
  }

  /** The code before clipping (may lie below 0 or above 2^N - 1), with the static errors and `noise` LSB. */
  unbounded(volts: number, noise: number): number {
    const scaled = ((volts - this.low) / this.lsb) * this.gain + this.offset + noise;
    return Math.floor(scaled + this.half);
  }

  /** The code without any converter error: the ideal code of `volts`, before clipping. */
  ideal(volts: number): number {
    return Math.floor((volts - this.low) / this.lsb + this.half);
  }

  /** A code clipped to 0 .. 2^N - 1. */
  clip(code: number): number {
    return code < 0 ? 0 : code > this.top ? this.top : code;
  }
}
