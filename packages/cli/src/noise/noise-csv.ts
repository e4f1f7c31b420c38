import { writeFileSync } from 'node:fs';
import type { NoiseAnalysis } from '@voltcast/core';
import { csvField, formatValue } from '../waveform-csv.ts';

/**
 * `noise.csv`: header `frequency,<node>,...`, one row per point of the band; hertz and the
 * output noise density in V/√Hz of each recorded node (and each differential converter input),
 * 9 significant digits as in waveforms.csv.
 */
export function writeNoiseCsv(path: string, noise: NoiseAnalysis): void {
  const lines = [['frequency', ...noise.nodes.map((n) => n.node)].map(csvField).join(',')];
  for (let i = 0; i < noise.frequency.length; i++) {
    let line = formatValue(noise.frequency[i]);
    for (const n of noise.nodes) line += `,${formatValue(n.density[i])}`;
    lines.push(line);
  }
  writeFileSync(path, lines.join('\n') + '\n');
}
