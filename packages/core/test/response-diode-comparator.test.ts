import { describe, expect, it } from 'vitest';
import { buildCircuit, frequencyResponse } from '../src/index.ts';
import { diodePresets } from '../src/parts/diode-presets.ts';
import { angleBetween, complex, dB, degrees, div, add, type Complex } from './support/complex.ts';

// CODATA 2018 exact values (SI 2019): Boltzmann constant and elementary charge.
const thermalVoltage = (1.380649e-23 * 298.15) / 1.602176634e-19;

describe('small-signal models of diodes and comparators', () => {
  it('a forward-biased diode answers with its slope resistance n·Vt/(I + Is) in parallel with its capacitance', () => {
    const R = 10e3;
    const C = 10e-12;
    const V = 5;
    const { saturationCurrent: is, emission: n } = diodePresets['small-signal'];
    // The bias point by bisection on the Shockley equation I = Is·(exp(Vd/(n·Vt)) − 1) with
    // I = (V − Vd)/R (textbook diode circuit), independent of the simulator.
    let low = 0;
    let high = V;
    for (let k = 0; k < 200; k++) {
      const vd = (low + high) / 2;
      if (is * Math.expm1(vd / (n * thermalVoltage)) > (V - vd) / R) high = vd;
      else low = vd;
    }
    const current = (V - low) / R;
    // Small-signal resistance of a junction, dV/dI of the Shockley equation (semiconductor textbooks).
    const rd = (n * thermalVoltage) / (current + is);
    const expected = (f: number): Complex => {
      const yd = complex(1 / rd, 2 * Math.PI * f * C);
      return div(complex(1), add(complex(1), div(complex(R), div(complex(1), yd))));
    };
    const circuit = buildCircuit({
      circuit: 'invented-diode-bias',
      parts: {
        VIN: { voltage: V, between: ['in', 'gnd'] },
        R1: { resistor: R, between: ['in', 'd'] },
        D1: { diode: { preset: 'small-signal', 'series-resistance': 0, capacitance: C }, between: ['d', 'gnd'] },
      },
      simulate: { duration: '1m' },
      record: ['d'],
      response: { input: 'VIN', from: 10, to: '100M', 'per-decade': 20 },
    });
    const response = frequencyResponse(circuit);
    let worstDb = 0;
    let worstDeg = 0;
    response.frequency.forEach((f, i) => {
      worstDb = Math.max(worstDb, Math.abs(response.nodes[0].dB[i] - dB(expected(f))));
      worstDeg = Math.max(worstDeg, Math.abs(angleBetween(response.nodes[0].degrees[i], degrees(expected(f)))));
    });
    // rd ≈ 105 Ω at 0.44 mA: the divider gives about -39.6 dB until C takes over above 150 MHz.
    expect(worstDb).toBeLessThan(0.01);
    expect(worstDeg).toBeLessThan(0.1);
  });

  it('a comparator holds its decided output: nothing of the input reaches it', () => {
    const circuit = buildCircuit({
      circuit: 'invented-comparator-hold',
      parts: {
        VIN: { voltage: 0.5, between: ['in', 'gnd'] },
        REF: { voltage: 1, between: ['ref', 'gnd'] },
        CMP: { comparator: 'ideal', plus: 'in', minus: 'ref', out: 'out', supply: [0, 5] },
        RL: { resistor: '10k', between: ['out', 'gnd'] },
      },
      simulate: { duration: '1m' },
      record: ['in', 'out'],
      response: { input: 'VIN', from: 10, to: '1M', 'per-decade': 5 },
    });
    const response = frequencyResponse(circuit);
    expect(response.nodes[0].lowFrequencyGain).toBeCloseTo(0, 12);
    for (const gain of response.nodes[1].dB) expect(gain).toBe(-Infinity);
  });
});
