import { BufferedWriter } from './buffered-writer.ts';

/**
 * `waveforms.csv`: header `time,<node>,...`, then one row per output step, every value in SI
 * base units (seconds, volts) as a plain number.
 *
 * Values are rounded to 9 significant digits, then printed in JavaScript's shortest form. Nine
 * digits is far finer than the engine's step error (relative tolerance 1e-4) and resolves an
 * output grid of up to a billion rows, while it turns grid times such as 3 × 0.1 into `0.3`
 * rather than `0.30000000000000004`, which a shortest round-trip print of the raw double would
 * show; files also come out about half the size of 17-digit output.
 */
export class WaveformCsv {
  readonly #out: BufferedWriter;

  constructor(path: string, recorded: readonly string[]) {
    this.#out = new BufferedWriter(path);
    this.#out.write(['time', ...recorded].map(csvField).join(',') + '\n');
  }

  get path(): string {
    return this.#out.path;
  }

  /**
   * One output row; `values` are in record order (the array may be reused by the caller).
   * The time is written in full (it reads as its decimal already), values to 9 digits.
   */
  row(time: number, values: Float64Array): void {
    let line = String(time);
    for (let i = 0; i < values.length; i++) line += ',' + formatValue(values[i]);
    this.#out.write(line + '\n');
  }

  close(): void {
    this.#out.close();
  }
}

export function formatValue(value: number): string {
  return String(Number(value.toPrecision(9)));
}

/** Quote a header field when it holds a comma, quote or line break (RFC 4180). */
export function csvField(text: string): string {
  return /[",\r\n]/.test(text) ? `"${text.replace(/"/g, '""')}"` : text;
}
