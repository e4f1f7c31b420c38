import { execFileSync } from 'node:child_process';
import { mkdtempSync, rmSync, symlinkSync, writeFileSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { afterAll, describe, expect, it } from 'vitest';
import { parseCircuit, runCircuit } from '@voltcast/core';
import { repoRoot } from './support/run-cli.ts';

// A tool builder embeds the engine in a plain Node program: the core must build to
// JavaScript that runs without any TypeScript loader, and give the same numbers.
const scratch = mkdtempSync(join(tmpdir(), 'voltcast-dist-'));
afterAll(() => rmSync(scratch, { recursive: true, force: true }));

const circuitText = `circuit: invented-embedded-filter
parts:
  V1: { voltage: { points: [[0, 0], [1m, 1]] }, between: [in, gnd] }
  R1: { resistor: 1k, between: [in, out] }
  C1: { capacitor: 1u, between: [out, gnd] }
simulate: { duration: 2m }
adc:
  CONV: { input: out, bits: 10, range: [0, 1], rate: 5k }
`;

describe('the core as JavaScript for plain Node', () => {
  it('builds with tsc and runs a circuit with the same results as the sources', () => {
    const dist = join(scratch, 'dist');
    // The built files find the core's dependencies as an installed package would.
    symlinkSync(join(repoRoot, 'packages/core/node_modules'), join(scratch, 'node_modules'), 'dir');
    execFileSync(process.execPath, [join(repoRoot, 'node_modules/typescript/bin/tsc'), '-p', join(repoRoot, 'packages/core/tsconfig.build.json'), '--outDir', dist], { cwd: repoRoot });
    const program = join(scratch, 'embed.mjs');
    writeFileSync(
      program,
      `import { parseCircuit, runCircuit } from ${JSON.stringify(join(dist, 'index.js'))};
const run = runCircuit(parseCircuit(${JSON.stringify(circuitText)}));
console.log(JSON.stringify({ out: Array.from(run.transient.columns.get('out')), codes: Array.from(run.adcs[0].code) }));`,
    );
    // No tsx, no loader: the plain node binary.
    const fromDist = JSON.parse(execFileSync(process.execPath, [program], { encoding: 'utf8' }));
    const fromSource = runCircuit(parseCircuit(circuitText));
    expect(fromDist.out).toEqual(Array.from(fromSource.transient.columns.get('out')!));
    expect(fromDist.codes).toEqual(Array.from(fromSource.adcs[0].code));
    expect(fromDist.codes.length).toBe(10); // instants 0, 0.2 ms, ..., 1.8 ms: a rate converts on [start, duration)
  });
});
