import { quantities } from '../units/quantity.ts';
import { formatSI } from '../units/format.ts';
import type { Wave, WaveKind } from './wave.ts';
import { nextPeriodicCorner, timeInPeriod } from './periodic.ts';

/**
 * A square wave with straight edges of equal rise and fall time. Each period (from `delay`)
 * starts with the rising edge; the falling edge starts at duty·period. Before the delay the
 * wave is low. Corners: the start and end of every edge.
 */
export class SquareWave implements Wave {
  private readonly period: number;
  private readonly fallStart: number;
  private readonly corners: Float64Array;
  constructor(
    readonly low: number,
    readonly high: number,
    frequency: number,
    duty: number,
    readonly edge: number,
    readonly delay: number,
  ) {
    this.period = 1 / frequency;
    this.fallStart = duty * this.period;
    this.corners = Float64Array.of(0, edge, this.fallStart, this.fallStart + edge);
  }

  value(t: number): number {
    if (t < this.delay) return this.low;
    const u = timeInPeriod(t, this.delay, this.period);
    const swing = this.high - this.low;
    if (u < this.edge) return this.low + (swing * u) / this.edge;
    if (u < this.fallStart) return this.high;
    if (u < this.fallStart + this.edge) return this.high - (swing * (u - this.fallStart)) / this.edge;
    return this.low;
  }

  nextCorner(t: number): number {
    return nextPeriodicCorner(t, this.delay, this.period, this.corners);
  }

  /** The shorter level: the edges are corners, which steps land on whatever the rows. */
  timescale(): number {
    return Math.min(this.fallStart, this.period - this.fallStart);
  }

  holdsFrom(): number {
    return Infinity;
  }
}

/** `square: { low: 0, high: 5, frequency: 1k, duty: 25%, edge: 1u, delay: 0 }`. */
export const square: WaveKind = {
  key: 'square',
  summary: 'square: `high`, `frequency`, optional `low` (0), `duty` (50%), `edge`, `delay`',
  read(main, _options, _context, quantity): Wave {
    const keys = main.map();
    const example = 'write square: { high: 5, frequency: 1k }';
    const low = keys.numberOr('low', quantity, 0);
    const high = keys.need('high', example)?.number(quantity) ?? NaN;
    const frequency = keys.need('frequency', example)?.number(quantities.frequency, { above: 0 }) ?? NaN;
    const dutyValue = keys.get('duty');
    let duty = dutyValue?.number(quantities.fraction, { above: 0 }) ?? 0.5;
    if (duty >= 1) {
      dutyValue?.fail(`duty must be below 100%, found ${formatSI(duty * 100, '%')}`, 'duty is the fraction of the period from the rising edge to the falling edge');
      duty = 0.5;
    }
    const period = 1 / frequency;
    const shorterPart = Math.min(duty, 1 - duty) * period;
    const edgeValue = keys.get('edge');
    const edge = edgeValue?.number(quantities.time, { above: 0 }) ?? Math.min(period / 1000, shorterPart / 10);
    if (edge >= shorterPart) {
      edgeValue?.fail(
        `edge ${formatSI(edge, 's')} does not fit: it must be shorter than the shorter part of the period, ${formatSI(shorterPart, 's')}`,
        'shorten the edge or lower the frequency',
      );
    }
    const delay = keys.numberOr('delay', quantities.time, 0, { min: 0 });
    keys.finish();
    return new SquareWave(low, high, frequency, duty, edge, delay);
  },
};
