/**
 * Circuits with a known reference, for `pnpm bench accuracy` (error and time) and for the
 * accuracy tests. Where the circuit reduces
 * by hand to a few ODEs, odex integrates them (an independent library); the op-amp fixtures
 * that clip or carry the full macro-model are compared against voltcast itself at a far
 * tighter setting (a self-converged reference, said so in the table).
 */
import type { OdeCase } from './odex-rows.ts';

export interface AccuracyCase {
  readonly name: string;
  /** Circuit-file text, or a fixture file name under fixtures/. */
  readonly text?: string;
  readonly fixture?: string;
  /** The node compared with the reference. */
  readonly node: string;
  /** Hand-reduced ODEs for odex; absent: self-converged reference. */
  readonly ode?: OdeCase;
}

/**
 * The case: a plain differentiator (C into the summing node, R in feedback) around a
 * single-pole op-amp of 100 dB and 1 MHz (no slew limit worth the name, rout 0), driven by a
 * 0..1 V triangle at 50 Hz for 0.2 s (20 corners; fewer for a shorter run). Output ±0.1 V plateaus with a ring at
 * √(f0·GBW) ≈ 12.6 kHz, damping ratio ≈ 0.007, after each of the 20 corners.
 */
export function plainDifferentiator(corners = 20): AccuracyCase {
  const r = 10e3;
  const c = 100e-9;
  // The op-amp macro-model (parts/opamp.ts): gm into an internal node with R1 ∥ C1; out = that node.
  const c1 = 1e-9;
  const gm = 2 * Math.PI * 1e6 * c1;
  const r1 = 1e5 / gm;
  const imax = 1e12 * c1;
  const half = 0.01;
  return {
    name: 'plain differentiator, triangle drive',
    node: 'out',
    text: `
circuit: accuracy-plain-differentiator
parts:
  TRI: { voltage: { triangle: { low: 0, high: 1, frequency: 50 } }, between: [in, gnd] }
  CIN: { capacitor: 100n, between: [in, sum] }
  RF: { resistor: 10k, between: [sum, out] }
  AMP: { opamp: { preset: ideal, gain: 100dB, gbw: 1MHz }, plus: gnd, minus: sum, out: out }
simulate: { duration: ${corners * 10}m, output-step: 10u }
record: [out]
`,
    // y = [v(sum), v(out)]: C·d(vin - vsum)/dt = (vsum - vout)/R; C1·dvout/dt = imax·tanh(-gm·vsum/imax) - vout/R1.
    ode: {
      initial: [0, 0],
      derivative: (_t, [vs, vo], from) => [(Math.round(from / half) % 2 === 0 ? 1 / half : -1 / half) - (vs - vo) / (r * c), (imax * Math.tanh((-gm * vs) / imax) - vo / r1) / c1],
      output: (_t, y) => y[1],
      corners: Array.from({ length: corners }, (_, k) => k * half),
    },
  };
}

/** fixtures/supply-ringing.yaml: a series RLC with ζ ≈ 0.105 switched onto 5 V. */
export const rlcRinging: AccuracyCase = (() => {
  const [rFeed, l, c, rLoad] = [0.2, 10e-6, 10e-6, 100];
  // The drive between its corners, chosen by the segment's start so that no rounding at a corner picks the wrong piece.
  const drive = (t: number, from: number): number => (from < 19e-6 ? 0 : from > 20.05e-6 ? 5 : ((t - 20e-6) / 0.1e-6) * 5);
  return {
    name: 'series RLC, zeta 0.1',
    fixture: 'supply-ringing.yaml',
    node: 'rail',
    // y = [i(L), v(rail)].
    ode: {
      initial: [0, 0],
      derivative: (t, [i, v], from) => [(drive(t, from) - rFeed * i - v) / l, (i - v / rLoad) / c],
      output: (_t, y) => y[1],
      corners: [20e-6, 20.1e-6],
    },
  };
})();

/** A ladder: two RC sections, an LC section and a loaded RC tail, driven by a 1 kHz sine (as test/reference-odex.test.ts). */
export const ladder: AccuracyCase = (() => {
  const p = { R1: 1e3, C1: 100e-9, R2: 2.2e3, C2: 47e-9, L1: 10e-3, C3: 100e-9, R3: 1e3, R4: 4.7e3, C4: 22e-9 };
  return {
    name: 'RC-LC ladder, sine drive',
    node: 'n4',
    text: `
circuit: accuracy-ladder
parts:
  SRC: { voltage: { sine: { amplitude: 1, frequency: 1k } }, between: [in, gnd] }
  R1: { resistor: ${p.R1}, between: [in, n1] }
  C1: { capacitor: ${p.C1}, between: [n1, gnd] }
  R2: { resistor: ${p.R2}, between: [n1, n2] }
  C2: { capacitor: ${p.C2}, between: [n2, gnd] }
  L1: { inductor: ${p.L1}, between: [n2, n3] }
  C3: { capacitor: ${p.C3}, between: [n3, gnd] }
  R3: { resistor: ${p.R3}, between: [n3, gnd] }
  R4: { resistor: ${p.R4}, between: [n3, n4] }
  C4: { capacitor: ${p.C4}, between: [n4, gnd] }
simulate: { duration: 3m, output-step: 5u }
record: [n4]
`,
    // y = [v1, v2, iL, v3, v4]: Kirchhoff's current law at each capacitor node.
    ode: {
      initial: [0, 0, 0, 0, 0],
      derivative: (t, [v1, v2, iL, v3, v4]) => {
        const vs = Math.sin(2 * Math.PI * 1e3 * t);
        return [
          ((vs - v1) / p.R1 - (v1 - v2) / p.R2) / p.C1,
          ((v1 - v2) / p.R2 - iL) / p.C2,
          (v2 - v3) / p.L1,
          (iL - v3 / p.R3 - (v3 - v4) / p.R4) / p.C3,
          (v3 - v4) / p.R4 / p.C4,
        ];
      },
      output: (_t, y) => y[4],
      corners: [],
    },
  };
})();

/** fixtures/noninverting-clipping.yaml: gain 20 into the rails, general-purpose macro-model. */
export const clippingOpamp: AccuracyCase = { name: 'non-inverting stage clipping', fixture: 'noninverting-clipping.yaml', node: 'out' };

/** fixtures/integrator-rain-gauge.yaml: an inverting integrator of a 2 ms pulse, precision macro-model. */
export const integrator: AccuracyCase = { name: 'inverting integrator', fixture: 'integrator-rain-gauge.yaml', node: 'out' };

export const otherCases: readonly AccuracyCase[] = [rlcRinging, ladder, clippingOpamp, integrator];
