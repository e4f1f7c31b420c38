import type { Wave } from './wave.ts';

/** A source written as a plain number: `voltage: 5`. */
export class ConstantWave implements Wave {
  constructor(readonly level: number) {}
  value(): number {
    return this.level;
  }
  nextCorner(): number {
    return Infinity;
  }
  timescale(): number {
    return Infinity;
  }
  holdsFrom(): number {
    return 0;
  }
}
