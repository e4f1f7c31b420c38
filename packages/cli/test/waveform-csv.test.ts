import { mkdtempSync, readFileSync, rmSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { afterEach, beforeEach, describe, expect, test } from 'vitest';
import { WaveformCsv, formatValue } from '../src/waveform-csv.ts';

let scratch: string;
beforeEach(() => {
  scratch = mkdtempSync(join(tmpdir(), 'voltcast-csv-'));
});
afterEach(() => {
  rmSync(scratch, { recursive: true, force: true });
});

describe('formatValue', () => {
  test('grid times print without binary noise', () => {
    // IEEE 754 doubles (from memory): 3 * 0.1 is 0.30000000000000004.
    expect(3 * 0.1).not.toBe(0.3);
    expect(formatValue(3 * 0.1)).toBe('0.3');
    expect(formatValue(24e-3)).toBe('0.024');
  });

  test('keeps 9 significant digits and reads back within half a unit of the 9th', () => {
    for (const value of [Math.PI, -Math.E * 1e-7, 1.23456789012e5, 4.99999999996]) {
      const back = Number(formatValue(value));
      expect(Math.abs(back - value)).toBeLessThanOrEqual(0.5e-8 * Math.abs(value));
    }
    expect(formatValue(Math.PI)).toBe('3.14159265');
    expect(formatValue(-0)).toBe('0');
  });
});

describe('WaveformCsv', () => {
  test('writes the header and one line per row, across buffer flushes', () => {
    const path = join(scratch, 'waveforms.csv');
    const csv = new WaveformCsv(path, ['in', 'out']);
    const values = new Float64Array(2);
    const rows = 5000; // about 100 kB: several 64 KiB flushes
    for (let k = 0; k < rows; k++) {
      values[0] = k;
      values[1] = -k / 4;
      csv.row(k * 1e-6, values);
    }
    csv.close();
    const lines = readFileSync(path, 'utf8').trimEnd().split('\n');
    expect(lines[0]).toBe('time,in,out');
    expect(lines.length).toBe(rows + 1);
    expect(lines[1]).toBe('0,0,0');
    expect(lines[rows]).toBe('0.004999,4999,-1249.75');
  });

  test('quotes header names that hold a comma or a quote (RFC 4180)', () => {
    const path = join(scratch, 'waveforms.csv');
    new WaveformCsv(path, ['a,b', 'say "x"']).close();
    expect(readFileSync(path, 'utf8')).toBe('time,"a,b","say ""x"""\n');
  });
});
