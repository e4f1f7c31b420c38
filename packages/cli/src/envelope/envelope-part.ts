import { createHash } from 'node:crypto';
import { readdirSync, statSync } from 'node:fs';
import { join } from 'node:path';
import type { Envelope } from '@voltcast/core';
import { InputError } from '../exit-codes.ts';
import { readTextFile } from '../read-text-file.ts';
import type { Shard } from './shard.ts';

const FORMAT = 'voltcast envelope part 1';

/** What an envelope part says of the run it belongs to; parts merge only when all of it agrees. */
export interface PartIdentity {
  readonly circuit: string;
  readonly file: string;
  /** SHA-256 of the circuit file's text: parts of edited circuits do not mix. */
  readonly source: string;
  readonly runs: number;
  readonly seed: number;
  readonly corners: number;
  readonly variants: number;
}

/** One shard's envelope: the nominal run and the variants of its slice folded together. */
export interface EnvelopePart {
  readonly identity: PartIdentity;
  readonly shard: Shard & { readonly from: number; readonly end: number };
  readonly envelope: Envelope;
}

export const partFileName = (shard: Shard): string => `envelope-part-${shard.index}-of-${shard.count}.json`;

export function sourceHash(text: string): string {
  return createHash('sha256').update(text).digest('hex');
}

/** The part as JSON: numbers as JSON writes them, which read back to the same doubles. */
export function partJson(part: EnvelopePart): string {
  const e = part.envelope;
  const columns = (map: ReadonlyMap<string, Float64Array>) => Object.fromEntries(e.recorded.map((p) => [p, Array.from(map.get(p)!)]));
  return (
    JSON.stringify({
      format: FORMAT,
      ...part.identity,
      shard: part.shard,
      envelope: {
        time: Array.from(e.time),
        recorded: e.recorded,
        nominal: columns(e.nominal),
        min: columns(e.min),
        max: columns(e.max),
        adcs: e.adcs.map((a) => ({ name: a.name, index: Array.from(a.index), time: Array.from(a.time), min: Array.from(a.min), nominal: Array.from(a.nominal), max: Array.from(a.max) })),
        varied: e.varied,
      },
    }) + '\n'
  );
}

/** A part named on the command line: the file, or the one part file in a shard's output folder. */
export function readPart(path: string): EnvelopePart {
  const file = partFileIn(path);
  let data: any;
  try {
    data = JSON.parse(readTextFile(file, 'envelope part'));
  } catch (error) {
    if (error instanceof InputError) throw error;
    throw new InputError(`voltcast merge: ${file} is not an envelope part (not JSON)\n  name the envelope-part-K-of-N.json files (or the folders) that voltcast envelope --shard wrote`);
  }
  if (data?.format !== FORMAT) throw new InputError(`voltcast merge: ${file} is not an envelope part\n  name the envelope-part-K-of-N.json files (or the folders) that voltcast envelope --shard wrote`);
  const e = data.envelope;
  const columns = (o: Record<string, number[]>) => new Map<string, Float64Array>(e.recorded.map((p: string) => [p, Float64Array.from(o[p])]));
  return {
    identity: { circuit: data.circuit, file: data.file, source: data.source, runs: data.runs, seed: data.seed, corners: data.corners, variants: data.variants },
    shard: data.shard,
    envelope: {
      time: Float64Array.from(e.time),
      recorded: e.recorded,
      nominal: columns(e.nominal),
      min: columns(e.min),
      max: columns(e.max),
      adcs: e.adcs.map((a: any) => ({ name: a.name, index: Int32Array.from(a.index), time: Float64Array.from(a.time), min: Int32Array.from(a.min), nominal: Int32Array.from(a.nominal), max: Int32Array.from(a.max) })),
      varied: e.varied,
      runs: data.runs,
      corners: data.corners,
      seed: data.seed,
    },
  };
}

function partFileIn(path: string): string {
  let isFolder = false;
  try {
    isFolder = statSync(path).isDirectory();
  } catch {
    return path; // readTextFile says what is wrong with it
  }
  if (!isFolder) return path;
  const parts = readdirSync(path).filter((name) => /^envelope-part-\d+-of-\d+\.json$/.test(name));
  if (parts.length !== 1) throw new InputError(`voltcast merge: the folder ${path} holds ${parts.length === 0 ? 'no envelope part' : `${parts.length} envelope parts`}\n  name the part files themselves, or folders that voltcast envelope --shard wrote (one part each)`);
  return join(path, parts[0]);
}

/**
 * Fold the parts of one sharded envelope into the envelope a single run gives, bit for bit:
 * min and max do not care how the variants were split, and every part holds the nominal run.
 * Refuses parts of different circuits or settings, and missing or repeated shards.
 */
export function mergeParts(parts: readonly EnvelopePart[], names: readonly string[]): Envelope {
  if (parts.length === 0) throw new InputError('voltcast merge: no parts given\n  name the envelope parts: voltcast merge out/shard-*/ --out out/envelope');
  const first = parts[0];
  const keys = ['circuit', 'source', 'runs', 'seed', 'corners', 'variants'] as const;
  parts.forEach((part, i) => {
    for (const key of keys) {
      if (part.identity[key] !== first.identity[key]) {
        throw new InputError(`voltcast merge: ${names[i]} belongs to another envelope than ${names[0]}: its ${key === 'source' ? 'circuit file' : key} differs (${String(part.identity[key]).slice(0, 16)} against ${String(first.identity[key]).slice(0, 16)})\n  merge only the parts of one voltcast envelope command, run with the same file, --runs, --seed and --corners`);
      }
    }
    if (part.shard.count !== first.shard.count) throw new InputError(`voltcast merge: ${names[i]} is a slice of ${part.shard.count}, ${names[0]} of ${first.shard.count}\n  merge the parts of one split: every --shard K/N with the same N`);
  });
  const seen = new Map<number, string>();
  parts.forEach((part, i) => {
    const earlier = seen.get(part.shard.index);
    if (earlier !== undefined) throw new InputError(`voltcast merge: shard ${part.shard.index}/${part.shard.count} is given twice (${earlier} and ${names[i]})\n  name each part once`);
    seen.set(part.shard.index, names[i]);
  });
  const missing = Array.from({ length: first.shard.count }, (_, k) => k + 1).filter((k) => !seen.has(k));
  if (missing.length > 0) throw new InputError(`voltcast merge: shard${missing.length === 1 ? '' : 's'} ${missing.map((k) => `${k}/${first.shard.count}`).join(', ')} missing\n  run voltcast envelope --shard K/${first.shard.count} for ${missing.length === 1 ? 'it' : 'them'}, then merge every part`);
  const base = first.envelope;
  const min = new Map([...base.min].map(([p, v]) => [p, v.slice()]));
  const max = new Map([...base.max].map(([p, v]) => [p, v.slice()]));
  const adcs = base.adcs.map((a) => ({ ...a, min: a.min.slice(), max: a.max.slice() }));
  for (const part of parts.slice(1)) {
    for (const p of base.recorded) {
      widen(min.get(p)!, max.get(p)!, part.envelope.min.get(p)!, part.envelope.max.get(p)!);
    }
    adcs.forEach((a, k) => widen(a.min, a.max, part.envelope.adcs[k].min, part.envelope.adcs[k].max));
  }
  return { ...base, min, max, adcs };
}

function widen(min: Float64Array | Int32Array, max: Float64Array | Int32Array, lo: ArrayLike<number>, hi: ArrayLike<number>): void {
  for (let i = 0; i < min.length; i++) {
    if (lo[i] < min[i]) min[i] = lo[i];
    if (hi[i] > max[i]) max[i] = hi[i];
  }
}
