import { describe, expect, it } from 'vitest';
import { column, runText } from './support/run-text.ts';

// CODATA 2018 exact values (SI since 2019), written out here independently of the engine.
const k = 1.380649e-23;
const q = 1.602176634e-19;
const thermalVoltage = (celsius: number) => (k * (celsius + 273.15)) / q;

/** Root of f on [lo, hi] by bisection (f(lo) and f(hi) of opposite signs). */
function bisect(f: (x: number) => number, lo: number, hi: number): number {
  for (let i = 0; i < 200; i++) {
    const mid = (lo + hi) / 2;
    if (Math.sign(f(mid)) === Math.sign(f(lo))) lo = mid;
    else hi = mid;
  }
  return (lo + hi) / 2;
}

describe('diode against the Shockley equation', () => {
  it('a ramp through 1 kΩ: the junction voltage matches the equation solved by bisection within 0.5 mV', () => {
    const result = runText(`
circuit: diode-ramp
parts:
  SRC: { voltage: { points: [[0, -2], [1m, 5]] }, between: [in, gnd] }
  R1: { resistor: 1k, between: [in, a] }
  D1: { diode: { preset: small-signal, saturation-current: 3n, emission: 1.8, series-resistance: 0, capacitance: 0 }, between: [a, gnd] }
simulate: { duration: 1m, output-step: 5u }
record: [in, a]
`);
    // Shockley equation I = Is·(exp(V/(n·Vt)) − 1), Vt = kT/q at 25 °C (any semiconductor
    // device textbook), with Vs = I·R + V solved for V by bisection.
    const nvt = 1.8 * thermalVoltage(25);
    const source = column(result, 'in');
    const anode = column(result, 'a');
    let worst = 0;
    for (let i = 0; i < source.length; i++) {
      const vs = source[i];
      const v = bisect((vd) => 3e-9 * (Math.exp(vd / nvt) - 1) * 1e3 + vd - vs, -3, 1);
      worst = Math.max(worst, Math.abs(anode[i] - v));
    }
    expect(worst).toBeLessThan(0.5e-3);
    expect(result.stats.newtonFailures).toBe(0);
  });
});
