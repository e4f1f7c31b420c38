import { execFileSync } from 'node:child_process';
import { existsSync, mkdtempSync, readFileSync, readdirSync, rmSync, writeFileSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { afterEach, beforeEach, describe, expect, test } from 'vitest';
import { repoRoot, runCli } from './support/run-cli.ts';

let scratch: string;
beforeEach(() => {
  scratch = mkdtempSync(join(tmpdir(), 'voltcast-adc-'));
});
afterEach(() => {
  rmSync(scratch, { recursive: true, force: true });
});

/** A C compiler, when the machine has one: it checks the header outside voltcast. */
function compiler(): string | undefined {
  for (const name of ['cc', 'gcc', 'clang']) {
    try {
      execFileSync(name, ['--version'], { stdio: 'ignore' });
      return name;
    } catch {
      // not installed: try the next one
    }
  }
  return undefined;
}

describe('voltcast run with an adc section', () => {
  const fixture = join(repoRoot, 'fixtures', 'adc-acquisition-starved.yaml');

  test('writes adc-NAME.csv with one row per sample, and the codes as a C header and JSON on request', async () => {
    const out = join(scratch, 'starved');
    const { code, stderr } = await runCli(['run', fixture, '--out', out, '--quiet', '--codes-as', 'c-header,json']);
    expect(stderr).toBe('');
    expect(code).toBe(0);
    expect(readdirSync(out)).toEqual(expect.arrayContaining(['adc-MCU.csv', 'adc-MCU.h', 'adc-MCU.json', 'waveforms.csv']));

    const lines = readFileSync(join(out, 'adc-MCU.csv'), 'utf8').trimEnd().split('\n');
    expect(lines[0]).toBe('index,time,volts,code');
    // rate 2k from 250 µs to 20 ms: instants 250 µs + k·500 µs, k = 0 .. 39.
    const rows = lines.slice(1).map((line) => line.split(',').map(Number));
    expect(rows).toHaveLength(40);
    rows.forEach(([index, time], k) => {
      expect(index).toBe(k);
      expect(time).toBeCloseTo(250e-6 + k * 500e-6, 12);
    });
    const codes = rows.map((row) => row[3]);

    const header = readFileSync(join(out, 'adc-MCU.h'), 'utf8');
    expect(header).toContain('#define ADC_MCU_CODE_COUNT 40u');
    expect(header).toContain('static const uint16_t adc_mcu_codes[ADC_MCU_CODE_COUNT] = {');
    const json = JSON.parse(readFileSync(join(out, 'adc-MCU.json'), 'utf8'));
    expect(json.code).toEqual(codes);
    // Sample times read the same in both files, as the decimals start + k/rate are (before: the JSON had 0.0017500000000000003 where the CSV had 0.00175).
    expect(lines.slice(1).map((line) => line.split(',')[1])).toEqual(json.time.map(String));
    expect(lines[4].split(',')[1]).toBe('0.00175');
    expect(json.bits).toBe(12);

    // Compile the header with the system C compiler and print the array back: C is the
    // reference for what the firmware will see.
    const cc = compiler();
    if (cc === undefined) return;
    const program = join(scratch, 'print-codes.c');
    writeFileSync(program, `#include <stdio.h>\n#include "adc-MCU.h"\nint main(void) { for (unsigned i = 0; i < ADC_MCU_CODE_COUNT; i++) printf("%u\\n", (unsigned)adc_mcu_codes[i]); return 0; }\n`);
    const binary = join(scratch, 'print-codes');
    execFileSync(cc, ['-std=c99', '-Wall', '-Werror', '-I', out, program, '-o', binary]);
    expect(execFileSync(binary, { encoding: 'utf8' }).trimEnd().split('\n').map(Number)).toEqual(codes);
  });

  test('an unknown --codes-as format is a usage error (exit 2) and leaves no output', async () => {
    const out = join(scratch, 'bad');
    const { code, stderr } = await runCli(['run', fixture, '--out', out, '--quiet', '--codes-as', 'c-header,yaml']);
    expect(code).toBe(2);
    expect(stderr).toContain("--codes-as: 'yaml' is not a code format; write one or more of c-header, json");
    expect(existsSync(out)).toBe(false);
  });
});
