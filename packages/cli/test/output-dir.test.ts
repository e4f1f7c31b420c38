import { existsSync, mkdirSync, mkdtempSync, readdirSync, readFileSync, rmSync, writeFileSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { afterEach, beforeEach, describe, expect, test } from 'vitest';
import { writeOutputDir } from '../src/output-dir.ts';

let scratch: string;
beforeEach(() => {
  scratch = mkdtempSync(join(tmpdir(), 'voltcast-outdir-'));
});
afterEach(() => {
  rmSync(scratch, { recursive: true, force: true });
});

describe('writeOutputDir', () => {
  test('files appear under the final name only once the writer has finished', () => {
    const target = join(scratch, 'run');
    const value = writeOutputDir(target, (staging) => {
      writeFileSync(join(staging, 'a.csv'), 'time\n0\n');
      expect(existsSync(target)).toBe(false);
      return 42;
    });
    expect(value).toBe(42);
    expect(readdirSync(scratch)).toEqual(['run']);
    expect(readFileSync(join(target, 'a.csv'), 'utf8')).toBe('time\n0\n');
  });

  test('a failing writer leaves neither files nor the parent folders it created', () => {
    const target = join(scratch, 'deep/er/run');
    expect(() =>
      writeOutputDir(target, (staging) => {
        writeFileSync(join(staging, 'half.csv'), 'time\n');
        throw new Error('engine gave up');
      }),
    ).toThrow('engine gave up');
    expect(readdirSync(scratch)).toEqual([]);
  });

  test('an earlier folder survives a failure and is replaced whole on success', () => {
    const target = join(scratch, 'run');
    mkdirSync(target);
    writeFileSync(join(target, 'old.txt'), 'earlier run');
    expect(() => writeOutputDir(target, () => { throw new Error('no'); })).toThrow('no');
    expect(readdirSync(target)).toEqual(['old.txt']);
    writeOutputDir(target, (staging) => writeFileSync(join(staging, 'new.txt'), 'this run'));
    expect(readdirSync(target)).toEqual(['new.txt']);
    expect(readdirSync(scratch)).toEqual(['run']);
  });

  test('the hidden folder of an interrupted run is swept by the next run', () => {
    const leftover = join(scratch, '.run.partial-abc123');
    mkdirSync(leftover);
    writeOutputDir(join(scratch, 'run'), () => undefined);
    expect(readdirSync(scratch)).toEqual(['run']);
  });
});
