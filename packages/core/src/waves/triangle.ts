import { quantities } from '../units/quantity.ts';
import type { Wave, WaveKind } from './wave.ts';
import { nextPeriodicCorner, timeInPeriod } from './periodic.ts';

/**
 * A symmetric triangle: each period (from `delay`) rises from low to high in the first half
 * and falls back in the second. Before the delay the wave is low. Corners: valleys and peaks.
 */
export class TriangleWave implements Wave {
  private readonly period: number;
  private readonly half: number;
  private readonly corners: Float64Array;
  constructor(
    readonly low: number,
    readonly high: number,
    frequency: number,
    readonly delay: number,
  ) {
    this.period = 1 / frequency;
    this.half = this.period / 2;
    this.corners = Float64Array.of(0, this.half);
  }

  value(t: number): number {
    if (t < this.delay) return this.low;
    const u = timeInPeriod(t, this.delay, this.period);
    const swing = this.high - this.low;
    return u < this.half ? this.low + (swing * u) / this.half : this.high - (swing * (u - this.half)) / this.half;
  }

  nextCorner(t: number): number {
    return nextPeriodicCorner(t, this.delay, this.period, this.corners);
  }

  timescale(): number {
    return this.half;
  }

  holdsFrom(): number {
    return Infinity;
  }
}

/** `triangle: { low: -1, high: 1, frequency: 500, delay: 2m }`. */
export const triangle: WaveKind = {
  key: 'triangle',
  summary: 'triangle: `high`, `frequency`, optional `low` (0), `delay`',
  read(main, _options, _context, quantity): Wave {
    const keys = main.map();
    const example = 'write triangle: { high: 1, frequency: 500 }';
    const low = keys.numberOr('low', quantity, 0);
    const high = keys.need('high', example)?.number(quantity) ?? NaN;
    const frequency = keys.need('frequency', example)?.number(quantities.frequency, { above: 0 }) ?? NaN;
    const delay = keys.numberOr('delay', quantities.time, 0, { min: 0 });
    keys.finish();
    return new TriangleWave(low, high, frequency, delay);
  },
};
