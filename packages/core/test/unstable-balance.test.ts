import { describe, expect, it } from 'vitest';
import { buildCircuit, runCircuit } from '../src/index.ts';

// An amplifier with its divider fed back to the + input balances at out = 2 V only on paper:
// with positive feedback of loop gain A·β > 1 any disturbance runs it to a rail (common
// practice: the principle of the comparator with hysteresis). Before, the run returned the
// balance with no word.
function stage(feedbackTo: 'plus' | 'minus', preset = 'general-purpose') {
  const other = feedbackTo === 'plus' ? 'minus' : 'plus';
  return buildCircuit({
    circuit: 'invented-feedback-sign',
    parts: {
      VIN: { voltage: 1, between: ['in', 'gnd'] },
      RF: { resistor: '10k', between: ['out', 'fb'] },
      RG: { resistor: '10k', between: ['fb', 'gnd'] },
      AMP: { opamp: preset, [feedbackTo]: 'fb', [other]: 'in', out: 'out', supply: [-12, 12] },
    },
    simulate: { duration: '1m' },
  });
}

describe('an operating point on an unstable balance', () => {
  it('positive feedback past unity is a warning naming the amplifier', () => {
    const run = runCircuit(stage('plus'));
    // The balance itself: out = A/(A/2 − 1) ≈ 2 V (4 mV more from the 2 mV offset), which the run shows.
    expect(run.transient.columns.get('out')![0]).toBeCloseTo(2, 1);
    const balance = run.findings.warnings.filter((w) => w.kind === 'balance');
    expect(balance).toHaveLength(1);
    expect(balance[0]).toMatchObject({ part: 'AMP', time: 0 });
    expect(balance[0].message).toMatch(/^AMP starts on an unstable balance: its feedback is positive with a loop gain of .* at DC/);
  });

  it('the ideal amplifier in the same stage runs and is flagged the same way', () => {
    // Before, its first exact step overflowed (growth at about π·1 GHz over a 1 µs step) and the
    // overflowed trial left the amplifier's linearization at NaN: the run ended with "no unique
    // solution at in". The ideal preset's balance is out = 2·A/(A − 2) = 2.000004 V (A = 10⁶).
    const run = runCircuit(stage('plus', 'ideal'));
    const out = run.transient.columns.get('out')!;
    expect(out[0]).toBeCloseTo(2.000004, 6);
    expect(out[out.length - 1]).toBeCloseTo(2.000004, 6);
    const balance = run.findings.warnings.filter((w) => w.kind === 'balance');
    expect(balance.map((w) => w.part)).toEqual(['AMP']);
    expect(balance[0].message).toMatch(/loop gain of 500 k at DC/);
  });

  it('the same divider on the − input (negative feedback) gives no warning', () => {
    const run = runCircuit(stage('minus'));
    expect(run.transient.columns.get('out')![0]).toBeCloseTo(2, 1);
    expect(run.findings.warnings.filter((w) => w.kind === 'balance')).toEqual([]);
  });
});
