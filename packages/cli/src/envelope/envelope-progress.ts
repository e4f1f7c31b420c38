import cliProgress from 'cli-progress';

/** Envelopes shorter than this finish without a bar. */
const showAfterMs = 1000;

/**
 * Runs done against runs planned, on stderr, only on a terminal and only once the envelope
 * has taken about a second (as the run command's bar).
 */
export class EnvelopeProgress {
  readonly #enabled: boolean;
  readonly #startedAt = performance.now();
  #bar: cliProgress.SingleBar | undefined;

  constructor(
    private readonly total: number,
    enabled: boolean,
  ) {
    this.#enabled = enabled && process.stderr.isTTY === true;
  }

  update(done: number): void {
    if (!this.#enabled) return;
    if (this.#bar === undefined) {
      if (performance.now() - this.#startedAt < showAfterMs) return;
      this.#bar = new cliProgress.SingleBar({ stream: process.stderr, format: 'varied runs {bar} {value}/{total} | {eta_formatted} left', clearOnComplete: true, hideCursor: false });
      this.#bar.start(this.total, done);
    } else {
      this.#bar.update(done);
    }
  }

  stop(): void {
    this.#bar?.stop();
    this.#bar = undefined;
  }
}
