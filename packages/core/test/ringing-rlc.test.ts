import { readFileSync } from 'node:fs';
import { join } from 'node:path';
import { describe, expect, it } from 'vitest';
import { parseCircuit, runCircuit } from '../src/index.ts';
import { oscillationFigures } from '../src/analysis/ringing/oscillation.ts';

const fixtures = join(import.meta.dirname, '..', '..', '..', 'fixtures');

describe('ringing of a series RLC (fixtures/supply-ringing.yaml)', () => {
  const file = join(fixtures, 'supply-ringing.yaml');
  const run = runCircuit(parseCircuit(readFileSync(file, 'utf8'), { fileName: file }));
  const rail = run.findings.ringing.filter((r) => r.node === 'rail');

  // The fixture's values: R = 200 mΩ in series with L = 10 µH into C = 10 µF parallel with 100 Ω.
  const [R, L, C, RL] = [0.2, 10e-6, 10e-6, 100];
  // Second-order low-pass H(s) = 1 / (LC s² + (L/RL + RC) s + 1 + R/RL): ω0² = (1 + R/RL)/(LC),
  // 2ζω0 = (L/RL + RC)/(LC) (series RLC with a load, circuit-analysis textbooks).
  const w0 = Math.sqrt((1 + R / RL) / (L * C));
  const zeta = (L / RL + R * C) / (L * C) / (2 * w0);
  // Damped frequency ωd = ω0 √(1 - ζ²): the frequency of the zero crossings (control textbooks).
  const fd = (w0 * Math.sqrt(1 - zeta * zeta)) / (2 * Math.PI);

  it('finds one decaying oscillation after the feed switches on', () => {
    expect(rail).toHaveLength(1);
    expect(rail[0].sustained).toBe(false);
    expect(rail[0].start).toBeCloseTo(20.1e-6, 12);
    // The feed's edge is 0 -> 5 V; the rail settles at 5·RL/(R + RL) (voltage divider, DC).
    expect(rail[0].settlingValue).toBeCloseTo((5 * RL) / (R + RL), 3);
  });

  it('reports the damping ratio within 5% and the frequency within 1%', () => {
    expect(Math.abs(rail[0].dampingRatio - zeta) / zeta).toBeLessThan(0.05);
    expect(Math.abs(rail[0].frequency - fd) / fd).toBeLessThan(0.01);
    // The spectral confirmation agrees too (its resolution is coarser: 5%).
    expect(Math.abs(rail[0].spectralFrequency - fd) / fd).toBeLessThan(0.05);
  });

  it('reports the overshoot of a second-order step response, exp(-πζ/√(1-ζ²)), within 2%', () => {
    // Peak overshoot of an underdamped second-order step response (control textbooks).
    const expected = Math.exp((-Math.PI * zeta) / Math.sqrt(1 - zeta * zeta));
    expect(Math.abs(rail[0].overshoot - expected) / expected).toBeLessThan(0.02);
  });

  it('relates damping ratio and logarithmic decrement by ζ = δ/√(4π² + δ²)', () => {
    // Logarithmic decrement of a damped oscillation (vibration textbooks): δ = 2πζ/√(1-ζ²).
    const { logDecrement: delta, dampingRatio } = rail[0];
    expect(dampingRatio).toBeCloseTo(delta / Math.sqrt(4 * Math.PI * Math.PI + delta * delta), 12);
    const expectedDelta = (2 * Math.PI * zeta) / Math.sqrt(1 - zeta * zeta);
    expect(Math.abs(delta - expectedDelta) / expectedDelta).toBeLessThan(0.05);
  });

  it('times the settling to 1% of the step within two cycles of the envelope estimate', () => {
    // The envelope e^(-ζω0 t) reaches 1% at t ≈ ln(100 A/step)/(ζω0) (control textbooks); the
    // true settling lies within a cycle or two of that because the oscillation is inside the envelope.
    const envelope = Math.log(100 / Math.sqrt(1 - zeta * zeta)) / (zeta * w0);
    expect(Math.abs(rail[0].settlingTime! - envelope)).toBeLessThan(2 / fd);
  });
});

describe('oscillationFigures on an exact damped sinusoid', () => {
  it('recovers ζ = 0.2 and the damped frequency of 1 - e^(-ζω0t)(cos ωd t + ζ/√(1-ζ²) sin ωd t)', () => {
    // Unit step response of a second-order system (control textbooks), sampled 200 times per period.
    const zeta = 0.2;
    const w0 = 2 * Math.PI * 1000;
    const wd = w0 * Math.sqrt(1 - zeta * zeta);
    const dt = (2 * Math.PI) / wd / 200;
    const time = Float64Array.from({ length: 4000 }, (_, i) => i * dt);
    const values = time.map((t) => 1 - Math.exp(-zeta * w0 * t) * (Math.cos(wd * t) + (zeta / Math.sqrt(1 - zeta * zeta)) * Math.sin(wd * t)));
    const found = oscillationFigures(time, values, 0, time.length, 0, 0, 0.01)!;
    expect(Math.abs(found.dampingRatio - zeta) / zeta).toBeLessThan(0.01);
    expect(Math.abs(found.frequency - wd / (2 * Math.PI)) / (wd / (2 * Math.PI))).toBeLessThan(0.002);
    expect(found.overshoot).toBeCloseTo(Math.exp((-Math.PI * zeta) / Math.sqrt(1 - zeta * zeta)), 3);
  });
});
