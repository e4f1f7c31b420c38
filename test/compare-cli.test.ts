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
let adcEnvelopeFile: string;
let adcCodesFile: string;
const fixture = join(repoRoot, 'fixtures', 'envelope-rc-filter.yaml');
const capture = (name: string) => join(repoRoot, 'fixtures', 'data', `moisture-capture-${name}.csv`);
beforeAll(async () => {
  scratch = mkdtempSync(join(tmpdir(), 'voltcast-compare-'));
  const made = await Promise.all([
    runCli(['envelope', fixture, '--corners', '--out', join(scratch, 'env'), '--quiet']),
    runCli(['run', fixture, '--out', join(scratch, 'run'), '--quiet']),
  ]);
  expect(made.map((m) => m.code)).toEqual([0, 0]);
  envelopeFile = join(scratch, 'env', 'envelope.csv');
  adcEnvelopeFile = join(scratch, 'env', 'envelope-adc-MCU.csv');
  adcCodesFile = join(scratch, 'run', 'adc-MCU.csv');
}, 60_000);
afterAll(() => rmSync(scratch, { recursive: true, force: true }));

/** Write `lines` as a capture file in the scratch folder. */
function captureFile(name: string, lines: readonly string[]): string {
  const path = join(scratch, name);
  writeFileSync(path, lines.join('\n') + '\n');
  return path;
}

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
    expect(verdict.signal).toBe('adc');
    expect(verdict.unit).toBe('V');
    // The dropout starts at 5.1 ms in the capture's own time (its header, by construction).
    expect(verdict.firstViolation.time).toBeCloseTo(5.1e-3, 9);
    expect(verdict.firstViolation.value).toBeLessThan(verdict.firstViolation.min);
    // 40 samples (5.1 ms to 5.295 ms every 5 µs) are in the dropout; all are outside.
    expect(verdict.violations).toBe(40);
    expect(verdict.fractionInside).toBeCloseTo(1 - 40 / verdict.compared, 9);
    expect(xmlProblems(readFileSync(plot, 'utf8'))).toEqual([]);
  });

  test('reports bad input with exit 2 and where it is', async () => {
    const broken = captureFile('broken.csv', ['time,adc', 's,V', '0,1', '1e-5,oops']);
    const bad = await runCli(['compare', broken, envelopeFile, '--signal', 'adc']);
    expect(bad.code).toBe(2);
    expect(bad.stderr).toContain(`${broken}: line 4, column 'adc': 'oops' is not a number`);
    const signal = await runCli(['compare', capture('good'), envelopeFile]);
    expect(signal.code).toBe(2);
    expect(signal.stderr).toMatch(/holds the signals filt, adc\n {2}choose one with --signal NAME/);
    const missing = await runCli(['compare', join(scratch, 'nothing.csv'), envelopeFile]);
    expect(missing.code).toBe(2);
  });
});

describe('ADC codes against envelope-adc-NAME.csv', () => {
  test("a converter's codes pass against its code envelope, called by the converter's name, with a margin in LSB", async () => {
    const { code, stdout } = await runCli(['compare', adcCodesFile, adcEnvelopeFile, '--margin', '2LSB']);
    expect(stdout).toMatch(/^PASS MCU: 100\.00% of \d+ samples inside/);
    expect(code).toBe(0);
    const json = JSON.parse((await runCli(['compare', adcCodesFile, adcEnvelopeFile, '--json'])).stdout);
    expect([json.signal, json.unit]).toEqual(['MCU', 'code']);
    const volts = await runCli(['compare', adcCodesFile, adcEnvelopeFile, '--margin', '5m']);
    expect(volts.code).toBe(2);
    expect(volts.stderr).toBe('voltcast compare: --margin 5m: the envelope holds ADC codes, so the margin is a number of codes\n  write it as 2LSB or 2; to check volts, compare against envelope.csv\n');
  });

  test('a code off by 10 fails with codes printed as codes, and the plot labels its axis in codes', async () => {
    const lines = readFileSync(adcCodesFile, 'utf8').trimEnd().split('\n');
    const codeAt = lines[0].split(',').indexOf('code');
    const bumped = lines.map((line, i) => (i === 41 ? line.split(',').map((field, c) => (c === codeAt ? String(Number(field) + 10) : field)).join(',') : line));
    const plot = join(scratch, 'codes.svg');
    const { code, stdout } = await runCli(['compare', captureFile('codes-bumped.csv', bumped), adcEnvelopeFile, '--margin', '2LSB', '--plot', plot]);
    expect(code).toBe(1);
    // Code 1 + 10 at 4 ms against codes 0..3 widened by 2 LSB (the envelope file's row 40).
    expect(stdout).toContain('first violation at t = 4 ms: 11 outside [-2, 5]');
    const svg = readFileSync(plot, 'utf8');
    const labels = [...svg.matchAll(/<g class="axis value"[^>]*>(.*?)<\/g>/g)].flatMap((m) => [...m[1].matchAll(/<text[^>]*>([^<]*)<\/text>/g)].map((t) => t[1]));
    expect(labels.length).toBeGreaterThan(2);
    for (const label of labels) expect(label).toMatch(/^-?\d+$/); // whole codes, no volts, no prefixes
  });
});
