import { describe, expect, it } from 'vitest';
import { buildCircuit } from '../src/circuit/parse-circuit.ts';
import { envelopePlan, planVariants, envelope } from '../src/analysis/envelope/envelope.ts';
import { runCircuit } from '../src/analysis/run-circuit.ts';

// An invented RC low-pass, a 1 V step at t = 0 (the capacitor starts empty), τ = 1 ms.
const tau = 1e-3;
const rc = buildCircuit({
  circuit: 'invented-rc-step',
  parts: {
    VS: { voltage: 1, between: ['in', 'gnd'] },
    R1: { resistor: '1k', tolerance: '1%', distribution: 'normal', between: ['in', 'out'] },
    C1: { capacitor: '1u', tolerance: '10%', distribution: 'normal', initial: 0, between: ['out', 'gnd'] },
  },
  simulate: { duration: '2m', 'output-step': '0.1m' },
  record: ['out'],
});

describe('Monte Carlo with normal tolerances', () => {
  it('spreads the RC step response as first-order tolerance analysis predicts', () => {
    const plan = envelopePlan(rc, { runs: 400, seed: 2026 });
    const row = 10; // t = τ
    const samples: number[] = [];
    for (const variant of planVariants(plan, 0, plan.runs)) {
      const run = runCircuit(variant.circuit);
      expect(run.transient.time[row]).toBeCloseTo(tau, 12);
      samples.push(run.transient.columns.get('out')![row]);
    }
    const mean = samples.reduce((a, b) => a + b, 0) / samples.length;
    const sd = Math.sqrt(samples.reduce((a, x) => a + (x - mean) ** 2, 0) / (samples.length - 1));
    // First-order tolerance analysis (root-sum-square of sensitivities, any tolerance-analysis
    // handbook): v(t) = 1 - exp(-t/τ), τ = RC, so ∂v/∂R·R = ∂v/∂C·C = -(t/τ)·exp(-t/τ), which is
    // -1/e at t = τ; with normal tolerances at 3 sigma, σR = 1%/3 and σC = 10%/3.
    const sensitivity = Math.exp(-1);
    const rss = Math.sqrt((sensitivity * 0.01 / 3) ** 2 + (sensitivity * 0.1 / 3) ** 2);
    expect(Math.abs(sd / rss - 1)).toBeLessThan(0.1);
    // The mean stays at the nominal 1 - 1/e to first order (same analysis).
    expect(Math.abs(mean - (1 - Math.exp(-1)))).toBeLessThan(3 * rss / Math.sqrt(samples.length) + 2e-3);
  });

  it('gives the same envelope for the same seed and run count, another for another seed', () => {
    const a = envelope(rc, { runs: 20, seed: 5 });
    const b = envelope(rc, { runs: 20, seed: 5 });
    const c = envelope(rc, { runs: 20, seed: 6 });
    expect(Array.from(a.max.get('out')!)).toEqual(Array.from(b.max.get('out')!));
    expect(Array.from(a.max.get('out')!)).not.toEqual(Array.from(c.max.get('out')!));
  });

  it('draws run i the same way whatever slice it is drawn in', () => {
    const plan = envelopePlan(rc, { runs: 10, seed: 9 });
    const whole = [...planVariants(plan, 0, 10)].map((v) => Array.from(v.deviations));
    const tail = [...planVariants(plan, 6, 10)].map((v) => Array.from(v.deviations));
    expect(tail).toEqual(whole.slice(6));
    // Normal draws are cut at the tolerance limits (3 sigma).
    for (const d of whole.flat()) expect(Math.abs(d)).toBeLessThanOrEqual(1);
  });
});
