import { describe, expect, it } from 'vitest';
import { buildCircuit } from '../src/circuit/parse-circuit.ts';
import { envelope } from '../src/analysis/envelope/envelope.ts';

// An invented divider: 10 V over two 1% resistors (top 10k, bottom 4.7k).
function divider(extra: object = {}) {
  return buildCircuit({
    circuit: 'invented-divider',
    parts: {
      VS: { voltage: 10, between: ['in', 'gnd'] },
      RTOP: { resistor: '10k', tolerance: '1%', between: ['in', 'out'], ...extra },
      RBOT: { resistor: '4.7k', tolerance: '1%', between: ['out', 'gnd'] },
    },
    simulate: { duration: '1m', 'output-step': '0.1m' },
    record: ['out'],
  });
}

describe('worst-case corners', () => {
  it('match the closed-form extremes of a 1% divider within 0.01%', () => {
    const result = envelope(divider(), { corners: true });
    expect(result.corners).toBe(4);
    // Extreme value analysis (worst-case circuit analysis, any tolerance-analysis handbook):
    // the output R2/(R1+R2)·V is monotonic in each resistor, so its extremes are at the
    // corners: highest with R1 low and R2 high, lowest with R1 high and R2 low.
    const v = 10;
    const high = (v * 4.7e3 * 1.01) / (10e3 * 0.99 + 4.7e3 * 1.01);
    const low = (v * 4.7e3 * 0.99) / (10e3 * 1.01 + 4.7e3 * 0.99);
    const nominal = (v * 4.7e3) / 14.7e3;
    for (let r = 0; r < result.time.length; r++) {
      expect(Math.abs(result.max.get('out')![r] / high - 1)).toBeLessThan(1e-4);
      expect(Math.abs(result.min.get('out')![r] / low - 1)).toBeLessThan(1e-4);
      expect(Math.abs(result.nominal.get('out')![r] / nominal - 1)).toBeLessThan(1e-4);
    }
  });

  it('stay inside the corner bounds with Monte Carlo draws', () => {
    const corners = envelope(divider(), { corners: true });
    const drawn = envelope(divider(), { runs: 50, seed: 7 });
    const out = (e: typeof corners, side: 'min' | 'max') => e[side].get('out')![0];
    // Any draw within the tolerances lies between the worst-case extremes (same source).
    expect(out(drawn, 'max')).toBeLessThanOrEqual(out(corners, 'max') * (1 + 1e-9));
    expect(out(drawn, 'min')).toBeGreaterThanOrEqual(out(corners, 'min') * (1 - 1e-9));
    expect(out(drawn, 'max')).toBeGreaterThan(out(drawn, 'min'));
  });

  it('applies an absolute tolerance in the value unit', () => {
    const result = envelope(divider({ tolerance: '100' }), { corners: true });
    // Same extreme value analysis with RTOP = 10k ± 100 Ω, which is ±1%: same bounds.
    const high = (10 * 4.7e3 * 1.01) / (9.9e3 + 4.7e3 * 1.01);
    expect(Math.abs(result.max.get('out')![0] / high - 1)).toBeLessThan(1e-4);
  });
});
