import type { TransientResult } from '@voltcast/core';

/** Smallest, largest and last value of one recorded node over a run. */
export interface NodeExtremes {
  readonly node: string;
  readonly min: number;
  readonly max: number;
  readonly final: number;
}

/** Each recorded node's extremes over every accepted step (not only the rows) and its last row's value. */
export function nodeExtremes(transient: TransientResult, lastRow: Float64Array): NodeExtremes[] {
  return transient.recorded.map((node, i) => ({ node, min: transient.minimum[i], max: transient.maximum[i], final: lastRow[i] }));
}
