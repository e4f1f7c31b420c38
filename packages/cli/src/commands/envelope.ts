import { availableParallelism } from 'node:os';
import { writeFileSync } from 'node:fs';
import { basename, extname, join } from 'node:path';
import { assembleEnvelope, envelopePlan, runCircuit, type Envelope } from '@voltcast/core';
import { startWarningText } from '../findings-text.ts';
import { readCircuitFile } from '../read-circuit-file.ts';
import { writeOutputDir } from '../output/output-dir.ts';
import { InputError } from '../exit-codes.ts';
import { runOnWorkers } from '../envelope/run-pool.ts';
import { writeEnvelopeFiles } from '../envelope/envelope-files.ts';
import { envelopeSummary } from '../envelope/envelope-summary.ts';
import { partFileName, partJson, sourceHash } from '../envelope/envelope-part.ts';
import { parseShard, shardRange } from '../envelope/shard.ts';
import { readTextFile } from '../read-text-file.ts';
import { EnvelopeProgress } from '../envelope/envelope-progress.ts';
import { estimateText } from '../envelope/estimate.ts';

export interface EnvelopeCommandOptions {
  runs?: string;
  seed?: string;
  corners?: boolean;
  workers?: string;
  out?: string;
  plot?: boolean;
  quiet?: boolean;
  force?: boolean;
  /** `K/N`: run only the K-th of N slices of the variants and write a part for voltcast merge. */
  shard?: string;
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
  const shard = options.shard === undefined ? undefined : parseShard(options.shard);
  const range = shard === undefined ? { from: 0, end: plan.variants } : shardRange(plan.variants, shard);
  const stem = `${basename(fileName, extname(fileName))}-envelope`;
  const outDir = options.out ?? join('out', shard === undefined ? stem : `${stem}-part-${shard.index}-of-${shard.count}`);
  const { result, files } = await writeOutputDir(outDir, { force: options.force }, async (staging) => {
    const nominalStart = performance.now();
    const nominal = runCircuit(circuit, { onWarning: (warning) => console.error(startWarningText(fileName, warning)) });
    const variants = range.end - range.from;
    const threads = Math.min(workers, Math.max(1, variants));
    const estimate = estimateText(variants, threads, (performance.now() - nominalStart) / 1000);
    if (estimate !== undefined && !options.quiet) console.error(estimate);
    const progress = new EnvelopeProgress(variants, !options.quiet);
    let result: Envelope;
    try {
      const bounds = await runOnWorkers(plan, file, threads, (done) => progress.update(done), range);
      result = assembleEnvelope(plan, nominal, bounds);
    } finally {
      progress.stop();
    }
    if (shard !== undefined) {
      const identity = { circuit: circuit.name, file: fileName, source: sourceHash(readTextFile(file, 'circuit file')), runs: plan.runs, seed: plan.seed, corners: plan.corners, variants: plan.variants };
      writeFileSync(join(staging, partFileName(shard)), partJson({ identity, shard: { ...shard, ...range }, envelope: result }));
      return { result, files: [partFileName(shard)] };
    }
    return { result, files: writeEnvelopeFiles(staging, result, options.plot ? { circuitName: circuit.name, fileName } : undefined) };
  });
  const how = `on ${workers} worker${workers === 1 ? '' : 's'}${shard === undefined ? '' : `, shard ${shard.index}/${shard.count}: variants ${range.from} to ${range.end - 1} of ${plan.variants} (merge the parts with voltcast merge)`}`;
  if (!options.quiet) console.log(envelopeSummary(result, fileName, how, (performance.now() - startedAt) / 1000, files.map((f) => join(outDir, f))));
}

function wholeNumber(text: string, option: string, min: number): number {
  const value = Number(text);
  if (!Number.isInteger(value) || value < min || value > 2 ** 31 - 1) throw new InputError(`voltcast envelope: ${option} ${text} is not a whole number of at least ${min}\n  for example ${option} ${Math.max(min, 100)}`);
  return value;
}
