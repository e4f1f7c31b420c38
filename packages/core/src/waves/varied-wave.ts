import type { Wave } from './wave.ts';

/**
 * A wave whose every value passes through `change` (a source's tolerance: a relative one
 * scales the whole wave, an absolute one shifts it). Corners stay where they were.
 */
export function variedWave(wave: Wave, change: (value: number) => number): Wave {
  return {
    value: (t) => change(wave.value(t)),
    nextCorner: (t) => wave.nextCorner(t),
    timescale: () => wave.timescale(),
    holdsFrom: () => wave.holdsFrom(),
  };
}
