import type { ObserverContext, StepObserver } from '../../transient/observer.ts';
import { formatSI } from '../../units/format.ts';
import { valueAt } from '../../parts/solution.ts';
import type { ReportWarning } from './types.ts';

/** Consecutive sign changes of the step-to-step difference that count as the method's oscillation. */
const ALTERNATIONS = 8;

/**
 * Watches chosen nodes at every accepted step for the trapezoidal rule's own oscillation: a
 * value that zig-zags from one step to the next (period two steps). That is the integration
 * method, not the circuit, so it becomes a solver warning and never a ringing finding.
 * The backward-Euler damping steps after each event should make it rare.
 */
export class TwoStepGuard implements StepObserver {
  private indices = new Int32Array(0);
  private previous = new Float64Array(0);
  private lastDiff = new Float64Array(0);
  private runs = new Int32Array(0);
  private seen: ReportWarning[] = [];
  private readonly flagged = new Set<number>();

  constructor(
    private readonly nodes: readonly string[],
    /** Differences below this (volts) are rounding, not a zig-zag. */
    private readonly floor = 1e-6,
    /** Plus this fraction of the value: a zig-zag of microvolts on a rail is no news. */
    private readonly relativeFloor = 1e-5,
  ) {}

  bind(context: ObserverContext): void {
    this.indices = Int32Array.from(this.nodes, (n) => context.node(n));
    this.previous = new Float64Array(this.nodes.length);
    this.lastDiff = new Float64Array(this.nodes.length);
    this.runs = new Int32Array(this.nodes.length);
  }

  accepted(t: number, x: Float64Array): void {
    for (let i = 0; i < this.indices.length; i++) {
      const v = valueAt(x, this.indices[i]);
      const diff = v - this.previous[i];
      const alternates = Math.abs(diff) > this.floor + this.relativeFloor * Math.abs(v) && diff * this.lastDiff[i] < 0;
      this.runs[i] = alternates ? this.runs[i] + 1 : 0;
      if (this.runs[i] === ALTERNATIONS && !this.flagged.has(i)) {
        this.flagged.add(i);
        this.seen.push({
          kind: 'solver',
          node: this.nodes[i],
          time: t,
          message: `node ${this.nodes[i]} zig-zags from one time step to the next near t = ${formatSI(t, 's')}: the integration method's own oscillation, not ringing of the circuit; lower \`max-step\` or the tolerances to check`,
        });
      }
      this.previous[i] = v;
      this.lastDiff[i] = diff;
    }
  }

  warnings(): ReportWarning[] {
    return this.seen;
  }
}
