import { readFileSync, readdirSync } from 'node:fs';
import { join } from 'node:path';
import { describe, expect, it } from 'vitest';
import { parseCircuit, simulate } from '@voltcast/core';
import { column } from './support/run-text.ts';
import { at, crossing, slope, swings } from './support/measure.ts';

const fixtures = join(import.meta.dirname, '..', 'fixtures');
const runFixture = (name: string) => {
  const file = join(fixtures, name);
  return simulate(parseCircuit(readFileSync(file, 'utf8'), { fileName: file, readFile: (p) => readFileSync(join(fixtures, p), 'utf8') }));
};

/** Damping ratio from the logarithmic decrement of successive same-sign swings (control textbooks). */
function dampingFromSwings(peaks: [number, number][]): number {
  const positive = peaks.filter(([, d]) => d > 0);
  const delta = Math.log(positive[0][1] / positive[1][1]);
  return delta / Math.sqrt(4 * Math.PI * Math.PI + delta * delta);
}

describe('differentiators and integrators', () => {
  // R = 10k, C = 10n: f0 = 1/(2 pi R C) = 1.59 kHz; the fixtures set GBW 1 MHz.
  const f0 = 1 / (2 * Math.PI * 10e3 * 10e-9);
  const ringing = Math.sqrt(f0 * 1e6);

  it('plain differentiator rings near sqrt(f0·GBW) within 5%', () => {
    const result = runFixture('differentiator-plain.yaml');
    const out = column(result, 'out');
    // Zero crossings of the deviation from the -1 V plateau (ramp 10 V/ms, RC 100 us).
    const settled = at(result.time, out, 1.0e-3);
    const ups: number[] = [];
    let from = 60e-6;
    for (let k = 0; k < 6; k++) {
      const t = crossing(result.time, out, settled, true, from);
      ups.push(t);
      from = t + 1e-6;
    }
    const frequency = (ups.length - 1) / (ups[ups.length - 1] - ups[0]);
    // Op-amp differentiator analysis (op-amp textbooks, from memory): f = sqrt(f0 · GBW).
    expect(Math.abs(frequency / ringing - 1)).toBeLessThan(0.05);
    // Quality factor about sqrt(GBW / f0) = 25: lightly damped (from memory).
    expect(dampingFromSwings(swings(result.time, out, settled, 50e-6, 1e-3))).toBeLessThan(0.1);
  });

  it('a feedback capacitor with its zero at that frequency damps the ringing (damping ratio >= 0.3)', () => {
    const result = runFixture('differentiator-feedback-capacitor.yaml');
    const out = column(result, 'out');
    const settled = at(result.time, out, 1.0e-3);
    const peaks = swings(result.time, out, settled, 50e-6, 1e-3).filter(([, d]) => Math.abs(d) > 1e-3);
    // Either no second swing above 1 mV, or a log decrement giving zeta >= 0.3.
    if (peaks.filter(([, d]) => d > 0).length >= 2) expect(dampingFromSwings(peaks)).toBeGreaterThanOrEqual(0.3);
    const overshoot = Math.max(...peaks.map(([, d]) => -d), 0) / Math.abs(settled);
    // Second-order step response: zeta >= 0.3 means overshoot <= exp(-pi·0.3/sqrt(1-0.09)) = 37% (control textbooks).
    expect(overshoot).toBeLessThan(0.372);
  });

  it('differentiator on a ramp settles at -R·C·dV/dt within 1%', () => {
    const result = runFixture('differentiator-plain.yaml');
    // Ideal relation: Vout = -R·C·dVin/dt = -10k · 10n · 10 V/ms = -1 V.
    expect(Math.abs(at(result.time, column(result, 'out'), 1.0e-3) / -1 - 1)).toBeLessThan(0.01);
  });

  it('integrator on a constant ramps at -V/(R·C) within 1%', () => {
    const result = runFixture('integrator-rain-gauge.yaml');
    // Ideal relation: dVout/dt = -Vin/(R·C) = -1 V / 1 ms.
    const measured = slope(result.time, column(result, 'out'), 0.7e-3, 2.3e-3);
    expect(Math.abs(measured / -1000 - 1)).toBeLessThan(0.01);
  });
});

describe('every fixture runs without a Newton failure', () => {
  const files = readdirSync(fixtures).filter((f) => f.endsWith('.yaml'));
  it.each(files)('%s', (file) => {
    const result = runFixture(file);
    expect(result.stats.newtonFailures).toBe(0);
    expect(result.stats.acceptedSteps).toBeGreaterThan(0);
  });
});
