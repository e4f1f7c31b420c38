import { describe, expect, it } from 'vitest';
import { buildCircuit, parseCircuit, readCircuit, simulate } from '../src/index.ts';

/** A 1 kHz sine of 1 V around 150 mV into a fast RC, over 1 s: 1,000 periods. */
function sineOverOneSecond(outputStep?: string) {
  return buildCircuit({
    circuit: 'invented-sine-rows',
    parts: {
      VS: { voltage: { sine: { amplitude: 1, frequency: '1k', offset: '150m' } }, between: ['in', 'gnd'] },
      R1: { resistor: '1k', between: ['in', 'out'] },
      C1: { capacitor: '1n', between: ['out', 'gnd'] },
    },
    simulate: { duration: 1, ...(outputStep !== undefined ? { 'output-step': outputStep } : {}) },
    record: ['in', 'out'],
  });
}

const wave = (text: string) => parseCircuit(`circuit: w\nparts:\n  V1: { voltage: ${text}, between: [a, gnd] }\n  R1: { resistor: 1k, between: [a, gnd] }\nsimulate: { duration: 1 }\n`);

describe('default output rows resolve the fastest stimulus', () => {
  it('a 1 kHz sine over 1 s gets rows every 50 µs (20 per period), and the run says why', () => {
    // Before: duration / 1000 = 1 ms, one row per period, and the sine came out as a flat line.
    const circuit = sineOverOneSecond();
    expect(circuit.simulate.outputStep).toBeCloseTo(50e-6, 15);
    expect(circuit.simulate.rowsSetBy).toEqual({ part: 'VS', timescale: 1e-3, capped: false });
    const run = simulate(circuit);
    const column = run.columns.get('in')!;
    // A sine's extremes are offset ± amplitude (common practice); 20 rows per period see them within 1 − cos(π/20) = 1.2%.
    expect(Math.max(...column)).toBeGreaterThan(1.15 - 0.02);
    expect(Math.min(...column)).toBeLessThan(-0.85 + 0.02);
  });

  it('minimum and maximum come from every step: within 2% even with one row per period', () => {
    const run = simulate(sineOverOneSecond('1m'));
    const rows = run.columns.get('in')!;
    // The rows all sit at the same phase: they see a flat line at the offset.
    expect(Math.max(...rows) - Math.min(...rows)).toBeLessThan(0.01);
    for (const i of [0, 1]) {
      expect(Math.abs(run.maximum[i] - 1.15)).toBeLessThan(0.02 * 1.15);
      expect(Math.abs(run.minimum[i] + 0.85)).toBeLessThan(0.02 * 1.15);
    }
  });

  it('warns when a written output-step cannot show the fastest stimulus', () => {
    const text = 'circuit: w\nparts:\n  VS: { voltage: { sine: { amplitude: 1, frequency: 1k } }, between: [a, gnd] }\n  R1: { resistor: 1k, between: [a, gnd] }\nsimulate: { duration: 1, output-step: 1m }\n';
    const { issues } = readCircuit(text, { fileName: 'w.yaml' });
    expect(issues.map((i) => `${i.severity}: ${i.message}`)).toEqual([
      "warning: output-step 1 ms is longer than half of VS's 1 ms (its shortest period, level or segment): the rows, the CSV and the plot cannot show it (minimum and maximum still come from every step)",
    ]);
    expect(issues[0].hint).toMatch(/output-step: 50 µs or less/);
  });

  it('caps the rows chosen by default at 100,000 and says so', () => {
    // A 1 MHz sine over 1 s would want 20 million rows.
    const circuit = wave('{ sine: { amplitude: 1, frequency: 1M } }');
    expect(circuit.simulate.outputStep).toBeCloseTo(1e-5, 15);
    expect(circuit.simulate.rowsSetBy).toEqual({ part: 'V1', timescale: 1e-6, capped: true });
  });

  it('each wave states its shortest feature', () => {
    const timescale = (text: string) => wave(text).simulate.rowsSetBy?.timescale;
    expect(timescale('{ square: { low: 0, high: 1, frequency: 1k, duty: 10% } }')).toBeCloseTo(1e-4, 15);
    expect(timescale('{ triangle: { low: 0, high: 1, frequency: 1k } }')).toBeCloseTo(5e-4, 15);
    expect(timescale('{ fm: { carrier: 10k, deviation: 2k, rate: 100, amplitude: 1 } }')).toBeCloseTo(1 / 12e3, 15);
    expect(timescale('{ chirp: { from: 100, to: 5k, duration: 1, amplitude: 1 } }')).toBeCloseTo(2e-4, 15);
    expect(timescale('{ noise: { rms: 1m, bandwidth: 20k } }')).toBeCloseTo(5e-5, 15);
    expect(timescale('{ sum: [1, { sine: { amplitude: 1, frequency: 2k } }, { sine: { amplitude: 1, frequency: 500 } }] }')).toBeCloseTo(5e-4, 15);
    // A 2 µs spike among points: its width, from the start of the rise to the end of the fall.
    expect(timescale('{ points: [[0, 0], [1m, 0], [1.001m, 1], [1.002m, 0]] }')).toBeCloseTo(2e-6, 15);
    // A single edge has no peak: the rows stay at duration / 1000.
    const edge = wave('{ points: [[0, 0], [1m, 0], [1.001m, 1]] }');
    expect(edge.simulate.rowsSetBy).toBeUndefined();
    expect(edge.simulate.outputStep).toBeCloseTo(1e-3, 15);
  });
});

describe('valueAt on a run', () => {
  const rc = buildCircuit({
    circuit: 'invented-rc-step',
    parts: { VS: { voltage: 1, between: ['in', 'gnd'] }, R1: { resistor: '1k', between: ['in', 'out'] }, C1: { capacitor: '1u', between: ['out', 'gnd'], initial: 0 } },
    simulate: { duration: '5m', 'output-step': '100u' },
    record: ['out'],
  });
  const run = simulate(rc);

  it('reads a row exactly and interpolates between rows', () => {
    expect(run.valueAt('out', 0.0013)).toBe(run.columns.get('out')![13]);
    // RC charging 1 − exp(−t/RC) (textbook): between rows, within the chord's sag of about (Δt/τ)²/8 of the swing.
    expect(run.valueAt('out', 0.00135)).toBeCloseTo(1 - Math.exp(-1.35), 3);
    expect(run.valueAt('out', 0.005)).toBe(run.columns.get('out')!.at(-1));
  });

  it('says which nodes there are, and the run\'s span, when asked outside them', () => {
    expect(() => run.valueAt('in', 1e-3)).toThrow("valueAt('in'): no recorded node of that name; the recorded nodes are out");
    expect(() => run.valueAt('out', 6e-3)).toThrow(/outside the run, 0 s to 5 ms/);
    expect(() => simulate(rc, { keepColumns: false }).valueAt('out', 1e-3)).toThrow(/kept no rows/);
  });
});
