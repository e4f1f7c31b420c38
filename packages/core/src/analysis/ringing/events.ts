import type { PartSpecBase } from '../../parts/part-kind.ts';
import type { Wave } from '../../waves/wave.ts';
import type { RingingEvent } from './types.ts';

/** Where one source's wave stands: its corner `at`, not yet handed out. */
interface Cursor {
  readonly wave: Wave;
  readonly cause: string;
  previous: number;
  at: number;
}

/**
 * The corners in (0, duration) of the sources' waves where the value or the slope really
 * changes (a list of points may end with a point that changes nothing), labelled with the
 * part, handed out as the run passes them: none is held before its time, so a periodic wave
 * over a long run costs no memory.
 */
export class StimulusCorners {
  private readonly cursors: Cursor[] = [];
  private readonly eps: number;
  /** The earliest corner not yet handed out: `take` is called at every step and mostly has nothing to do. */
  private next = Infinity;

  constructor(
    parts: readonly PartSpecBase[],
    private readonly duration: number,
  ) {
    this.eps = duration * 1e-12;
    for (const part of parts) {
      const wave = (part as PartSpecBase & { wave?: Wave }).wave;
      if (wave !== undefined) this.cursors.push({ wave, cause: `corner of ${part.name}`, previous: 0, at: wave.nextCorner(this.eps) });
    }
    this.next = Math.min(...this.cursors.map((c) => c.at));
  }

  /** Hand each corner before `until` to `each`, once. */
  take(until: number, each: (event: RingingEvent) => void): void {
    if (until <= this.next) return;
    const end = Math.min(until, this.duration - this.eps);
    this.next = Infinity;
    for (const c of this.cursors) {
      while (c.at < end) {
        const t = c.at;
        const next = c.wave.nextCorner(t + this.eps);
        if (changesThere(c.wave, t, Math.min(t - c.previous, next - t, this.duration) * 1e-3)) each({ time: t, cause: c.cause });
        c.previous = t;
        c.at = next;
      }
      this.next = Math.min(this.next, c.at);
    }
  }
}

/** The slope just before `t` differs from the slope just after (a jump makes them differ too). */
function changesThere(wave: Wave, t: number, delta: number): boolean {
  const left = (wave.value(t) - wave.value(t - delta)) / delta;
  const right = (wave.value(t + delta) - wave.value(t)) / delta;
  return Math.abs(right - left) > 1e-6 * Math.max(Math.abs(left), Math.abs(right));
}
