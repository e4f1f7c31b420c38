import { readFileSync } from 'node:fs';
import { describe, expect, it } from 'vitest';
import { parseCircuit, simulate, SimulationError, type SimulateOptions, type TransientResult } from '@voltcast/core';
import { rcLadder } from '../bench/cases.ts';

function run(text: string, matrix: SimulateOptions['matrix']): TransientResult {
  return simulate(parseCircuit(text, { fileName: 'inline.yaml' }), { matrix });
}

function fixture(name: string): string {
  return readFileSync(new URL(`../fixtures/${name}`, import.meta.url), 'utf8');
}

/** Largest difference between two runs over every probe and row; the runs must take the same steps. */
function largestDifference(a: TransientResult, b: TransientResult): number {
  expect(b.stats.acceptedSteps).toBe(a.stats.acceptedSteps);
  expect(b.time.length).toBe(a.time.length);
  let worst = 0;
  for (const [probe, column] of a.columns) {
    const other = b.columns.get(probe)!;
    for (let i = 0; i < column.length; i++) worst = Math.max(worst, Math.abs(column[i] - other[i]));
  }
  return worst;
}

describe('sparse and dense matrices give the same waveforms', () => {
  // Both solve the same equations exactly up to rounding (pivot order differs): 1 nV on
  // signals of volts leaves room for rounding over thousands of steps and nothing else.
  it.each(['differentiator-plain.yaml', 'noninverting-clipping.yaml', 'supply-ringing.yaml'])('%s within 1 nV', (name) => {
    const text = fixture(name);
    expect(largestDifference(run(text, 'dense'), run(text, 'sparse'))).toBeLessThan(1e-9);
  });

  it('an amplifier that reaches a rail set by a supply node mid-run (the sparse pattern grows then) within 1 nV', () => {
    const text = `
circuit: clip-at-supply-nodes
parts:
  VCC: { voltage: 5, between: [vcc, gnd] }
  VEE: { voltage: -5, between: [vee, gnd] }
  SRC: { voltage: { sine: { amplitude: 1, frequency: 1k } }, between: [in, gnd] }
  RG: { resistor: 1k, between: [sum, gnd] }
  RF: { resistor: 9k, between: [sum, out] }
  AMP: { opamp: general-purpose, plus: in, minus: sum, out: out, supply: [vee, vcc] }
simulate: { duration: 2m, output-step: 2u }
record: [out]
`;
    const sparse = run(text, 'sparse');
    expect(largestDifference(run(text, 'dense'), sparse)).toBeLessThan(1e-9);
    // A gain of 10 asks for 10 V peaks; the amplifier clips short of its 5 V supply nodes.
    const out = sparse.columns.get('out')!;
    expect(Math.max(...out)).toBeLessThan(5);
    expect(Math.max(...out)).toBeGreaterThan(3);
  });

  it('an RC ladder of 150 sections (sparse by default) within 1 nV of dense', () => {
    const text = rcLadder(150, 2e-3);
    expect(largestDifference(run(text, 'dense'), run(text, 'auto'))).toBeLessThan(1e-9);
  });
});

describe('a singular circuit is still diagnosed by name with sparse matrices', () => {
  function failure(text: string): SimulationError {
    try {
      run(text, 'sparse');
    } catch (e) {
      if (e instanceof SimulationError) return e;
      throw e;
    }
    throw new Error('the run did not fail');
  }

  it('a floating node (no conducting path to ground at DC)', () => {
    const e = failure(`
circuit: floating
parts:
  V1: { voltage: 5, between: [in, gnd] }
  C1: { capacitor: 1u, between: [in, mid] }
  C2: { capacitor: 1u, between: [mid, gnd] }
simulate: { duration: 1m }
`);
    expect(e.message).toBe('node mid floats: nothing that conducts at DC (resistor, source, inductor) joins it to gnd, so its steady voltage is undefined (only C1 and C2 touch it)');
    expect(e.nodes).toEqual(['mid']);
    expect(e.parts).toEqual(['C1', 'C2']);
  });

  it('a floating node in the middle of a 100-section ladder', () => {
    const text = rcLadder(100, 1e-3).replace('R51: { resistor: 100, between: [n50, n51] }', 'R51: { capacitor: 1n, between: [n50, n51] }');
    const e = failure(text);
    // n51..n100 hang from n50 through a capacitor: every one of them floats at DC.
    expect(e.nodes).toEqual(Array.from({ length: 50 }, (_, i) => `n${51 + i}`));
    expect(e.message).toContain('float: nothing that conducts at DC');
  });

  it('a loop of a source and an inductor', () => {
    const e = failure(`
circuit: loop
parts:
  V1: { voltage: 5, between: [a, gnd] }
  L1: { inductor: 1m, between: [a, gnd] }
simulate: { duration: 1m }
`);
    expect(e.parts).toEqual(['V1', 'L1']);
  });
});
