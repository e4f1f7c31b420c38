import { readFileSync } from 'node:fs';
import { join } from 'node:path';
import { describe, expect, it } from 'vitest';
import { parseCircuit, runCircuit, type CircuitRun } from '../src/index.ts';

const fixtures = join(import.meta.dirname, '..', '..', '..', 'fixtures');
const run = (name: string): CircuitRun => {
  const file = join(fixtures, name);
  return runCircuit(parseCircuit(readFileSync(file, 'utf8'), { fileName: file }));
};

// The stage: CIN = 10 nF into the inverting input, RF = 10 kΩ in feedback, GBW = 1 MHz.
// Its noise gain 1 + s·RF·CIN rises from f0 = 1/(2π·RF·CIN) and meets the open-loop gain
// GBW/f near fr = √(f0·GBW) (op-amp differentiator stability, common practice).
const f0 = 1 / (2 * Math.PI * 10e3 * 10e-9);
const resonance = Math.sqrt(f0 * 1e6);

describe('ringing of the plain differentiator (fixtures/differentiator-plain.yaml)', () => {
  const found = run('differentiator-plain.yaml').findings.ringing.filter((r) => r.node === 'out');

  it('finds the output ringing near √(f0·GBW) = 39.9 kHz, within 5%', () => {
    expect(found).toHaveLength(1);
    expect(resonance).toBeCloseTo(39.89e3, -1);
    expect(Math.abs(found[0].frequency - resonance) / resonance).toBeLessThan(0.05);
    // Little phase margin: lightly damped, many cycles.
    expect(found[0].dampingRatio).toBeLessThan(0.1);
    expect(found[0].cycles).toBeGreaterThan(10);
    // It rings after the ramp's start and again after its end (one repeat).
    expect(found[0].start).toBeCloseTo(50e-6, 12);
    expect(found[0].repeats).toBe(1);
  });

  it('hints the feedback capacitor Cf = 1/(2π·Rf·fr) and the series resistor Rs = Rf/G', () => {
    const values = found[0].hint!.values;
    expect(values.resonance).toBeCloseTo(resonance, 6);
    expect(values.feedbackCapacitor).toBeCloseTo(1 / (2 * Math.PI * 10e3 * resonance), 15);
    expect(values.feedbackCapacitor * 1e12).toBeCloseTo(398.9, 0);
    expect(values.seriesResistor).toBeCloseTo(10e3 / values.highFrequencyGain, 6);
    expect(found[0].hint!.text).toContain('RF');
  });
});

describe('the differentiator with a feedback capacitor (fixtures/differentiator-feedback-capacitor.yaml)', () => {
  it('is reported with a damping ratio above 0.3', () => {
    const found = run('differentiator-feedback-capacitor.yaml').findings.ringing.filter((r) => r.node === 'out');
    expect(found.length).toBeGreaterThan(0);
    // The zero at 1/(2π·RF·CF) = 41 kHz sits on the resonance and restores phase margin (common practice).
    for (const r of found) expect(r.dampingRatio).toBeGreaterThan(0.3);
  });
});
