import { describe, expect, it } from 'vitest';
import { buildCircuit, noiseAnalysis } from '../src/index.ts';

// CODATA 2018: the Boltzmann constant is exact in the SI since 2019.
const K = 1.380649e-23;
const T = 298.15;
const [R, C] = [10e3, 10e-9];
const fc = 1 / (2 * Math.PI * R * C);

function rcLowPass(band: { from: number; to: number; perDecade?: number }) {
  return buildCircuit({
    circuit: 'invented-rc-noise',
    parts: {
      VIN: { voltage: 0, between: ['in', 'gnd'] },
      R1: { resistor: R, between: ['in', 'out'] },
      C1: { capacitor: C, between: ['out', 'gnd'] },
    },
    simulate: { duration: '1m' },
    record: ['out'],
    noise: band,
  });
}

describe('noise of an RC low-pass (textbook results)', () => {
  it.each([
    [1, 100e3],
    [100, 5e3],
    [1e3, 1e6],
  ])('integrates from %d Hz to %d Hz to kT/C·(2/π)·(atan(f2/fc) − atan(f1/fc)) within 2%', (f1, f2) => {
    // The RC's noise density 4kTR/(1 + (f/fc)²) integrated in closed form (textbook: the kT/C result over a finite band).
    const expected = Math.sqrt(((K * T) / C) * (2 / Math.PI) * (Math.atan(f2 / fc) - Math.atan(f1 / fc)));
    const result = noiseAnalysis(rcLowPass({ from: f1, to: f2 }));
    const out = result.nodes[0];
    expect(Math.abs(out.rms / expected - 1)).toBeLessThan(0.02);
    // Measured: within 1e-4 at the default 20 points per decade.
    expect(Math.abs(out.rms / expected - 1)).toBeLessThan(1e-3);
    expect(out.contributions.map((c) => `${c.part} ${c.source}`)).toEqual(['R1 thermal']);
    expect(out.contributions[0].share).toBeCloseTo(1, 12);
  });

  it('reads √(4kTR) well below the corner (Johnson–Nyquist)', () => {
    const result = noiseAnalysis(rcLowPass({ from: 1, to: 10 }));
    expect(result.temperature).toBe(25);
    expect(result.nodes[0].density[0] / Math.sqrt(4 * K * T * R)).toBeCloseTo(1, 6);
  });

  it('scales with absolute temperature', () => {
    const circuit = rcLowPass({ from: 1, to: 10 });
    const hot = noiseAnalysis(circuit, { temperature: 125 }).nodes[0].density[0];
    const room = noiseAnalysis(circuit).nodes[0].density[0];
    expect(hot / room).toBeCloseTo(Math.sqrt((125 + 273.15) / T), 10);
  });
});
