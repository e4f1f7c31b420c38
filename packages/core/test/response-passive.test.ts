import { describe, expect, it } from 'vitest';
import { buildCircuit, frequencyResponse, type FrequencyResponse } from '../src/index.ts';
import { add, angleBetween, capacitorImpedance, complex, dB, degrees, div, mul, type Complex } from './support/complex.ts';

/** The response of `parts` per 1 V (1 A) at `input`, recording `nodes`, from 10 Hz to 1 MHz. */
function sweep(parts: object, input: string, nodes: string[], perDecade = 50): FrequencyResponse {
  const circuit = buildCircuit({ circuit: 'invented-passive', parts, simulate: { duration: '1m' }, record: nodes, response: { input, from: 10, to: '1M', 'per-decade': perDecade } });
  return frequencyResponse(circuit);
}

/** Largest gain and phase differences between node `j`'s response and `expected(f)` over the sweep. */
function worstAgainst(response: FrequencyResponse, j: number, expected: (f: number) => Complex): { dB: number; degrees: number } {
  let worstDb = 0;
  let worstDeg = 0;
  response.frequency.forEach((f, i) => {
    const h = expected(f);
    worstDb = Math.max(worstDb, Math.abs(response.nodes[j].dB[i] - dB(h)));
    worstDeg = Math.max(worstDeg, Math.abs(angleBetween(response.nodes[j].degrees[i], degrees(h))));
  });
  return { dB: worstDb, degrees: worstDeg };
}

const R = 1e3;
const C = 100e-9;
const rcLowPass = (f: number): Complex => div(complex(1), complex(1, 2 * Math.PI * f * R * C));
const rc = (capacitor: object = {}) => ({
  VIN: { voltage: 0, between: ['in', 'gnd'] },
  R1: { resistor: R, between: ['in', 'out'] },
  C1: { capacitor: C, between: ['out', 'gnd'], ...capacitor },
});

describe('passive circuits against their transfer functions', () => {
  it('RC low-pass: 1/(1 + jωRC) within 0.01 dB and 0.1°, corner at 1/(2πRC)', () => {
    // First-order low-pass, textbook circuit theory.
    const response = sweep(rc(), 'VIN', ['in', 'out']);
    const worst = worstAgainst(response, 1, rcLowPass);
    expect(worst.dB).toBeLessThan(0.01);
    expect(worst.degrees).toBeLessThan(0.1);
    // In fact to rounding: the same equations, solved exactly.
    expect(worst.dB).toBeLessThan(1e-9);
    const out = response.nodes[1];
    expect(out.lowFrequencyGain).toBeCloseTo(dB(rcLowPass(10)), 9);
    // Half power (-3.01 dB) below the gain at 10 Hz: 1 + (f/fc)² = 2·(1 + (10/fc)²), just above fc = 1/(2πRC).
    const fc = 1 / (2 * Math.PI * R * C);
    expect(Math.abs(out.bandwidth! / (fc * Math.sqrt(1 + 2 * (10 / fc) ** 2)) - 1)).toBeLessThan(1e-9);
    expect(out.peaks).toEqual([]);
    // The phase is unwrapped and continuous: 0 at the low end, toward -90° at the top.
    expect(out.degrees[0]).toBeCloseTo(degrees(rcLowPass(10)), 6);
    expect(out.degrees[out.degrees.length - 1]).toBeCloseTo(degrees(rcLowPass(1e6)), 6);
    // The input node follows the source exactly; it never falls 3 dB.
    expect(response.nodes[0].lowFrequencyGain).toBeCloseTo(0, 12);
    expect(response.nodes[0].bandwidth).toBeNull();
    // 5 decades at 50 per decade, both ends included.
    expect(response.frequency.length).toBe(251);
    expect(response.frequency[0]).toBe(10);
    expect(response.frequency[250]).toBe(1e6);
    expect(response.frequency[50]).toBeCloseTo(100, 9);
  });

  it('a capacitor held at an initial voltage answers as the plain one', () => {
    const worst = worstAgainst(sweep(rc({ initial: 1.5 }), 'VIN', ['out']), 0, rcLowPass);
    expect(worst.dB).toBeLessThan(1e-9);
    expect(worst.degrees).toBeLessThan(1e-7);
  });

  it('a current source into R ∥ C: transimpedance R/(1 + jωRC) in dB re 1 V/A', () => {
    // Norton source into a parallel RC, textbook circuit theory.
    const parts = { IIN: { current: '1m', between: ['gnd', 'out'] }, R1: { resistor: R, between: ['out', 'gnd'] }, C1: { capacitor: C, between: ['out', 'gnd'] } };
    const worst = worstAgainst(sweep(parts, 'IIN', ['out']), 0, (f) => mul(complex(R), rcLowPass(f)));
    expect(worst.dB).toBeLessThan(1e-9);
    expect(worst.degrees).toBeLessThan(1e-7);
  });

  it('series RLC across R: R/(R + jωL + 1/(jωC)), peak 0 dB at 1/(2π√(LC))', () => {
    // Series resonance, textbook circuit theory: f0 = 5.033 kHz, Q = √(L/C)/R = 3.16.
    const [r, l, c] = [100, 10e-3, 100e-9];
    const parts = {
      VIN: { voltage: 0, between: ['in', 'gnd'] },
      L1: { inductor: l, between: ['in', 'a'] },
      C1: { capacitor: c, between: ['a', 'out'] },
      R1: { resistor: r, between: ['out', 'gnd'] },
    };
    const response = sweep(parts, 'VIN', ['out']);
    const expected = (f: number): Complex => div(complex(r), add(complex(r), add(complex(0, 2 * Math.PI * f * l), capacitorImpedance(c, f))));
    const worst = worstAgainst(response, 0, expected);
    expect(worst.dB).toBeLessThan(1e-9);
    expect(worst.degrees).toBeLessThan(1e-7);
    const f0 = 1 / (2 * Math.PI * Math.sqrt(l * c));
    expect(response.nodes[0].peaks).toHaveLength(1);
    expect(Math.abs(response.nodes[0].peaks[0].frequency / f0 - 1)).toBeLessThan(1e-6);
    expect(response.nodes[0].peaks[0].dB).toBeCloseTo(0, 9);
  });

  it.each([{}, { initial: '1m' }])('RL high-pass (inductor %o): jωL/(R + jωL)', (inductor) => {
    // First-order high-pass, textbook circuit theory; a forced current at the operating point changes nothing small-signal.
    const [r, l] = [100, 10e-3];
    const parts = { VIN: { voltage: 0, between: ['in', 'gnd'] }, R1: { resistor: r, between: ['in', 'out'] }, L1: { inductor: l, between: ['out', 'gnd'], ...inductor } };
    const response = sweep(parts, 'VIN', ['out']);
    const worst = worstAgainst(response, 0, (f) => div(complex(0, 2 * Math.PI * f * l), complex(r, 2 * Math.PI * f * l)));
    expect(worst.dB).toBeLessThan(1e-9);
    expect(worst.degrees).toBeLessThan(1e-7);
    // It rises from the low end: no bandwidth to speak of.
    expect(response.nodes[0].bandwidth).toBeNull();
  });

  it('a vcvs of gain 10 after the RC: 20 dB above it', () => {
    const parts = { ...rc(), GAIN: { vcvs: 10, sense: ['out', 'gnd'], between: ['buf', 'gnd'] }, RL: { resistor: '10k', between: ['buf', 'gnd'] } };
    const worst = worstAgainst(sweep(parts, 'VIN', ['buf']), 0, (f) => mul(complex(10), rcLowPass(f)));
    expect(worst.dB).toBeLessThan(1e-9);
  });

  it('switches in the state the run starts from: a divider with the on or the off resistance', () => {
    const divider = (state: object) => ({
      VIN: { voltage: 0, between: ['in', 'gnd'] },
      R1: { resistor: '10k', between: ['in', 'out'] },
      S1: { switch: { on: 50, off: '1G' }, between: ['out', 'gnd'], ...state },
    });
    // Closed on (1 ms, 2 ms]: open before, so the divider is 1G/(10k + 1G); listed as open there: closed before, 50/(10k + 50).
    const open = sweep(divider({ closed: [['1m', '2m']] }), 'VIN', ['out'], 5).nodes[0];
    const closed = sweep(divider({ open: [['1m', '2m']] }), 'VIN', ['out'], 5).nodes[0];
    expect(open.lowFrequencyGain).toBeCloseTo(20 * Math.log10(1e9 / (1e9 + 1e4)), 9);
    expect(closed.lowFrequencyGain).toBeCloseTo(20 * Math.log10(50 / (1e4 + 50)), 9);
  });

  it("an ADC's sampling capacitor loads the node through its switch, closed in the window before the first instant", () => {
    // The first window is (-2 µs, 0]: the switch is closed at the operating point, so the load is Rsw + 1/(jωCs).
    const circuit = buildCircuit({
      circuit: 'invented-sampled-node',
      parts: { VIN: { voltage: 1, between: ['in', 'gnd'] }, R1: { resistor: '10k', between: ['in', 'out'] } },
      simulate: { duration: '1m' },
      record: ['out'],
      response: { input: 'VIN', from: 10, to: '1M' },
      adc: { MCU: { input: 'out', bits: 12, range: [0, 3.3], rate: '10k', sampling: { capacitance: '10n', resistance: '1k', acquisition: '2u' } } },
    });
    const response = frequencyResponse(circuit);
    const expected = (f: number): Complex => {
      const load = add(complex(1e3), capacitorImpedance(10e-9, f));
      return div(load, add(complex(10e3), load));
    };
    const worst = worstAgainst(response, 0, expected);
    expect(worst.dB).toBeLessThan(1e-6);
    expect(worst.degrees).toBeLessThan(1e-5);
    // Low-pass towards Rsw/(R1 + Rsw) = -20.8 dB: starts flat, falls through -3 dB near 1/(2π·(R1 + Rsw)·Cs) = 1.45 kHz.
    expect(response.nodes[0].bandwidth).toBeGreaterThan(1.4e3);
    expect(response.nodes[0].bandwidth).toBeLessThan(1.6e3);
  });
});
