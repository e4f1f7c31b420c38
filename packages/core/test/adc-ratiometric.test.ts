import { describe, expect, it } from 'vitest';
import { parseCircuit, readCircuit } from '../src/circuit/parse-circuit.ts';
import { runCircuit } from '../src/analysis/run-circuit.ts';
import { formatIssue } from '../src/reading/issue.ts';

// A sensor bridge half (a divider) fed from a supply with 100 mV of 100 Hz ripple on 3.3 V.
const divider = `
circuit: ratiometric-divider
parts:
  VDD: { voltage: { sine: { offset: 3.3, amplitude: 0.1, frequency: 100 } }, between: [vdd, gnd] }
  R1: { resistor: 10k, between: [vdd, mid] }
  R2: { resistor: 20k, between: [mid, gnd] }
simulate: { duration: 20m, output-step: 10u }
adc:
  RATIO: { input: mid, bits: 12, range: [gnd, vdd], rate: 5k }
  FIXED: { input: mid, bits: 12, range: [0, 3.3], rate: 5k }
`;

describe('a ratiometric converter', () => {
  const [ratio, fixed] = runCircuit(parseCircuit(divider)).adcs;

  it('reads a divider of its own reference as constant codes, where a fixed reference reads the ripple', () => {
    // Ratiometric measurement (common practice): a divider of the reference converts to
    // 2^N · R2/(R1 + R2) whatever the reference does: 4096 · 2/3 = 2730.7, code 2731 (±1).
    for (const code of ratio.code) expect(Math.abs(code - 2731)).toBeLessThanOrEqual(1);
    // Against a fixed 3.3 V the 2/3 · 100 mV ripple is ±66.7 mV, ±82.7 codes of 0.806 mV.
    const swing = (Math.max(...fixed.code) - Math.min(...fixed.code)) / 2;
    expect(swing).toBeGreaterThan(82.7 * 0.97);
    expect(swing).toBeLessThan(82.7 * 1.01);
  });

  it('reports the mean LSB over its conversions', () => {
    // The reference averages 3.3 V over whole ripple periods: LSB 3.3 / 4096.
    expect(ratio.report.lsb).toBeCloseTo(3.3 / 4096, 7);
    expect(fixed.report.lsb).toBe(3.3 / 4096);
  });

  it('keeps node names in its spec', () => {
    expect(ratio.spec.low).toBe(0);
    expect(ratio.spec.high).toBe('vdd');
  });
});

describe('reading a ratiometric range', () => {
  it('a range end that is neither a voltage nor a node is an error with a did-you-mean', () => {
    const { circuit, issues } = readCircuit(divider.replace('range: [gnd, vdd]', 'range: [gnd, vdq]'));
    expect(circuit).toBeUndefined();
    expect(issues.map((issue) => formatIssue(issue, 'r.yaml'))).toEqual(["r.yaml:9:47: error: range: 'vdq' is neither a voltage nor a node of this circuit at adc.RATIO.range.1\n  did you mean 'vdd'?"]);
  });

  it('a reference node counts as used: no warning for a node only the converter reads', () => {
    const text = divider.replace('R2: { resistor: 20k, between: [mid, gnd] }', 'R2: { resistor: 20k, between: [mid, gnd] }\n  VREF: { voltage: 2.5, between: [ref, gnd] }').replace('range: [gnd, vdd]', 'range: [gnd, ref]');
    expect(readCircuit(text).issues).toEqual([]);
  });
});
