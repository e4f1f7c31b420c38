import { writeFileSync } from 'node:fs';
import type { AdcEnvelope, Envelope } from '@voltcast/core';
import { formatValue } from '../waveform-csv.ts';

/** `envelope.csv`: `time,<node>.min,<node>.nominal,<node>.max,...`, one row per output step. */
export function writeEnvelopeCsv(path: string, result: Envelope): void {
  const header = ['time', ...result.recorded.flatMap((p) => [`${p}.min`, `${p}.nominal`, `${p}.max`])];
  const columns = result.recorded.flatMap((p) => [result.min.get(p)!, result.nominal.get(p)!, result.max.get(p)!]);
  const lines = [header.join(',')];
  for (let r = 0; r < result.time.length; r++) {
    let line = formatValue(result.time[r]);
    for (const column of columns) line += ',' + formatValue(column[r]);
    lines.push(line);
  }
  writeFileSync(path, lines.join('\n') + '\n');
}

/**
 * `envelope-adc-NAME.csv`: `index,time,NAME.min,NAME.nominal,NAME.max`, one row per code. The
 * columns carry the converter's name so that `voltcast compare` calls the signal by it.
 */
export function writeAdcEnvelopeCsv(path: string, adc: AdcEnvelope): void {
  const lines = [['index', 'time', ...['min', 'nominal', 'max'].map((limit) => `${adc.name}.${limit}`)].join(',')];
  for (let i = 0; i < adc.index.length; i++) lines.push(`${adc.index[i]},${formatValue(adc.time[i])},${adc.min[i]},${adc.nominal[i]},${adc.max[i]}`);
  writeFileSync(path, lines.join('\n') + '\n');
}
