import { closeSync, openSync, writeSync } from 'node:fs';

/** Gather about this much text before one write to the file. */
const flushThreshold = 1 << 16;

/**
 * A text file written in large chunks, synchronously. `simulate` is synchronous and calls
 * `onRow` from inside its loop, so a Node stream would only queue every row in memory until the
 * run ends; writing through a file descriptor keeps memory flat on long runs, and batching
 * keeps it to one system call per ~64 KiB instead of one per value.
 */
export class BufferedWriter {
  readonly #fd: number;
  #pending = '';

  constructor(readonly path: string) {
    this.#fd = openSync(path, 'w');
  }

  write(text: string): void {
    this.#pending += text;
    if (this.#pending.length >= flushThreshold) this.flush();
  }

  flush(): void {
    if (this.#pending.length === 0) return;
    writeSync(this.#fd, this.#pending);
    this.#pending = '';
  }

  /** Flush and close. Call once, also on failure (the folder is then discarded anyway). */
  close(): void {
    try {
      this.flush();
    } finally {
      closeSync(this.#fd);
    }
  }
}
