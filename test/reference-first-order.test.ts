import { describe, expect, it } from 'vitest';
import { column, maxError, runText } from './support/run-text.ts';
import { lagThroughEdge } from './support/first-order.ts';

describe('first-order circuits against the closed-form response', () => {
  it('RC charges through a piecewise-linear edge within 0.05% of full scale', () => {
    // tau = 1k * 1u = 1 ms; a 0.5 ms edge from 0 to 2 V starting at 1 ms.
    const result = runText(`
circuit: rc-edge
parts:
  SRC: { voltage: { points: [[0, 0], [1m, 0], [1.5m, 2]] }, between: [in, gnd] }
  R1: { resistor: 1k, between: [in, out] }
  C1: { capacitor: 1u, between: [out, gnd] }
simulate: { duration: 8m, output-step: 10u }
record: [out]
`);
    const error = maxError(result.time, column(result, 'out'), (t) => lagThroughEdge(t, 1e-3, 1e-3, 1.5e-3, 2));
    // Closed-form first-order response (any circuit theory textbook): 0.05% of 2 V = 1 mV.
    expect(error).toBeLessThan(0.0005 * 2);
  });

  it('RL current rises as 1 - exp(-t R / L) within 0.05% of full scale', () => {
    // tau = L / R = 10 mH / 100 ohm = 100 us; current read as the voltage across R.
    const result = runText(`
circuit: rl-rise
parts:
  SRC: { voltage: { points: [[0, 0], [10u, 0], [11u, 1]] }, between: [in, gnd] }
  L1: { inductor: 10m, between: [in, mid] }
  R1: { resistor: 100, between: [mid, gnd] }
simulate: { duration: 800u, output-step: 1u }
record: [mid]
`);
    const error = maxError(result.time, column(result, 'mid'), (t) => lagThroughEdge(t, 100e-6, 10e-6, 11e-6, 1));
    // Closed-form first-order response (any circuit theory textbook): 0.05% of the 1 V full scale (10 mA through 100 Ω).
    expect(error).toBeLessThan(0.0005 * 1);
  });
});
