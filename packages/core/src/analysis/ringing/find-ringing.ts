import { RingingSearch, type RingingResult } from './ringing-search.ts';
import type { RingingEvent, RingingOptions } from './types.ts';

/** Waveforms on the output grid, as a `TransientResult` holds them. */
export interface RowWaveforms {
  readonly time: Float64Array;
  readonly columns: ReadonlyMap<string, Float64Array>;
  /** Rows filled (defaults to time.length). */
  readonly rows?: number;
}

/**
 * The ringing search (`RingingSearch`) over waveforms already in memory: after each cluster
 * of events, a damped oscillation on any column, its figures, and the solver and resolution
 * warnings. A run does the same as its rows arrive, without keeping them.
 */
export function findRinging(waves: RowWaveforms, events: readonly RingingEvent[], outputStep: number, options: RingingOptions = {}): RingingResult {
  const nodes = [...waves.columns.keys()];
  const columns = [...waves.columns.values()];
  const search = new RingingSearch(nodes, outputStep, options);
  for (const e of events) search.event(e);
  const row = new Float64Array(nodes.length);
  const rows = waves.rows ?? waves.time.length;
  for (let i = 0; i < rows; i++) {
    for (let p = 0; p < columns.length; p++) row[p] = columns[p][i];
    search.row(waves.time[i], row, Infinity);
  }
  return search.finish();
}
