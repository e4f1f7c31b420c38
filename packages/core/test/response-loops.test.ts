import { readFileSync } from 'node:fs';
import { join } from 'node:path';
import { describe, expect, it } from 'vitest';
import { buildCircuit, frequencyResponse, parseCircuit, runCircuit, type FrequencyResponse } from '../src/index.ts';
import { add, angleBetween, capacitorImpedance, complex, dB, degrees, div, mul, neg, parallel, type Complex } from './support/complex.ts';

// The plain differentiator: Cin = 100 nF into the inverting input, Rf = 10 kΩ in
// feedback, a single-pole amplifier of 100 dB and 1 MHz with rout 0 (the ideal class with
// those two figures). Optionally a feedback capacitor across Rf, or a series resistor before Cin.
const [A0, GBW, RF, CIN] = [1e5, 1e6, 10e3, 100e-9];

function differentiator(change: { cf?: number; rs?: number } = {}, targetMargin?: number): FrequencyResponse {
  const parts: Record<string, object> = {
    VIN: { voltage: 0, between: ['in', 'gnd'] },
    CIN: { capacitor: CIN, between: [change.rs !== undefined ? 'cin' : 'in', 'sum'] },
    RF: { resistor: RF, between: ['sum', 'out'] },
    AMP: { opamp: { preset: 'ideal', gain: A0, gbw: GBW }, plus: 'gnd', minus: 'sum', out: 'out' },
  };
  if (change.cf !== undefined) parts.CF = { capacitor: change.cf, between: ['sum', 'out'] };
  if (change.rs !== undefined) parts.RS = { resistor: change.rs, between: ['in', 'cin'] };
  const circuit = buildCircuit({ circuit: 'invented-differentiator', parts, simulate: { duration: '1m' }, record: ['out'], response: { input: 'VIN', from: 1, to: '10M' } });
  return frequencyResponse(circuit, targetMargin !== undefined ? { targetMargin } : {});
}

// Closed forms (textbook op-amp feedback theory): a single-pole amplifier A = A0/(1 + jf/fp)
// with fp = GBW/A0; the inverting stage H = -A·Zf/(Zi + Zf + A·Zi); its return ratio
// T = A·Zi/(Zi + Zf) (the feedback factor Zi/(Zi + Zf) times A).
const openLoop = (f: number): Complex => div(complex(A0), complex(1, (f * A0) / GBW));
const impedances = (f: number, change: { cf?: number; rs?: number }): { zi: Complex; zf: Complex } => ({
  zi: add(complex(change.rs ?? 0), capacitorImpedance(CIN, f)),
  zf: change.cf !== undefined ? parallel(complex(RF), capacitorImpedance(change.cf, f)) : complex(RF),
});
const closedLoop = (f: number, change: { cf?: number; rs?: number } = {}): Complex => {
  const { zi, zf } = impedances(f, change);
  const a = openLoop(f);
  return neg(div(mul(a, zf), add(add(zi, zf), mul(a, zi))));
};
const returnRatio = (f: number, change: { cf?: number; rs?: number } = {}): Complex => {
  const { zi, zf } = impedances(f, change);
  return mul(openLoop(f), div(zi, add(zi, zf)));
};

/** Where |T| = 1 (bisection in log frequency on the closed form) and 180° + ∠T there. */
function closedFormMargin(change: { cf?: number; rs?: number }): { crossover: number; phaseMargin: number } {
  let [lo, hi] = [1, 1e7];
  for (let i = 0; i < 200; i++) {
    const mid = Math.sqrt(lo * hi);
    if (dB(returnRatio(mid, change)) > 0) lo = mid;
    else hi = mid;
  }
  return { crossover: lo, phaseMargin: 180 + degrees(returnRatio(lo, change)) };
}

describe('the plain differentiator against its closed forms', () => {
  const response = differentiator();
  const out = response.nodes[0];

  it('gain and phase: H = -A·Zf/(Zi + Zf + A·Zi) within 0.2 dB and 2° (over the whole sweep, peak included)', () => {
    let [worstDb, worstDeg] = [0, 0];
    response.frequency.forEach((f, i) => {
      worstDb = Math.max(worstDb, Math.abs(out.dB[i] - dB(closedLoop(f))));
      worstDeg = Math.max(worstDeg, Math.abs(angleBetween(out.degrees[i], degrees(closedLoop(f)))));
    });
    expect(worstDb).toBeLessThan(0.2);
    expect(worstDeg).toBeLessThan(2);
    // The macro-model with rout 0 is this single-pole amplifier exactly: agreement to rounding.
    expect(worstDb).toBeLessThan(1e-9);
    expect(worstDeg).toBeLessThan(1e-7);
  });

  it('loop crossover and phase margin: T = A·Zi/(Zi + Zf), margin within 0.5°', () => {
    const reference = closedFormMargin({});
    const loop = response.loops[0];
    expect(loop.part).toBe('AMP');
    expect(loop.state).toBe('linear');
    expect(Math.abs(loop.phaseMargin! - reference.phaseMargin)).toBeLessThan(0.5);
    expect(Math.abs(loop.crossover! / reference.crossover - 1)).toBeLessThan(1e-6);
    // Near √(f0·GBW) = 12.6 kHz (common practice), with almost no margin left.
    expect(loop.crossover! / Math.sqrt(GBW / (2 * Math.PI * RF * CIN))).toBeCloseTo(1, 2);
    expect(loop.phaseMargin!).toBeLessThan(1);
    // Two poles only: the phase never reaches -180°, so there is no gain margin to give.
    expect(loop.phaseCrossover).toBeNull();
    expect(loop.gainMargin).toBeNull();
  });

  it('the loop arrays: |T| and ∠T as the closed form, A as the single pole, 1/β = A/T', () => {
    const loop = response.loops[0];
    response.frequency.forEach((f, i) => {
      expect(loop.dB[i]).toBeCloseTo(dB(returnRatio(f)), 8);
      expect(angleBetween(loop.degrees[i], degrees(returnRatio(f)))).toBeCloseTo(0, 6);
      expect(loop.openLoopDb[i]).toBeCloseTo(dB(openLoop(f)), 8);
      // 1/β = 1 + Zf/Zi = 1 + j2πf·Rf·Cin.
      expect(loop.noiseGainDb[i]).toBeCloseTo(dB(complex(1, 2 * Math.PI * f * RF * CIN)), 8);
    });
    // Unwrapped: 0° at the low end, falling toward -180° without a jump.
    for (let i = 1; i < loop.degrees.length; i++) expect(Math.abs(loop.degrees[i] - loop.degrees[i - 1])).toBeLessThan(10);
  });

  it('the closed loop peaks at the crossover', () => {
    expect(out.peaks).toHaveLength(1);
    expect(out.peaks[0].frequency / response.loops[0].crossover!).toBeCloseTo(1, 2);
  });
});

describe('the same stage with a feedback capacitor or a series input resistor', () => {
  it.each([{ cf: 1.2e-9 }, { rs: 120 }, { cf: 3.3e-9 }, { rs: 470 }])('%o: margin against T = A·Zi/(Zi + Zf) within 1°', (change) => {
    const loop = differentiator(change).loops[0];
    const reference = closedFormMargin(change);
    expect(Math.abs(loop.phaseMargin! - reference.phaseMargin)).toBeLessThan(1);
    expect(Math.abs(loop.crossover! / reference.crossover - 1)).toBeLessThan(1e-6);
    // Either change buys margin over the plain stage's 0.8°.
    expect(loop.phaseMargin!).toBeGreaterThan(20);
  });
});

describe('hints that restore a chosen margin', () => {
  it.each([60, 45])('the plain stage: the hinted Cf, and the hinted Rs, each give %i° by the closed form, within 1°', (target) => {
    const loop = differentiator({}, target).loops[0];
    const { feedbackCapacitor, seriesResistor } = loop.hint!.values;
    expect(Math.abs(closedFormMargin({ cf: feedbackCapacitor }).phaseMargin - target)).toBeLessThan(1);
    expect(Math.abs(closedFormMargin({ rs: seriesResistor }).phaseMargin - target)).toBeLessThan(1);
    expect(loop.hint!.text).toContain('across RF');
    expect(loop.hint!.text).toContain('in series with CIN');
  });

  it('an existing feedback capacitor is resized, not doubled; a stage that meets the target gets no hint', () => {
    const short = differentiator({ cf: 1.2e-9 }).loops[0];
    expect(short.phaseMargin!).toBeLessThan(60);
    expect(short.hint!.text).toMatch(/make CF [\d.]+ nF \(now 1\.2 nF\)/);
    expect(Math.abs(closedFormMargin({ cf: short.hint!.values.feedbackCapacitor }).phaseMargin - 60)).toBeLessThan(1);
    const enough = differentiator({ cf: 10e-9 }).loops[0];
    expect(enough.phaseMargin!).toBeGreaterThan(60);
    expect(enough.hint).toBeUndefined();
  });
});

describe('an amplifier with a second pole, output resistance and a capacitive load', () => {
  it('a follower into 10 nF: crossover, phase and gain margins against a three-pole T', () => {
    // Follower (β = 1): T = A0 / ((1 + jf/fp)(1 + jf/f2)(1 + jf/f3)), f3 = 1/(2π·rout·CL) (textbook).
    const [gain, gbw, f2, rout, cl] = [1e5, 10e6, 20e6, 50, 10e-9];
    const circuit = buildCircuit({
      circuit: 'invented-loaded-follower',
      parts: {
        VIN: { voltage: 0, between: ['in', 'gnd'] },
        AMP: { opamp: { preset: 'ideal', gain, gbw, 'second-pole': f2, rout, 'current-limit': '20m' }, plus: 'in', minus: 'out', out: 'out' },
        CL: { capacitor: cl, between: ['out', 'gnd'] },
      },
      simulate: { duration: '1m' },
      record: ['out'],
      response: { input: 'VIN', from: 10, to: '100M' },
    });
    const loop = frequencyResponse(circuit).loops[0];
    const f3 = 1 / (2 * Math.PI * rout * cl);
    const t = (f: number): Complex => div(complex(gain), mul(mul(complex(1, (f * gain) / gbw), complex(1, f / f2)), complex(1, f / f3)));
    const at = (level: (f: number) => number): number => {
      let [lo, hi] = [10, 1e8];
      for (let i = 0; i < 200; i++) {
        const mid = Math.sqrt(lo * hi);
        if (level(mid) > 0) lo = mid;
        else hi = mid;
      }
      return lo;
    };
    const crossover = at((f) => dB(t(f)));
    // Unwrapped phase of the three poles: -atan(f/fp) - atan(f/f2) - atan(f/f3).
    const phase = (f: number): number => -((Math.atan((f * gain) / gbw) + Math.atan(f / f2) + Math.atan(f / f3)) * 180) / Math.PI;
    const phaseCrossover = at((f) => phase(f) + 180);
    expect(Math.abs(loop.crossover! / crossover - 1)).toBeLessThan(1e-6);
    expect(Math.abs(loop.phaseMargin! - (180 + phase(crossover)))).toBeLessThan(0.5);
    expect(Math.abs(loop.phaseCrossover! / phaseCrossover - 1)).toBeLessThan(1e-6);
    expect(Math.abs(loop.gainMargin! + dB(t(phaseCrossover)))).toBeLessThan(0.01);
    // A follower into a capacitor: a few degrees and a few dB, the classic trouble.
    expect(loop.phaseMargin!).toBeLessThan(15);
    expect(loop.gainMargin!).toBeGreaterThan(3);
  });
});

describe('amplifiers outside their linear region at the operating point', () => {
  it('a stage at its rail is reported as such, without margins', () => {
    // Gain 11 on 2 V: it wants 22 V from ±12 V supplies less 1.5 V headroom.
    const circuit = buildCircuit({
      circuit: 'invented-railed-stage',
      parts: {
        VIN: { voltage: 2, between: ['in', 'gnd'] },
        RG: { resistor: '1k', between: ['sum', 'gnd'] },
        RF: { resistor: '10k', between: ['sum', 'out'] },
        AMP: { opamp: 'general-purpose', plus: 'in', minus: 'sum', out: 'out', supply: [-12, 12] },
      },
      simulate: { duration: '1m' },
      response: { input: 'VIN', from: 10, to: '1M' },
    });
    const response = frequencyResponse(circuit);
    expect(response.loops[0].state).toBe('high rail');
    expect(response.loops[0].crossover).toBeNull();
    expect(response.loops[0].phaseMargin).toBeNull();
    expect(response.warnings).toHaveLength(1);
    expect(response.warnings[0].message).toMatch(/AMP sits at its high rail at the t = 0 operating point \(out = 10\.\d+ V\)/);
  });

  it('a follower into 10 Ω at its current limit is reported as such', () => {
    // 1 V into 10 Ω asks 100 mA of a 20 mA limit.
    const circuit = buildCircuit({
      circuit: 'invented-overloaded-follower',
      parts: {
        VIN: { voltage: 1, between: ['in', 'gnd'] },
        AMP: { opamp: 'general-purpose', plus: 'in', minus: 'out', out: 'out', supply: [-12, 12] },
        RL: { resistor: 10, between: ['out', 'gnd'] },
      },
      simulate: { duration: '1m' },
      response: { input: 'VIN', from: 10, to: '1M' },
    });
    const response = frequencyResponse(circuit);
    expect(response.loops[0].state).toBe('current limit');
    expect(response.warnings[0].message).toContain('current limit');
  });
});

describe('transient and frequency views agree (fixtures/differentiator-plain.yaml)', () => {
  it('the ringing frequency of the transient report lies within 3% of the response peak', () => {
    const file = join(import.meta.dirname, '..', '..', '..', 'fixtures', 'differentiator-plain.yaml');
    const circuit = parseCircuit(readFileSync(file, 'utf8'), { fileName: file });
    const ringing = runCircuit(circuit).findings.ringing.filter((r) => r.node === 'out');
    const peaks = frequencyResponse(circuit).nodes.find((n) => n.node === 'out')!.peaks;
    expect(ringing).toHaveLength(1);
    expect(peaks).toHaveLength(1);
    // A lightly damped second-order loop rings at ωn·√(1 - ζ²) and peaks at ωn·√(1 - 2ζ²): within 1% for ζ < 0.1 (textbook).
    expect(Math.abs(ringing[0].frequency / peaks[0].frequency - 1)).toBeLessThan(0.03);
  });
});
