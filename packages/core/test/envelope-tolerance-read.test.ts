import { describe, expect, it } from 'vitest';
import { readCircuit } from '../src/circuit/parse-circuit.ts';

// Invented circuits; only the tolerance keys matter here.
function read(partLines: string) {
  const text = `circuit: invented-tolerance\nparts:\n  VS: { voltage: 5, between: [in, gnd] }\n${partLines}\n  RL: { resistor: 1k, between: [out, gnd] }\nsimulate: { duration: 1m }\n`;
  return readCircuit(text);
}

describe('tolerance keys', () => {
  it('reads percent as relative and a plain number as absolute', () => {
    const { circuit, issues } = read('  R1: { resistor: 10k, tolerance: 1%, distribution: normal, between: [in, out] }\n  AMP: { opamp: { preset: general-purpose }, tolerance: { gbw: 33%, offset: 2mV, headroom: 0.2 }, plus: out, minus: fb, out: fb, supply: [-5, 5] }');
    expect(issues.filter((i) => i.severity === 'error')).toEqual([]);
    const r1 = circuit!.parts.find((p) => p.name === 'R1')!;
    expect(r1.tolerances).toEqual([{ key: 'resistor', mode: 'relative', amount: 0.01, distribution: 'normal' }]);
    const amp = circuit!.parts.find((p) => p.name === 'AMP')!;
    expect(amp.tolerances!.map((t) => [t.key, t.mode, t.amount, t.distribution])).toEqual([
      ['gbw', 'relative', 0.33, 'uniform'],
      ['offset', 'absolute', 0.002, 'uniform'],
      ['headroom', 'absolute', 0.2, 'uniform'],
    ]);
  });

  it('refuses a gain tolerance in dB, which is a ratio and not a gain difference', () => {
    const { circuit, issues } = read('  E1: { vcvs: 10, tolerance: 1dB, sense: [in, gnd], between: [out, gnd] }');
    expect(circuit).toBeUndefined();
    const issue = issues.find((i) => i.severity === 'error')!;
    expect(issue.message).toBe('a gain tolerance cannot be written in dB');
    expect(issue.part).toBe('E1');
  });

  it('rejects a tolerance that makes a value invalid, with position and hint', () => {
    const { circuit, issues } = read('  R1: { resistor: 10k, tolerance: 120%, between: [in, out] }');
    expect(circuit).toBeUndefined();
    const issue = issues.find((i) => i.severity === 'error')!;
    expect(issue.message).toMatch(/resistance reach -2 kΩ/);
    expect(issue.hint).toMatch(/smaller percentage/);
    expect(issue.position).toEqual({ line: 4, column: 35 });
    expect(issue.part).toBe('R1');
  });

  it('rejects unknown op-amp tolerance keys, a plain op-amp tolerance and a lone distribution', () => {
    const bad = read('  AMP: { opamp: general-purpose, tolerance: { gwb: 10% }, plus: out, minus: fb, out: fb, supply: [-5, 5] }\n  R1: { resistor: 1k, distribution: normal, between: [in, out] }\n  R2: { resistor: 1k, tolerance: fast, between: [in, out] }');
    const messages = bad.issues.filter((i) => i.severity === 'error').map((i) => `${i.message} | ${i.hint}`);
    expect(messages.some((m) => /gwb/.test(m) && /gbw/.test(m))).toBe(true);
    expect(messages.some((m) => /`distribution` has no `tolerance`/.test(m))).toBe(true);
    expect(messages.some((m) => /resistance/.test(m) && /fast/.test(m))).toBe(true);
    const plain = read('  AMP: { opamp: general-purpose, tolerance: 10%, plus: out, minus: fb, out: fb, supply: [-5, 5] }');
    expect(plain.issues.find((i) => i.severity === 'error')!.message).toMatch(/names the values it varies/);
  });
});
