import { formatSI, type Envelope } from '@voltcast/core';

/** The lines `voltcast envelope` and `voltcast merge` print: what was run, each node's widest band, the files. */
export function envelopeSummary(result: Envelope, fileName: string, how: string, wallSeconds: number, files: readonly string[]): string {
  const widest = result.recorded.map((p) => {
    const min = result.min.get(p)!;
    const max = result.max.get(p)!;
    let spread = 0;
    for (let r = 0; r < min.length; r++) spread = Math.max(spread, max[r] - min[r]);
    return `  ${p}: widest band ${formatSI(spread, 'V')}`;
  });
  return [
    `${fileName}: envelope of ${result.runs} Monte Carlo runs (seed ${result.seed}) and ${result.corners} corners over ${result.varied.length} toleranced values`,
    `  ${formatSI(wallSeconds, 's', 3)} wall time ${how}`,
    ...widest,
    'files',
    ...files.map((f) => `  ${f}`),
  ].join('\n');
}
