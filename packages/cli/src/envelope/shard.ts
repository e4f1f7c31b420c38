import { InputError } from '../exit-codes.ts';

/** The K-th of N slices of an envelope's variants (1-based K). */
export interface Shard {
  readonly index: number;
  readonly count: number;
}

/** `--shard K/N`, e.g. `3/8`: 1 ≤ K ≤ N. */
export function parseShard(text: string): Shard {
  const match = /^(\d+)\/(\d+)$/.exec(text.trim());
  const index = match ? Number(match[1]) : NaN;
  const count = match ? Number(match[2]) : NaN;
  if (!(count >= 1 && index >= 1 && index <= count && count <= 1_000_000)) {
    throw new InputError(`voltcast envelope: --shard ${text} is not a slice K/N with 1 ≤ K ≤ N\n  write e.g. --shard 3/8 for the third of eight slices (an indexed job's index + 1 over its count)`);
  }
  return { index, count };
}

/** The variants of slice `shard` out of `variants`: [from, end), the slices as equal as whole runs allow. */
export function shardRange(variants: number, shard: Shard): { from: number; end: number } {
  return { from: Math.floor(((shard.index - 1) * variants) / shard.count), end: Math.floor((shard.index * variants) / shard.count) };
}
