import { describe, expect, it } from 'vitest';
import { parseCircuit, runCircuit, type Findings } from '../src/index.ts';
import { findRinging } from '../src/analysis/ringing/find-ringing.ts';
import { uniformNoise } from './support/lcg.ts';

const findingsOf = (yaml: string): Findings => runCircuit(parseCircuit(yaml, { fileName: 'inline.yaml' })).findings;


describe('no ringing where there is none', () => {
  it('a well-damped first-order RC driven by a square wave', () => {
    const findings = findingsOf(`
circuit: rc-square
parts:
  SRC: { voltage: { square: { low: 0, high: 2, frequency: 1k, edge: 1u } }, between: [in, gnd] }
  R1: { resistor: 1k, between: [in, out] }
  C1: { capacitor: 100n, between: [out, gnd] }
simulate: { duration: 5m, output-step: 1u }
record: [in, out]
`);
    // 10 edges examined (square wave: 2 edges per period, 5 periods), nothing found.
    expect(findings.stats.events).toBeGreaterThanOrEqual(9);
    expect(findings.ringing).toEqual([]);
  });

  it('a slow ramp', () => {
    const findings = findingsOf(`
circuit: slow-ramp
parts:
  SRC: { voltage: { points: [[0, 0], [1m, 0], [9m, 5], [10m, 5]] }, between: [in, gnd] }
  R1: { resistor: 10k, between: [in, out] }
  C1: { capacitor: 1n, between: [out, gnd] }
simulate: { duration: 10m, output-step: 2u }
record: [in, out]
`);
    expect(findings.ringing).toEqual([]);
  });

  it('a square wave clipped by a gain stage, slewing into its rails', () => {
    const findings = findingsOf(`
circuit: clipped-square
parts:
  SRC: { voltage: { square: { low: -1, high: 1, frequency: 1k, edge: 1u } }, between: [in, gnd] }
  RG: { resistor: 10k, between: [sum, gnd] }
  RF: { resistor: 190k, between: [sum, out] }
  AMP: { opamp: { preset: general-purpose, headroom: 2 }, plus: in, minus: sum, out: out, supply: [-10, 10] }
simulate: { duration: 4m, output-step: 1u }
record: [in, out]
`);
    // The premise: it does clip at both rails and slew between them (0.5 V/µs across 16 V).
    expect(findings.saturation.filter((s) => s.rail === 'high').length).toBeGreaterThanOrEqual(3);
    expect(findings.saturation.filter((s) => s.rail === 'low').length).toBeGreaterThanOrEqual(3);
    expect(findings.slew.length).toBeGreaterThanOrEqual(6);
    expect(findings.ringing).toEqual([]);
  });

  it('a noisy input through an RC filter', () => {
    const noise = uniformNoise(7);
    const points = Array.from({ length: 200 }, (_, k) => `[${k * 20}u, ${(k >= 50 ? 1 : 0) + 0.1 * noise()}]`).join(', ');
    const findings = findingsOf(`
circuit: noisy-input
parts:
  SRC: { voltage: { points: [${points}] }, between: [in, gnd] }
  R1: { resistor: 1k, between: [in, out] }
  C1: { capacitor: 4.7n, between: [out, gnd] }
simulate: { duration: 4m, output-step: 1u }
record: [in, out]
`);
    expect(findings.ringing).toEqual([]);
  });
});

describe('the detector on sampled data with white noise', () => {
  const rows = 4000;
  const dt = 1e-6;
  const time = Float64Array.from({ length: rows }, (_, i) => i * dt);
  const stepAt = 1e-3;
  const noisy = (ringing: boolean): Float64Array => {
    const noise = uniformNoise(11);
    return time.map((t) => {
      const after = t - stepAt;
      const step = after >= 0 ? 1 : 0;
      // A 20 kHz oscillation with ζ ≈ 0.05 after the step, when asked for.
      const ring = ringing && after >= 0 ? -Math.exp(-2 * Math.PI * 20e3 * 0.05 * after) * Math.cos(2 * Math.PI * 20e3 * after) : 0;
      return step + ring + 0.05 * noise();
    });
  };
  const event = [{ time: stepAt, cause: 'corner of TEST' }];

  it('reports nothing for a step buried in ±25 mV of noise', () => {
    expect(findRinging({ time, columns: new Map([['n', noisy(false)]]) }, event, dt).ringing).toEqual([]);
  });

  it('still finds a real 20 kHz ringing in the same noise (the check can fail)', () => {
    const found = findRinging({ time, columns: new Map([['n', noisy(true)]]) }, event, dt).ringing;
    expect(found).toHaveLength(1);
    expect(Math.abs(found[0].frequency - 20e3 * Math.sqrt(1 - 0.05 ** 2)) / 20e3).toBeLessThan(0.02);
  });
});
