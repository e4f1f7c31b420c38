import { decimalRounded } from '../units/decimal.ts';

/**
 * Output row times: k·outputStep (to the decimal it reads as) for k = 0..N-1, and the duration itself as the
 * last row. Computed from k, never accumulated, so that row times carry no drift.
 */
export class OutputGrid {
  readonly rows: number;
  constructor(
    private readonly step: number,
    private readonly duration: number,
  ) {
    this.rows = Math.max(1, Math.ceil(duration / step - 1e-9)) + 1;
  }
  time(row: number): number {
    return row >= this.rows - 1 ? this.duration : decimalRounded(row * this.step);
  }
}
