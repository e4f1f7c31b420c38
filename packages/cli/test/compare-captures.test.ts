import { mkdtempSync, rmSync, writeFileSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { afterAll, beforeAll, describe, expect, test, vi } from 'vitest';
import { compareCommand, type CompareCommandOptions } from '../src/commands/compare.ts';
import { distinctly } from '../src/compare/verdict-text.ts';
import { detectSeparator } from '../src/compare/separator.ts';
import { splitHeader } from '../src/compare/column-units.ts';

// Captures as bench instruments and data loggers write them, checked against a synthetic
// envelope: an invented 1 kHz, 300 mV sine about 1.2 V, limits ±12.3456 mV, rows every 10 µs.
let scratch: string;
let envelopeFile: string;
const nominal = (t: number) => 1.2 + 0.3 * Math.sin(2 * Math.PI * 1000 * t);
const halfWidth = 0.0123456;
const envelopeTimes = Array.from({ length: 201 }, (_, k) => k * 1e-5);
beforeAll(() => {
  scratch = mkdtempSync(join(tmpdir(), 'voltcast-captures-'));
  envelopeFile = join(scratch, 'envelope.csv');
  const rows = envelopeTimes.map((t) => [t, nominal(t) - halfWidth, nominal(t), nominal(t) + halfWidth].map((x) => x.toPrecision(9)).join(','));
  writeFileSync(envelopeFile, ['time,out.min,out.nominal,out.max', ...rows].join('\n') + '\n');
});
afterAll(() => rmSync(scratch, { recursive: true, force: true }));

/** The capture: every 7 µs over the envelope's 2 ms, on the nominal (inside: the sine bends less than the limits' width between rows). */
const captureTimes = Array.from({ length: 286 }, (_, k) => k * 7e-6);

function captureFile(name: string, lines: readonly string[]): string {
  const path = join(scratch, name);
  writeFileSync(path, lines.join('\n') + '\n');
  return path;
}

/** Run `voltcast compare` in this process: its exit code and what it printed. */
function compareRun(capture: string, options: CompareCommandOptions = {}): { code: number; printed: string } {
  const log = vi.spyOn(console, 'log').mockImplementation(() => undefined);
  try {
    const code = compareCommand(capture, envelopeFile, options);
    return { code, printed: log.mock.calls.map((call) => call.join(' ')).join('\n') };
  } finally {
    log.mockRestore();
  }
}

/** `x · 10^k` written without the float noise of the product. */
const scaled = (x: number, k: number) => Number((x * 10 ** k).toPrecision(12));

describe('units of a capture', () => {
  const milli = captureTimes.map((t) => `${scaled(t, 3)},${scaled(nominal(t), 3)}`);

  test('a units row applies its SI prefixes (before, ms and mV were read as s and V: FAIL)', () => {
    expect(compareRun(captureFile('units-row.csv', ['Time,out', 'ms,mV', ...milli]))).toEqual({ code: 0, printed: 'PASS out: 100.00% of 286 samples inside (shift 0 s)' });
    expect(compareRun(captureFile('units-row-brackets.csv', ['Time,out', '(ms),(mV)', ...milli])).code).toBe(0);
  });

  test('units in the header apply too, in round or square brackets', () => {
    expect(compareRun(captureFile('header-round.csv', ['time (ms),out (mV)', ...milli])).code).toBe(0);
    const micro = captureTimes.map((t) => `${scaled(t, 6)},${nominal(t)}`);
    expect(compareRun(captureFile('header-square.csv', ['Time [us],out [V]', ...micro])).code).toBe(0);
    expect(compareRun(captureFile('header-micro-sign.csv', ['Time [µs],CH1 [V]', ...micro]), { column: 'CH1' }).code).toBe(0);
  });

  test('a unit of another quantity is refused, never read as base units', () => {
    const amps = captureFile('amps.csv', ['time (ms),out (mA)', ...milli]);
    expect(() => compareRun(amps)).toThrow(`${amps}: column 'out' is in 'mA', which is not a unit of voltage\n  write V, mV or uV (an SI prefix and V), or convert the column to volts`);
    const metres = captureFile('metres.csv', ['time,out', 'm,V', ...milli]);
    expect(() => compareRun(metres)).toThrow(`${metres}: column 'time' is in 'm', which is not a unit of time`);
  });
});

describe('separators', () => {
  test('commas, semicolons and tabs are told apart from the first lines', () => {
    expect(detectSeparator('time,ch1\n0,1\n')).toBe(',');
    expect(detectSeparator('# a comment, with a comma\ntime;ch1\n0.00001;1.516160\n')).toBe(';');
    expect(detectSeparator('time\tch1\n0\t1,5\n1\t1,25\n')).toBe('\t');
    expect(detectSeparator('time;ch1\n0,00001;1,516\n0,00002;1,5\n')).toBe(';'); // decimal commas vary per line
    expect(detectSeparator('value\n1\n2\n')).toBe(',');
  });

  test.each([
    ['semicolons.csv', ';'],
    ['tabs.tsv', '\t'],
  ])('%s is read and passes', (name, separator) => {
    const lines = [`Time${separator}out`, `s${separator}V`, ...captureTimes.map((t) => `${t}${separator}${nominal(t)}`)];
    expect(compareRun(captureFile(name, lines)).code).toBe(0);
  });

  test('a decimal comma is named, and a file of another separator says how it was read', () => {
    const comma = captureFile('decimal-comma.csv', ['Time;out', ...captureTimes.map((t) => `${t};${nominal(t)}`.replace(/\./g, ','))]);
    expect(() => compareRun(comma)).toThrow(`${comma}: line 3, column 'Time': '0,000007' is not a number`);
    expect(() => compareRun(comma)).toThrow(/the file is separated by semicolons and writes a decimal comma; export it with a decimal point, or replace ',' by '\.'/);
    const spaces = captureFile('spaces.txt', ['time out', ...captureTimes.map((t) => `${t} ${nominal(t)}`)]);
    expect(() => compareRun(spaces)).toThrow(/line 2, column 'time out': '0 1\.2' is not a number\n {2}write plain numbers such as 0\.0015 \(the file was read as separated by commas\)/);
  });

  test('headers split into name and unit', () => {
    expect(splitHeader('CH1 (mV)')).toEqual({ name: 'CH1', unit: 'mV' });
    expect(splitHeader('Time[s]')).toEqual({ name: 'Time', unit: 's' });
    expect(splitHeader('adc')).toEqual({ name: 'adc', unit: '' });
    expect(splitHeader('(V)')).toEqual({ name: '(V)', unit: '' });
  });
});

describe('verdicts that can be trusted', () => {
  test('the first violation is printed with the digits that show it is outside', () => {
    // 1 µV under the lower limit at one envelope row: 4 digits would print both as the same.
    const k = 40;
    const low = Number((nominal(envelopeTimes[k]) - halfWidth).toPrecision(9));
    const lines = ['time,out', ...envelopeTimes.map((t, i) => `${t},${i === k ? low - 1e-6 : nominal(t)}`)];
    const { code, printed } = compareRun(captureFile('just-under.csv', lines));
    expect(code).toBe(1);
    const [, value, min] = /first violation at t = 400 µs: ([\d.]+) V outside \[([\d.]+) V, [\d.]+ V\]/.exec(printed)!;
    expect(Number(value)).toBeLessThan(Number(min));
    expect(Number(min)).toBeCloseTo(low, 6);
  });

  test('digits grow only as far as needed', () => {
    const [value, min] = distinctly('voltage', 1.5069996, 1.507, 1.565);
    expect(value).not.toBe(min);
    expect(value).toBe('1.5069996 V');
    expect(distinctly('voltage', 1.2, 1.3, 1.5)).toEqual(['1.2 V', '1.3 V', '1.5 V']);
    expect(distinctly('code', 11, -2, 5)).toEqual(['11', '-2', '5']);
  });

  test('a capture in ms read as seconds (one sample in the span) gets no verdict: exit 2', () => {
    // Before: "FAIL out" (exit 1) from the single sample at t = 0.
    const seconds = captureFile('ms-as-s.csv', ['time,out', ...captureTimes.map((t) => `${scaled(t, 3)},${nominal(t)}`)]);
    expect(() => compareRun(seconds)).toThrow(`${seconds}: only 1 of 286 samples fall within the envelope's time span (0 s to 2 ms); the capture runs from 0 s to 1.995 s: no verdict\n  check the time column's unit`);
  });

  test('a short capture wholly within the span is judged', () => {
    const short = captureFile('short.csv', ['time,out', ...[1e-4, 2e-4, 3e-4].map((t) => `${t},${nominal(t)}`)]);
    expect(compareRun(short)).toEqual({ code: 0, printed: 'PASS out: 100.00% of 3 samples inside (shift 0 s)' });
  });

  test('a margin in LSB on a voltage envelope is refused with what to do', () => {
    const capture = captureFile('plain.csv', ['time,out', ...captureTimes.map((t) => `${t},${nominal(t)}`)]);
    expect(() => compareRun(capture, { margin: '2LSB' })).toThrow(/--margin 2LSB: '2LSB' is not a voltage.*\n.*a margin is in volts for envelope\.csv and in codes \(2LSB\) for envelope-adc-NAME\.csv/);
  });
});
