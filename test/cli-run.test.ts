import { spawn, spawnSync } from 'node:child_process';
import { existsSync, mkdirSync, mkdtempSync, readFileSync, readdirSync, rmSync, writeFileSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { afterEach, beforeEach, describe, expect, test } from 'vitest';
import { repoRoot, runCli } from './support/run-cli.ts';

// End-to-end runs of the fixtures through the real engine. Durations and steps below are
// those written in the fixture files (checked here independently of the CLI's own report).
const fixtures = [
  { file: 'demo-strain-front-end.yaml', recorded: ['beam', 'amp', 'adc'], duration: 24e-3, outputStep: 10e-6, files: ['adc-TRAY.csv'] },
  { file: 'supply-ringing.yaml', recorded: ['feed', 'rail'], duration: 500e-6, outputStep: 500e-9, files: [] },
  { file: 'sensor-cable-rl.yaml', recorded: ['drive', 'sensor'], duration: 100e-6, outputStep: 100e-9, files: [] },
  { file: 'adc-clamp-overdrive.yaml', recorded: ['probe', 'pin'], duration: 16e-3, outputStep: 5e-6, files: ['adc-MCU.csv'] },
];

let scratch: string;
beforeEach(() => {
  scratch = mkdtempSync(join(tmpdir(), 'voltcast-run-'));
});
afterEach(() => {
  rmSync(scratch, { recursive: true, force: true });
});

describe.each(fixtures)('voltcast run fixtures/$file', ({ file, recorded, duration, outputStep, files }) => {
  test('writes waveforms.csv on the output grid and report.json with the run counters', async () => {
    const out = join(scratch, 'result');
    const { code, stdout, stderr } = await runCli(['run', join(repoRoot, 'fixtures', file), '--out', out]);
    expect(stderr).toBe('');
    expect(code).toBe(0);
    expect(readdirSync(out).sort()).toEqual(['.voltcast-output', ...files, 'report.json', 'report.txt', 'waveforms.csv'].sort());
    expect(readdirSync(scratch)).toEqual(['result']); // the staging folder is gone

    const lines = readFileSync(join(out, 'waveforms.csv'), 'utf8').trimEnd().split('\n');
    expect(lines[0]).toBe(['time', ...recorded].join(','));
    const rows = lines.slice(1).map((line) => line.split(',').map(Number));
    expect(rows.length).toBe(Math.round(duration / outputStep) + 1);
    for (const row of rows) {
      expect(row.length).toBe(recorded.length + 1);
      for (const value of row) expect(Number.isFinite(value)).toBe(true);
    }
    expect(rows[0][0]).toBe(0);
    expect(rows.at(-1)![0]).toBeCloseTo(duration, 15);
    // Row times sit on the grid k·output-step (to the 9 significant digits written).
    rows.forEach((row, k) => expect(Math.abs(row[0] - k * outputStep)).toBeLessThanOrEqual(1e-8 * duration));

    const report = JSON.parse(readFileSync(join(out, 'report.json'), 'utf8'));
    expect(report.file).toContain(file);
    expect(report.settings.duration).toBeCloseTo(duration, 15);
    expect(report.stats.acceptedSteps).toBeGreaterThanOrEqual(rows.length - 1);
    expect(report.stats.factorizations).toBeGreaterThan(0);
    expect(Object.keys(report.recorded)).toEqual(recorded);
    // The per-node extremes come from every step: they reach at least as far as the CSV's rows (written to 9 digits).
    recorded.forEach((node, i) => {
      const column = rows.map((row) => row[i + 1]);
      expect(report.recorded[node].min).toBeLessThanOrEqual(Math.min(...column) + 1e-8 * Math.abs(Math.min(...column)));
      expect(report.recorded[node].max).toBeGreaterThanOrEqual(Math.max(...column) - 1e-8 * Math.abs(Math.max(...column)));
      expect(report.recorded[node].final).toBeCloseTo(column.at(-1)!, 6);
    });

    expect(readFileSync(join(out, 'report.txt'), 'utf8')).toContain(report.circuit);
    expect(stdout).toContain(report.circuit);
    expect(stdout).toContain(join(out, 'waveforms.csv'));
  });
});

describe('output folder', () => {
  test("a successful run replaces an earlier run's folder as a whole", async () => {
    const out = join(scratch, 'result');
    expect((await runCli(['run', join(repoRoot, 'fixtures/demo-strain-front-end.yaml'), '--out', out, '--quiet'])).code).toBe(0);
    expect(readdirSync(out)).toContain('adc-TRAY.csv');
    const { code } = await runCli(['run', join(repoRoot, 'fixtures/supply-ringing.yaml'), '--out', out, '--quiet']);
    expect(code).toBe(0);
    expect(readdirSync(out).sort()).toEqual(['.voltcast-output', 'report.json', 'report.txt', 'waveforms.csv']);
    expect(readdirSync(scratch)).toEqual(['result']);
  });

  test('a folder voltcast did not write is refused (exit 2) and left as it was', async () => {
    const out = join(scratch, 'result');
    mkdirSync(out);
    writeFileSync(join(out, 'stale.txt'), 'not from voltcast');
    const { code, stderr } = await runCli(['run', join(repoRoot, 'fixtures/supply-ringing.yaml'), '--out', out, '--quiet']);
    expect(code).toBe(2);
    expect(stderr).toMatch(/holds files voltcast did not write \(stale\.txt\)/);
    expect(readdirSync(out)).toEqual(['stale.txt']);
  });

  test('without --out the run writes to out/<file base name> under the current folder', async () => {
    const { code, stdout } = await runCli(['run', join(repoRoot, 'fixtures/supply-ringing.yaml'), '--quiet'], scratch);
    expect(code).toBe(0);
    expect(stdout).toBe(''); // --quiet
    expect(existsSync(join(scratch, 'out/supply-ringing/waveforms.csv'))).toBe(true);
  });
});

describe('voltcast run: signals between rows', () => {
  test('a 1 kHz sine over 1 s with no output-step: rows chosen to show it, extremes within 2%', async () => {
    // Before: rows every duration / 1000 = 1 ms fell on the same phase each period, and the
    // summary read "150 mV 150 mV". A sine's extremes are offset ± amplitude (common practice).
    const file = join(scratch, 'sine.yaml');
    writeFileSync(file, 'circuit: invented-sine\nparts:\n  VS: { voltage: { sine: { amplitude: 1, frequency: 1k, offset: 150m } }, between: [in, gnd] }\n  R1: { resistor: 1k, between: [in, gnd] }\nsimulate: { duration: 1 }\n');
    const out = join(scratch, 'sine');
    const { code, stdout, stderr } = await runCli(['run', file, '--out', out]);
    expect(stderr).toBe('');
    expect(code).toBe(0);
    expect(stdout).toMatch(/rows every\s+50 µs, chosen to show VS's 1 ms/);
    const report = JSON.parse(readFileSync(join(out, 'report.json'), 'utf8'));
    expect(Math.abs(report.recorded.in.max - 1.15)).toBeLessThan(0.02 * 1.15);
    expect(Math.abs(report.recorded.in.min + 0.85)).toBeLessThan(0.02 * 1.15);
    expect(report.settings.rowsSetBy).toEqual({ part: 'VS', timescale: 1e-3, capped: false });
    expect(readFileSync(join(out, 'waveforms.csv'), 'utf8').trimEnd().split('\n').length).toBe(20_002);
  });
});

describe('voltcast run: a duration far beyond settling', () => {
  test('is a warning on stderr before the run, naming the duration and the slowest time constant, and in report.json', async () => {
    // Before: `duration: 5` on a 1 ms RC ran with no word. RC = 1 kΩ · 1 µF = 1 ms (handbook).
    const file = join(scratch, 'rc.yaml');
    writeFileSync(file, 'circuit: invented-rc\nparts:\n  VIN: { voltage: { points: [[0, 0], [1m, 1]] }, between: [in, gnd] }\n  R1: { resistor: 1k, between: [in, out] }\n  C1: { capacitor: 1u, between: [out, gnd] }\nsimulate: { duration: 5 }\n');
    const out = join(scratch, 'rc');
    const { code, stderr } = await runCli(['run', file, '--out', out, '--quiet']);
    expect(code).toBe(0);
    expect(stderr).toBe(`${file}: warning: the duration 5 s is 5 k times the circuit's slowest time constant, 1 ms at node out, and its drive holds from 1 ms: the circuit has settled long before the end. Check the duration's prefix (m is milli, u is micro, n is nano), or end the run near 11 ms, the last change and 10 time constants\n`);
    const report = JSON.parse(readFileSync(join(out, 'report.json'), 'utf8'));
    expect(report.warnings.map((w: { kind: string; node: string }) => [w.kind, w.node])).toEqual([['duration', 'out']]);
  });
});

// `script` (util-linux) gives the command a terminal, as a person running it has; without one no bar is drawn.
const hasScript = spawnSync('script', ['--version']).status === 0;

describe('voltcast run: progress on a terminal', () => {
  test.skipIf(!hasScript)('a long run shows simulated time against the duration and the wall time left', async () => {
    // Before: "t = 533 ms of 500 s" and nothing about how long the rest would take.
    const file = join(scratch, 'long.yaml');
    writeFileSync(file, 'circuit: invented-long\nparts:\n  VIN: { voltage: { sine: { amplitude: 1, frequency: 1k } }, between: [in, gnd] }\n  R1: { resistor: 1k, between: [in, out] }\n  C1: { capacitor: 100n, between: [out, gnd] }\nsimulate: { duration: 1000, output-step: 10u }\n');
    const command = `${JSON.stringify(process.execPath)} ${JSON.stringify(join(repoRoot, 'packages/cli/bin/voltcast.mjs'))} run ${JSON.stringify(file)} --out ${JSON.stringify(join(scratch, 'long'))}`;
    const screen = await new Promise<string>((resolve) => {
      const child = spawn('script', ['-qec', command, '/dev/null'], { stdio: ['ignore', 'pipe', 'ignore'] });
      let text = '';
      // The estimate comes after 2 s of running; 8 s is the most this waits for it.
      const stop = setTimeout(() => child.kill('SIGTERM'), 8_000);
      child.stdout.setEncoding('utf8').on('data', (chunk: string) => {
        text += chunk;
        if (/about \d/.test(text)) child.kill('SIGTERM');
      });
      child.on('close', () => {
        clearTimeout(stop);
        resolve(text);
      });
    });
    expect(screen).toMatch(/simulating .* \d+% \| t = [\d.]+ (ms|s) of 1 ks \| about [\d.]+ (s|min|h|days) left/);
  }, 20_000);
});
