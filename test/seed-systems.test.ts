import { readFileSync } from 'node:fs';
import { join } from 'node:path';
import { describe, expect, it } from 'vitest';
import { parseCircuit, runCircuit, type CircuitRun } from '@voltcast/core';
import { repoRoot } from './support/run-cli.ts';
import { at, crossing } from './support/measure.ts';

// The example circuits with diodes, comparators and the new waves do what they show.
function run(file: string, edit: (text: string) => string = (text) => text): CircuitRun {
  const text = edit(readFileSync(join(repoRoot, 'fixtures', file), 'utf8'));
  return runCircuit(parseCircuit(text, { fileName: file }));
}

function column(result: CircuitRun, node: string): Float64Array {
  const values = result.transient.columns.get(node);
  if (values === undefined) throw new Error(`no column ${node}`);
  return values;
}

/** Times at which v falls through `level`. */
function falls(time: Float64Array, v: Float64Array, level: number): number[] {
  const found: number[] = [];
  for (let i = 1; i < v.length; i++) if (v[i - 1] > level && v[i] <= level) found.push(time[i]);
  return found;
}

const k = 1.380649e-23;
const q = 1.602176634e-19;

/** Forward voltage of a Schottky-preset diode (30 nA, n = 1.05, 2 Ω) at current i, Shockley equation at 25 °C. */
function schottkyDrop(i: number): number {
  const nvt = (1.05 * k * 298.15) / q;
  return nvt * Math.log(i / 3e-8 + 1) + 2 * i;
}

describe('fixtures/fm-demodulation.yaml', () => {
  const result = run('fm-demodulation.yaml');

  it('recovers the 200 Hz modulating tone: a least-squares 200 Hz sine fits it to within 10% of its amplitude', () => {
    const time = result.transient.time;
    const tone = column(result, 'tone');
    // Fit tone ≈ c + a·sin(ωt) + b·cos(ωt) over 5..15 ms (two whole periods) by the normal equations.
    const w = 2 * Math.PI * 200;
    const rows: number[][] = [];
    const values: number[] = [];
    time.forEach((t, i) => {
      if (t < 5e-3) return;
      rows.push([1, Math.sin(w * t), Math.cos(w * t)]);
      values.push(tone[i]);
    });
    const ata = [0, 1, 2].map((r) => [0, 1, 2].map((c) => rows.reduce((s, row) => s + row[r] * row[c], 0)));
    const atb = [0, 1, 2].map((r) => rows.reduce((s, row, i) => s + row[r] * values[i], 0));
    // Over whole periods the basis is orthogonal: the normal matrix is diagonal.
    const coefficients = atb.map((v, r) => v / ata[r][r]);
    const amplitude = Math.hypot(coefficients[1], coefficients[2]);
    const residual = Math.sqrt(values.reduce((s, v, i) => s + (v - rows[i].reduce((t, x, j) => t + x * coefficients[j], 0)) ** 2, 0) / values.length);
    expect(amplitude).toBeGreaterThan(0.2);
    expect(residual / amplitude).toBeLessThan(0.1);
    expect(result.transient.stats.newtonFailures).toBe(0);
  });

  it('the differentiator’s swing follows the instantaneous frequency: gain 2π·f·R·C (textbook differentiator)', () => {
    const time = result.transient.time;
    const diff = column(result, 'diff');
    // Peak |diff| in the 0.2 ms around the tone's frequency peak (25 kHz at 1.25 ms) and trough (15 kHz at 3.75 ms).
    const peak = (t0: number) => Math.max(...diff.filter((_, i) => Math.abs(time[i] - t0) < 0.1e-3).map(Math.abs));
    const rc = 10e3 * 1e-9;
    // RD adds a pole at 159 kHz: |H| = ωRC/√(1 + (ω·RD·C)²).
    const gain = (f: number) => (2 * Math.PI * f * rc) / Math.hypot(1, 2 * Math.PI * f * 1e3 * 1e-9);
    expect(peak(1.25e-3)).toBeCloseTo(gain(25e3), 1);
    expect(peak(3.75e-3)).toBeCloseTo(gain(15e3), 1);
  });
});

describe('fixtures/interrupt-comparator.yaml', () => {
  it('pulls the interrupt pin low once per tray with hysteresis, and chatters without it', () => {
    const withBand = run('interrupt-comparator.yaml');
    const irq = column(withBand, 'irq');
    expect(falls(withBand.transient.time, irq, 3.3 / 2)).toHaveLength(1);
    // Low level: the open-drain output's 80 Ω against the 10 kΩ pull-up.
    expect(Math.min(...irq)).toBeCloseTo((3.3 * 80) / 10080, 3);
    const without = run('interrupt-comparator.yaml', (text) => text.replace('hysteresis: 200m', 'hysteresis: 0'));
    expect(falls(without.transient.time, column(without, 'irq'), 3.3 / 2).length).toBeGreaterThan(1);
    expect(withBand.transient.stats.newtonFailures + without.transient.stats.newtonFailures).toBe(0);
  });
});

describe('fixtures/bias-compensation.yaml', () => {
  const result = run('bias-compensation.yaml');
  const time = result.transient.time;
  const a = column(result, 'outa');
  const b = column(result, 'outb');

  it('without compensation the output sits at Ib·Rf; with it, within 1 mV of 0', () => {
    // Op-amp handbooks: bias current Ib through the feedback resistor gives an output offset
    // Ib·Rf (50 nA · 1 MΩ = 50 mV); a resistor Rin ∥ Rf at the other input cancels it,
    // leaving only the offset current (0 in this model) times Rf.
    expect(at(time, a, 4e-3)).toBeCloseTo(50e-3, 3);
    expect(Math.abs(at(time, b, 4e-3))).toBeLessThan(1e-3);
  });

  it('both stages amplify the sensor step by -Rf/Rin = -10', () => {
    // Inverting amplifier gain -Rf/Rin (any op-amp textbook): -20 mV in, +200 mV out.
    expect(at(time, a, 14e-3) - at(time, a, 4e-3)).toBeCloseTo(0.2, 3);
    expect(at(time, b, 14e-3) - at(time, b, 4e-3)).toBeCloseTo(0.2, 3);
  });
});

describe('fixtures/adc-clamp-overdrive.yaml', () => {
  const result = run('adc-clamp-overdrive.yaml');
  const pin = column(result, 'pin');

  it('holds the pin a Schottky drop beyond each rail, as the Shockley equation gives for the fault current', () => {
    const high = Math.max(...pin);
    const low = Math.min(...pin);
    // Fault current through the 1 kΩ series resistor: (6 V − pin)/1 kΩ and (−2 V − pin)/1 kΩ.
    expect(Math.abs(high - (3.3 + schottkyDrop((6 - high) / 1e3)))).toBeLessThan(2e-3);
    expect(Math.abs(low + schottkyDrop((low + 2) / 1e3))).toBeLessThan(2e-3);
  });

  it('reads full scale through the high fault and 0 through the low one, and reports the clipped samples', () => {
    const adc = result.adcs[0];
    const codeAt = (t: number) => adc.code[adc.time.findIndex((s) => Math.abs(s - t) < 1e-9)];
    expect(codeAt(1e-3)).toBe(Math.round((1.2 / 3.3) * 4096));
    expect(codeAt(5e-3)).toBe(4095);
    expect(codeAt(10e-3)).toBe(0);
    expect(adc.report.clippedHigh.count).toBeGreaterThan(40);
    expect(adc.report.clippedLow.count).toBeGreaterThan(40);
    // The pin leaves the range where the probe line crosses 3.3 V + the clamp's knee, on the rising fault.
    expect(adc.report.clippedHigh.intervals[0].from).toBeGreaterThan(crossing(result.transient.time, column(result, 'probe'), 3.3, true));
  });
});
