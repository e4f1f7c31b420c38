import { describe, expect, it } from 'vitest';
import { buildCircuit } from '../src/circuit/parse-circuit.ts';
import { envelope } from '../src/analysis/envelope/envelope.ts';

// An invented follower on a 1 V reference whose offset may be ±2 mV and gain-bandwidth ±33%.
const follower = buildCircuit({
  circuit: 'invented-follower-offset',
  parts: {
    VREF: { voltage: 1, between: ['ref', 'gnd'] },
    BUF: { opamp: { preset: 'precision', offset: 0 }, tolerance: { offset: '2mV', gbw: '33%' }, plus: 'ref', minus: 'out', out: 'out', supply: [-5, 5] },
    RL: { resistor: '10k', between: ['out', 'gnd'] },
  },
  simulate: { duration: '1m', 'output-step': '0.1m' },
  record: ['out'],
});

describe('op-amp tolerances', () => {
  it('move a follower by its offset limits at the corners', () => {
    const result = envelope(follower, { corners: true });
    expect(result.corners).toBe(4);
    expect(result.varied.map((v) => v.key)).toEqual(['gbw', 'offset']);
    // A follower's output is the input plus the input offset, times A/(1 + A) for open-loop
    // gain A (op-amp error analysis, any op-amp textbook); A = 3e6 for the precision class.
    const a = 3e6;
    const end = result.time.length - 1;
    expect(result.max.get('out')![end]).toBeCloseTo(((1 + 2e-3) * a) / (1 + a), 6);
    expect(result.min.get('out')![end]).toBeCloseTo(((1 - 2e-3) * a) / (1 + a), 6);
    expect(result.nominal.get('out')![end]).toBeCloseTo(a / (1 + a), 6);
  });
});
