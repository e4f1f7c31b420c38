import { describe, expect, it } from 'vitest';
import { readCircuit } from '@voltcast/core';
import { column, runText } from './support/run-text.ts';
import { crossing } from './support/measure.ts';

/** Every crossing of `level` by v, rising and falling alternately from the first. */
function crossings(time: Float64Array, v: Float64Array, level: number): { t: number; rising: boolean }[] {
  const found: { t: number; rising: boolean }[] = [];
  for (let i = 1; i < v.length; i++) {
    const a = v[i - 1] - level;
    const b = v[i] - level;
    if ((a < 0 && b >= 0) || (a > 0 && b <= 0)) found.push({ t: time[i - 1] + (a / (a - b)) * (time[i] - time[i - 1]), rising: b > a });
  }
  return found;
}

describe('comparator on a triangle', () => {
  // Triangle from -1 V to 1 V at 1 kHz: 4 V/ms, rising from t = 0, falling from 0.5 ms.
  const result = runText(`
circuit: comparator-triangle
parts:
  SRC: { voltage: { triangle: { low: -1, high: 1, frequency: 1k } }, between: [in, gnd] }
  CMP: { comparator: { preset: fast, hysteresis: 200m, delay: 5u, edge: 100n }, plus: in, minus: gnd, out: out, supply: [0, 3.3] }
  RL: { resistor: 100k, between: [out, gnd] }
simulate: { duration: 3m, output-step: 1u }
record: [in, out]
`);
  const out = column(result, 'out');

  it('switches at plus and minus half the hysteresis, plus the delay, within 2 µs', () => {
    // A comparator with hysteresis (a Schmitt trigger, electronics textbooks): it turns high
    // when the input rises through +H/2 and low when it falls through -H/2. With the input
    // at 4 V/ms those are 0.275 ms and 0.775 ms into each period; the output's mid-swing
    // follows after the 5 µs delay and half the 100 ns edge.
    const switches = crossings(result.time, out, 3.3 / 2);
    expect(switches.length).toBe(6);
    switches.forEach(({ t, rising }, i) => {
      const period = Math.floor(i / 2) * 1e-3;
      const expected = period + (rising ? 1.1 / 4 : 0.5 + 1.1 / 4) * 1e-3 + 5e-6 + 50e-9;
      expect(Math.abs(t - expected)).toBeLessThan(2e-6);
    });
  });

  it('drives its output to the supplies', () => {
    // Push-pull through the fast class's 30 Ω into 100 kΩ: within 1 mV of each supply.
    expect(Math.max(...out)).toBeGreaterThan(3.3 - 1e-3);
    expect(Math.min(...out)).toBeLessThan(1e-3);
    expect(Math.min(...out)).toBeGreaterThanOrEqual(0);
  });

  it('locates each switching instant as an event: Newton never fails on the way', () => {
    expect(result.stats.newtonFailures).toBe(0);
  });
});

describe('comparator output edge', () => {
  it('rises in a straight edge of the given time', () => {
    const result = runText(`
circuit: comparator-edge
parts:
  SRC: { voltage: { points: [[0, -1], [1u, -1], [1.01u, 1]] }, between: [in, gnd] }
  CMP: { comparator: { preset: fast, delay: 200n, edge: 100n }, plus: in, minus: gnd, out: out, supply: [0, 3.3] }
  RL: { resistor: 100k, between: [out, gnd] }
simulate: { duration: 2u, output-step: 1n }
record: [out]
`);
    const out = column(result, 'out');
    // The 10%–90% time of a straight edge is 80% of the edge (definition of rise time, common practice).
    const rise = crossing(result.time, out, 0.9 * 3.3, true) - crossing(result.time, out, 0.1 * 3.3, true);
    expect(Math.abs(rise - 0.8 * 100e-9)).toBeLessThan(2e-9);
    // The input crosses 0 V at 1.005 µs; the edge starts 200 ns later.
    expect(Math.abs(crossing(result.time, out, 0.1 * 3.3, true) - (1.005e-6 + 200e-9 + 10e-9))).toBeLessThan(2e-9);
  });
});

describe('comparator outputs and supplies', () => {
  it('an open-drain output pulls low through its on resistance and lets the pull-up raise it', () => {
    const result = runText(`
circuit: open-drain
parts:
  VCC: { voltage: 3.3, between: [vcc, gnd] }
  SRC: { voltage: { points: [[0, 0], [1m, 0], [1.001m, 1]] }, between: [in, gnd] }
  CMP: { comparator: general-purpose, plus: in, minus: ref, out: irq, supply: [gnd, vcc] }
  REF: { voltage: 0.5, between: [ref, gnd] }
  RPU: { resistor: 10k, between: [vcc, irq] }
simulate: { duration: 2m, output-step: 1u }
record: [irq]
`);
    const irq = column(result, 'irq');
    // Before 1 ms the input is below the reference: the output pulls low, a divider of the
    // class's 80 Ω against 10 kΩ; after it, only the 1 nA off-state leakage loads the pull-up.
    expect(irq[500]).toBeCloseTo((3.3 * 80) / 10080, 4);
    expect(irq.at(-1)!).toBeCloseTo(3.3 - 10e3 * 1e-9 * 3.3, 4);
  });

  it('an open-drain output with no pull-up is an error that says what to add', () => {
    const { circuit, issues } = readCircuit(`circuit: no-pull-up
parts:
  SRC: { voltage: 1, between: [in, gnd] }
  CMP: { comparator: { output: open-drain }, plus: in, minus: gnd, out: irq, supply: [gnd, vcc] }
  VCC: { voltage: 3.3, between: [vcc, gnd] }
simulate: { duration: 1m }
record: [irq]
`);
    expect(circuit).toBeUndefined();
    expect(issues).toMatchObject([
      {
        severity: 'error',
        part: 'CMP',
        position: { line: 4, column: 73 },
        message: "node 'irq' at out of CMP is joined to nothing else that conducts at DC: an open-drain output only pulls low, so its voltage is undefined while it is off",
        hint: 'add a pull-up resistor to vcc, e.g. R_PULLUP: { resistor: 10k, between: [irq, vcc] }, or write `output: push-pull`',
      },
    ]);
  });

  it('a push-pull output follows supply nodes, and starts in the state its inputs give at t = 0', () => {
    const result = runText(`
circuit: supply-node
parts:
  VCC: { voltage: { points: [[0, 5], [1m, 5], [2m, 3]] }, between: [vcc, gnd] }
  SRC: { voltage: 1, between: [in, gnd] }
  CMP: { comparator: ideal, plus: in, minus: gnd, out: out, supply: [gnd, vcc] }
  RL: { resistor: 10k, between: [out, gnd] }
simulate: { duration: 3m, output-step: 10u }
record: [out]
`);
    const out = column(result, 'out');
    // The ideal class's 1 Ω into 10 kΩ.
    expect(out[0]).toBeCloseTo((5 * 1e4) / 10001, 6);
    expect(out.at(-1)!).toBeCloseTo((3 * 1e4) / 10001, 6);
  });

  it('reads presets and overrides, and names a wrong class', () => {
    const { issues } = readCircuit(`circuit: bad-class
parts:
  SRC: { voltage: 1, between: [in, gnd] }
  CMP: { comparator: { preset: fsat, output: totem }, plus: in, minus: gnd, out: out, supply: [0, 5] }
  RL: { resistor: 10k, between: [out, gnd] }
simulate: { duration: 1m }
`);
    expect(issues.map((issue) => `${issue.message} | ${issue.hint}`)).toEqual([
      "'fsat' is not a comparator class | did you mean 'fast'?",
      "'totem' is not one of push-pull, open-drain | choose one of: push-pull, open-drain",
    ]);
  });
});
