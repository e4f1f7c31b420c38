import { describe, expect, it } from 'vitest';
import { Propagator } from '../src/transient/propagator.ts';

/** x(H) = A·x + B·p + D·q for a system given as row-major G and C. */
function stepOf(g: number[], c: number[], h: number, x: number[], p: number[], q: number[]): Float64Array {
  const propagator = new Propagator(x.length);
  expect(propagator.build(Float64Array.from(g), Float64Array.from(c), h)).toBe(true);
  const out = new Float64Array(x.length);
  propagator.prepare(0, Float64Array.from(p), Float64Array.from(q));
  propagator.apply(Float64Array.from(x), 0, out);
  return out;
}

describe('exact step over a linear stretch (Propagator)', () => {
  it('an RC charging from a held and from a ramping drive matches the closed form within 1e-13', () => {
    // C·v' + v/R = p(τ), R = C = 1: v(H) = v0·e^{-H} + p0·(1 - e^{-H}) + q·(H - 1 + e^{-H})
    // (first-order linear ODE with polynomial forcing, any circuit theory textbook).
    const e = Math.exp(-0.5);
    expect(stepOf([1], [1], 0.5, [0.3], [0], [0])[0]).toBeCloseTo(0.3 * e, 13);
    expect(stepOf([1], [1], 0.5, [0], [2], [0])[0]).toBeCloseTo(2 * (1 - e), 13);
    expect(stepOf([1], [1], 0.5, [0], [0], [3])[0]).toBeCloseTo(3 * (0.5 - 1 + e), 13);
  });

  it('a lightly damped oscillator keeps amplitude and phase within 1e-11 over 10,000 steps of 1/8 cycle', () => {
    // x'' + 2ζω x' + ω² x = 0 from x = 1, x' = 0: x(t) = e^{-ζωt}(cos ω_d t + ζω/ω_d sin ω_d t)
    // (damped harmonic oscillator, any mechanics or circuit theory textbook).
    const w = 2 * Math.PI * 12.6e3;
    const zeta = 0.007;
    const h = 1 / 12.6e3 / 8;
    const propagator = new Propagator(2);
    // States [x, x']: x' - v = 0; v' + ω²x + 2ζω v = 0.
    propagator.build(Float64Array.of(0, -1, w * w, 2 * zeta * w), Float64Array.of(1, 0, 0, 1), h);
    let x = Float64Array.of(1, 0);
    let next = new Float64Array(2);
    const none = new Float64Array(2);
    propagator.prepare(0, none, none);
    const steps = 10_000;
    for (let k = 0; k < steps; k++) {
      propagator.apply(x, 0, next);
      [x, next] = [next, x];
    }
    const t = steps * h;
    const wd = w * Math.sqrt(1 - zeta * zeta);
    const exact = Math.exp(-zeta * w * t) * (Math.cos(wd * t) + ((zeta * w) / wd) * Math.sin(wd * t));
    // e^{-ζωt} ≈ 0.0004 here: compare against the amplitude at that time.
    expect(Math.abs(x[0] - exact)).toBeLessThan(1e-11);
  });

  it('algebraic unknowns (a voltage source and its current, no capacitance) come out consistent', () => {
    // Unknowns [v(node), v(src), i(src)]: C·v' + (v - u) = 0; (u - v) + i = 0; u = p.
    // Step response of an RC behind a source: v(1) = 1 - e^{-1}, u = 1, i = v - u.
    const g = [1, -1, 0, -1, 1, 1, 0, 1, 0];
    const c = [1, 0, 0, 0, 0, 0, 0, 0, 0];
    const out = stepOf(g, c, 1, [0, 0, 0], [0, 0, 1], [0, 0, 0]);
    expect(out[0]).toBeCloseTo(1 - Math.exp(-1), 13);
    expect(out[1]).toBeCloseTo(1, 13);
    expect(out[2]).toBeCloseTo(out[0] - 1, 13);
    // A ramp p = τ from rest: v(1) = 1 - (1 - e^{-1}) = e^{-1}, u follows the ramp to 1.
    const ramp = stepOf(g, c, 1, [0, 0, 0], [0, 0, 0], [0, 0, 1]);
    expect(ramp[0]).toBeCloseTo(Math.exp(-1), 13);
    expect(ramp[1]).toBeCloseTo(1, 13);
  });

  it('a stiff mode (time constant 1e-9 of a 1e-3 step) decays to nothing instead of ringing', () => {
    // Two RCs in parallel from a held drive of 1: v(H) = 1 - e^{-H/τ} for each; τ = 1e-9 gives 1.
    const out = stepOf([1, 0, 0, 1], [1e-9, 0, 0, 1e-3], 1e-3, [0, 0], [1, 1], [0, 0]);
    expect(out[0]).toBeCloseTo(1, 12);
    expect(out[1]).toBeCloseTo(1 - Math.exp(-1), 12);
  });
});
