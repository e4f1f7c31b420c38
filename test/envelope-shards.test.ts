import { mkdtempSync, readFileSync, rmSync, writeFileSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { repoRoot, runCli } from './support/run-cli.ts';

// Shards of one envelope run on separate machines (here: separate processes), then merged:
// min and max are associative, so the merge must give the single run's files byte for byte.
const fixture = join(repoRoot, 'fixtures/envelope-rc-filter.yaml');
const settings = ['--runs', '12', '--corners', '--seed', '5', '--workers', '1', '--quiet'];
const files = ['envelope.csv', 'envelope-adc-MCU.csv'];

let scratch: string;
beforeAll(async () => {
  scratch = mkdtempSync(join(tmpdir(), 'voltcast-shards-'));
  const single = await runCli(['envelope', fixture, ...settings, '--out', join(scratch, 'single')]);
  expect(single.code).toBe(0);
});
afterAll(() => rmSync(scratch, { recursive: true, force: true }));

async function shards(count: number, seed = '5'): Promise<string[]> {
  const folders: string[] = [];
  for (let k = 1; k <= count; k++) {
    const out = join(scratch, `n${count}-s${seed}`, String(k));
    const args = ['envelope', fixture, ...settings, '--shard', `${k}/${count}`, '--out', out].map((a, i, all) => (all[i - 1] === '--seed' ? seed : a));
    const { code, stderr } = await runCli(args);
    expect(stderr).toBe('');
    expect(code).toBe(0);
    folders.push(out);
  }
  return folders;
}

describe('envelopes past one machine: --shard K/N and merge', () => {
  it.each([1, 2, 3, 7])('%i shards merged equal the single run byte for byte', async (count) => {
    const parts = await shards(count);
    const out = join(scratch, `merged-${count}`);
    // In any order: the fold does not care.
    const { code, stderr } = await runCli(['merge', ...parts.reverse(), '--out', out, '--quiet']);
    expect(stderr).toBe('');
    expect(code).toBe(0);
    for (const file of files) expect(readFileSync(join(out, file))).toEqual(readFileSync(join(scratch, 'single', file)));
  });

  it('refuses a missing or repeated shard, and parts of another envelope (exit 2, what to do)', async () => {
    const [first, second] = await shards(2);
    const missing = await runCli(['merge', first, '--out', join(scratch, 'm1')]);
    expect(missing.code).toBe(2);
    expect(missing.stderr).toContain('voltcast merge: shard 2/2 missing\n  run voltcast envelope --shard K/2 for it, then merge every part');
    const twice = await runCli(['merge', first, first, second, '--out', join(scratch, 'm2')]);
    expect(twice.code).toBe(2);
    expect(twice.stderr).toMatch(/shard 1\/2 is given twice/);
    const [otherSeed] = await shards(2, '6');
    const mixed = await runCli(['merge', otherSeed, second, '--out', join(scratch, 'm3')]);
    expect(mixed.code).toBe(2);
    expect(mixed.stderr).toMatch(/belongs to another envelope than .*: its seed differs \(5 against 6\)/);
    const notPart = join(scratch, 'notes.json');
    writeFileSync(notPart, '{"hello": 1}');
    const foreign = await runCli(['merge', notPart, '--out', join(scratch, 'm4')]);
    expect(foreign.code).toBe(2);
    expect(foreign.stderr).toMatch(/is not an envelope part/);
    const badShard = await runCli(['envelope', fixture, ...settings, '--shard', '3/2', '--out', join(scratch, 'x')]);
    expect(badShard.code).toBe(2);
    expect(badShard.stderr).toMatch(/--shard 3\/2 is not a slice K\/N with 1 ≤ K ≤ N/);
  });
});
