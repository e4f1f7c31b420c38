import cliProgress from 'cli-progress';
import { formatSI } from '@voltcast/core';

/** Runs shorter than this finish without a bar: a bar that flashes for a moment is noise. */
const showAfterMs = 1000;

/**
 * A progress bar on stderr showing simulated time against the duration. It appears only when
 * stderr is a terminal (never in pipes, logs or CI) and only once the run has lasted about a
 * second; stdout stays clean for the summary.
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
    if (this.#bar === undefined) {
      if (performance.now() - this.#startedAt < showAfterMs) return;
      this.#bar = new cliProgress.SingleBar({
        stream: process.stderr,
        // `total` and `value` are the bar's own tokens; the payload uses other names.
        format: 'simulating {bar} {percentage}% | t = {simulated} of {end}',
        clearOnComplete: true,
        hideCursor: false,
      });
      this.#bar.start(1, fraction, { simulated, end: formatSI(this.#duration, 's') });
    } else {
      this.#bar.update(fraction, { simulated });
    }
  }

  /** Remove the bar (if shown) so the summary starts on a clean line. */
  stop(): void {
    this.#bar?.stop();
    this.#bar = undefined;
  }
}
