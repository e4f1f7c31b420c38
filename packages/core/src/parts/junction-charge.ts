import type { Mna, StepInfo } from './device.ts';
import type { DiodeCapacitance } from './diode-presets.ts';
import { stampConductance, stampCurrent } from './stamps.ts';

/** Above FC·φ the depletion formula is replaced by its tangent line in C (common practice: FC = 0.5). */
const FC = 0.5;

/**
 * The charge on a junction's capacitance and its companion model over a step. Integrated in
 * charge, so that a capacitance that follows the voltage conserves charge: trapezoidal
 * i = (2/h)·(q(v) − q₀) − i₀, backward Euler i = (q(v) − q₀)/h, linearized at each Newton
 * iterate with the slope C(v). Open at the operating point.
 */
export class JunctionCharge {
  private readonly edge: number;
  private readonly capacitanceAtEdge: number;
  private readonly chargeAtEdge: number;
  /** dC/dV beyond the edge. */
  private readonly rise: number;
  private qPrev = 0;
  private iPrev = 0;

  constructor(private readonly c: DiodeCapacitance) {
    const { zeroBias, potential, grading } = c;
    this.edge = FC * potential;
    this.capacitanceAtEdge = zeroBias / Math.pow(1 - FC, grading);
    this.chargeAtEdge = this.depletionCharge(this.edge);
    this.rise = (this.capacitanceAtEdge * grading) / (potential * (1 - FC));
  }

  /** Charge at voltage v (0 at 0 V). */
  charge(v: number): number {
    if (v < this.edge) return this.depletionCharge(v);
    const d = v - this.edge;
    return this.chargeAtEdge + this.capacitanceAtEdge * d + 0.5 * this.rise * d * d;
  }

  /** dq/dv at voltage v. */
  capacitance(v: number): number {
    if (v < this.edge) return this.c.zeroBias / Math.pow(1 - v / this.c.potential, this.c.grading);
    return this.capacitanceAtEdge + this.rise * (v - this.edge);
  }

  /** Stamp the companion between `a` and `b`, linearized at v = v(a) − v(b). */
  stamp(m: Mna, a: number, b: number, v: number, step: StepInfo): void {
    if (step.method === 'dc') return;
    const k = (step.method === 'trap' ? 2 : 1) / step.h;
    const g = k * this.capacitance(v);
    stampConductance(m, a, b, g);
    stampCurrent(m, a, b, this.currentAt(v, k, step) - g * v);
  }

  /** Record the accepted voltage. */
  accept(v: number, step: StepInfo): void {
    this.iPrev = step.method === 'dc' ? 0 : this.currentAt(v, (step.method === 'trap' ? 2 : 1) / step.h, step);
    this.qPrev = this.charge(v);
  }

  private currentAt(v: number, k: number, step: StepInfo): number {
    return k * (this.charge(v) - this.qPrev) - (step.method === 'trap' ? this.iPrev : 0);
  }

  /** ∫₀^v C₀/(1 − u/φ)^m du. */
  private depletionCharge(v: number): number {
    const { zeroBias, potential, grading } = this.c;
    return ((zeroBias * potential) / (1 - grading)) * (1 - Math.pow(1 - v / potential, 1 - grading));
  }
}
