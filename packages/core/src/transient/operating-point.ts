import type { StepInfo } from '../parts/device.ts';
import type { Equations } from './equations.ts';
import { SimulationError } from './simulation-error.ts';

/** First step of the pseudo-transient, seconds; it doubles after every accepted step. */
const PSEUDO_FIRST_STEP = 1e-9;
/** The pseudo-transient has settled when a step this long changes nothing. */
const PSEUDO_SETTLED_STEP = 1;
const PSEUDO_MAX_STEPS = 400;

/**
 * DC operating point: capacitors open, inductors shorted, `initial:` values held. Three
 * strategies, each tried when the one before fails:
 * 1. plain Newton from zero;
 * 2. source stepping: every independent source scaled from 0 up to its full value, each
 *    solution the next one's starting guess, the increment shrinking where Newton struggles;
 * 3. pseudo-transient continuation: the circuit's own capacitances (amplifiers' internal ones
 *    included) let it settle in backward-Euler steps of growing size with the sources held at
 *    their t = 0 values, then Newton finishes from there. This follows the circuit's own
 *    dynamics, so a stage with positive feedback (a comparator with hysteresis) lands on a
 *    stable state where source stepping runs into a fold of the solution curve.
 */
export function solveOperatingPoint(equations: Equations, x: Float64Array, step: StepInfo): void {
  const dc = (): boolean => {
    step.t = 0;
    step.h = 0;
    step.method = 'dc';
    return equations.solve(step, x);
  };
  step.sourceScale = 1;
  x.fill(0);
  if (dc()) return;
  const good = new Float64Array(x.length);
  const reached = stepSources(x, step, good, dc);
  if (reached === 1) return;
  if (settleInPseudoTime(equations, x, step, good) && dc()) return;
  throw failure(equations, good, x, reached);
}

/** Source stepping; returns the fraction of the sources reached (1 when solved, x then holds the solution). */
function stepSources(x: Float64Array, step: StepInfo, good: Float64Array, dc: () => boolean): number {
  let scale = 0;
  let increment = 0.1;
  step.sourceScale = 0;
  x.fill(0);
  if (!dc()) return 0;
  good.set(x);
  while (scale < 1) {
    const trial = Math.min(1, scale + increment);
    step.sourceScale = trial;
    x.set(good);
    if (dc()) {
      good.set(x);
      scale = trial;
      increment = Math.min(increment * 2, 0.5);
    } else {
      increment /= 4;
      if (increment < 1e-6) break;
    }
  }
  step.sourceScale = 1;
  x.set(good);
  return scale;
}

/** Backward-Euler steps at t = 0 until a long step changes nothing; x then holds the settled state. */
function settleInPseudoTime(equations: Equations, x: Float64Array, step: StepInfo, last: Float64Array): boolean {
  x.fill(0);
  last.fill(0);
  step.t = 0;
  step.sourceScale = 1;
  step.method = 'be';
  let h = PSEUDO_FIRST_STEP;
  for (let n = 0; n < PSEUDO_MAX_STEPS; n++) {
    step.h = h;
    x.set(last);
    if (!equations.solve(step, x)) {
      h /= 4;
      if (h < PSEUDO_FIRST_STEP * 1e-6) return false;
      continue;
    }
    equations.accept(x, step);
    const settled = h >= PSEUDO_SETTLED_STEP && equations.converged(last, x);
    last.set(x);
    if (settled) return true;
    h *= 2;
  }
  return false;
}

function failure(equations: Equations, good: Float64Array, last: Float64Array, scale: number): SimulationError {
  const nodes = equations.worstUnknowns(good, last, 3);
  return new SimulationError(
    `the operating point did not converge (sources stepped up to ${(scale * 100).toFixed(1)}% of their values, and the circuit did not settle in pseudo-time); ${nodes.join(', ')} would not settle`,
    NaN,
    nodes,
    'check the supplies and feedback around these nodes; a capacitor `initial:` voltage can give the solver a consistent start',
  );
}
