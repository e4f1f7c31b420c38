import type { StepInfo } from '../parts/device.ts';
import type { Equations } from './equations.ts';
import { SimulationError } from './simulation-error.ts';

/**
 * DC operating point: capacitors open, inductors shorted, `initial:` values held. Plain
 * Newton first; when it fails (an amplifier that starts saturated, say), source stepping:
 * every independent source is scaled from 0 up to its full value, each solution the next
 * one's starting guess, the increment shrinking where Newton struggles.
 */
export function solveOperatingPoint(equations: Equations, x: Float64Array, step: StepInfo): void {
  step.t = 0;
  step.h = 0;
  step.method = 'dc';
  step.sourceScale = 1;
  x.fill(0);
  if (equations.solve(step, x)) return;

  const good = new Float64Array(x.length);
  let scale = 0;
  let increment = 0.1;
  step.sourceScale = 0;
  x.fill(0);
  if (!equations.solve(step, x)) throw failure(equations, good, x, 0);
  good.set(x);
  while (scale < 1) {
    const trial = Math.min(1, scale + increment);
    step.sourceScale = trial;
    x.set(good);
    if (equations.solve(step, x)) {
      good.set(x);
      scale = trial;
      increment = Math.min(increment * 2, 0.5);
    } else {
      increment /= 4;
      if (increment < 1e-6) throw failure(equations, good, x, scale);
    }
  }
  step.sourceScale = 1;
  x.set(good);
}

function failure(equations: Equations, good: Float64Array, last: Float64Array, scale: number): SimulationError {
  const nodes = equations.worstUnknowns(good, last, 3);
  return new SimulationError(
    `the operating point did not converge (sources stepped up to ${(scale * 100).toFixed(1)}% of their values); ${nodes.join(', ')} would not settle`,
    NaN,
    nodes,
    'check the supplies and feedback around these nodes; a capacitor `initial:` voltage can give the solver a consistent start',
  );
}
