import { describe, expect, it } from 'vitest';
import { readMessages } from './support/read-messages.ts';

function read(adc: string) {
  const text = `circuit: adc-read
parts:
  SRC: { voltage: 1, between: [sensor, gnd] }
  R1: { resistor: 10k, between: [sensor, out] }
  C1: { capacitor: 1n, between: [out, gnd] }
simulate: { duration: 1m }
adc:
${adc}
`;
  return readMessages(text);
}

describe('reading the adc section', () => {
  it('reads a converter with its defaults', () => {
    const { circuit, messages } = read('  MCU: { input: out, bits: 12, range: [0, 3.3], rate: 20k }');
    expect(messages).toEqual([]);
    expect(circuit?.adcs).toEqual([
      {
        name: 'MCU',
        input: ['out', 'gnd'],
        held: ['out', 'gnd'],
        bits: 12,
        low: 0,
        high: 3.3,
        times: { rate: 20e3, start: 0 },
        rounding: 'nearest',
        coding: 'unsigned',
        offset: 0,
        gainError: 0,
        noise: 0,
        seed: 1,
        average: 1,
      },
    ]);
  });

  it('sampling adds a switch and a capacitor per input, named after the converter', () => {
    const { circuit, messages } = read('  MCU: { input: out, bits: 12, range: [0, 3.3], rate: 20k, sampling: { capacitance: 10p, resistance: 2k, acquisition: 1u, precharge: 0 } }');
    expect(messages).toEqual([]);
    expect(circuit?.parts.map((p) => p.name).slice(3)).toEqual(['MCU.precharge-source', 'MCU.sample-switch', 'MCU.sample-capacitor', 'MCU.precharge-switch']);
    expect(circuit?.adcs[0].held).toEqual(['MCU.hold', 'gnd']);
    expect(circuit?.nodes).toContain('MCU.hold');
  });

  it('an input naming no node is an error with a did-you-mean, at its line and column', () => {
    const { messages } = read('  MCU: { input: otu, bits: 12, range: [0, 3.3], rate: 20k }');
    expect(messages).toEqual(["a.yaml:8:17: error: ADC input 'otu' names no node of this circuit at adc.MCU.input\n  did you mean 'out'?"]);
  });

  it('reports bad values, each where it is written', () => {
    const { messages } = read('  MCU: { input: [out, out], bits: 30, range: [3.3, 0], rate: 20k, times: [1m], coding: twos, sampling: { capacitance: 10p, resistance: 1k, acquisition: 60u } }');
    expect(messages).toEqual([
      "a.yaml:8:17: error: both ends of the differential input are 'out' at adc.MCU.input\n  write `input: [p, n]` with two different nodes",
      'a.yaml:8:35: error: bits must be at most 24, found 30 at adc.MCU.bits\n  write a number of 24 or less',
      "a.yaml:8:46: error: the range's high end (0 V) must be above its low end (3.3 V) at adc.MCU.range\n  write `range: [low, high]`",
      'a.yaml:8:74: error: an ADC takes `rate:` or `times:`, not both at adc.MCU.times\n  keep `rate:` (with `start:`) for regular sampling, or `times:` for listed instants',
      "a.yaml:8:88: error: 'twos' is not one of unsigned, offset-binary, twos-complement at adc.MCU.coding\n  choose one of: unsigned, offset-binary, twos-complement",
      'a.yaml:8:153: error: the acquisition window 60 µs is not shorter than the time between samples (50 µs) at adc.MCU.sampling.acquisition\n  shorten `acquisition`, or sample less often',
    ]);
  });

  it('unknown keys get a did-you-mean; a missing rate is named', () => {
    const { messages } = read('  MCU: { input: out, bits: 12, range: [0, 3.3], roundng: down }');
    expect(messages).toEqual([
      "a.yaml:8:8: error: an ADC needs `rate:` or `times:` at adc.MCU\n  write e.g. `rate: 20k` (samples per second)",
      "a.yaml:8:49: error: unknown key 'roundng' at adc.MCU.roundng\n  did you mean 'rounding'?",
    ]);
  });

  it('sample times after the end of the run are a warning', () => {
    const { circuit, messages } = read('  MCU: { input: out, bits: 12, range: [0, 3.3], times: [0.5m, 2m] }');
    expect(circuit).toBeDefined();
    expect(messages).toEqual(['a.yaml:8:56: warning: 1 sample time(s) lie after the end of the run (1 ms) and are never converted at adc.MCU.times\n  lengthen `duration` under simulate, or remove them']);
  });

  it('a rate that makes more samples than a run can keep is refused; many samples are a warning', () => {
    // 1 ms at 1e15 S/s is 1e12 samples (before: a raw RangeError from the typed array).
    expect(read('  MCU: { input: out, bits: 12, range: [0, 3.3], rate: 1e15 }').messages).toEqual([
      'a.yaml:8:55: error: rate 1e+6 GHz makes 1.0e+12 samples, more than a run can keep (1e+9) at adc.MCU.rate\n  check the prefix: k is kilo, M is mega, m is milli',
    ]);
    expect(read('  MCU: { input: out, bits: 12, range: [0, 3.3], rate: 20G }').messages).toEqual([
      'a.yaml:8:55: warning: rate 20 GHz makes 20 M samples at adc.MCU.rate\n  check the prefix: k is kilo, M is mega, m is milli',
    ]);
  });
});
