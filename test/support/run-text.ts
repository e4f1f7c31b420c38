import { parseCircuit, simulate, type TransientResult } from '@voltcast/core';

/** Parse a circuit written inline and run it. */
export function runText(yaml: string): TransientResult {
  return simulate(parseCircuit(yaml, { fileName: 'inline.yaml' }));
}

/** A recorded node's column, failing loudly when absent. */
export function column(result: TransientResult, node: string): Float64Array {
  const c = result.columns.get(node);
  if (c === undefined) throw new Error(`no column ${node}`);
  return c;
}

/** Largest |a[i] - f(t[i])| over all rows. */
export function maxError(time: Float64Array, values: Float64Array, exact: (t: number) => number): number {
  let worst = 0;
  for (let i = 0; i < time.length; i++) worst = Math.max(worst, Math.abs(values[i] - exact(time[i])));
  return worst;
}
