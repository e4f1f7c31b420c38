import { mkdtempSync, readFileSync, rmSync, writeFileSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { afterAll, beforeAll, describe, expect, test } from 'vitest';
import { repoRoot, runCli, type CliOutcome } from './support/run-cli.ts';

let scratch: string;
beforeAll(() => {
  scratch = mkdtempSync(join(tmpdir(), 'voltcast-report-'));
});
afterAll(() => {
  rmSync(scratch, { recursive: true, force: true });
});

async function run(fixture: string): Promise<{ outcome: CliOutcome; json: Record<string, unknown> & { ringing: Record<string, number>[]; saturation: Record<string, number>[] }; text: string }> {
  const out = join(scratch, fixture);
  const outcome = await runCli(['run', join(repoRoot, 'fixtures', `${fixture}.yaml`), '--out', out]);
  expect(outcome.stderr).toBe('');
  expect(outcome.code).toBe(0);
  return { outcome, json: JSON.parse(readFileSync(join(out, 'report.json'), 'utf8')), text: readFileSync(join(out, 'report.txt'), 'utf8') };
}

describe('voltcast run writes findings a designer can act on', () => {
  test('the plain differentiator: ringing near √(f0·GBW) with its remedy', async () => {
    const { outcome, json, text } = await run('differentiator-plain');
    // The findings fields of docs/report-schema.md are at the top level.
    for (const key of ['schema', 'saturation', 'slew', 'currentLimit', 'ringing', 'adc', 'warnings', 'stats']) expect(json).toHaveProperty(key);
    expect(json.schema).toBe(1);
    // f0 = 1/(2π·10k·10n) = 1.59 kHz, GBW 1 MHz: resonance √(f0·GBW) = 39.9 kHz (common practice).
    const resonance = Math.sqrt((1 / (2 * Math.PI * 10e3 * 10e-9)) * 1e6);
    expect(json.ringing).toHaveLength(1);
    expect(Math.abs(json.ringing[0].frequency - resonance) / resonance).toBeLessThan(0.05);
    // report.txt: the finding with SI prefixes, and its hint (Cf = 1/(2π·Rf·fr) = 398.9 pF).
    expect(text).toMatch(/ringing\s+out\s+39\.\d+ kHz/);
    expect(text).toContain('398.9 pF across RF');
    // The screen summary lists it.
    expect(outcome.stdout).toMatch(/out rings at 39\.\d+ kHz/);
  });

  test('the clipping stage: rail intervals sorted by time, with the input level that clips', async () => {
    const { outcome, json, text } = await run('noninverting-clipping');
    const starts = json.saturation.map((s) => s.start);
    expect(starts).toEqual([...starts].sort((a, b) => a - b));
    // Gain 20, clamp ±8 V: the input clips at ±400 mV (limit / gain).
    expect(text).toContain('when in is at 400 mV');
    expect(text).toMatch(/high rail\s+AMP\s+held at 8 V/);
    expect(outcome.stdout).toContain('AMP at the high rail 3 times');
  });

  test('an ADC driven past its range: its clipped runs appear among the findings', async () => {
    // Invented example: a 1 kHz sine of 2 V about 1.65 V, divided by 100k/101k, into a 0..3.3 V converter.
    const file = join(scratch, 'adc-clip.yaml');
    writeFileSync(file, `circuit: invented-adc-clip
parts:
  SRC: { voltage: { sine: { amplitude: 2, offset: 1.65, frequency: 1k } }, between: [in, gnd] }
  R1: { resistor: 1k, between: [in, out] }
  R2: { resistor: 100k, between: [out, gnd] }
simulate: { duration: 2m, output-step: 10u }
record: [in, out]
adc:
  MCU: { input: out, bits: 12, range: [0, 3.3], rate: 20k }
`);
    const out = join(scratch, 'adc-clip');
    const { code, stdout } = await runCli(['run', file, '--out', out]);
    expect(code).toBe(0);
    const json = JSON.parse(readFileSync(join(out, 'report.json'), 'utf8'));
    const text = readFileSync(join(out, 'report.txt'), 'utf8');
    // The peak 1.65 + 2·100/101 = 3.63 V is above 3.3 V and the trough -0.33 V below 0 V: both ends clip, twice each in 2 ms.
    expect(json.adc[0].clippedHigh.intervals).toHaveLength(2);
    expect(json.adc[0].clippedLow.intervals).toHaveLength(2);
    expect(text.match(/ADC clipped high\s+MCU/g)).toHaveLength(2);
    expect(text.match(/ADC clipped low\s+MCU/g)).toHaveLength(2);
    expect(stdout).toMatch(/ADC MCU: \d+ clipped samples/);
  });
});
