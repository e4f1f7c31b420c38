import { describe, expect, it } from 'vitest';
import { buildCircuit, simulate } from '../src/index.ts';
import { NoiseSignal } from '../src/transient/noise-signal.ts';

// CODATA 2018 Boltzmann constant (exact SI value).
const K = 1.380649e-23;
const T = 298.15;
const [R, C] = [10e3, 10e-9];

const rc = buildCircuit({
  circuit: 'invented-rc-noise',
  parts: {
    VIN: { voltage: 0, between: ['in', 'gnd'] },
    R1: { resistor: R, between: ['in', 'out'] },
    C1: { capacitor: C, between: ['out', 'gnd'] },
  },
  // 1000 time constants of 100 µs.
  simulate: { duration: '100m', 'output-step': '10u' },
  record: ['out'],
});

function rms(values: Float64Array, skip: number): number {
  let sum = 0;
  for (let i = skip; i < values.length; i++) sum += values[i] * values[i];
  return Math.sqrt(sum / (values.length - skip));
}

describe('noise in the time domain', () => {
  it('a resistor into a capacitor settles at kT/C (textbook equipartition), within 10%, the same for the same seed', () => {
    const expected = Math.sqrt((K * T) / C);
    const run = () => simulate(rc, { noise: { seed: 7, bandwidth: 100e3 } }).columns.get('out')!;
    const out = run();
    // Skip the first 10 time constants (the noise starts from the quiet operating point).
    const measured = rms(out, 100);
    expect(Math.abs(measured / expected - 1)).toBeLessThan(0.1);
    expect(run()).toEqual(out);
    const other = simulate(rc, { noise: { seed: 8, bandwidth: 100e3 } }).columns.get('out')!;
    expect(other).not.toEqual(out);
    expect(Math.abs(rms(other, 100) / expected - 1)).toBeLessThan(0.1);
  });

  it('holds the step to a twentieth of 1/bandwidth', () => {
    const result = simulate({ ...rc, simulate: { ...rc.simulate, duration: 1e-3 } }, { noise: { seed: 1, bandwidth: 100e3 } });
    expect(result.stats.maxStep).toBeLessThanOrEqual(0.5e-6 * (1 + 1e-9));
  });

  it('is a pure function of time: the same value whatever order it is asked in', () => {
    const signal = new NoiseSignal(1e-16, 10e3, 3, 0);
    const times = Array.from({ length: 200 }, (_, i) => i * 3.7e-6);
    const forward = times.map((t) => signal.value(t));
    const backward = [...times].reverse().map((t) => new NoiseSignal(1e-16, 10e3, 3, 0).value(t)).reverse();
    expect(backward).toEqual(forward);
  });

  it('has the density asked for: the variance of the samples against ∫ sinc⁸ of the spline', () => {
    // One-sided density N over a band-limited spline: variance N/(2Δ)·151/315 (its spectrum's integral).
    const signal = new NoiseSignal(4e-16, 1e3, 11, 2);
    let sum = 0;
    let sumSquares = 0;
    const count = 200000;
    // 0.37 Δ apart: every phase of the spline, 74000 sample spacings.
    for (let i = 0; i < count; i++) {
      const v = signal.value(i * 0.37 * signal.spacing);
      sum += v;
      sumSquares += v * v;
    }
    const variance = sumSquares / count - (sum / count) ** 2;
    expect(Math.abs(variance / signal.variance - 1)).toBeLessThan(0.02);
    expect(Math.abs(sum / count) / Math.sqrt(signal.variance)).toBeLessThan(0.02);
  });
});
