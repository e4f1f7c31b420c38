import { describe, expect, it } from 'vitest';
import { parseCircuit } from '../src/circuit/parse-circuit.ts';
import { runCircuit } from '../src/analysis/run-circuit.ts';

/** 4000 conversions of a constant 1.65 V (code 2048 of 12 bits over 3.3 V, mid-code). */
function codes(adc: string): Int32Array {
  const circuit = parseCircuit(`
circuit: adc-noise
parts:
  SRC: { voltage: 1.6504, between: [in, gnd] }
  RL: { resistor: 10k, between: [in, gnd] }
simulate: { duration: 4m, output-step: 1m }
adc:
  A: { input: in, bits: 12, range: [0, 3.3], rate: 1M, ${adc} }
`);
  return runCircuit(circuit).adcs[0].code;
}

function standardDeviation(values: ArrayLike<number>): number {
  const n = values.length;
  let mean = 0;
  for (let i = 0; i < n; i++) mean += values[i] / n;
  let sum = 0;
  for (let i = 0; i < n; i++) sum += (values[i] - mean) ** 2;
  return Math.sqrt(sum / (n - 1));
}

describe('seeded converter noise', () => {
  it('the same seed gives the same codes bit for bit; another seed gives others', () => {
    const a = codes('noise: 2, seed: 7');
    const b = codes('noise: 2, seed: 7');
    const c = codes('noise: 2, seed: 8');
    expect(a.length).toBe(4000);
    expect(Array.from(b)).toEqual(Array.from(a));
    expect(Array.from(c)).not.toEqual(Array.from(a));
  });

  it('the standard deviation of the codes matches the requested rms within 10%', () => {
    for (const rms of [1, 3]) {
      // Quantization adds its own 1/12 LSB² to the variance (common practice: uniform rounding
      // error of one LSB width): the codes' variance is rms² + 1/12.
      const expected = Math.sqrt(rms ** 2 + 1 / 12);
      expect(Math.abs(standardDeviation(codes(`noise: ${rms}, seed: 3`)) / expected - 1)).toBeLessThan(0.1);
    }
  });

  it('without noise a constant input reads one code', () => {
    expect(new Set(codes('noise: 0')).size).toBe(1);
  });

  it('averaging N samples divides the noise by about sqrt(N)', () => {
    // Independent samples: the standard deviation of a mean of N is sigma / sqrt(N) (statistics
    // textbook fact). 16 samples per code: 250 codes of 4 LSB rms noise, expect about 1 LSB.
    const averaged = codes('noise: 4, seed: 11, average: 16');
    expect(averaged.length).toBe(250);
    const sd = standardDeviation(averaged);
    expect(sd).toBeGreaterThan(0.8);
    expect(sd).toBeLessThan(1.25);
  });
});
