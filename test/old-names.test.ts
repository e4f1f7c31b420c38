import { readdirSync, readFileSync, statSync } from 'node:fs';
import { join, relative } from 'node:path';
import { describe, expect, it } from 'vitest';
import { readCircuit } from '@voltcast/core';
import { program } from '../packages/cli/src/program.ts';
import { repoRoot } from './support/run-cli.ts';

// Spellings voltcast gave up for names of its own. They may appear only in this file, which
// shows that they are refused.
const retired: readonly [RegExp, string][] = [
  [/\bprobes\s*:/, 'the `probes:` key (now `record:`)'],
  [/--probe\b/, 'the `--probe` option (now `--signal`)'],
  [/\b(relative|voltage|current)-tolerance\b/, 'the flat tolerance keys (now `accuracy: { relative, volts, amps }`)'],
  [/\brepeat\s*:/, 'the `repeat:` key (now `every:`)'],
  [/measureOscillation/, 'measureOscillation (now oscillationFigures)'],
  [/no DC path/, 'the old floating-node and open-pin wording'],
];

const roots = ['packages/core/src', 'packages/cli/src', 'packages/core/test', 'packages/cli/test', 'test', 'bench', 'docs', 'fixtures', 'README.md', 'DEVELOPERS.md'];
const skip = new Set(['node_modules', 'dist', 'api']);

function files(path: string): string[] {
  if (!statSync(path).isDirectory()) return [path];
  return readdirSync(path).filter((name) => !skip.has(name)).flatMap((name) => files(join(path, name)));
}

describe('retired names', () => {
  it('appear nowhere in sources, tests, docs or fixtures', () => {
    const self = relative(repoRoot, import.meta.filename);
    const found: string[] = [];
    for (const file of roots.flatMap((root) => files(join(repoRoot, root)))) {
      const name = relative(repoRoot, file);
      if (name === self || !/\.(ts|mjs|md|yaml|csv|json)$/.test(name)) continue;
      readFileSync(file, 'utf8').split('\n').forEach((line, i) => {
        for (const [pattern, what] of retired) if (pattern.test(line)) found.push(`${name}:${i + 1}: ${what}`);
      });
    }
    expect(found).toEqual([]);
  });

  it('--probe is an unknown option of compare', async () => {
    const parsed = program(() => undefined).parseAsync(['node', 'voltcast', 'compare', 'capture.csv', 'envelope.csv', '--probe', 'adc']);
    await expect(parsed).rejects.toMatchObject({ code: 'commander.unknownOption', exitCode: 1 });
  });

  const base = 'circuit: old\nparts:\n  V1: { voltage: { points: [[0, 0], [1m, 1]] }, between: [in, gnd] }\n  R1: { resistor: 1k, between: [in, gnd] }\nsimulate: { duration: 1m }\n';
  it.each([
    ['probes: [in]\n', "unknown key 'probes'"],
    [base.replace('duration: 1m', 'duration: 1m, relative-tolerance: 1e-3'), "unknown key 'relative-tolerance'"],
    [base.replace('[1m, 1]] }', '[1m, 1]], repeat: 2m }'), "unknown key 'repeat'"],
  ])('are unknown keys in a circuit file: %s', (text, message) => {
    const source = text.startsWith('probes') ? base + text : text;
    const { circuit, issues } = readCircuit(source);
    expect(circuit).toBeUndefined();
    expect(issues.map((issue) => issue.message)).toContain(message);
  });
});
