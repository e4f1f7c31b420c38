import { describe, expect, it } from 'vitest';
import { column, runText } from './support/run-text.ts';

/** Times where `v` crosses `level` upward, linearly interpolated between rows. */
function upwardCrossings(time: Float64Array, v: Float64Array, level: number): number[] {
  const out: number[] = [];
  for (let i = 1; i < v.length; i++) {
    if (v[i - 1] < level && v[i] >= level) out.push(time[i - 1] + ((level - v[i - 1]) / (v[i] - v[i - 1])) * (time[i] - time[i - 1]));
  }
  return out;
}

describe('series RLC step against the closed-form second-order response', () => {
  // L = 1 mH, C = 1 uF: w0 = 1/sqrt(LC) = 31623 rad/s. zeta = (R/2)·sqrt(C/L) = 0.1 for R = 6.3246 ohm.
  const L = 1e-3;
  const C = 1e-6;
  const zeta = 0.1;
  const R = 2 * zeta * Math.sqrt(L / C);
  const w0 = 1 / Math.sqrt(L * C);
  const result = runText(`
circuit: rlc-step
parts:
  SRC: { voltage: { points: [[0, 0], [10u, 0], [10.01u, 1]] }, between: [in, gnd] }
  R1: { resistor: ${R}, between: [in, a] }
  L1: { inductor: ${L}, between: [a, out] }
  C1: { capacitor: ${C}, between: [out, gnd] }
simulate: { duration: 1.2m, output-step: 0.1u }
record: [out]
`);
  const v = column(result, 'out');

  it('peak overshoot is exp(-pi·zeta/sqrt(1-zeta²)) within 0.5%', () => {
    // Second-order step response, peak overshoot formula (control and circuit textbooks).
    const expected = Math.exp((-Math.PI * zeta) / Math.sqrt(1 - zeta * zeta));
    const overshoot = Math.max(...v) - 1;
    expect(Math.abs(overshoot - expected) / expected).toBeLessThan(0.005);
  });

  it('damped frequency is w0·sqrt(1-zeta²) within 0.5%', () => {
    // Second-order step response, damped natural frequency (control and circuit textbooks).
    const expected = (w0 * Math.sqrt(1 - zeta * zeta)) / (2 * Math.PI);
    const crossings = upwardCrossings(result.time, v, 1);
    expect(crossings.length).toBeGreaterThanOrEqual(4);
    const period = (crossings[crossings.length - 1] - crossings[0]) / (crossings.length - 1);
    expect(Math.abs(1 / period - expected) / expected).toBeLessThan(0.005);
  });
});
