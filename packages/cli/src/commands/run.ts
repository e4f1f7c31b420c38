import { writeFileSync } from 'node:fs';
import { basename, extname, join } from 'node:path';
import { runCircuit, type CircuitRun } from '@voltcast/core';
import { startWarningText } from '../findings-text.ts';
import { readCircuitFile } from '../read-circuit-file.ts';
import { InputError } from '../exit-codes.ts';
import { writeOutputDir } from '../output/output-dir.ts';
import { WaveformCsv } from '../waveform-csv.ts';
import { nodeExtremes } from '../node-extremes.ts';
import { buildReport, writeReport } from '../report.ts';
import { RunProgress } from '../progress.ts';
import { runSummary } from '../summary.ts';
import { parseCodeFormats, writeAdcFiles } from '../adc-files.ts';
import { renderFigure } from '../plot/render-figure.ts';
import { runFigure } from '../plot/run-plot.ts';

export interface RunOptions {
  /** Output folder; default `out/<circuit file base name>` in the current folder. */
  out?: string;
  /** No progress bar and no summary; warnings and errors still go to stderr. */
  quiet?: boolean;
  /** Also write `plot.svg`: the waveforms and ADC codes (keeps the columns in memory). */
  plot?: boolean;
  /** Extra forms of the ADC codes, comma-separated: `c-header`, `json`. */
  codesAs?: string;
  /** Write into a folder that holds other files, beside them (voltcast's own files are replaced). */
  force?: boolean;
  /** Add the parts' noise: `true` (seed 1) or the seed as typed. */
  noise?: boolean | string;
}

/** `voltcast run FILE`: simulate, stream `waveforms.csv`, write the reports, print a summary. */
export async function runCommand(file: string, options: RunOptions): Promise<void> {
  const { circuit, fileName, warnings } = readCircuitFile(file);
  for (const warning of warnings) console.error(warning);
  const outDir = options.out ?? defaultOutDir(fileName);
  const codeFormats = parseCodeFormats(options.codesAs ?? '');
  const noise = noiseOption(options.noise);
  const progress = new RunProgress(circuit.simulate.duration, !options.quiet);
  const startedAt = performance.now();

  const { report, files } = await writeOutputDir(outDir, { force: options.force }, (staging) => {
    const csv = new WaveformCsv(join(staging, 'waveforms.csv'), circuit.recorded);
    const lastRow = new Float64Array(circuit.recorded.length);
    let run: CircuitRun;
    try {
      run = runCircuit(circuit, {
        keepColumns: options.plot === true,
        onRow: (time, values) => {
          csv.row(time, values);
          lastRow.set(values);
        },
        onProgress: (fraction) => progress.update(fraction),
        onWarning: (warning) => console.error(startWarningText(fileName, warning)),
        ...(noise !== undefined ? { noise } : {}),
      });
    } finally {
      progress.stop();
      csv.close();
    }
    const built = buildReport(fileName, run, nodeExtremes(run.transient, lastRow));
    const report = noise !== undefined ? { ...built, noise } : built;
    const adcFiles = writeAdcFiles(staging, circuit.name, run.adcs, codeFormats);
    const names = ['waveforms.csv', ...adcFiles, ...writeReport(staging, report).map((path) => basename(path))];
    if (options.plot) {
      writeFileSync(join(staging, 'plot.svg'), renderFigure(runFigure(circuit, fileName, run.transient, run.adcs, run.findings.saturation)));
      names.push('plot.svg');
    }
    return { report, files: names };
  });

  if (!options.quiet) {
    const wallSeconds = (performance.now() - startedAt) / 1000;
    console.log(runSummary(report, circuit, wallSeconds, files.map((name) => join(outDir, name))));
  }
}

function noiseOption(value: boolean | string | undefined): { seed: number } | undefined {
  if (value === undefined || value === false) return undefined;
  if (value === true) return { seed: 1 };
  const seed = Number(value);
  if (!(Number.isInteger(seed) && seed >= 0 && seed < 2 ** 31)) throw new InputError(`voltcast run: --noise ${value} is not a seed\n  write a whole number from 0 to 2147483647, e.g. --noise 7, or --noise alone for seed 1`);
  return { seed };
}

function defaultOutDir(file: string): string {
  return join('out', basename(file, extname(file)));
}
