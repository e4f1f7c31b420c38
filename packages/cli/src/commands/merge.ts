import { writeOutputDir } from '../output/output-dir.ts';
import { writeEnvelopeFiles } from '../envelope/envelope-files.ts';
import { envelopeSummary } from '../envelope/envelope-summary.ts';
import { mergeParts, readPart } from '../envelope/envelope-part.ts';
import { join } from 'node:path';

export interface MergeCommandOptions {
  out?: string;
  plot?: boolean;
  quiet?: boolean;
  force?: boolean;
}

/**
 * `voltcast merge PARTS... --out DIR`: fold the parts that `voltcast envelope --shard K/N`
 * wrote (on this machine or others) into the envelope files one `voltcast envelope` writes,
 * byte for byte the same.
 */
export async function mergeCommand(paths: readonly string[], options: MergeCommandOptions): Promise<void> {
  const startedAt = performance.now();
  const parts = paths.map(readPart);
  const result = mergeParts(parts, paths);
  const { identity, shard } = parts[0];
  const outDir = options.out ?? join('out', `${identity.circuit}-envelope`);
  const { files } = await writeOutputDir(outDir, { force: options.force }, (staging) => ({ files: writeEnvelopeFiles(staging, result, options.plot ? { circuitName: identity.circuit, fileName: identity.file } : undefined) }));
  if (!options.quiet) console.log(envelopeSummary(result, identity.file, `to merge ${shard.count} part${shard.count === 1 ? '' : 's'}`, (performance.now() - startedAt) / 1000, files.map((f) => join(outDir, f))));
}
