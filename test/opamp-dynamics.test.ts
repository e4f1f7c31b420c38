import { describe, expect, it } from 'vitest';
import { column, runText } from './support/run-text.ts';
import { at, crossing, maxSlope, slope } from './support/measure.ts';

describe('op-amp macro-model: gain-bandwidth and slew rate', () => {
  it('non-inverting stage: 10-90% rise time is 0.35 / (GBW / noise gain) within 3%', () => {
    // Noise gain 10 (RF = 9k, RG = 1k), GBW 1 MHz: closed-loop bandwidth 100 kHz, rise 3.5 us.
    // A 5 mV input step keeps the stage far from its slew limit.
    const result = runText(`
circuit: rise-time
parts:
  SRC: { voltage: { points: [[0, 0], [10u, 0], [10.001u, 5m]] }, between: [in, gnd] }
  RG: { resistor: 1k, between: [sum, gnd] }
  RF: { resistor: 9k, between: [sum, out] }
  AMP: { opamp: { preset: general-purpose, gain: 100dB, gbw: 1MHz, offset: 0, bias: 0 }, plus: in, minus: sum, out: out, supply: [-12, 12] }
simulate: { duration: 40u, output-step: 5n }
record: [out]
`);
    const out = column(result, 'out');
    const final = out[out.length - 1];
    const t10 = crossing(result.time, out, 0.1 * final, true);
    const t90 = crossing(result.time, out, 0.9 * final, true);
    // Single-pole op-amp theory (any op-amp textbook): tr = 0.35 / f-3dB, f-3dB = GBW / noise gain.
    const expected = 0.35 / (1e6 / 10);
    expect(Math.abs(t90 - t10 - expected) / expected).toBeLessThan(0.03);
    // Closed-loop gain 1 + RF/RG = 10 (ideal relation), finite open-loop gain 1e5 costs 0.01%.
    expect(final / 5e-3).toBeCloseTo(10, 2);
  });

  it('follower with a large step ramps at the slew rate within 2%', () => {
    const result = runText(`
circuit: slew-step
parts:
  SRC: { voltage: { points: [[0, 0], [5u, 0], [5.01u, 5]] }, between: [in, gnd] }
  AMP: { opamp: { preset: general-purpose, slew: 0.5V/us, offset: 0 }, plus: in, minus: out, out: out, supply: [-10, 10] }
  RL: { resistor: 10k, between: [out, gnd] }
simulate: { duration: 25u, output-step: 10n }
record: [out]
`);
    const out = column(result, 'out');
    const t1 = crossing(result.time, out, 1, true);
    const t4 = crossing(result.time, out, 4, true);
    // Slew rate definition (op-amp data sheets, common practice): the large-signal output slope.
    const measured = slope(result.time, out, t1, t4);
    expect(Math.abs(measured - 0.5e6) / 0.5e6).toBeLessThan(0.02);
  });

  it('a sine starts to distort at the full-power bandwidth SR / (2 pi Vpeak)', () => {
    // SR 0.5 V/us, 5 V peak: full-power bandwidth 15.9 kHz (standard relation).
    const fpbw = 0.5e6 / (2 * Math.PI * 5);
    const maxOutputSlope = (frequency: number): number => {
      const result = runText(`
circuit: full-power
parts:
  SRC: { voltage: { sine: { amplitude: 5, frequency: ${frequency} } }, between: [in, gnd] }
  AMP: { opamp: { preset: general-purpose, slew: 0.5V/us, offset: 0, gbw: 10MHz }, plus: in, minus: out, out: out, supply: [-10, 10] }
  RL: { resistor: 10k, between: [out, gnd] }
simulate: { duration: ${3 / frequency}, output-step: ${1 / frequency / 2000} }
record: [out]
`);
      return maxSlope(result.time, column(result, 'out'), 1 / frequency, 3 / frequency);
    };
    // Below it the output follows the input's own peak slope 2 pi f Vp (within 2%) ...
    const below = 0.7 * fpbw;
    expect(Math.abs(maxOutputSlope(below) / (2 * Math.PI * below * 5) - 1)).toBeLessThan(0.02);
    // ... above it the slope is capped at the slew rate and the sine is distorted.
    const above = 1.5 * fpbw;
    const capped = maxOutputSlope(above);
    expect(capped).toBeLessThan(0.5e6 * 1.01);
    expect(capped).toBeLessThan(0.7 * 2 * Math.PI * above * 5);
  });
});

describe('op-amp macro-model: rails, offset', () => {
  it('clips 2 V short of +/-10 V supplies at +/-8 V within 10 mV', () => {
    const result = runText(`
circuit: clip
parts:
  SRC: { voltage: { sine: { amplitude: 1, frequency: 500 } }, between: [in, gnd] }
  RG: { resistor: 10k, between: [sum, gnd] }
  RF: { resistor: 190k, between: [sum, out] }
  AMP: { opamp: { preset: general-purpose, headroom: 2 }, plus: in, minus: sum, out: out, supply: [-10, 10] }
simulate: { duration: 4m, output-step: 2u }
record: [out]
`);
    const out = column(result, 'out');
    // Common practice: an amplifier on +/-10 V that swings to within 2 V of its rails saturates at +/-8 V.
    expect(Math.abs(Math.max(...out) - 8)).toBeLessThan(0.01);
    expect(Math.abs(Math.min(...out) + 8)).toBeLessThan(0.01);
  });

  it('clamp follows supply nodes', () => {
    const result = runText(`
circuit: clip-nodes
parts:
  VCC: { voltage: 5, between: [vcc, gnd] }
  SRC: { voltage: 1, between: [in, gnd] }
  AMP: { opamp: rail-to-rail, plus: in, minus: gnd, out: out, supply: [gnd, vcc] }
  RL: { resistor: 100k, between: [out, gnd] }
simulate: { duration: 10u }
record: [out]
`);
    // Open loop with +1 V input: the output saturates 50 mV below the 5 V supply node (preset headroom).
    expect(column(result, 'out')[0]).toBeCloseTo(4.95, 2);
  });

  it('follower output equals the offset; inverting stage output offset is (1 + Rf/Rin)·Vos within 1%', () => {
    const result = runText(`
circuit: offsets
parts:
  F: { opamp: { preset: general-purpose, offset: 2m, bias: 0 }, plus: gnd, minus: fout, out: fout, supply: [-12, 12] }
  RIN: { resistor: 1k, between: [gnd, sum] }
  RF: { resistor: 9k, between: [sum, iout] }
  I: { opamp: { preset: general-purpose, offset: 2m, bias: 0 }, plus: gnd, minus: sum, out: iout, supply: [-12, 12] }
simulate: { duration: 10u }
record: [fout, iout]
`);
    // Offset voltage referred to the input, amplified by the noise gain (op-amp textbooks).
    expect(Math.abs(column(result, 'fout')[0] / 2e-3 - 1)).toBeLessThan(0.01);
    expect(Math.abs(column(result, 'iout')[0] / (10 * 2e-3) - 1)).toBeLessThan(0.01);
  });

  it('a comparator with hysteresis starts on its stable rail and switches at +/-Vsat·R2/(R1+R2)', () => {
    // Inverting Schmitt trigger, R1 = 20k feedback, R2 = 10k: thresholds at a third of the
    // saturated output (op-amp textbooks, hysteresis comparator). At t = 0 the input is -5 V,
    // below the lower threshold: only the high state is consistent.
    const result = runText(`
circuit: schmitt
parts:
  SRC: { voltage: { triangle: { low: -5, high: 5, frequency: 1k } }, between: [in, gnd] }
  R1: { resistor: 20k, between: [out, pos] }
  R2: { resistor: 10k, between: [pos, gnd] }
  CMP: { opamp: general-purpose, plus: pos, minus: in, out: out, supply: [-12, 12] }
simulate: { duration: 2m, output-step: 0.5u }
record: [in, out]
`);
    const out = column(result, 'out');
    const input = column(result, 'in');
    const vsat = out[0];
    expect(vsat).toBeGreaterThan(10);
    const threshold = vsat / 3;
    // The output leaves the rail when the input passes the threshold (within the 20 mV/us
    // ramp times the few microseconds the loop takes to regenerate).
    const down = crossing(result.time, out, vsat - 0.5, false);
    expect(Math.abs(at(result.time, input, down) - threshold)).toBeLessThan(0.1);
    const up = crossing(result.time, out, -vsat + 0.5, true, down + 100e-6);
    expect(Math.abs(at(result.time, input, up) + threshold)).toBeLessThan(0.1);
  });

  it('an amplifier that starts saturated finds its operating point', () => {
    const result = runText(`
circuit: starts-saturated
parts:
  SRC: { voltage: 3, between: [in, gnd] }
  REF: { voltage: 1, between: [ref, gnd] }
  CMP: { opamp: { preset: jfet-input, rout: 100 }, plus: in, minus: ref, out: out, supply: [-12, 12] }
  RL: { resistor: 10k, between: [out, gnd] }
simulate: { duration: 10u }
record: [out]
`);
    // 2 V of differential input open loop: the output sits at 12 V - 1.5 V headroom, less rout·I (100 Ω into 10k).
    expect(result.operatingPoint.get('out')!).toBeCloseTo(10.5 * (10e3 / 10.1e3), 2);
    expect(result.stats.newtonFailures).toBe(0);
  });
});
