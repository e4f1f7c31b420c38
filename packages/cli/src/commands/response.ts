import { writeFileSync } from 'node:fs';
import { basename, extname, join } from 'node:path';
import { formatSI, frequencyResponse, type FrequencyResponse } from '@voltcast/core';
import { readCircuitFile } from '../read-circuit-file.ts';
import { writeOutputDir } from '../output/output-dir.ts';
import { InputError } from '../exit-codes.ts';
import { writeResponseCsv } from '../response/response-csv.ts';
import { buildResponseReport, writeResponseReport } from '../response/response-report.ts';
import { renderFigure } from '../plot/render-figure.ts';
import { responseFigure } from '../plot/response-plot.ts';

export interface ResponseCommandOptions {
  /** Output folder; default `out/<circuit file base name>-response`. */
  out?: string;
  /** Also write `plot.svg`. */
  plot?: boolean;
  /** Phase margin the hints aim for, degrees, as typed. */
  phaseMargin?: string;
  /** No summary on stdout. */
  quiet?: boolean;
  /** Write into a folder that holds other files, beside them (voltcast's own files are replaced). */
  force?: boolean;
}

/**
 * `voltcast response FILE`: the frequency sweep of the file's `response:` section; writes
 * `response.csv`, `response.json`, `response.txt` and with `--plot` `plot.svg`.
 */
export async function responseCommand(file: string, options: ResponseCommandOptions): Promise<void> {
  const targetMargin = marginOption(options.phaseMargin);
  const { circuit, fileName, warnings } = readCircuitFile(file);
  for (const warning of warnings) console.error(warning);
  if (circuit.response === undefined) {
    throw new InputError(`${fileName}: no response: section, so there is nothing to sweep\n  add e.g. \`response: { input: VIN, from: 10, to: 1M }\`, naming the source that drives the stage`);
  }
  const response = frequencyResponse(circuit, { targetMargin });
  const outDir = options.out ?? join('out', `${basename(fileName, extname(fileName))}-response`);
  const files = await writeOutputDir(outDir, { force: options.force }, (staging) => {
    writeResponseCsv(join(staging, 'response.csv'), response);
    const written = ['response.csv', ...writeResponseReport(staging, buildResponseReport(circuit.name, fileName, response))];
    if (options.plot) {
      writeFileSync(join(staging, 'plot.svg'), renderFigure(responseFigure(circuit.name, fileName, response)));
      written.push('plot.svg');
    }
    return written;
  });
  for (const w of response.warnings) console.error(`${fileName}: warning: ${w.message}\n  ${w.hint}`);
  if (!options.quiet) console.log(summary(response, fileName, files.map((f) => join(outDir, f))));
}

function marginOption(text: string | undefined): number {
  if (text === undefined) return 60;
  const value = Number(text);
  if (!(value > 0 && value < 180)) throw new InputError(`voltcast response: --phase-margin ${text} is not an angle between 0 and 180 degrees\n  write e.g. --phase-margin 45`);
  return value;
}

function summary(response: FrequencyResponse, fileName: string, files: readonly string[]): string {
  const loops = response.loops.map((l) =>
    l.crossover === null
      ? `  ${l.part}: ${l.state === 'linear' ? 'no crossover within the sweep' : `at the operating point: ${l.state}`}`
      : `  ${l.part}: crossover ${formatSI(l.crossover, 'Hz')}, phase margin ${l.phaseMargin!.toFixed(1)}°${l.gainMargin !== null ? `, gain margin ${l.gainMargin.toFixed(1)} dB` : ''}`,
  );
  const peaks = response.nodes.flatMap((n) => n.peaks).map((p) => `  ${p.node} peaks at ${formatSI(p.frequency, 'Hz')}: ${p.dB.toFixed(1)} dB`);
  const { from, to } = response.settings;
  return [
    `${fileName}: frequency response from ${formatSI(from, 'Hz')} to ${formatSI(to, 'Hz')}, ${response.frequency.length} points`,
    ...(loops.length > 0 ? ['loops', ...loops] : []),
    ...(peaks.length > 0 ? ['peaks', ...peaks] : []),
    'files',
    ...files.map((f) => `  ${f}`),
  ].join('\n');
}
