import { describe, expect, it } from 'vitest';
import { readMessages } from './support/read-messages.ts';

function read(response: string) {
  const text = `circuit: response-read
parts:
  VIN: { voltage: 1, between: [in, gnd] }
  R1: { resistor: 10k, between: [in, out] }
  C1: { capacitor: 1n, between: [out, gnd] }
simulate: { duration: 1m }
response: ${response}
`;
  return readMessages(text);
}

describe('reading the response section', () => {
  it('reads the sweep, with 50 points per decade by default', () => {
    const { circuit, messages } = read('{ input: VIN, from: 10, to: 1MHz }');
    expect(messages).toEqual([]);
    expect(circuit?.response).toEqual({ input: 'VIN', from: 10, to: 1e6, perDecade: 50 });
    expect(read('{ input: VIN, from: 1, to: 1k, per-decade: 20 }').circuit?.response?.perDecade).toBe(20);
  });

  it('leaves the circuit without one when the section is absent', () => {
    const { circuit } = readMessages('circuit: x\nparts:\n  VIN: { voltage: 1, between: [in, gnd] }\n  R1: { resistor: 1k, between: [in, gnd] }\nsimulate: { duration: 1m }\n');
    expect(circuit).toBeDefined();
    expect(circuit!.response).toBeUndefined();
  });

  it('names an input that is no part, with the closest source', () => {
    const { circuit, messages } = read('{ input: VNI, from: 10, to: 1M }');
    expect(circuit).toBeUndefined();
    expect(messages).toEqual(["a.yaml:7:20: error: response input 'VNI' names no part of this circuit at response.input\n  did you mean 'VIN'?"]);
  });

  it('refuses an input that is not a source, listing the sources', () => {
    const { messages } = read('{ input: R1, from: 10, to: 1M }');
    expect(messages).toEqual(["a.yaml:7:20: error: response input 'R1' is a resistor, not a voltage or current source at response.input\n  name a source: VIN"]);
  });

  it('refuses a sweep that ends below its start, and missing or bad keys', () => {
    expect(read('{ input: VIN, from: 1M, to: 10 }').messages).toEqual(['a.yaml:7:39: error: the sweep ends (10 Hz) at or below where it starts (1 MHz) at response.to\n  write `to:` above `from:`']);
    const { messages } = read('{ input: VIN, to: 1M, per-decade: 2.5, step: 3 }');
    expect(messages).toHaveLength(3);
    expect(messages[0]).toMatch(/^a\.yaml:7:11: error: missing key 'from'.*\n  write `from: 10`, the lowest frequency in Hz$/);
    expect(messages[1]).toBe('a.yaml:7:45: error: per-decade must be a whole number, found 2.5 at response.per-decade\n  write it without a fraction, e.g. 12');
    expect(messages[2]).toMatch(/^a\.yaml:7:\d+: error: unknown key 'step'/);
    expect(read('[10, 1M]').messages).toEqual(['a.yaml:7:11: error: `response` must be a map of keys at response\n  for example `response: { input: VIN, from: 10, to: 1M }`']);
  });

  it('warns of a sweep of absurdly many points', () => {
    const { circuit, messages } = read('{ input: VIN, from: 1m, to: 1G, per-decade: 10000 }');
    expect(circuit).toBeDefined();
    expect(messages).toEqual(['a.yaml:7:55: warning: the sweep makes 120000 points at response.per-decade\n  check the prefixes of `from` and `to`: m is milli, M is mega']);
  });
});
