import { describe, expect, it } from 'vitest';
import { parseCircuit, runCircuit, type Findings } from '../src/index.ts';

const findingsOf = (yaml: string): Findings => runCircuit(parseCircuit(yaml, { fileName: 'inline.yaml' })).findings;

describe('slew-rate limiting', () => {
  // A follower given a 10 V step in 10 ns: the output can only move at the slew rate, so the
  // edge takes 10 V / 0.5 V/µs = 20 µs (definition of slew rate, common practice).
  const findings = findingsOf(`
circuit: follower-step
parts:
  SRC: { voltage: { points: [[0, -5], [10u, -5], [10.01u, 5], [100u, 5], [100.01u, -5]] }, between: [in, gnd] }
  AMP: { opamp: { preset: general-purpose, slew: 0.5V/us }, plus: in, minus: out, out: out, supply: [-12, 12] }
  RL: { resistor: 10k, between: [out, gnd] }
simulate: { duration: 200u, output-step: 100n }
record: [in, out]
`);

  it('finds one rising and one falling interval at the slew rate', () => {
    expect(findings.slew.map((s) => s.direction)).toEqual(['rising', 'falling']);
    for (const s of findings.slew) {
      // The interval covers most of the 20 µs edge (the last volts before the target are small-signal).
      expect(s.duration).toBeGreaterThan(15e-6);
      expect(s.duration).toBeLessThan(21e-6);
      // 0.5 V/µs within 10%: the tanh input stage delivers 90-100% of its current while flagged.
      expect(Math.abs(Math.abs(s.averageRate) - 0.5e6) / 0.5e6).toBeLessThan(0.1);
    }
    expect(findings.slew[0].start).toBeGreaterThanOrEqual(10e-6);
    expect(findings.slew[0].start).toBeLessThan(10.5e-6);
    expect(findings.saturation).toEqual([]);
  });
});

describe('output current limiting', () => {
  // A follower asked for 5 V into 100 Ω needs 50 mA; the amplifier here limits at 25 mA, so the output sits near 25 mA · 100 Ω = 2.5 V (Ohm's law).
  const findings = findingsOf(`
circuit: follower-heavy-load
parts:
  SRC: { voltage: { points: [[0, 0], [100u, 0], [101u, 5], [300u, 5], [301u, 0]] }, between: [in, gnd] }
  AMP: { opamp: { preset: general-purpose, slew: 0.5V/us, rout: 75, current-limit: 25mA }, plus: in, minus: out, out: out, supply: [-12, 12] }
  RL: { resistor: 100, between: [out, gnd] }
simulate: { duration: 400u, output-step: 1u }
record: [in, out]
`);

  it('finds one interval while the load asks for more than the limit', () => {
    expect(findings.currentLimit).toHaveLength(1);
    const [c] = findings.currentLimit;
    expect(c.part).toBe('AMP');
    // Flagged from 90% of 25 mA: the macro-model's limit is I = Ilim·tanh(v/(rout·Ilim)) across
    // rout = 75 Ω, so 90% needs v = atanh(0.9)·75 Ω·25 mA = 2.76 V across rout plus 2.25 V at the
    // output: the internal drive, slewing from 0 V at 0.5 V/µs from 100 µs, gets there near 110 µs.
    // It ends when the input falls at 300 µs and the drive, held at the clamp 12 - 1.5 = 10.5 V,
    // has slewed back below that level.
    const driveNeeded = Math.atanh(0.9) * 75 * 25e-3 + 0.9 * 25e-3 * 100;
    expect(Math.abs(c.start - (100e-6 + driveNeeded / 0.5e6))).toBeLessThan(2e-6);
    expect(Math.abs(c.end - (300e-6 + (10.5 - driveNeeded) / 0.5e6))).toBeLessThan(2e-6);
    expect(c.worstOutput).toBeGreaterThan(2.25);
    expect(c.worstOutput).toBeLessThan(2.5);
  });
});
