import { describe, expect, it } from 'vitest';
import { buildCircuit, noiseAnalysis } from '../src/index.ts';

// CODATA 2018: the Boltzmann constant and the elementary charge are exact in the SI since 2019.
const K = 1.380649e-23;
const Q = 1.602176634e-19;
const T = 298.15;
const VT = (K * T) / Q;
const [I, IS, C] = [1e-3, 1e-14, 1e-9];

function biasedDiode(seriesResistance: number) {
  return buildCircuit({
    circuit: 'invented-diode-noise',
    parts: {
      IBIAS: { current: I, between: ['gnd', 'a'] },
      D1: { diode: { 'saturation-current': IS, emission: 1, 'series-resistance': seriesResistance }, between: ['a', 'gnd'] },
      C1: { capacitor: C, between: ['a', 'gnd'] },
    },
    simulate: { duration: '1m' },
    record: ['a'],
    noise: { from: 1, to: '100G', 'per-decade': 20 },
  });
}

describe('diode noise (textbook shot noise)', () => {
  it('a junction biased at 1 mA: √(2qI)·Vt/I at low frequency, within 0.1%', () => {
    const result = noiseAnalysis(biasedDiode(0));
    const a = result.nodes[0];
    // Shot noise 2q(I + 2·Is) through the slope resistance Vt/(I + Is) (Shockley diode, n = 1).
    const expected = (Math.sqrt(2 * Q * (I + 2 * IS)) * VT) / (I + IS);
    expect(Math.abs(a.contributions[0].density[0] / expected - 1)).toBeLessThan(1e-3);
    expect(a.contributions.map((c) => `${c.part} ${c.source}`)).toEqual(['D1 shot']);
  });

  it('integrates to kT/(2C) across the junction capacitance: half the kT/C of a resistor, within 1%', () => {
    // 2qI·rd² over the noise bandwidth 1/(4·rd·C), with rd = kT/(qI): kT/(2C) (textbook result for shot noise on a capacitor).
    const a = noiseAnalysis(biasedDiode(0)).nodes[0];
    expect(Math.abs(a.rms / Math.sqrt((K * T) / (2 * C)) - 1)).toBeLessThan(0.01);
  });

  it('a series resistance adds its own 4kTR, listed apart', () => {
    const a = noiseAnalysis(biasedDiode(10)).nodes[0];
    const parts = a.contributions.map((c) => `${c.part} ${c.source}`).sort();
    expect(parts).toEqual(['D1 shot', 'D1 thermal']);
    // At low frequency the 10 Ω sits in series with the node: its density there is √(4kT·10 Ω) (Johnson–Nyquist).
    const thermal = a.contributions.find((c) => c.source === 'thermal')!;
    expect(Math.abs(thermal.density[0] / Math.sqrt(4 * K * T * 10) - 1)).toBeLessThan(1e-3);
  });
});
