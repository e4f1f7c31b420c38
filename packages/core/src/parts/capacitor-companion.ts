import type { Mna, StepInfo } from './device.ts';
import { stampConductance, stampCurrent } from './stamps.ts';

/**
 * Companion model of a capacitance over one step: a conductance g with a history current,
 * i = g·v - history. Trapezoidal: g = 2C/h, history = g·v₀ + i₀; backward Euler: g = C/h,
 * history = g·v₀. Open at the operating point. Shared by capacitors and by the capacitances
 * inside macro-models.
 */
export class CapacitorCompanion {
  /** Conductance of the current step (0 at the operating point). */
  g = 0;
  private vPrev = 0;
  private iPrev = 0;

  constructor(readonly capacitance: number) {}

  /** Set the conductance for the step (0 at the operating point). */
  update(step: StepInfo): void {
    this.g = step.method === 'dc' ? 0 : ((step.method === 'trap' ? 2 : 1) * this.capacitance) / step.h;
  }

  /** Set the conductance for the step and stamp it between `a` and `b` (either may be ground). */
  stampStep(m: Mna, a: number, b: number, step: StepInfo): void {
    this.update(step);
    if (this.g !== 0) stampConductance(m, a, b, this.g);
  }

  /** History term of the current step. */
  history(step: StepInfo): number {
    return this.g * this.vPrev + (step.method === 'trap' ? this.iPrev : 0);
  }

  /** Stamps the history current source between `a` and `b`. */
  stampRhs(m: Mna, a: number, b: number, step: StepInfo): void {
    if (step.method !== 'dc') stampCurrent(m, a, b, -this.history(step));
  }

  /** Record the accepted voltage; `current` when a branch unknown carries it. */
  accept(v: number, step: StepInfo, current?: number): void {
    this.iPrev = current ?? (step.method === 'dc' ? 0 : this.g * v - this.history(step));
    this.vPrev = v;
  }
}
