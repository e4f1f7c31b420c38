import { availableParallelism } from 'node:os';
import { writeFileSync } from 'node:fs';
import { basename, extname, join } from 'node:path';
import { assembleEnvelope, envelopePlan, formatSI, runCircuit, type Envelope } from '@voltcast/core';
import { readCircuitFile } from '../read-circuit-file.ts';
import { writeOutputDir } from '../output/output-dir.ts';
import { InputError } from '../exit-codes.ts';
import { runOnWorkers } from '../envelope/run-pool.ts';
import { writeAdcEnvelopeCsv, writeEnvelopeCsv } from '../envelope/envelope-csv.ts';
import { EnvelopeProgress } from '../envelope/envelope-progress.ts';
import { estimateText } from '../envelope/estimate.ts';
import { envelopeFigure } from '../plot/envelope-plot.ts';
import { renderFigure } from '../plot/render-figure.ts';

export interface EnvelopeCommandOptions {
  runs?: string;
  seed?: string;
  corners?: boolean;
  workers?: string;
  out?: string;
  plot?: boolean;
  quiet?: boolean;
  force?: boolean;
}

/**
 * `voltcast envelope FILE`: the nominal run, seeded Monte Carlo runs and, with `--corners`,
 * the worst-case corners, spread over worker threads; writes `envelope.csv`, per ADC
 * `envelope-adc-NAME.csv`, and with `--plot` `plot.svg`.
 */
export async function envelopeCommand(file: string, options: EnvelopeCommandOptions): Promise<void> {
  const runs = wholeNumber(options.runs ?? '0', '--runs', 0);
  const seed = wholeNumber(options.seed ?? '1', '--seed', -(2 ** 31));
  const workers = wholeNumber(options.workers ?? String(availableParallelism()), '--workers', 1);
  if (runs === 0 && !options.corners) throw new InputError('voltcast envelope: nothing to vary\n  give --runs N for Monte Carlo runs, --corners for worst-case corners, or both');
  const { circuit, fileName, warnings } = readCircuitFile(file);
  for (const warning of warnings) console.error(warning);
  const plan = envelopePlan(circuit, { runs, seed, corners: options.corners === true });
  if (plan.slots.length === 0) console.error(`${fileName}: warning: no part has a tolerance, so every run is the nominal one\n  add for example \`tolerance: 1%\` to resistors`);
  const startedAt = performance.now();
  const outDir = options.out ?? join('out', `${basename(fileName, extname(fileName))}-envelope`);
  const { result, files } = await writeOutputDir(outDir, { force: options.force }, async (staging) => {
    const nominalStart = performance.now();
    const nominal = runCircuit(circuit);
    const threads = Math.min(workers, Math.max(1, plan.variants));
    const estimate = estimateText(plan.variants, threads, (performance.now() - nominalStart) / 1000);
    if (estimate !== undefined && !options.quiet) console.error(estimate);
    const progress = new EnvelopeProgress(plan.variants, !options.quiet);
    let result: Envelope;
    try {
      const bounds = await runOnWorkers(plan, file, threads, (done) => progress.update(done));
      result = assembleEnvelope(plan, nominal, bounds);
    } finally {
      progress.stop();
    }
    writeEnvelopeCsv(join(staging, 'envelope.csv'), result);
    const files = ['envelope.csv'];
    for (const adc of result.adcs) {
      files.push(`envelope-adc-${adc.name}.csv`);
      writeAdcEnvelopeCsv(join(staging, files.at(-1)!), adc);
    }
    if (options.plot) {
      files.push('plot.svg');
      writeFileSync(join(staging, 'plot.svg'), renderFigure(envelopeFigure(result, circuit.name, fileName)));
    }
    return { result, files };
  });
  if (!options.quiet) console.log(summary(result, fileName, workers, (performance.now() - startedAt) / 1000, files.map((f) => join(outDir, f))));
}

function summary(result: Envelope, fileName: string, workers: number, wallSeconds: number, files: readonly string[]): string {
  const widest = result.recorded.map((p) => {
    const min = result.min.get(p)!;
    const max = result.max.get(p)!;
    let spread = 0;
    for (let r = 0; r < min.length; r++) spread = Math.max(spread, max[r] - min[r]);
    return `  ${p}: widest band ${formatSI(spread, 'V')}`;
  });
  return [
    `${fileName}: envelope of ${result.runs} Monte Carlo runs (seed ${result.seed}) and ${result.corners} corners over ${result.varied.length} toleranced values`,
    `  ${formatSI(wallSeconds, 's', 3)} wall time on ${workers} worker${workers === 1 ? '' : 's'}`,
    ...widest,
    'files',
    ...files.map((f) => `  ${f}`),
  ].join('\n');
}

function wholeNumber(text: string, option: string, min: number): number {
  const value = Number(text);
  if (!Number.isInteger(value) || value < min || value > 2 ** 31 - 1) throw new InputError(`voltcast envelope: ${option} ${text} is not a whole number of at least ${min}\n  for example ${option} ${Math.max(min, 100)}`);
  return value;
}
