import { mkdtempSync, readFileSync, rmSync, writeFileSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { afterAll, beforeAll, describe, expect, test } from 'vitest';
import { repoRoot, runCli } from './support/run-cli.ts';
import { xmlProblems } from './support/xml-well-formed.ts';

// The invented glasshouse fixture's envelope is made once; the captures are synthetic
// (fixtures/data/moisture-capture-*.csv say how they were made).
let scratch: string;
let envelopeFile: string;
const capture = (name: string) => join(repoRoot, 'fixtures', 'data', `moisture-capture-${name}.csv`);
beforeAll(async () => {
  scratch = mkdtempSync(join(tmpdir(), 'voltcast-compare-'));
  const { code } = await runCli(['envelope', join(repoRoot, 'fixtures', 'envelope-rc-filter.yaml'), '--corners', '--out', join(scratch, 'env'), '--quiet']);
  expect(code).toBe(0);
  envelopeFile = join(scratch, 'env', 'envelope.csv');
}, 60_000);
afterAll(() => rmSync(scratch, { recursive: true, force: true }));

describe('voltcast compare', () => {
  test('passes the good capture once aligned (exit 0) and fails it unaligned (exit 1)', async () => {
    const aligned = await runCli(['compare', capture('good'), envelopeFile, '--signal', 'adc', '--shift', 'auto']);
    expect(aligned.code).toBe(0);
    // The synthetic capture was made with a 37 µs delay (see its header).
    expect(aligned.stdout).toMatch(/^PASS adc: 100\.00% of \d+ samples inside \(shift 37(\.\d+)? µs/);
    const given = await runCli(['compare', capture('good'), envelopeFile, '--signal', 'adc', '--shift', '37u']);
    expect(given.code).toBe(0);
    const unaligned = await runCli(['compare', capture('good'), envelopeFile, '--signal', 'adc']);
    expect(unaligned.code).toBe(1);
    expect(unaligned.stdout).toMatch(/^FAIL adc/);
  });

  test('fails the dropout capture at the dropout, with JSON and a plot', async () => {
    const plot = join(scratch, 'dropout.svg');
    const { code, stdout } = await runCli(['compare', capture('dropout'), envelopeFile, '--signal', 'adc', '--column', 'adc', '--shift', 'auto', '--json', '--plot', plot]);
    expect(code).toBe(1);
    const verdict = JSON.parse(stdout);
    expect(verdict.pass).toBe(false);
    // The dropout starts at 5.1 ms in the capture's own time (its header, by construction).
    expect(verdict.firstViolation.time).toBeCloseTo(5.1e-3, 9);
    expect(verdict.firstViolation.value).toBeLessThan(verdict.firstViolation.min);
    // 40 samples (5.1 ms to 5.295 ms every 5 µs) are in the dropout; all are outside.
    expect(verdict.violations).toBe(40);
    expect(verdict.fractionInside).toBeCloseTo(1 - 40 / verdict.compared, 9);
    expect(xmlProblems(readFileSync(plot, 'utf8'))).toEqual([]);
  });

  test('reports bad input with exit 2 and where it is', async () => {
    const broken = join(scratch, 'broken.csv');
    writeFileSync(broken, 'time,adc\ns,V\n0,1\n1e-5,oops\n');
    const bad = await runCli(['compare', broken, envelopeFile, '--signal', 'adc']);
    expect(bad.code).toBe(2);
    expect(bad.stderr).toContain(`${broken}: row 4, column 'adc': 'oops' is not a number`);
    const unnamed = await runCli(['compare', capture('good'), envelopeFile]);
    expect(unnamed.code).toBe(2);
    expect(unnamed.stderr).toMatch(/holds the signals filt, adc\n  choose one with --signal NAME/);
    const missing = await runCli(['compare', join(scratch, 'nothing.csv'), envelopeFile]);
    expect(missing.code).toBe(2);
  });
});
