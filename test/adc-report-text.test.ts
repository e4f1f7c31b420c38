import { readFileSync } from 'node:fs';
import { join } from 'node:path';
import { describe, expect, it } from 'vitest';
import { parseCircuit, runCircuit } from '@voltcast/core';
import { adcText } from '../packages/cli/src/adc-text.ts';
import { repoRoot } from './support/run-cli.ts';

const adcs = (fixture: string) => runCircuit(parseCircuit(readFileSync(join(repoRoot, 'fixtures', fixture), 'utf8'), { fileName: fixture })).adcs.map((a) => a.report);

describe('the converters section of report.txt', () => {
  it('names the before-window figure for what it is and shows it only for a real acquisition error', () => {
    // The starved pin (220 kΩ into 12 pF in 1.5 µs) misses by far more than 1/2 LSB, the
    // common-practice settling criterion; the buffered pin settles, and a moving input alone
    // must not read as an error there.
    const starved = adcText(adcs('adc-acquisition-starved.yaml')).join('\n');
    const fixed = adcText(adcs('adc-acquisition-fixed.yaml')).join('\n');
    for (const text of [starved, fixed]) {
      expect(text).toContain('vs input as the window opened');
      expect(text).not.toContain('vs input before window');
      expect(text).toMatch(/shown where the held\n {2}voltage missed the input by more than 1\/2 LSB/);
    }
    expect(starved).toMatch(/-\d+ codes at [\d.]+ m?s \(\d+ vs \d+\)\s+\S/);
    expect(fixed).toMatch(/ settled /);
  });
});
