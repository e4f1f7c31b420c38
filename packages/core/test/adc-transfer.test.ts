import { describe, expect, it } from 'vitest';
import { parseCircuit } from '../src/circuit/parse-circuit.ts';
import { runCircuit } from '../src/analysis/run-circuit.ts';

/** A circuit whose node `in` follows `source` exactly, read by one ADC written as `adc`. */
function readout(source: string, adc: string, duration = '1') {
  const circuit = parseCircuit(`
circuit: adc-transfer
parts:
  SRC: { voltage: ${source}, between: [in, gnd] }
  RL: { resistor: 10k, between: [in, gnd] }
simulate: { duration: ${duration} }
adc:
  A: ${adc}
`);
  return runCircuit(circuit).adcs[0];
}

/**
 * The ideal code of IEEE Std 1241 counted transition by transition: code k starts at
 * T[k] = low + (k - 1/2)·LSB with rounding to nearest, at low + k·LSB when rounding down,
 * and the codes stop at 0 and 2^N - 1.
 */
function idealByTransitions(v: number, bits: number, low: number, high: number, firstAt: number): number {
  const lsb = (high - low) / 2 ** bits;
  let code = 0;
  for (let k = 1; k < 2 ** bits; k++) if (v >= low + (k - 1 + firstAt) * lsb) code = k;
  return code;
}

describe('ideal transfer function on a slow ramp, sample by sample', () => {
  // 4 bits over [0.2, 1.8] V: LSB = 0.1 V. The ramp runs from 0 to 2 V in 1 s, beyond both
  // ends of the range; 1997 samples on [0, 1 s) (a rate that never lands exactly on a transition).
  const ramp = '{ points: [[0, 0], [1, 2]] }';
  for (const [rounding, firstAt] of [['nearest', 0.5], ['down', 1]] as const) {
    it(`rounding ${rounding}: every code matches IEEE Std 1241's ideal ADC, first transition ${firstAt} LSB above low`, () => {
      const adc = readout(ramp, `{ input: in, bits: 4, range: [0.2, 1.8], rate: 1997, rounding: ${rounding} }`);
      expect(adc.report.lsb).toBeCloseTo(0.1, 15); // LSB = (high - low) / 2^N (IEEE Std 1241)
      expect(adc.code.length).toBe(1997);
      let mismatches = 0;
      for (let i = 0; i < adc.code.length; i++) {
        const v = 2 * adc.time[i]; // the ramp's value, computed here, not taken from the solver
        expect(adc.volts[i]).toBeCloseTo(v, 9); // the held value is the solution at the instant
        if (adc.code[i] !== idealByTransitions(v, 4, 0.2, 1.8, firstAt)) mismatches++;
      }
      expect(mismatches).toBe(0); // ideal ADC of IEEE Std 1241
      // The first transition: code 1 first appears at low + firstAt·LSB (within one sample spacing, 1 mV).
      const first = adc.code.findIndex((c) => c === 1);
      expect(adc.volts[first]).toBeGreaterThanOrEqual(0.2 + firstAt * 0.1);
      expect(adc.volts[first - 1]).toBeLessThan(0.2 + firstAt * 0.1);
      expect(adc.volts[first] - (0.2 + firstAt * 0.1)).toBeLessThan(0.0011);
      // Clipping at 0 and 2^N - 1, reported as samples beyond the range.
      expect(Math.min(...adc.code)).toBe(0);
      expect(Math.max(...adc.code)).toBe(15);
      expect(adc.report.codeRange).toEqual([0, 15]);
      expect(adc.report.clippedLow.count).toBeGreaterThan(100);
      expect(adc.report.clippedLow.intervals).toHaveLength(1);
      expect(adc.report.clippedLow.intervals[0].from).toBe(0);
      expect(adc.report.clippedHigh.intervals).toHaveLength(1);
      expect(adc.report.clippedHigh.intervals[0].to).toBeCloseTo(1996 / 1997, 12); // the last instant before the end
      expect(adc.report.largestError?.codes).toBe(0); // an ideal converter reading a stiff source
    });
  }
});

describe('coding tables on a bipolar range', () => {
  // 3 bits over [-5, 5] V: LSB = 1.25 V. One level per millisecond, read at mid-level.
  const levels = [-5, -3.75, -1.25, 0, 1.25, 3.75];
  const source = `{ points: [${levels.map((v, i) => `[${i}m, ${v}], [${i + 0.9}m, ${v}]`).join(', ')}] }`;
  const times = `[${levels.map((_, i) => `${i + 0.5}m`).join(', ')}]`;
  const read = (coding: string) => Array.from(readout(source, `{ input: in, bits: 3, range: [-5, 5], times: ${times}, coding: ${coding} }`, '6m').code);

  it('offset binary: -FS is 000, -1 LSB is 011, zero is 100, +FS - 1 LSB is 111', () => {
    // Standard coding tables in converter data books (from memory).
    expect(read('offset-binary')).toEqual([0b000, 0b001, 0b011, 0b100, 0b101, 0b111]);
  });
  it("two's complement: -FS is 100, -1 LSB is 111, zero is 000, +FS - 1 LSB is 011, read as signed", () => {
    // Standard coding tables in converter data books (from memory): the offset-binary word with its top bit inverted.
    expect(read('twos-complement')).toEqual([-4, -3, -1, 0, 1, 3]);
  });
  it('unsigned counts from the low end like offset binary', () => {
    expect(read('unsigned')).toEqual([0, 1, 3, 4, 5, 7]);
  });
});

describe('static errors, differential input, sample instants', () => {
  it('offset and gain error move the codes by that many LSB at zero and at full scale', () => {
    // 10 bits over [0, 1.024] V: LSB = 1 mV. Read 100.2 mV (code 100) and 1000.2 mV (code 1000).
    const source = '{ points: [[0, 0.1002], [1m, 0.1002], [2m, 1.0002]] }';
    const plain = readout(source, '{ input: in, bits: 10, range: [0, 1.024], times: [0.5m, 3m] }', '4m');
    const shifted = readout(source, '{ input: in, bits: 10, range: [0, 1.024], times: [0.5m, 3m], offset: 3LSB, gain-error: -2.048 }', '4m');
    expect(Array.from(plain.code)).toEqual([100, 1000]);
    // Gain error g LSB at full scale (1024 codes) is g·x/1024 LSB at code x: -0.2 at 100, -2 at 1000.
    expect(Array.from(shifted.code)).toEqual([103, 1001]);
    expect(shifted.report.largestError).toMatchObject({ codes: 3, index: 0, read: 103, ideal: 100 });
  });

  it('a differential input converts v(p) - v(n)', () => {
    const circuit = parseCircuit(`
circuit: adc-differential
parts:
  VP: { voltage: 1.2, between: [p, gnd] }
  VN: { voltage: 0.4, between: [n, gnd] }
simulate: { duration: 1m }
adc:
  A: { input: [p, n], bits: 8, range: [-1.28, 1.28], rate: 1k, coding: twos-complement }
`);
    const adc = runCircuit(circuit).adcs[0];
    // 0.8 V / 10 mV = 80 LSB above mid-scale.
    expect(Array.from(adc.code)).toEqual([80]);
    expect(adc.volts[0]).toBeCloseTo(0.8, 12);
  });

  it('converts the solution at each instant, never an interpolation between output rows', () => {
    // A 1 kHz sine with output rows only every 100 µs: instants between rows read the wave itself.
    const adc = readout('{ sine: { amplitude: 1, frequency: 1k } }', '{ input: in, bits: 16, range: [-2, 2], times: [37u, 213u, 651u] }', '1m');
    for (let i = 0; i < 3; i++) {
      // Within the stepper's own accuracy (relative tolerance 1e-4); linear interpolation between rows 100 µs apart is off by up to 12 mV.
      expect(adc.volts[i]).toBeCloseTo(Math.sin(2 * Math.PI * 1000 * adc.time[i]), 4);
    }
    expect(Array.from(adc.time)).toEqual([37e-6, 213e-6, 651e-6]);
  });
});
