import type { PartSpecBase } from '../../parts/part-kind.ts';
import type { Wave } from '../../waves/wave.ts';
import type { RingingEvent } from './types.ts';

/** More corners than this per wave are not searched one by one (a dense sampled wave). */
const MAX_CORNERS = 100_000;

/**
 * Every corner in (0, duration) of the sources' waves where the value or the slope really
 * changes (a list of points may end with a point that changes nothing), labelled with the part.
 */
export function stimulusCorners(parts: readonly PartSpecBase[], duration: number): RingingEvent[] {
  const events: RingingEvent[] = [];
  const eps = duration * 1e-12;
  for (const part of parts) {
    const wave = (part as PartSpecBase & { wave?: Wave }).wave;
    if (wave === undefined) continue;
    let previous = 0;
    let t = wave.nextCorner(eps);
    for (let count = 0; t < duration - eps && count < MAX_CORNERS; count++) {
      const next = wave.nextCorner(t + eps);
      if (changesThere(wave, t, Math.min(t - previous, next - t, duration) * 1e-3)) events.push({ time: t, cause: `corner of ${part.name}` });
      previous = t;
      t = next;
    }
  }
  return events;
}

/** The slope just before `t` differs from the slope just after (a jump makes them differ too). */
function changesThere(wave: Wave, t: number, delta: number): boolean {
  const left = (wave.value(t) - wave.value(t - delta)) / delta;
  const right = (wave.value(t + delta) - wave.value(t)) / delta;
  return Math.abs(right - left) > 1e-6 * Math.max(Math.abs(left), Math.abs(right));
}

/** A run of events close together: ringing is looked for after the last one. */
export interface EventCluster {
  readonly first: number;
  readonly last: number;
  readonly cause: string;
}

/**
 * Sort events and join those less than `gap` apart (the two corners of one fast edge, a rail
 * exit right after an edge) into one cluster.
 */
export function clusterEvents(events: readonly RingingEvent[], gap: number): EventCluster[] {
  const sorted = [...events].sort((a, b) => a.time - b.time);
  const clusters: { first: number; last: number; causes: string[] }[] = [];
  for (const e of sorted) {
    const open = clusters[clusters.length - 1];
    if (open !== undefined && e.time - open.last < gap) {
      open.last = e.time;
      if (!open.causes.includes(e.cause)) open.causes.push(e.cause);
    } else {
      clusters.push({ first: e.time, last: e.time, causes: [e.cause] });
    }
  }
  return clusters.map((c) => ({ first: c.first, last: c.last, cause: c.causes.join(', ') }));
}
