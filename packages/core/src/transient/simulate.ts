import type { Circuit } from '../circuit/circuit.ts';
import type { StepInfo } from '../parts/device.ts';
import { circuitEquations, newRunStats } from './circuit-equations.ts';
import { solveOperatingPoint } from './operating-point.ts';
import { OutputGrid } from './output-grid.ts';
import { OutputRecorder } from './output-recorder.ts';
import { ObserverHub } from './observer-hub.ts';
import type { SimulateOptions, TransientResult } from './result.ts';
import { SimulationError } from './simulation-error.ts';
import { TruncationError } from './truncation-error.ts';
import { formatSI } from '../units/format.ts';

/** Fraction of the step before a corner used for the first (backward-Euler) step after it. */
const FIRST_STEP_FRACTION = 1e-3;
/** Largest growth of the step from one step to the next. */
const MAX_GROWTH = 2;
/** The step grows only when the estimate allows at least this factor. */
const GROW_ABOVE = 1.5;
/** Safety factor on the step the error estimate proposes. */
const SAFETY = 0.9;

/**
 * Transient analysis: operating point at t = 0, then trapezoidal steps with error control.
 * Every stimulus corner and output row is a landing point that a step ends on exactly;
 * after each corner (and at t = 0) two backward-Euler steps damp the trapezoidal rule's
 * own two-step oscillation before trapezoidal steps resume.
 */
export function simulate(circuit: Circuit, options: SimulateOptions = {}): TransientResult {
  const settings = circuit.simulate;
  const stats = newRunStats();
  const { devices, topology, equations } = circuitEquations(circuit, stats, options.matrix);
  const n = equations.size;
  const duration = settings.duration;
  const fixed = settings.fixedStep;
  const maxStep = Math.min(settings.maxStep, duration);
  /** Times closer than this are the same instant. */
  const eps = duration * 1e-12;
  const floor = Math.max(duration * 1e-14, 1e-18);

  const x = new Float64Array(n);
  const trial = new Float64Array(n);
  const step: StepInfo = { t: 0, h: 0, method: 'dc', sourceScale: 1 };
  solveOperatingPoint(equations, x, step);
  equations.accept(x, step);
  const operatingPoint = new Map(topology.labels.slice(0, topology.nodeCount).map((name, i) => [name, x[i]] as const));

  const absolute = Float64Array.from(topology.isCurrent, (c) => (c ? settings.accuracy.amps : settings.accuracy.volts));
  const error = new TruncationError(n, equations.watchedUnknowns(), settings.accuracy.relative, absolute);
  error.restart(0, x);

  const observers = new ObserverHub(options.observers ?? [], topology, devices);
  observers.accepted(0, x);
  const grid = new OutputGrid(settings.outputStep, duration);
  const output = new OutputRecorder(grid, Int32Array.from(circuit.recorded, (p) => topology.node(p)), options.keepColumns !== false, options.onRow);
  output.record(0, x);

  let t = 0;
  let row = 1;
  let corner = equations.nextCorner(eps);
  let instant = observers.nextInstant(eps);
  let sinceCorner = 0;
  let natural = fixed ?? Math.min(maxStep, settings.outputStep);
  let lastH = NaN;
  let nextProgress = 0.01;
  const worst = { index: 0 };
  /** Step imposed while narrowing onto an event; Infinity when none. */
  let cut = Infinity;
  /** Events are located to within this time. */
  const eventResolution = Math.max(Math.min(settings.outputStep, maxStep) * 1e-3, floor);

  while (t < duration - eps) {
    const target = Math.min(corner, instant, grid.time(row), duration);
    let h = cut < Infinity ? cut : fixed !== undefined ? Math.min(natural, fixed) : sinceCorner === 0 ? Math.min(natural, corner - t) * FIRST_STEP_FRACTION : natural;
    h = Math.min(h, maxStep);
    let landing = false;
    if (t + h >= target - eps) {
      h = target - t;
      landing = true;
    } else if (fixed === undefined) {
      // Split the way to the next landing point into equal steps: no sliver before it, and
      // the same step (so the same factorization) between evenly spaced output rows.
      h = (target - t) / Math.ceil((target - t) / h - 1e-9);
      landing = h === target - t;
    }
    // Keep the previous step exactly when this one differs only by rounding: same matrix.
    if (Math.abs(h - lastH) <= eps) h = lastH;
    step.t = landing ? target : t + h;
    step.h = h;
    step.method = sinceCorner < 2 ? 'be' : 'trap';
    trial.set(x);

    if (!equations.solve(step, trial)) {
      stats.newtonFailures++;
      stats.rejectedSteps++;
      natural = h / 8;
      if (cut < Infinity) cut = natural;
      if (natural < floor) throw stuck(t, equations.worstUnknowns(x, trial, 3), 'Newton iterations did not converge');
      continue;
    }
    // A device changed piece (an amplifier reached a rail): bisect the step onto the change.
    const event = equations.regionChanged(x, trial);
    if (event && h > eventResolution) {
      stats.rejectedSteps++;
      cut = h / 2;
      continue;
    }
    if (fixed === undefined) {
      const order = step.method === 'be' ? 1 : 2;
      const ratio = error.ratio(step.t, trial, order, worst);
      const proposal = ratio === 0 ? h * MAX_GROWTH : h * Math.min(MAX_GROWTH, SAFETY * Math.pow(ratio, -1 / (order + 1)));
      if (ratio > 1) {
        stats.rejectedSteps++;
        natural = Math.max(proposal, h * 0.1);
        if (cut < Infinity) cut = natural;
        if (natural < floor) throw stuck(t, [topology.labels[worst.index]], 'the local truncation error stayed above tolerance');
        continue;
      }
      // An accepted step is kept until the estimate allows a clear increase: every change of
      // step size costs a new factorization.
      if (cut === Infinity && !landing) natural = proposal >= h * GROW_ABOVE ? proposal : h;
    } else {
      natural = fixed;
    }

    equations.accept(trial, step);
    x.set(trial);
    t = step.t;
    lastH = h;
    stats.acceptedSteps++;
    if (step.method === 'be') stats.dampingSteps++;
    if (h < stats.minStep) stats.minStep = h;
    if (h > stats.maxStep) stats.maxStep = h;
    sinceCorner++;
    // While narrowing, the event lies in the rest of the bisected interval: halve again.
    cut = cut < Infinity && !event && h / 2 > eventResolution ? h / 2 : Infinity;
    if (event || t >= corner - eps) {
      error.restart(t, x);
      sinceCorner = 0;
      if (t >= corner - eps) equations.cornerPassed();
      // An event may schedule corners of its own (a comparator's delayed edge).
      corner = equations.nextCorner(t + eps);
    } else {
      error.push(t, x);
    }
    observers.accepted(t, x);
    if (t >= instant - eps) instant = observers.nextInstant(t + eps);
    while (row < grid.rows && grid.time(row) <= t + eps) output.record(row++, x);
    if (options.onProgress && t >= nextProgress * duration) {
      options.onProgress(t / duration);
      nextProgress = Math.floor((t / duration) * 100 + 1) / 100;
    }
  }

  const columns = new Map(circuit.recorded.map((p, i) => [p, output.columns[i]] as const));
  return { time: output.time, columns, recorded: circuit.recorded, stats, operatingPoint };
}

function stuck(t: number, nodes: string[], why: string): SimulationError {
  return new SimulationError(
    `the step size fell below its floor at t = ${formatSI(t, 's', 6)}: ${why} at ${nodes.join(', ')}`,
    t,
    nodes,
    'look for an edge much faster than the circuit around it, a missing resistance in a loop, or loosen `accuracy: { relative }`',
  );
}
