import cliProgress from 'cli-progress';
import { formatSI } from '@voltcast/core';
import { wallTimeText } from './wall-time-text.ts';

/** Runs shorter than this finish without a bar: a bar that flashes for a moment is noise. */
const showAfterMs = 1000;
/** The time left is estimated after this many seconds of running (before, the rate says little). */
const estimateAfterSeconds = 2;

/**
 * A progress bar on stderr showing simulated time against the duration, and the wall time left
 * at the rate so far. It appears only when stderr is a terminal (never in pipes, logs or CI)
 * and only once the run has lasted about a second; stdout stays clean for the summary.
 */
export class RunProgress {
  readonly #duration: number;
  readonly #enabled: boolean;
  readonly #startedAt = performance.now();
  #bar: cliProgress.SingleBar | undefined;

  constructor(duration: number, enabled: boolean) {
    this.#duration = duration;
    this.#enabled = enabled && process.stderr.isTTY === true;
  }

  /** `fraction` of simulated time done, 0..1 (the engine's onProgress). */
  update(fraction: number): void {
    if (!this.#enabled) return;
    const simulated = formatSI(fraction * this.#duration, 's');
    const elapsed = (performance.now() - this.#startedAt) / 1000;
    // Simulated time goes at the rate of the run so far: the rest takes as long per second of it.
    const left = elapsed >= estimateAfterSeconds && fraction > 0 ? `about ${wallTimeText((elapsed * (1 - fraction)) / fraction)} left` : 'estimating the time left';
    if (this.#bar === undefined) {
      if (elapsed * 1000 < showAfterMs) return;
      this.#bar = new cliProgress.SingleBar({
        stream: process.stderr,
        // `total` and `value` are the bar's own tokens; the payload uses other names.
        format: 'simulating {bar} {percentage}% | t = {simulated} of {end} | {left}',
        clearOnComplete: true,
        hideCursor: false,
      });
      this.#bar.start(1, fraction, { simulated, end: formatSI(this.#duration, 's'), left });
    } else {
      this.#bar.update(fraction, { simulated, left });
    }
  }

  /** Remove the bar (if shown) so the summary starts on a clean line. */
  stop(): void {
    this.#bar?.stop();
    this.#bar = undefined;
  }
}
