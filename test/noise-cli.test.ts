import { mkdtempSync, readFileSync, readdirSync, rmSync, writeFileSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { afterAll, beforeAll, describe, expect, test } from 'vitest';
import { repoRoot, runCli } from './support/run-cli.ts';
import { xmlProblems } from './support/xml-well-formed.ts';

let scratch: string;
beforeAll(() => {
  scratch = mkdtempSync(join(tmpdir(), 'voltcast-noise-'));
});
afterAll(() => rmSync(scratch, { recursive: true, force: true }));

describe('voltcast noise', () => {
  test('the leaf thermopile: CSV, JSON, text and plot, the dominant part and the samples to average', async () => {
    const out = join(scratch, 'leaf');
    const { code, stdout, stderr } = await runCli(['noise', join(repoRoot, 'fixtures', 'noise-leaf-thermopile.yaml'), '--out', out, '--plot']);
    expect(stderr).toBe('');
    expect(code).toBe(0);
    expect(stdout).toMatch(/LEAF: 5\.\d\d LSB rms, 3\d\.\d LSB peak-to-peak, 10\.\d noise-free bits; average \d+ samples for ±1 LSB/);
    expect(readdirSync(out).sort()).toEqual(['.voltcast-output', 'noise.csv', 'noise.json', 'noise.txt', 'plot.svg']);

    // 1 Hz to 50 kHz at 20 per decade: 95 points after the header.
    const rows = readFileSync(join(out, 'noise.csv'), 'utf8').trimEnd().split('\n');
    expect(rows[0]).toBe('frequency,amp,adc');
    expect(rows).toHaveLength(96);

    const json = JSON.parse(readFileSync(join(out, 'noise.json'), 'utf8'));
    expect(json.temperature).toBe(25);
    expect(json.band).toEqual([1, 50e3]);
    expect(Object.keys(json.nodes)).toEqual(['amp', 'adc']);
    const adcNode = json.nodes.adc;
    expect(adcNode.contributions[0]).toMatchObject({ part: 'RPILE', source: 'thermal' });
    // The shares add up to the node's noise power.
    expect(adcNode.contributions.reduce((s: number, c: { rms: number }) => s + c.rms ** 2, 0)).toBeCloseTo(adcNode.rms ** 2, 15);
    const [leaf] = json.adc;
    expect(Object.keys(leaf)).toEqual(expect.arrayContaining(['name', 'node', 'rmsVolts', 'lsbRms', 'peakToPeakLsb', 'noiseFreeBits', 'averagingFor1Lsb']));
    expect(leaf).toMatchObject({ name: 'LEAF', node: 'adc', rmsVolts: adcNode.rms });
    expect(leaf.lsbRms).toBe(leaf.rmsVolts / (2.5 / 2 ** 16));
    expect(leaf.averagingFor1Lsb).toBeGreaterThan(100);

    const text = readFileSync(join(out, 'noise.txt'), 'utf8');
    expect(text).toMatch(/LEAF\s+adc\s+2\d\d µV rms\s+5\.\d\d\s+3\d\.\d LSB\s+10\.\d\s+\d+ samples/);
    expect(text).toMatch(/RPILE\s+thermal\s+1\d\d µV rms\s+39\.\d%/);
    expect(text).toMatch(/hint: RPILE \(47 kΩ\) makes 39% of the noise power at adc/);
    expect(text).toMatch(/hint: A first-order low-pass with its corner at [\d.]+ [kM]?Hz on adc would halve its noise/);
    expect(text.split('\n').length).toBeLessThan(50);

    const svg = readFileSync(join(out, 'plot.svg'), 'utf8');
    expect(xmlProblems(svg)).toEqual([]);
    const series = [...svg.matchAll(/<path\b[^>]*data-series="([^"]*)"/g)].map((m) => m[1]);
    expect(series).toEqual(expect.arrayContaining(['RPILE thermal (133 µV rms)', 'adc total (213 µV rms)']));
  });
});

describe('voltcast run --noise', () => {
  const circuit = `# Invented: a resistor into a capacitor, for the noise of a run.
circuit: invented-rc-noise
parts:
  VIN: { voltage: 1, between: [in, gnd] }
  R1: { resistor: 100k, between: [in, out] }
  C1: { capacitor: 1n, between: [out, gnd] }
simulate: { duration: 5m, output-step: 10u }
record: [out]
noise: { to: 200k }
`;

  test('--noise with a seed and alone (seed 1) give different noise; the report names the seed', async () => {
    const file = join(scratch, 'rc.yaml');
    writeFileSync(file, circuit);
    const outs = ['a', 'b'].map((name) => join(scratch, name));
    const results = await Promise.all([runCli(['run', file, '--out', outs[0], '--noise', '7', '--quiet']), runCli(['run', file, '--out', outs[1], '--noise', '--quiet'])]);
    for (const r of results) expect(r.code, r.stderr).toBe(0);
    const waves = outs.map((out) => readFileSync(join(out, 'waveforms.csv'), 'utf8'));
    expect(waves[1]).not.toBe(waves[0]);
    expect(JSON.parse(readFileSync(join(outs[0], 'report.json'), 'utf8')).noise).toEqual({ seed: 7 });
    expect(JSON.parse(readFileSync(join(outs[1], 'report.json'), 'utf8')).noise).toEqual({ seed: 1 });
    expect(readFileSync(join(outs[0], 'report.txt'), 'utf8')).toMatch(/noise of the parts, seed\s+7/);
    // kT/C = 2.03 µV rms on 1 nF around the 1 V the node settles at (textbook), loosely: 1000 rows, 10 time constants each 100 µs.
    const values = waves[0].trimEnd().split('\n').slice(101).map((line) => Number(line.split(',')[1]) - 1);
    const rms = Math.sqrt(values.reduce((s, v) => s + v * v, 0) / values.length);
    expect(rms / Math.sqrt((1.380649e-23 * 298.15) / 1e-9)).toBeGreaterThan(0.7);
    expect(rms / Math.sqrt((1.380649e-23 * 298.15) / 1e-9)).toBeLessThan(1.3);
  });

  test('a seed that is not a whole number exits 2 and says what to write', async () => {
    const file = join(scratch, 'rc-bad.yaml');
    writeFileSync(file, circuit);
    const { code, stderr } = await runCli(['run', file, '--out', join(scratch, 'bad'), '--noise', 'loud']);
    expect(code).toBe(2);
    expect(stderr).toMatch(/--noise loud is not a seed/);
  });
});
