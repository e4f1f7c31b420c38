import { readdirSync, readFileSync } from 'node:fs';
import { join } from 'node:path';
import { describe, expect, it } from 'vitest';
import { parseCircuit, runCircuit } from '@voltcast/core';
import { repoRoot } from './support/run-cli.ts';

// Every example circuit, diodes and comparators included, must run with Newton converging
// on every step it tries: a step cut because Newton failed means the nonlinear stamps or
// their limiting need work, even when the run still ends.
const folder = join(repoRoot, 'fixtures');
const files = readdirSync(folder).filter((name) => name.endsWith('.yaml')).sort();

describe.each(files)('fixtures/%s', (file) => {
  it('runs with Newton converging on every step', () => {
    const circuit = parseCircuit(readFileSync(join(folder, file), 'utf8'), { fileName: file, readFile: (path) => readFileSync(join(folder, path), 'utf8') });
    const run = runCircuit(circuit);
    expect(run.transient.stats.newtonFailures).toBe(0);
    expect(run.transient.stats.acceptedSteps).toBeGreaterThan(0);
  });
});
