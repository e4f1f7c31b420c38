import type { AdcSpec } from '../../circuit/adc-spec.ts';

/**
 * The converter's transfer function, from volts to a code 0 .. 2^N - 1, over a range
 * [low, high] given per conversion (a ratiometric converter's reference moves). The ideal one
 * is that of IEEE Std 1241: LSB = (high - low) / 2^N; rounding `nearest` puts the first code
 * transition 1/2 LSB above `low`, rounding `down` puts it 1 LSB above. The static errors
 * then move the scaled input: `offset` adds LSB everywhere, `gain-error` scales it so that
 * full scale reads that many LSB more; noise adds LSB per sample. A range whose high end is
 * not above its low end at that instant reads as below the range.
 */
export class Transfer {
  /** Largest code, 2^N - 1. */
  readonly top: number;
  private readonly levels: number;
  private readonly half: number;
  private readonly gain: number;
  private readonly offset: number;

  constructor(spec: Pick<AdcSpec, 'bits' | 'rounding' | 'offset' | 'gainError'>) {
    this.levels = 2 ** spec.bits;
    this.top = this.levels - 1;
    this.half = spec.rounding === 'nearest' ? 0.5 : 0;
    this.gain = 1 + spec.gainError / this.levels;
    this.offset = spec.offset;
  }

  /** Volts per code over [low, high]. */
  lsb(low: number, high: number): number {
    return (high - low) / this.levels;
  }

  /** The code before clipping (may lie below 0 or above 2^N - 1), with the static errors and `noise` LSB. */
  unbounded(volts: number, low: number, high: number, noise: number): number {
    if (!(high > low)) return -1;
    const scaled = ((volts - low) / this.lsb(low, high)) * this.gain + this.offset + noise;
    return Math.floor(scaled + this.half);
  }

  /** The code without any converter error: the ideal code of `volts`, before clipping. */
  ideal(volts: number, low: number, high: number): number {
    if (!(high > low)) return -1;
    return Math.floor((volts - low) / this.lsb(low, high) + this.half);
  }

  /** A code clipped to 0 .. 2^N - 1. */
  clip(code: number): number {
    return code < 0 ? 0 : code > this.top ? this.top : code;
  }
}
