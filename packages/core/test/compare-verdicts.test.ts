import { describe, expect, it } from 'vitest';
import { buildCircuit } from '../src/circuit/parse-circuit.ts';
import { envelope } from '../src/analysis/envelope/envelope.ts';
import { compare } from '../src/analysis/envelope/compare.ts';
import { LinearLookup } from '../src/analysis/envelope/linear-lookup.ts';

// An invented pulse through a 5% RC filter (τ = 100 µs); captures below are synthetic,
// made from the nominal waveform.
const circuit = buildCircuit({
  circuit: 'invented-pulse-filter',
  parts: {
    VS: { voltage: { points: [[0, 0], [0.5e-3, 0], [0.51e-3, 2], [2.5e-3, 2], [2.51e-3, 0]] }, between: ['in', 'gnd'] },
    R1: { resistor: '1k', tolerance: '5%', between: ['in', 'out'] },
    C1: { capacitor: '100n', tolerance: '5%', between: ['out', 'gnd'] },
  },
  simulate: { duration: '4m', 'output-step': '10u' },
  record: ['out'],
});
const result = envelope(circuit, { corners: true });
const limits = { time: result.time, min: result.min.get('out')!, nominal: result.nominal.get('out')!, max: result.max.get('out')! };

/** The nominal waveform sampled every 7 µs (a grid unrelated to the envelope's), delayed. */
function capture(delay: number, glitch?: { from: number; to: number; add: number }) {
  const lookup = new LinearLookup(result.time, limits.nominal);
  const time: number[] = [];
  const values: number[] = [];
  for (let k = 0; k * 7e-6 <= 4e-3; k++) {
    const t = k * 7e-6;
    time.push(t);
    const inGlitch = glitch !== undefined && t >= glitch.from && t <= glitch.to;
    values.push((t - delay < 0 ? 0 : lookup.at(t - delay)) + (inGlitch ? glitch.add : 0));
  }
  return { time, values };
}

describe('compare', () => {
  it('passes a capture that follows the nominal', () => {
    const verdict = compare(capture(0), limits);
    expect(verdict.pass).toBe(true);
    expect(verdict.fractionInside).toBe(1);
    expect(verdict.compared).toBe(Math.floor(4e-3 / 7e-6) + 1);
  });

  it('fails a capture with a glitch and names its first sample as the first violation', () => {
    const glitch = { from: 1.5e-3, to: 1.6e-3, add: 0.3 };
    const verdict = compare(capture(0, glitch), limits);
    expect(verdict.pass).toBe(false);
    // The first sample at or after 1.5 ms is 215 · 7 µs = 1.505 ms (by construction).
    expect(verdict.firstViolation!.time).toBeCloseTo(215 * 7e-6, 12);
    expect(verdict.firstViolation!.value).toBeGreaterThan(verdict.firstViolation!.max);
    // The glitch spans 14 samples (1.505 .. 1.596 ms, by construction).
    expect(verdict.violations.length).toBe(14);
    expect(verdict.fractionInside).toBeCloseTo(1 - 14 / verdict.compared, 12);
  });

  it('fails a capture delayed by 150 µs unless it is aligned, and finds the delay', () => {
    const late = capture(150e-6);
    const unaligned = compare(late, limits);
    expect(unaligned.pass).toBe(false);
    // The delayed rising edge leaves the band first: just after the 0.5 ms edge.
    expect(unaligned.firstViolation!.time).toBeGreaterThan(0.5e-3);
    expect(unaligned.firstViolation!.time).toBeLessThan(0.65e-3);
    const aligned = compare(late, limits, { shift: 'auto' });
    expect(Math.abs(aligned.shift - 150e-6)).toBeLessThan(1e-6);
    expect(aligned.pass).toBe(true);
    const given = compare(late, limits, { shift: 150e-6 });
    expect(given.pass).toBe(true);
    // The 150 µs at the start have no expected values after the shift: not compared.
    expect(given.skipped).toBe(Math.ceil(150e-6 / 7e-6));
  });

  it('accepts a small delay within a time margin, and only then', () => {
    const late = capture(4e-6);
    expect(compare(late, limits).pass).toBe(false);
    // Within ±5 µs each sample may meet any limit of that window: a 4 µs delay is covered...
    expect(compare(late, limits, { timeMargin: 5e-6 }).pass).toBe(true);
    // ...while ±3 µs leaves the 4 µs delay outside at the steepest edge.
    expect(compare(late, limits, { timeMargin: 3e-6 }).pass).toBe(false);
  });
});
