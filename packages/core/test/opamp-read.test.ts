import { describe, expect, it } from 'vitest';
import { readCircuit } from '../src/index.ts';
import type { OpampSpec } from '../src/parts/opamp-spec.ts';

const circuit = (amp: string): string => `circuit: amp-read
parts:
  SRC: { voltage: 1, between: [in, gnd] }
  AMP: ${amp}
  RL: { resistor: 10k, between: [out, gnd] }
simulate: { duration: 1m }
`;

const errors = (amp: string) => readCircuit(circuit(amp), { fileName: 'amp.yaml' }).issues.filter((i) => i.severity === 'error');
const spec = (amp: string): OpampSpec => {
  const { circuit: c, issues } = readCircuit(circuit(amp), { fileName: 'amp.yaml' });
  expect(issues.filter((i) => i.severity === 'error')).toEqual([]);
  return c!.parts.find((p) => p.name === 'AMP') as OpampSpec;
};

describe('reading op-amps', () => {
  it('a misspelt class gets a suggestion at its position', () => {
    const [issue] = errors('{ opamp: general-purpse, plus: in, minus: out, out: out, supply: [-5, 5] }');
    expect(issue.message).toBe("'general-purpse' is not an op-amp class");
    expect(issue.hint).toBe("did you mean 'general-purpose'?");
    expect(issue.position).toEqual({ line: 4, column: 17 });
    expect(issue.part).toBe('AMP');
  });

  it('overrides take SI units and keep the rest of the preset', () => {
    const s = spec('{ opamp: { preset: jfet-input, gbw: 5MHz, slew: 20V/us, gain: 120dB, headroom: [1, 2] }, plus: in, minus: out, out: out, supply: [-5, 5] }');
    expect(s.parameters.gbw).toBe(5e6);
    expect(s.parameters.slew).toBe(20e6);
    expect(s.parameters.gain).toBeCloseTo(1e6, 6); // 120 dB = 10^(120/20), voltage ratio
    expect(s.parameters.headroom).toEqual([1, 2]);
    expect(s.parameters.offset).toBe(2e-3); // the jfet-input preset's
  });

  it('noise figures take densities with their units, and a bad unit is named', () => {
    const s = spec("{ opamp: { preset: precision, noise-voltage: 4.5nV/√Hz, noise-corner: 2Hz, noise-current: 0.4pA/rtHz }, plus: in, minus: out, out: out, supply: [-5, 5] }");
    expect([s.parameters.noiseVoltage, s.parameters.noiseCorner, s.parameters.noiseCurrent]).toEqual([4.5e-9, 2, 0.4e-12]);
    expect(spec('{ opamp: general-purpose, plus: in, minus: out, out: out, supply: [-5, 5] }').parameters.noiseVoltage).toBe(20e-9);
    const [issue] = errors('{ opamp: { preset: precision, noise-voltage: 4nA/√Hz }, plus: in, minus: out, out: out, supply: [-5, 5] }');
    expect(issue.message).toBe("'4nA/√Hz' is not a voltage noise density: A/√Hz is a unit of current noise density");
  });

  it('supplies may be node names', () => {
    const s = spec('{ opamp: rail-to-rail, plus: in, minus: out, out: out, supply: [gnd, in] }');
    expect(s.supply).toEqual([{ node: 'gnd' }, { node: 'in' }]);
  });

  it('a supply is required except for the ideal class', () => {
    expect(errors('{ opamp: precision, plus: in, minus: out, out: out }')[0].message).toBe("missing key 'supply'");
    expect(errors('{ opamp: ideal, plus: in, minus: out, out: out }')).toEqual([]);
  });

  it('a current limit without output resistance is refused with a remedy', () => {
    const [issue] = errors('{ opamp: { preset: ideal, current-limit: 20m }, plus: in, minus: out, out: out }');
    expect(issue.message).toBe('a current limit needs an output resistance above 0');
    expect(issue.hint).toMatch(/rout/);
  });

  it('supplies in the wrong order are refused', () => {
    expect(errors('{ opamp: general-purpose, plus: in, minus: out, out: out, supply: [5, -5] }')[0].message).toMatch(/must be above the low one/);
  });
});
