import { eigs, matrix } from 'mathjs';
import { describe, expect, it } from 'vitest';
import { buildCircuit } from '../src/index.ts';
import { LinearizedCircuit } from '../src/small-signal/linearized-circuit.ts';
import { slowestMode } from '../src/small-signal/slowest-mode.ts';
import { LADDER_C, LADDER_R, rcLadder as ladder } from './support/rc-ladder.ts';

const [R, C] = [LADDER_R, LADDER_C];

describe('the slowest natural mode of a linearized circuit', () => {
  it('a series RLC loaded by a resistor decays and rings as the roots of its characteristic equation, within 1e-9', () => {
    const [r, l, c, load] = [0.2, 10e-6, 10e-6, 100];
    const circuit = buildCircuit({
      circuit: 'invented-rail',
      parts: {
        FEED: { voltage: 5, between: ['feed', 'gnd'] },
        RFEED: { resistor: r, between: ['feed', 'mid'] },
        LF: { inductor: l, between: ['mid', 'rail'] },
        CBULK: { capacitor: c, between: ['rail', 'gnd'] },
        RLOAD: { resistor: load, between: ['rail', 'gnd'] },
      },
      simulate: { duration: '1m' },
    });
    // Handbook (second-order circuit, quadratic formula): s² + s·(R/L + 1/(RLOAD·C)) + (1 + R/RLOAD)/(LC) = 0,
    // so 1/|Re s| = 2/(R/L + 1/(RLOAD·C)) and the ringing is √(ω0² − α²)/2π.
    const alpha = (r / l + 1 / (load * c)) / 2;
    const omega0Squared = (1 + r / load) / (l * c);
    const mode = slowestMode(new LinearizedCircuit(circuit))!;
    expect(Math.abs(mode.timeConstant * alpha - 1)).toBeLessThan(1e-9);
    expect(Math.abs(mode.frequency / (Math.sqrt(omega0Squared - alpha * alpha) / (2 * Math.PI)) - 1)).toBeLessThan(1e-9);
    expect(['rail', 'mid']).toContain(mode.node);
  });

  it('a 400-section RC ladder (402 unknowns, past the whole-space Krylov size) has RC/(2 − 2cos(π/801)) as its slowest time constant, within 1e-6', () => {
    // From memory, and derivable: the ladder's G is (1/R)·tridiag(−1, 2, −1) with 1 in its last
    // diagonal entry and C = C·I; that matrix's eigenvalues are 2 − 2cos((2k − 1)π/(2N + 1)).
    const sections = 400;
    const mode = slowestMode(new LinearizedCircuit(ladder(sections)))!;
    const expected = (R * C) / (2 - 2 * Math.cos(Math.PI / (2 * sections + 1)));
    expect(Math.abs(mode.timeConstant / expected - 1)).toBeLessThan(1e-6);
    expect(mode.frequency).toBe(0);
    // The slowest mode is a quarter sine that is largest at the open end.
    expect(mode.node).toBe(`n${sections}`);
  });

  it('a 40-section ladder agrees with mathjs eigs on its conductance matrix (reference library from the npm registry), within 1e-9', () => {
    const sections = 40;
    const t = Array.from({ length: sections }, (_, i) =>
      Array.from({ length: sections }, (_, j) => (i === j ? (i === sections - 1 ? 1 : 2) : Math.abs(i - j) === 1 ? -1 : 0)),
    );
    const values = (eigs(matrix(t), { eigenvectors: false }).values as unknown as { toArray(): number[] }).toArray();
    const expected = (R * C) / Math.min(...values);
    const mode = slowestMode(new LinearizedCircuit(ladder(sections)))!;
    expect(Math.abs(mode.timeConstant / expected - 1)).toBeLessThan(1e-9);
  });

  it('a circuit of resistors and sources only has no natural mode', () => {
    const circuit = buildCircuit({
      circuit: 'invented-divider',
      parts: { V1: { voltage: 5, between: ['in', 'gnd'] }, R1: { resistor: '10k', between: ['in', 'out'] }, R2: { resistor: '10k', between: ['out', 'gnd'] } },
      simulate: { duration: '1m' },
    });
    expect(slowestMode(new LinearizedCircuit(circuit))).toBeUndefined();
  });
});
