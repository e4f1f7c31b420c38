import { describe, expect, it } from 'vitest';
import { column, maxError, runText } from './support/run-text.ts';

/**
 * The trapezoidal rule is second order: with fixed steps, halving the step cuts the global
 * error about fourfold (numerical analysis textbooks, order of the trapezoidal rule).
 */
describe('convergence order with fixed steps', () => {
  const tau = 1e-3;
  const w = 2 * Math.PI * 200;
  // RC low-pass driven by sin(wt) from rest: steady state plus the decaying transient
  // (closed-form forced first-order response, any circuit theory textbook).
  const exact = (t: number): number => {
    const wt = w * tau;
    return (Math.sin(w * t) - wt * Math.cos(w * t) + wt * Math.exp(-t / tau)) / (1 + wt * wt);
  };
  const errorAt = (h: number): number => {
    const result = runText(`
circuit: rc-sine-fixed
parts:
  SRC: { voltage: { sine: { amplitude: 1, frequency: 200 } }, between: [in, gnd] }
  R1: { resistor: 1k, between: [in, out] }
  C1: { capacitor: 1u, between: [out, gnd] }
simulate: { duration: 10m, output-step: 100u, fixed-step: ${h} }
record: [out]
`);
    return maxError(result.time, column(result, 'out'), exact);
  };

  it('halving the step cuts the error by 4 within 10%', () => {
    const e1 = errorAt(20e-6);
    const e2 = errorAt(10e-6);
    const e3 = errorAt(5e-6);
    expect(e1 / e2).toBeGreaterThan(3.6);
    expect(e1 / e2).toBeLessThan(4.4);
    expect(e2 / e3).toBeGreaterThan(3.6);
    expect(e2 / e3).toBeLessThan(4.4);
  });
});
