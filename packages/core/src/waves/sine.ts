import { quantities } from '../units/quantity.ts';
import type { Wave, WaveKind } from './wave.ts';

/**
 * offset + amplitude·sin(2π·frequency·(t − delay) + phase). Before the delay the wave holds
 * its starting value, offset + amplitude·sin(phase), so the delay is its only corner.
 */
export class SineWave implements Wave {
  private readonly omega: number;
  private readonly phaseRadians: number;
  constructor(
    readonly amplitude: number,
    readonly frequency: number,
    readonly offset: number,
    /** Degrees. */
    readonly phase: number,
    readonly delay: number,
  ) {
    this.omega = 2 * Math.PI * frequency;
    this.phaseRadians = (phase * Math.PI) / 180;
  }

  value(t: number): number {
    const angle = t > this.delay ? this.omega * (t - this.delay) + this.phaseRadians : this.phaseRadians;
    return this.offset + this.amplitude * Math.sin(angle);
  }

  nextCorner(t: number): number {
    return this.delay > 0 && t < this.delay ? this.delay : Infinity;
  }

  timescale(): number {
    return 1 / this.frequency;
  }

  holdsFrom(): number {
    return Infinity;
  }
}

/** `sine: { amplitude: 1, frequency: 1k, offset: 2.5, phase: 90, delay: 1m }`. */
export const sine: WaveKind = {
  key: 'sine',
  summary: 'sine: `amplitude`, `frequency`, optional `offset`, `phase` (degrees), `delay`',
  read(main, _options, _context, quantity): Wave {
    const keys = main.map();
    const example = 'write sine: { amplitude: 1, frequency: 1k }';
    const amplitude = keys.need('amplitude', example)?.number(quantity) ?? NaN;
    const frequency = keys.need('frequency', example)?.number(quantities.frequency, { above: 0 }) ?? NaN;
    const offset = keys.numberOr('offset', quantity, 0);
    const phase = keys.numberOr('phase', quantities.angle, 0);
    const delay = keys.numberOr('delay', quantities.time, 0, { min: 0 });
    keys.finish();
    return new SineWave(amplitude, frequency, offset, phase, delay);
  },
};
