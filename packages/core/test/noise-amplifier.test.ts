import { describe, expect, it } from 'vitest';
import { buildCircuit, noiseAnalysis } from '../src/index.ts';
import { add, complex, div, mul, type Complex } from './support/complex.ts';

// CODATA 2018 Boltzmann constant (exact SI value).
const K = 1.380649e-23;
const T = 298.15;
// Non-inverting stage of gain 10: RS from a 0 V source into plus, RG from minus to gnd, RF
// from out to minus; a single-pole amplifier of 100 dB and 1 MHz with 10 nV/√Hz white voltage noise.
const [RS, RG, RF, A0, GBW, EN] = [1e3, 1e3, 9e3, 1e5, 1e6, 10e-9];
const [F1, F2] = [10, 10e6];

function stage(adc?: object) {
  return buildCircuit({
    circuit: 'invented-gain-of-ten',
    parts: {
      VIN: { voltage: 0, between: ['src', 'gnd'] },
      RS: { resistor: RS, between: ['src', 'in'] },
      RG: { resistor: RG, between: ['minus', 'gnd'] },
      RF: { resistor: RF, between: ['out', 'minus'] },
      AMP: { opamp: { preset: 'ideal', gain: A0, gbw: GBW, 'noise-voltage': EN }, plus: 'in', minus: 'minus', out: 'out' },
    },
    simulate: { duration: '1m' },
    record: ['out'],
    noise: { from: F1, to: F2 },
    ...(adc !== undefined ? { adc: { MCU: adc } } : {}),
  });
}

// Closed forms (textbook op-amp noise analysis): with A = A0/(1 + j·f·A0/GBW) and β = RG/(RG + RF),
// a voltage at plus (the amplifier's en, RS's √(4kTRS)) reaches out through A/(1 + Aβ); a noise
// current into the minus node (RG's √(4kT/RG), RF's √(4kT/RF), the output being stiff) through
// -A / (1/RG + (1 + A)/RF), which tends to -RF for large A.
const beta = RG / (RG + RF);
const openLoop = (f: number): Complex => div(complex(A0), complex(1, (f * A0) / GBW));
const abs2 = (z: Complex): number => z[0] * z[0] + z[1] * z[1];
const plusGain2 = (f: number): number => abs2(div(openLoop(f), add(complex(1), mul(openLoop(f), complex(beta)))));
const minusGain2 = (f: number): number => abs2(div(openLoop(f), add(complex(1 / RG), mul(add(complex(1), openLoop(f)), complex(1 / RF)))));

/** ∫ from F1 to F2 by Simpson's rule in ln f, 4000 intervals per decade. */
function integrate(density: (f: number) => number): number {
  const n = 4000 * Math.round(Math.log10(F2 / F1));
  const h = Math.log(F2 / F1) / n;
  let sum = 0;
  for (let i = 0; i <= n; i++) {
    const f = F1 * Math.exp(i * h);
    sum += (i === 0 || i === n ? 1 : i % 2 === 1 ? 4 : 2) * density(f) * f;
  }
  return (sum * h) / 3;
}

describe('noise of a non-inverting stage of gain 10 with finite gain-bandwidth', () => {
  const result = noiseAnalysis(stage());
  const out = result.nodes[0];

  it('output rms within 3% of the numerically integrated closed form', () => {
    const amplifier = integrate((f) => EN * EN * plusGain2(f));
    const source = integrate((f) => 4 * K * T * RS * plusGain2(f));
    const feedback = integrate((f) => 4 * K * T * (1 / RG + 1 / RF) * minusGain2(f));
    const expected = Math.sqrt(amplifier + source + feedback);
    expect(Math.abs(out.rms / expected - 1)).toBeLessThan(0.03);
    // The amplifier's share stands apart, against its own closed form.
    const amp = out.contributions.find((c) => c.part === 'AMP' && c.source === 'voltage')!;
    expect(Math.abs(amp.rms / Math.sqrt(amplifier) - 1)).toBeLessThan(0.03);
    expect(out.contributions[0]).toBe(amp);
    const rf = out.contributions.find((c) => c.part === 'RF')!;
    expect(Math.abs(rf.rms / Math.sqrt(integrate((f) => ((4 * K * T) / RF) * minusGain2(f))) - 1)).toBeLessThan(0.03);
  });

  it('reads ten times en at low frequency, with the resistors beside it', () => {
    // Well inside the loop's bandwidth: en·10, √(4kTRS)·10, √(4kTRG)·RF/RG and √(4kTRF) (textbook).
    const low = EN * EN * 100 + 4 * K * T * RS * 100 + 4 * K * T * RG * (RF / RG) ** 2 + 4 * K * T * RF;
    expect(out.density[0] / Math.sqrt(low)).toBeCloseTo(1, 3);
  });

  it('gives a converter its noise in LSB: lsbRms = rms / LSB exactly, noise-free bits = log2(full scale / 6.6 σ)', () => {
    const withAdc = noiseAnalysis(stage({ input: 'out', bits: 16, range: [-5, 5], rate: '200k' }), { from: F1, to: F2, hints: false });
    const [adc] = withAdc.adc;
    const lsb = 10 / 2 ** 16;
    expect(adc.rmsVolts).toBe(withAdc.nodes[0].rms);
    expect(adc.lsbRms).toBe(adc.rmsVolts / lsb);
    expect(adc.peakToPeakLsb).toBe((6.6 * adc.rmsVolts) / lsb);
    expect(adc.noiseFreeBits).toBe(Math.log2(10 / (6.6 * adc.rmsVolts)));
  });

  it('never gives a converter more noise-free bits than it has', () => {
    // The same stage read by an 8-bit converter: its noise is far below one LSB (39 mV).
    const withAdc = noiseAnalysis(stage({ input: 'out', bits: 8, range: [-5, 5], rate: '200k' }), { from: F1, to: F2, hints: false });
    const [adc] = withAdc.adc;
    expect(Math.log2(10 / (6.6 * adc.rmsVolts))).toBeGreaterThan(9);
    expect(adc.noiseFreeBits).toBe(8);
  });

  it('takes the band to the converter\'s Nyquist rate when the section leaves it out', () => {
    const circuit = { ...stage({ input: 'out', bits: 12, range: [0, 3.3], rate: '20k' }), noise: {} };
    const analysis = noiseAnalysis(circuit, { hints: false });
    expect(analysis.band).toEqual({ from: 1, to: 10e3, perDecade: 20 });
  });
});

describe('the noise band', () => {
  const base = { circuit: 'invented-slow-logger', parts: { V: { voltage: 1, between: ['a', 'gnd'] }, R: { resistor: '1k', between: ['a', 'b'] }, C: { capacitor: '1u', between: ['b', 'gnd'] } }, simulate: { duration: 1 } };

  it('starts a thousandth below a slow converter\'s Nyquist rate when it would start above it', () => {
    const circuit = buildCircuit({ ...base, adc: { A: { input: 'b', bits: 12, range: [0, 3.3], rate: 1 } } });
    expect(noiseAnalysis(circuit, { hints: false }).band).toEqual({ from: 0.5e-3, to: 0.5, perDecade: 20 });
  });

  it('refuses a from above the converters\' Nyquist rate, at its key', () => {
    expect(() => buildCircuit({ ...base, noise: { from: '20k' }, adc: { A: { input: 'b', bits: 12, range: [0, 3.3], rate: '1k' } } })).toThrow(/the noise band starts \(20 kHz\) at or above its end, the highest converter's Nyquist rate \(500 Hz\)/);
  });
});
