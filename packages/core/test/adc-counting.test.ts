import { describe, expect, it } from 'vitest';
import { parseCircuit, runCircuit, simulate } from '../src/index.ts';

const circuit = (adc: string, simulateKeys = 'duration: 10m') =>
  parseCircuit(`
circuit: invented-adc-counting
parts:
  SRC: { voltage: { points: [[0, 0], [10m, 3.3]] }, between: [in, gnd] }
  RL: { resistor: 10k, between: [in, gnd] }
simulate: { ${simulateKeys} }
adc:
  A: { input: in, bits: 12, range: [0, 3.3], ${adc} }
`);

describe('ADC prediction as firmware counts', () => {
  it.each(['10kS/s', '10ksps', '10kSPS', '10k', '10kHz'])('reads rate: %s as 10,000 samples per second (data sheets write S/s and sps)', (rate) => {
    const adc = runCircuit(circuit(`rate: ${rate}`)).adcs[0];
    expect(adc.time[1]).toBe(1e-4);
  });

  it('converts on [start, duration): 10 ms at 10 kS/s is 100 codes, as a firmware loop counts them', () => {
    // Before: 101, the instant at the end of the run converted too.
    expect(runCircuit(circuit('rate: 10kS/s')).adcs[0].code.length).toBe(100);
    expect(runCircuit(circuit('rate: 10kS/s, start: 2.5m')).adcs[0].code.length).toBe(75);
  });

  it('writes sample times as start + k/rate, the decimals a person writes', () => {
    // Before: 3 × 0.1 ms came out as 0.00030000000000000003.
    const adc = runCircuit(circuit('rate: 10kS/s, start: 1m')).adcs[0];
    expect(adc.time[0]).toBe(0.001);
    expect(adc.time[2]).toBe(0.0012);
    expect(Array.from(adc.time).indexOf(0.0033)).toBe(23);
    const plain = runCircuit(circuit('rate: 10k')).adcs[0];
    expect(String(plain.time[3])).toBe('0.0003');
  });

  it('lays output rows on k·step, the decimals a person writes', () => {
    const run = simulate(circuit('rate: 10k', 'duration: 10m, output-step: 50u'));
    expect(Array.from(run.time).indexOf(0.00015)).toBe(3);
    expect(Array.from(run.time).indexOf(0.0097)).toBe(194);
  });
});
