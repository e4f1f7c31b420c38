import type { Device } from '../../parts/device.ts';
import type { RingingEvent } from './types.ts';

/** More corners than this in one run are not searched one by one (a dense sampled wave). */
const MAX_CORNERS = 100_000;

/** Every stimulus corner in (0, duration), from the parts' waves, labelled with the part. */
export function stimulusCorners(devices: readonly Device[], duration: number): RingingEvent[] {
  const events: RingingEvent[] = [];
  const eps = duration * 1e-12;
  for (const d of devices) {
    if (d.nextCorner === undefined) continue;
    let t = d.nextCorner(eps);
    let count = 0;
    while (t < duration - eps && count++ < MAX_CORNERS) {
      events.push({ time: t, cause: `corner of ${d.name}` });
      t = d.nextCorner(t + eps);
    }
  }
  return events;
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
