import { mkdtempSync, readFileSync, readdirSync, rmSync, writeFileSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { afterAll, beforeAll, describe, expect, test } from 'vitest';
import { runCli, runCliUntil } from './support/run-cli.ts';

// An invented divider with an RC: four toleranced values, small enough for quick runs.
const circuit = `circuit: invented-envelope-workers
parts:
  VS: { voltage: { points: [[0, 0], [0.1m, 0], [0.11m, 5]] }, tolerance: 1%, between: [in, gnd] }
  RTOP: { resistor: 10k, tolerance: 1%, distribution: normal, between: [in, mid] }
  RBOT: { resistor: 10k, tolerance: 1%, distribution: normal, between: [mid, gnd] }
  CF: { capacitor: 1n, tolerance: 10%, between: [mid, gnd] }
simulate: { duration: 0.5m, output-step: 5u }
record: [mid]
adc:
  CONV: { input: mid, bits: 12, range: [0, 5], rate: 20k }
`;

let scratch: string;
let file: string;
beforeAll(() => {
  scratch = mkdtempSync(join(tmpdir(), 'voltcast-envelope-'));
  file = join(scratch, 'divider.yaml');
  writeFileSync(file, circuit);
});
afterAll(() => rmSync(scratch, { recursive: true, force: true }));

async function envelopeCsv(out: string, ...options: string[]): Promise<string> {
  const { code, stderr } = await runCli(['envelope', file, '--out', join(scratch, out), '--quiet', ...options]);
  expect(stderr).toBe('');
  expect(code).toBe(0);
  return readFileSync(join(scratch, out, 'envelope.csv'), 'utf8');
}

const adcCsv = (out: string) => readFileSync(join(scratch, out, 'envelope-adc-CONV.csv'), 'utf8');

describe('voltcast envelope', () => {
  test('gives the same envelope bit for bit with 1 and with 2 workers', async () => {
    const one = await envelopeCsv('one', '--runs', '40', '--seed', '11', '--corners', '--workers', '1');
    const two = await envelopeCsv('two', '--runs', '40', '--seed', '11', '--corners', '--workers', '2', '--plot');
    expect(two).toBe(one);
    expect(adcCsv('two')).toBe(adcCsv('one'));
    expect(readdirSync(join(scratch, 'two')).sort()).toEqual(['.voltcast-output', 'envelope-adc-CONV.csv', 'envelope.csv', 'plot.svg']);
    const lines = one.trimEnd().split('\n');
    expect(lines[0]).toBe('time,mid.min,mid.nominal,mid.max');
    expect(lines.length).toBe(1 + 101);
    // At the end the filter has settled: the divider's worst case, 5 V ± 1% times
    // 10k/(10k+10k) with 1% resistors (extreme value analysis, any tolerance-analysis text).
    const [, min, nominal, max] = lines.at(-1)!.split(',').map(Number);
    expect(nominal).toBeCloseTo(2.5, 4);
    expect(max).toBeCloseTo((5.05 * 10.1) / (9.9 + 10.1), 4);
    expect(min).toBeCloseTo((4.95 * 9.9) / (10.1 + 9.9), 4);
    // The converter's last code: 12 bits over 0..5 V round to the nearest code (IEEE Std 1241's
    // ideal ADC), so code = round(v / 5 · 4096) for each of min, nominal and max.
    const codes = adcCsv('one').trimEnd().split('\n');
    expect(codes[0]).toBe('index,time,CONV.min,CONV.nominal,CONV.max'); // named by the converter
    const [, , codeMin, codeNominal, codeMax] = codes.at(-1)!.split(',').map(Number);
    expect([codeMin, codeNominal, codeMax]).toEqual([min, nominal, max].map((v) => Math.round((v / 5) * 4096)));
  });

  test('says up front how long a huge envelope will take: one run timed, times the runs', async () => {
    const out = join(scratch, 'huge');
    const said = await runCliUntil(['envelope', file, '--runs', '1e9', '--workers', '1', '--out', out], /this takes about/);
    const [, oneRun, unit, total, totalUnit] = /envelope: 1000000000 runs on 1 worker; one run took ([\d.]+) (ms|s), so this takes about ([\d.]+) (days|h)\n {2}fewer --runs finish sooner/.exec(said)!;
    // Both figures are printed to 2 significant digits, so they agree within about 10%.
    const days = (Number(oneRun) * (unit === 'ms' ? 1e-3 : 1) * 1e9) / 86_400;
    expect(totalUnit).toBe('days');
    expect(Math.abs(Number(total) / days - 1)).toBeLessThan(0.1);
  });

  test('refuses to run with nothing to vary or a bad run count (exit 2)', async () => {
    const none = await runCli(['envelope', file, '--out', join(scratch, 'none')]);
    expect(none.code).toBe(2);
    expect(none.stderr).toMatch(/--runs N/);
    const bad = await runCli(['envelope', file, '--runs', 'many', '--out', join(scratch, 'bad')]);
    expect(bad.code).toBe(2);
    expect(bad.stderr).toMatch(/--runs many is not a whole number/);
  });
});
