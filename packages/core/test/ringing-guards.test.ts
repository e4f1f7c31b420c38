import { describe, expect, it } from 'vitest';
import { findRinging } from '../src/analysis/ringing/find-ringing.ts';
import { TwoStepGuard } from '../src/analysis/ringing/two-step-guard.ts';

const dt = 1e-6;
const time = Float64Array.from({ length: 2000 }, (_, i) => i * dt);
const event = [{ time: 100e-6, cause: 'corner of TEST' }];
/** A unit step at 100 µs followed by a decaying oscillation of `rowsPerPeriod` rows per period. */
const stepWithRing = (rowsPerPeriod: number): Float64Array =>
  time.map((t) => {
    const after = t - 100e-6;
    if (after < 0) return 0;
    const w = (2 * Math.PI) / (rowsPerPeriod * dt);
    return 1 - Math.exp(-0.02 * w * after) * Math.cos(w * after);
  });

describe('ringing guards', () => {
  it('reports an alternation with a period of two rows as a solver warning, never as ringing', () => {
    // Period of two steps: the trapezoidal rule's own oscillation (its growth factor is -1 for stiff modes; numerical-analysis texts, from memory).
    const { ringing, warnings } = findRinging({ time, columns: new Map([['n', stepWithRing(2)]]) }, event, dt);
    expect(ringing).toEqual([]);
    expect(warnings.map((w) => w.kind)).toEqual(['solver']);
  });

  it('reports ringing of 6 rows per period, with a warning that the output step is too coarse to measure it', () => {
    const { ringing, warnings } = findRinging({ time, columns: new Map([['n', stepWithRing(6)]]) }, event, dt);
    expect(ringing).toHaveLength(1);
    expect(ringing[0].rowsPerPeriod).toBeCloseTo(6, 1);
    expect(warnings.map((w) => w.kind)).toEqual(['resolution']);
  });

  it('reports 50 rows per period without warnings', () => {
    const { ringing, warnings } = findRinging({ time, columns: new Map([['n', stepWithRing(50)]]) }, event, dt);
    expect(ringing).toHaveLength(1);
    // ζ from the envelope e^(-0.02 ω t): ζω0 = 0.02 ωd, so ζ ≈ 0.02 (control textbooks).
    expect(ringing[0].dampingRatio).toBeCloseTo(0.02, 3);
    expect(warnings).toEqual([]);
  });

  it('flags a value that zig-zags between accepted steps, once', () => {
    const guard = new TwoStepGuard(['n']);
    guard.bind({ node: () => 0, devices: [], labels: ['n'] });
    const x = new Float64Array(1);
    for (let k = 0; k < 40; k++) {
      x[0] = 1 + (k % 2 === 0 ? 1e-3 : -1e-3);
      guard.accepted(k * 1e-6, x);
    }
    expect(guard.warnings()).toHaveLength(1);
    expect(guard.warnings()[0].kind).toBe('solver');
  });

  it('does not flag a smooth oscillation of 20 steps per period', () => {
    const guard = new TwoStepGuard(['n']);
    guard.bind({ node: () => 0, devices: [], labels: ['n'] });
    const x = new Float64Array(1);
    for (let k = 0; k < 400; k++) {
      x[0] = Math.sin((2 * Math.PI * k) / 20);
      guard.accepted(k * 1e-6, x);
    }
    expect(guard.warnings()).toEqual([]);
  });
});
