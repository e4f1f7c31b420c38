import { readFileSync } from 'node:fs';
import { join } from 'node:path';
import { describe, expect, it } from 'vitest';
import { parseCircuit, runCircuit } from '../src/index.ts';

const fixtures = join(import.meta.dirname, '..', '..', '..', 'fixtures');

describe('clipping of a sine (fixtures/noninverting-clipping.yaml)', () => {
  const file = join(fixtures, 'noninverting-clipping.yaml');
  const circuit = parseCircuit(readFileSync(file, 'utf8'), { fileName: file });
  const { findings } = runCircuit(circuit);
  const outputStep = circuit.simulate.outputStep;

  // The stage: gain G = 1 + 190k/10k = 20, input 1 V peak at 500 Hz, clamp at ±(10 - 2) V,
  // general-purpose class: GBW 1 MHz, input offset 1 mV (opamp-presets.ts).
  const [G, amplitude, f, limit, gbw, offset] = [20, 1, 500, 8, 1e6, 1e-3];
  const w = 2 * Math.PI * f;
  // The output asks for G·(sin ωt + offset/A); it meets the clamp where sin ωt = limit/G - offset
  // (arcsine of the clip level, a fact of trigonometry).
  const entry = (rail: 1 | -1): number => Math.asin(rail * limit / (G * amplitude) - offset / amplitude);
  // On its way into the rail the output lags the input by the closed-loop pole at GBW/G:
  // φ = atan(f·G/GBW) (first-order closed-loop response, common practice). On the rail the loop
  // is open, so the output leaves it as soon as the input asks for less: no lag.
  const lag = Math.atan((f * G) / gbw);
  const period = 1 / f;

  it('finds one interval per half period, alternating rails', () => {
    expect(findings.saturation).toHaveLength(6);
    findings.saturation.forEach((s, k) => {
      expect(s.part).toBe('AMP');
      expect(s.rail).toBe(k % 2 === 0 ? 'high' : 'low');
      expect(s.limit).toBeCloseTo(k % 2 === 0 ? limit : -limit, 9);
    });
  });

  it('starts and ends each interval at the arcsine prediction within one output step', () => {
    findings.saturation.forEach((s, k) => {
      const cycle = Math.floor(k / 2) * period;
      const rail = s.rail === 'high' ? 1 : -1;
      const base = s.rail === 'high' ? 0 : Math.PI;
      // High rail: from asin(x) to π - asin(x); low rail: from π - asin(x) to 2π + asin(x) with x < 0.
      const start = rail > 0 ? (entry(1) + lag) / w : (base - entry(-1) + lag) / w;
      const end = rail > 0 ? (Math.PI - entry(1)) / w : (2 * Math.PI + entry(-1)) / w;
      expect(Math.abs(s.start - (cycle + start))).toBeLessThan(outputStep);
      expect(Math.abs(s.end - (cycle + end))).toBeLessThan(outputStep);
      expect(s.duration).toBeCloseTo(s.end - s.start, 15);
    });
  });

  it('estimates the demanded output: input error × noise gain reaches G·amplitude - limit', () => {
    // Demanded peak output G·amplitude = 20 V, so 12 V past the 8 V limit (within 2%).
    for (const s of findings.saturation) expect(Math.abs(s.overdrive! - (G * amplitude - limit)) / (G * amplitude - limit)).toBeLessThan(0.02);
  });

  it('hints the input level at which the stage clips: limit / gain = 400 mV', () => {
    const hint = findings.saturation[0].hint!;
    expect(hint.values.clipsAt).toBeCloseTo(limit / G, 12);
    expect(hint.text).toContain('400 mV');
  });

  it('reports no ringing and no slewing for a 63 V/ms demand on a 0.5 V/µs amplifier', () => {
    expect(findings.ringing).toHaveLength(0);
    expect(findings.slew).toHaveLength(0);
  });
});
