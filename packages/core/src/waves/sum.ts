import type { ReadContext, ValueReader } from '../reading/reader.ts';
import type { Quantity } from '../units/quantity.ts';
import type { Wave, WaveKind } from './wave.ts';

/** The sum of its members; its corners are every member's corners. */
export class SumWave implements Wave {
  constructor(private readonly members: readonly Wave[]) {}

  value(t: number): number {
    let total = 0;
    for (let i = 0; i < this.members.length; i++) total += this.members[i].value(t);
    return total;
  }

  timescale(): number {
    return Math.min(...this.members.map((m) => m.timescale()));
  }

  holdsFrom(): number {
    return Math.max(...this.members.map((m) => m.holdsFrom()));
  }

  nextCorner(t: number): number {
    let corner = Infinity;
    for (let i = 0; i < this.members.length; i++) {
      const c = this.members[i].nextCorner(t);
      if (c < corner) corner = c;
    }
    return corner;
  }
}

/** Reads one member: a number or a wave, as a source's own value is read. */
export type ReadMember = (value: ValueReader, quantity: Quantity, context: ReadContext) => Wave;

/**
 * `sum: [{ sine: { amplitude: 1, frequency: 50 } }, 2.5, { noise: { rms: 10m, bandwidth: 10k } }]`.
 * Made with the registry's own reader for its members (passed in, so that the registry and
 * this kind do not import each other).
 */
export function sumOf(readMember: ReadMember): WaveKind {
  return {
    key: 'sum',
    summary: 'sum of waves and numbers: `sum: [<wave or number>, ...]`',
    read(main, _options, context, quantity): Wave {
      const items = main.list();
      if (items.length === 0 && main.kind() === 'list') main.fail('a sum needs at least one member', 'write sum: [{ sine: { amplitude: 1, frequency: 50 } }, 2.5]');
      return new SumWave(items.map((item) => readMember(item, quantity, context)));
    },
  };
}
