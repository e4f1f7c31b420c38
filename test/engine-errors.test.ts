import { describe, expect, it } from 'vitest';
import { SimulationError, buildCircuit, runCircuit } from '@voltcast/core';
import { runText } from './support/run-text.ts';

function failure(yaml: string): SimulationError {
  try {
    runText(yaml);
  } catch (e) {
    if (e instanceof SimulationError) return e;
    throw e;
  }
  throw new Error('the run did not fail');
}

describe('unsolvable circuits are reported by cause', () => {
  it('a floating node (no conducting path to ground at DC) names the node and the capacitors around it', () => {
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
    expect(Number.isNaN(e.time)).toBe(true);
  });

  it('a held capacitor fixes that node at DC', () => {
    expect(() =>
      runText(`
circuit: held
parts:
  V1: { voltage: 5, between: [in, gnd] }
  C1: { capacitor: 1u, between: [in, mid] }
  C2: { capacitor: 1u, between: [mid, gnd], initial: 2 }
simulate: { duration: 1m }
`),
    ).not.toThrow();
  });

  it('a loop of a source and an inductor names both parts', () => {
    const e = failure(`
circuit: loop
parts:
  V1: { voltage: 5, between: [a, gnd] }
  L1: { inductor: 1m, between: [a, gnd] }
simulate: { duration: 1m }
`);
    expect(e.parts).toEqual(['V1', 'L1']);
    expect(e.message).toContain('loop');
  });
});

describe('values far outside the circuit range', () => {
  it.each(['dense', 'sparse'] as const)('a 1 GF capacitor charges through 1 kΩ as the handbook ramp response says (%s matrix)', (matrix) => {
    // Before: "no unique solution at in" at the first step: C/h = 1e18 beside 1 mS made every
    // other pivot look like rounding. Handbook (RC ramp response): with τ = RC = 1e12 s far
    // beyond the run, v(t) = 5·(t − T/2)/τ after a ramp of T = 1 µs to 5 V, to 1e-14 relative.
    const circuit = buildCircuit({
      circuit: 'invented-huge-capacitor',
      parts: {
        V1: { voltage: { points: [[0, 0], ['1u', 5]] }, between: ['in', 'gnd'] },
        R1: { resistor: '1k', between: ['in', 'a'] },
        CX: { capacitor: '1G', between: ['a', 'gnd'] },
      },
      simulate: { duration: '10m' },
    });
    const run = runCircuit(circuit, { matrix });
    const expected = (5 * (10e-3 - 0.5e-6)) / 1e12;
    expect(Math.abs(run.transient.valueAt('a', 10e-3) / expected - 1)).toBeLessThan(1e-6);
  });

  it('a 1 GF capacitor to a plate joined to nothing else says the values are too far apart, not that the circuit has no solution', () => {
    const e = failure(`
circuit: invented-floating-plate
parts:
  V1: { voltage: { points: [[0, 0], [1u, 5]] }, between: [in, gnd] }
  R1: { resistor: 1k, between: [in, a] }
  R2: { resistor: 1k, between: [a, gnd] }
  CX: { capacitor: 1G, between: [a, b], initial: 0 }
simulate: { duration: 10m }
record: [a, b]
`);
    expect(e.message).toBe('the circuit equations at b are too ill-conditioned to solve: the values there (CX, and what drives them) are more decades apart than double precision holds');
    expect(e.nodes).toEqual(['b']);
    expect(e.parts).toEqual(['CX']);
    expect(e.hint).toMatch(/missing or wrong prefix/);
    expect(e.time).toBeGreaterThan(0);
  });
});

describe('a drive far outside the circuit range', () => {
  it('an integrator driven to 1e12 V and back in 1 µs stops at the edge with the step floor, not a false topology verdict', () => {
    // Before: the first step after the edge was the step before it × 1e-3 (1e-18 s), the
    // capacitor's C/h drowned every conductance, and the run ended with "no unique solution at out".
    const e = failure(`
circuit: invented-integrator
parts:
  TIP: { voltage: { points: [[0, 0], [0.5m, 0], [0.501m, 1], [2.5m, 1e12], [2.501m, 0]] }, between: [in, gnd] }
  RIN: { resistor: 10k, between: [in, sum] }
  CINT: { capacitor: 100n, between: [sum, out], initial: 0 }
  AMP: { opamp: precision, plus: gnd, minus: sum, out: out, supply: [-12, 12] }
simulate: { duration: 4m, output-step: 2u }
`);
    expect(e.message).toMatch(/^the step size fell below its floor at t = 2\.501 ms: /);
    expect(Math.abs(e.time - 2.501e-3)).toBeLessThan(1e-9);
    expect(e.nodes).toContain('out');
    expect(e.hint).toMatch(/an edge much faster than the circuit around it, a source value far beyond its supplies \(a missing or wrong prefix\)/);
  });
});
