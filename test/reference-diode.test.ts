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

/**
 * The anode voltage of a diode fed from `vs` through `r`: the Shockley equation
 * I = Is·(exp(Vj/(n·Vt)) − 1) (any semiconductor device textbook) with Vt = kT/q, and
 * Vs = I·(r + rs) + Vj, solved for the junction voltage by bisection.
 */
function shockleyAnode(vs: number, r: number, is: number, n: number, rs: number, celsius = 25): number {
  const nvt = n * thermalVoltage(celsius);
  const current = (vj: number) => is * (Math.exp(vj / nvt) - 1);
  const vj = bisect((v) => current(v) * (r + rs) + v - vs, Math.min(vs, 0) - 1, Math.max(vs, 0) + 1);
  return vj + current(vj) * rs;
}

describe('diode against the Shockley equation', () => {
  it('a ramp from -2 V to 5 V through 1 kΩ: the anode matches the equation solved by bisection within 0.5 mV', () => {
    const result = runText(`
circuit: diode-ramp
parts:
  SRC: { voltage: { points: [[0, -2], [1m, 5]] }, between: [in, gnd] }
  R1: { resistor: 1k, between: [in, a] }
  D1: { diode: { preset: small-signal, saturation-current: 3n, emission: 1.8, series-resistance: 0.8, capacitance: 0 }, between: [a, gnd] }
simulate: { duration: 1m, output-step: 5u }
record: [in, a]
`);
    const source = column(result, 'in');
    const anode = column(result, 'a');
    let worst = 0;
    for (let i = 0; i < source.length; i++) worst = Math.max(worst, Math.abs(anode[i] - shockleyAnode(source[i], 1e3, 3e-9, 1.8, 0.8)));
    expect(worst).toBeLessThan(0.5e-3);
    expect(result.stats.newtonFailures).toBe(0);
  });

  it('a 5 V step straight across a diode: Newton converges to the current its series resistance allows', () => {
    // No resistor outside the diode: the junction alone limits the current (amperes). Junction
    // limiting must keep every iterate's exponential finite for Newton to get there.
    const result = runText(`
circuit: diode-hard
parts:
  SRC: { voltage: { points: [[0, 0], [10u, 0], [11u, 5]] }, between: [a, gnd] }
  D1: { diode: { preset: schottky, capacitance: 0 }, between: [a, k] }
  RS: { resistor: 1, between: [k, gnd] }
simulate: { duration: 20u, output-step: 100n }
record: [a, k]
`);
    // Schottky preset: Is = 30 nA, n = 1.05, 2 Ω; with the 1 Ω sense resistor, 3 Ω in all.
    const expected = 5 - shockleyAnode(5, 1, 3e-8, 1.05, 2);
    const sensed = column(result, 'k').at(-1)!;
    expect(Math.abs(sensed - expected)).toBeLessThan(0.5e-3);
    expect(sensed).toBeGreaterThan(1.4); // about 1.5 A
    expect(result.stats.newtonFailures).toBe(0);
  });

  it('the forward voltage of a silicon diode falls by about 2 mV per kelvin', () => {
    const at = (celsius: number) => {
      const result = runText(`
circuit: diode-temperature
parts:
  BIAS: { current: 1m, between: [gnd, a] }
  D1: { diode: small-signal, between: [a, gnd] }
simulate: { duration: 1u, temperature: ${celsius} }
record: [a]
`);
      return column(result, 'a')[0];
    };
    // Common practice: a silicon junction's forward voltage falls by 1.5 to 2.5 mV/K near room temperature.
    const slope = (at(75) - at(-25)) / 100;
    expect(slope).toBeGreaterThan(-2.5e-3);
    expect(slope).toBeLessThan(-1.5e-3);
  });
});

describe('diode circuits against handbook relations', () => {
  it('half-wave rectifier with an RC load: ripple close to I/(f·C), a little below it', () => {
    const result = runText(`
circuit: half-wave
parts:
  AC: { voltage: { sine: { amplitude: 12, frequency: 50 } }, between: [ac, gnd] }
  D1: { diode: rectifier, between: [ac, dc] }
  C1: { capacitor: 470u, between: [dc, gnd] }
  RL: { resistor: 1k, between: [dc, gnd] }
simulate: { duration: 400m, output-step: 20u }
record: [dc]
`);
    const v = column(result, 'dc');
    let high = -Infinity;
    let low = Infinity;
    let sum = 0;
    let count = 0;
    result.time.forEach((t, i) => {
      if (t < 0.3) return; // settled: the last five periods
      high = Math.max(high, v[i]);
      low = Math.min(low, v[i]);
      sum += v[i];
      count++;
    });
    // Power-supply handbook relation for a half-wave rectifier with a reservoir capacitor:
    // ripple ≈ I/(f·C). It assumes the capacitor discharges for the whole period; it recharges
    // during a short part of it, so the true ripple is a few percent smaller.
    const estimate = sum / count / 1e3 / (50 * 470e-6);
    expect((high - low) / estimate).toBeGreaterThan(0.85);
    expect((high - low) / estimate).toBeLessThan(1);
    // The peak lies a rectifier drop (about 0.8 V at the peak current) below the 12 V peak.
    expect(high).toBeGreaterThan(11);
    expect(high).toBeLessThan(11.5);
    expect(result.stats.newtonFailures).toBe(0);
  });

  it('a clamp with a 5.1 V breakdown holds 5.1 V ± 5% at 5 mA', () => {
    const result = runText(`
circuit: clamp
parts:
  FEED: { current: 5m, between: [gnd, k] }
  DZ: { diode: { preset: small-signal, breakdown: 5.1 }, between: [gnd, k] }
simulate: { duration: 1u }
record: [k]
`);
    // Common practice: small Zener clamps are sold in ±5% voltage classes, stated at their test current.
    const volts = column(result, 'k')[0];
    expect(volts).toBeGreaterThan(5.1 * 0.95);
    expect(volts).toBeLessThan(5.1 * 1.05);
    expect(result.stats.newtonFailures).toBe(0);
  });
});
