import { writeFileSync } from 'node:fs';
import type { FrequencyResponse } from '@voltcast/core';
import { csvField, formatValue } from '../waveform-csv.ts';

/**
 * `response.csv`: header `frequency,<node>.dB,<node>.deg,...`, one row per sweep point;
 * hertz, decibels and unwrapped degrees, 9 significant digits as in waveforms.csv. A node that
 * does not move at all reads -Infinity dB.
 */
export function writeResponseCsv(path: string, response: FrequencyResponse): void {
  const header = ['frequency', ...response.nodes.flatMap((n) => [`${n.node}.dB`, `${n.node}.deg`])];
  const lines = [header.map(csvField).join(',')];
  for (let i = 0; i < response.frequency.length; i++) {
    let line = formatValue(response.frequency[i]);
    for (const n of response.nodes) line += `,${formatValue(n.dB[i])},${formatValue(n.degrees[i])}`;
    lines.push(line);
  }
  writeFileSync(path, lines.join('\n') + '\n');
}
