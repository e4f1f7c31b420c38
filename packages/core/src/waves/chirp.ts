import { quantities } from '../units/quantity.ts';
import type { Wave, WaveKind } from './wave.ts';

export type ChirpShape = 'linear' | 'log';

/**
 * A sine swept from `from` to `to` over `duration`: offset + amplitude·sin(θ(t)), the phase
 * being the instantaneous frequency integrated in closed form. `linear`: f(t) = from +
 * (to − from)·t/duration, θ = 2π·(from·t + (to − from)·t²/(2·duration)). `log`: f(t) =
 * from·(to/from)^(t/duration), θ = 2π·from·duration·((to/from)^(t/duration) − 1)/ln(to/from).
 * After the sweep it keeps the final frequency with its phase continuous. Value and slope are
 * continuous everywhere: no corners.
 */
export class ChirpWave implements Wave {
  /** ln(to/from) for `log`. */
  private readonly logRatio: number;
  private readonly phaseAtEnd: number;
  constructor(
    private readonly from: number,
    private readonly to: number,
    private readonly duration: number,
    readonly amplitude: number,
    readonly offset: number,
    private readonly shape: ChirpShape,
  ) {
    this.logRatio = Math.log(to / from);
    this.phaseAtEnd = this.sweepPhase(duration);
  }

  value(t: number): number {
    const u = t > 0 ? t : 0;
    const theta = u <= this.duration ? this.sweepPhase(u) : this.phaseAtEnd + 2 * Math.PI * this.to * (u - this.duration);
    return this.offset + this.amplitude * Math.sin(theta);
  }

  nextCorner(): number {
    return Infinity;
  }

  timescale(): number {
    return 1 / Math.max(this.from, this.to);
  }

  holdsFrom(): number {
    return Infinity;
  }

  private sweepPhase(t: number): number {
    // Equal ends, or log ratios too small to divide by: a constant frequency.
    if (this.shape === 'linear' || Math.abs(this.logRatio) < 1e-12) return 2 * Math.PI * (this.from * t + ((this.to - this.from) * t * t) / (2 * this.duration));
    return (2 * Math.PI * this.from * this.duration * Math.expm1((this.logRatio * t) / this.duration)) / this.logRatio;
  }
}

/** `chirp: { from: 100, to: 10k, duration: 50m, amplitude: 1, offset: 0, shape: log }`. */
export const chirp: WaveKind = {
  key: 'chirp',
  summary: 'sine swept in frequency: `from`, `to`, `duration`, `amplitude`, optional `offset`, `shape: linear | log`',
  read(main, _options, _context, quantity): Wave {
    const keys = main.map();
    const example = 'write chirp: { from: 100, to: 10k, duration: 50m, amplitude: 1 }';
    const from = keys.need('from', example)?.number(quantities.frequency, { above: 0 }) ?? NaN;
    const to = keys.need('to', example)?.number(quantities.frequency, { above: 0 }) ?? NaN;
    const duration = keys.need('duration', example)?.number(quantities.time, { above: 0 }) ?? NaN;
    const amplitude = keys.need('amplitude', example)?.number(quantity) ?? NaN;
    const offset = keys.numberOr('offset', quantity, 0);
    const shape = keys.choiceOr<ChirpShape>('shape', ['linear', 'log'], 'linear');
    keys.finish();
    return new ChirpWave(from, to, duration, amplitude, offset, shape);
  },
};
