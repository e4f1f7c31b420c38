import { rowsText } from './rows-text.ts';
import { isAbsolute, relative, resolve } from 'node:path';
import { formatSI, type Circuit } from '@voltcast/core';
import { nodeTable, type RunReport } from './report.ts';
import { textTable } from './text-table.ts';
import { topFindings } from './findings-text.ts';

/** The one-screen summary printed on stdout after a successful run. */
export function runSummary(report: RunReport, circuit: Circuit, wallSeconds: number, files: readonly string[]): string {
  const { stats } = report;
  const lines = [
    `${report.circuit} (${report.file})`,
    ...textTable([
      ['simulated', `${formatSI(circuit.simulate.duration, 's')} in ${formatSI(wallSeconds, 's', 3)} wall time`],
      ['rows every', rowsText(circuit.simulate)],
      ['steps', `${stats.acceptedSteps} accepted, ${stats.rejectedSteps} rejected`],
      ['LU factorizations', String(stats.factorizations)],
    ], 2),
    'files',
    ...files.map((file) => `  ${displayPath(file)}`),
    'recorded nodes',
    ...nodeTable(report.recorded, false),
    'findings',
    ...topFindings(report).map((line) => `  ${line}`),
  ];
  return lines.join('\n');
}

/** Relative to the current folder when the file lies under it, else absolute. */
function displayPath(file: string): string {
  const absolute = resolve(file);
  const fromHere = relative(process.cwd(), absolute);
  return fromHere.startsWith('..') || isAbsolute(fromHere) ? absolute : fromHere;
}
