import { mkdtempSync, readFileSync, readdirSync, rmSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { afterAll, beforeAll, describe, expect, test } from 'vitest';
import { repoRoot, runCli } from './support/run-cli.ts';
import { xmlProblems } from './support/xml-well-formed.ts';

let scratch: string;
beforeAll(() => {
  scratch = mkdtempSync(join(tmpdir(), 'voltcast-response-'));
});
afterAll(() => rmSync(scratch, { recursive: true, force: true }));

const fixture = (name: string): string => join(repoRoot, 'fixtures', `${name}.yaml`);

describe('voltcast response', () => {
  test('the plain differentiator: CSV, JSON, text and plot, with its crossover, margin, peak and remedy', async () => {
    const out = join(scratch, 'plain');
    const { code, stdout, stderr } = await runCli(['response', fixture('differentiator-plain'), '--out', out, '--plot']);
    expect(stderr).toBe('');
    expect(code).toBe(0);
    expect(readdirSync(out).sort()).toEqual(['.voltcast-output', 'plot.svg', 'response.csv', 'response.json', 'response.txt']);

    // 10 Hz to 10 MHz at 50 per decade: 301 rows after the header.
    const rows = readFileSync(join(out, 'response.csv'), 'utf8').trimEnd().split('\n');
    expect(rows[0]).toBe('frequency,in.dB,in.deg,out.dB,out.deg');
    expect(rows).toHaveLength(302);
    const first = rows[1].split(',').map(Number);
    expect(first[0]).toBe(10);
    // Far below the crossover the stage is the ideal differentiator -jωRC: 20·log10(2π·10 Hz·100 µs) = -44.04 dB, -90° (textbook).
    expect(first[3]).toBeCloseTo(20 * Math.log10(2 * Math.PI * 10 * 1e-4), 2);
    expect(first[4]).toBeCloseTo(-90, 1);

    const json = JSON.parse(readFileSync(join(out, 'response.json'), 'utf8'));
    expect(Object.keys(json)).toEqual(expect.arrayContaining(['loops', 'peaks', 'lowFrequencyGain', 'bandwidth']));
    const [loop] = json.loops;
    expect(Object.keys(loop)).toEqual(expect.arrayContaining(['part', 'crossover', 'phaseMargin', 'gainMargin']));
    expect(loop.part).toBe('AMP');
    // The loop crosses over near √(f0·GBW) = √(1.59 kHz · 1 MHz) = 39.9 kHz (common practice) with almost no margin.
    expect(Math.abs(loop.crossover / Math.sqrt((1e6 / (2 * Math.PI * 1e-4))) - 1)).toBeLessThan(0.02);
    expect(loop.phaseMargin).toBeGreaterThan(0);
    expect(loop.phaseMargin).toBeLessThan(10);
    expect(loop.gainMargin).toBeNull();
    expect(loop.hint.values.feedbackCapacitor).toBeGreaterThan(100e-12);
    expect(json.peaks).toHaveLength(1);
    expect(json.peaks[0].node).toBe('out');
    expect(json.peaks[0].frequency / loop.crossover).toBeCloseTo(1, 1);
    expect(json.lowFrequencyGain.in).toBe(0);
    expect(json.bandwidth).toEqual({ in: null, out: null });

    const text = readFileSync(join(out, 'response.txt'), 'utf8');
    expect(text).toMatch(/AMP\s+linear\s+39\.\d+ kHz\s+\d\.\d°\s+none\s+none\s+short/);
    expect(text).toMatch(/hint: AMP's loop crosses over at 39\.\d+ kHz with \d\.\d° of phase margin; for 60°: put [\d.]+ pF\s+across RF/);
    expect(text).toMatch(/out\s+-44\.04 dB\s+none\s+5\d\.\d+ dB at 39\.\d+ kHz/);
    expect(text.split('\n').length).toBeLessThan(30);

    const svg = readFileSync(join(out, 'plot.svg'), 'utf8');
    expect(xmlProblems(svg)).toEqual([]);
    const series = [...svg.matchAll(/<path\b[^>]*data-series="([^"]*)"/g)].map((m) => m[1]);
    expect(series).toEqual(expect.arrayContaining(['out', 'AMP open-loop gain', 'AMP ideal gain 1/β', 'AMP loop gain phase ∠T']));
    expect(series.filter((s) => s.startsWith('AMP crossover 39.'))).toHaveLength(2);

    expect(stdout).toMatch(/AMP: crossover 39\.\d+ kHz, phase margin \d\.\d°/);
  });

  test('a file without a response: section is bad input (exit 2), and so is a margin that is no angle', async () => {
    const missing = await runCli(['response', fixture('edge-detector'), '--out', join(scratch, 'none')]);
    expect(missing.code).toBe(2);
    expect(missing.stderr).toContain('edge-detector.yaml: no response: section');
    expect(missing.stderr).toContain('response: { input: VIN, from: 10, to: 1M }');
    const angle = await runCli(['response', fixture('differentiator-plain'), '--phase-margin', '200', '--out', join(scratch, 'angle')]);
    expect(angle.code).toBe(2);
    expect(angle.stderr).toContain('--phase-margin 200 is not an angle between 0 and 180 degrees');
    expect(readdirSync(scratch).sort()).toEqual(['plain']);
  });
});
