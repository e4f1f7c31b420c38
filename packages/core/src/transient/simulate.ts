import type { Circuit } from '../circuit/circuit.ts';
import type { StepInfo } from '../parts/device.ts';
import { circuitEquations, newRunStats } from './circuit-equations.ts';
import { SPARSE_FROM } from './equations.ts';
import { solveOperatingPoint } from './operating-point.ts';
import { OutputGrid } from './output-grid.ts';
import { OutputRecorder } from './output-recorder.ts';
import { ObserverHub } from './observer-hub.ts';
import { Landings } from './landings.ts';
import type { SimulateOptions, TransientResult } from './result.ts';
import { SimulationError } from './simulation-error.ts';
import { TruncationError } from './truncation-error.ts';
import { LinearStretch } from './linear-stretch.ts';
import { Extremes } from './extremes.ts';
import { interpolatedValue } from './value-at.ts';
import { formatSI } from '../units/format.ts';
import { noiseBandOf } from '../circuit/noise-band.ts';
import { noiseMaxStep } from './noise-injection.ts';

/** Fraction of the step before a corner used for the first (backward-Euler) step after it. */
const FIRST_STEP_FRACTION = 1e-3;
/** Largest growth of the step from one step to the next. */
const MAX_GROWTH = 2;
/** The step grows only when the estimate allows at least this factor. */
const GROW_ABOVE = 1.5;
/** Safety factor on the step the error estimate proposes. */
const SAFETY = 0.9;
/** The truncation-error floors never exceed `relative` times these (volts, amperes). */
const FLOOR_VOLTS_PER_RELATIVE = 1e-2;
const FLOOR_AMPS_PER_RELATIVE = 1e-5;
/**
 * A circuit with nonlinear parts is offered exact steps only after this many trapezoidal
 * steps without a new factorization: its linearization has stopped moving.
 */
const QUIET_STEPS = 4;
/** Trapezoidal steps before exact steps are tried again after a stretch broke off early; doubles each time it breaks off again. */
const EXACT_RETRY_FIRST = 8;
const EXACT_RETRY_MOST = 4096;
/** Step attempts between progress reports, besides every 1% of simulated time. */
const PROGRESS_EVERY_ATTEMPTS = 2000;

/**
 * Transient analysis: operating point at t = 0, then steps of two kinds. Where the circuit is
 * linear between two corners of its drive (linear parts, amplifiers inside their linear
 * range, piecewise-linear stimuli), exact steps (the matrix exponential, LinearStretch)
 * carry it from landing point to landing point without truncation error. Elsewhere,
 * trapezoidal steps with error control; after each corner (and at t = 0, and when exact
 * steps hand over) two backward-Euler steps damp the trapezoidal rule's own two-step
 * oscillation before trapezoidal steps resume. Every stimulus corner, output row and
 * observer instant is a landing point that a step ends on exactly.
 */
export function simulate(circuit: Circuit, options: SimulateOptions = {}): TransientResult {
  const settings = circuit.simulate;
  const stats = newRunStats();
  const noise = options.noise !== undefined ? { seed: options.noise.seed, bandwidth: options.noise.bandwidth ?? noiseBandOf(circuit).to } : undefined;
  const { devices, topology, equations } = circuitEquations(circuit, stats, options.matrix, noise);
  const n = equations.size;
  const duration = settings.duration;
  const fixed = settings.fixedStep;
  const maxStep = Math.min(settings.maxStep, duration, noise !== undefined ? noiseMaxStep(noise.bandwidth) : Infinity);
  /** Times closer than this are the same instant. */
  const eps = duration * 1e-12;
  const floor = Math.max(duration * 1e-14, 1e-18);

  const x = new Float64Array(n);
  const trial = new Float64Array(n);
  const step: StepInfo = { t: 0, h: 0, method: 'dc', sourceScale: 1 };
  solveOperatingPoint(equations, x, step);
  equations.accept(x, step);
  const operatingPoint = new Map(topology.labels.slice(0, topology.nodeCount).map((name, i) => [name, x[i]] as const));

  const { relative } = settings.accuracy;
  // The floors follow the knob: never above relative × 10 mV (or 10 µA), so that tightening
  // `relative` keeps paying where the default floors (1 µV, 1 nA at 1e-4) would stop it.
  const volts = Math.min(settings.accuracy.volts, relative * FLOOR_VOLTS_PER_RELATIVE);
  const amps = Math.min(settings.accuracy.amps, relative * FLOOR_AMPS_PER_RELATIVE);
  const absolute = Float64Array.from(topology.isCurrent, (c) => (c ? amps : volts));
  const error = new TruncationError(n, equations.watchedUnknowns(), relative, absolute);
  error.restart(0, x);

  const observers = new ObserverHub(options.observers ?? [], topology, devices);
  observers.accepted(0, x);
  const grid = new OutputGrid(settings.outputStep, duration);
  const output = new OutputRecorder(grid, Int32Array.from(circuit.recorded, (p) => topology.node(p)), options.keepColumns !== false, options.onRow);
  output.record(0, x);
  const extremes = new Extremes(Int32Array.from(circuit.recorded, (p) => topology.node(p)));
  extremes.add(x);
  const landings = new Landings(grid, output, observers, eps, duration, options.onProgress);

  let t = 0;
  let corner = equations.nextCorner(eps);
  let sinceCorner = 0;
  let natural = fixed ?? Math.min(maxStep, settings.outputStep);
  let lastH = NaN;
  const worst = { index: 0 };
  /** Step imposed while narrowing onto an event; Infinity when none. */
  let cut = Infinity;
  /** Events are located to within this time. */
  const eventResolution = Math.max(Math.min(settings.outputStep, maxStep) * 1e-3, floor);

  // Exact steps are dense products (n² per step, n³ per new step size): for circuits small
  // enough that their equations are dense too.
  const exactStep: StepInfo = { t: 0, h: 0, method: 'be', sourceScale: 1 };
  const stretch = fixed === undefined && n < SPARSE_FROM && options.exactSteps !== false ? new LinearStretch(devices, n) : null;
  /** True while exact steps carry a linear stretch. */
  let exact = stretch !== null && stretch.begin(0, x, Math.min(corner, duration), step);
  /** Exact steps since the stretch began; trapezoidal steps before the next try, and the wait after a failed one. */
  let exactRun = 0;
  let retryIn = 0;
  let retryWait = EXACT_RETRY_FIRST;
  /** Accepted trapezoidal steps in a row that needed no new factorization. */
  let quiet = 0;

  let untilHeartbeat = PROGRESS_EVERY_ATTEMPTS;
  /** The last trapezoidal try was rejected (error too large, no convergence, or bisecting onto an event). */
  let retrying = false;
  while (t < duration - eps) {
    // A heartbeat every so many attempts, accepted or not: a run stuck on hard steps still reports (and can be stopped from the callback).
    if (--untilHeartbeat === 0) {
      untilHeartbeat = PROGRESS_EVERY_ATTEMPTS;
      options.onProgress?.(t / duration);
    }
    const target = Math.min(corner, landings.next(), duration);
    if (exact) {
      // No error control: as long as the landing points and max-step allow, in equal steps.
      const h = (target - t) / Math.ceil((target - t) / Math.min(maxStep, target - t) - 1e-9);
      const end = t + h >= target - eps ? target : t + h;
      if (stretch!.step(t, h, x, trial) && !equations.regionChanged(x, trial) && stretch!.holds(trial, end)) {
        t = end;
        x.set(trial);
        // The devices' history sees the step's end and length (a comparator times its flips by them).
        exactStep.t = t;
        exactStep.h = h;
        equations.accept(x, exactStep);
        stats.acceptedSteps++;
        stats.exactSteps++;
        exactRun++;
        if (h < stats.minStep) stats.minStep = h;
        if (h > stats.maxStep) stats.maxStep = h;
        if (t >= corner - eps) {
          corner = equations.nextCorner(t + eps);
          equations.cornerPassed();
          exactRun = 0;
          exact = stretch!.begin(t, x, Math.min(corner, duration), step);
        }
        extremes.add(x);
        landings.passed(t, x);
      } else {
        exact = false;
      }
      if (!exact) {
        // Hand over to trapezoidal steps, damping first as after a corner; a stretch that broke
        // off early waits longer before the next try.
        sinceCorner = 0;
        natural = Math.min(maxStep, settings.outputStep);
        error.restart(t, x);
        retryWait = exactRun < EXACT_RETRY_FIRST ? Math.min(retryWait * 2, EXACT_RETRY_MOST) : EXACT_RETRY_FIRST;
        retryIn = retryWait;
      }
      continue;
    }

    let h = cut < Infinity ? cut : fixed !== undefined ? Math.min(natural, fixed) : sinceCorner === 0 ? Math.max(Math.min(natural, corner - t) * FIRST_STEP_FRACTION, floor) : natural;
    h = Math.min(h, maxStep);
    let landing = false;
    // Stretch onto a landing point within eps, unless the last try was rejected: then the step
    // must shrink (a step that ends within eps of the point has reached it).
    if (t + h >= target - eps && (!retrying || h >= target - t)) {
      h = target - t;
      landing = true;
    } else if (fixed === undefined) {
      // Split the way to the next landing point into equal steps: no sliver before it, and
      // the same step (so the same factorization) between evenly spaced output rows.
      h = (target - t) / Math.ceil((target - t) / h - 1e-9);
      landing = h === target - t;
    }
    // Keep the previous step exactly when this one differs only by rounding: same matrix.
    // (Relative to the step too: a step near eps must still be able to grow.)
    if (Math.abs(h - lastH) <= Math.min(eps, h * 1e-6)) h = lastH;
    step.t = landing ? target : t + h;
    step.h = h;
    step.method = sinceCorner < 2 ? 'be' : 'trap';
    trial.set(x);
    const factorizations = stats.factorizations;

    if (!equations.solve(step, trial)) {
      stats.newtonFailures++;
      stats.rejectedSteps++;
      retrying = true;
      natural = h / 8;
      if (cut < Infinity) cut = natural;
      if (natural < floor) throw stuck(t, equations.worstUnknowns(x, trial, 3), 'Newton iterations did not converge');
      continue;
    }
    // A device changed piece (an amplifier reached a rail): bisect the step onto the change.
    const event = equations.regionChanged(x, trial);
    if (event && h > eventResolution) {
      stats.rejectedSteps++;
      retrying = true;
      cut = h / 2;
      continue;
    }
    if (fixed === undefined) {
      const order = step.method === 'be' ? 1 : 2;
      const ratio = error.ratio(step.t, trial, order, worst);
      const proposal = ratio === 0 ? h * MAX_GROWTH : h * Math.min(MAX_GROWTH, SAFETY * Math.pow(ratio, -1 / (order + 1)));
      if (ratio > 1) {
        stats.rejectedSteps++;
        retrying = true;
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
    retrying = false;
    lastH = h;
    stats.acceptedSteps++;
    if (step.method === 'be') stats.dampingSteps++;
    if (h < stats.minStep) stats.minStep = h;
    if (h > stats.maxStep) stats.maxStep = h;
    sinceCorner++;
    // While narrowing, the event lies in the rest of the bisected interval: halve again.
    cut = cut < Infinity && !event && h / 2 > eventResolution ? h / 2 : Infinity;
    const atCorner = t >= corner - eps;
    if (event || atCorner) {
      error.restart(t, x);
      sinceCorner = 0;
      if (atCorner) equations.cornerPassed();
      // An event may schedule corners of its own (a comparator's delayed edge).
      corner = equations.nextCorner(t + eps);
    } else {
      error.push(t, x);
    }
    // Exact steps take over at a corner (they need no damping) or after a quiet spell.
    retryIn--;
    quiet = stats.factorizations === factorizations ? quiet + 1 : 0;
    const settled = stretch !== null && cut === Infinity && (stretch.linear || quiet >= QUIET_STEPS);
    if (settled && ((atCorner && retryWait === EXACT_RETRY_FIRST) || (retryIn <= 0 && sinceCorner > 2))) {
      exactRun = 0;
      exact = stretch!.begin(t, x, Math.min(corner, duration), step);
      if (!exact) {
        retryWait = Math.min(retryWait * 2, EXACT_RETRY_MOST);
        retryIn = retryWait;
      }
    }
    extremes.add(x);
    landings.passed(t, x);
  }
  stats.propagators = stretch?.builds ?? 0;

  const columns = new Map(circuit.recorded.map((p, i) => [p, output.columns[i]] as const));
  const time = output.time;
  return { time, columns, recorded: circuit.recorded, minimum: extremes.minimum, maximum: extremes.maximum, valueAt: (name, at) => interpolatedValue(time, columns, name, at), stats, operatingPoint };
}

function stuck(t: number, nodes: string[], why: string): SimulationError {
  return new SimulationError(
    `the step size fell below its floor at t = ${formatSI(t, 's', 6)}: ${why} at ${nodes.join(', ')}`,
    t,
    nodes,
    'look for an edge much faster than the circuit around it, a source value far beyond its supplies (a missing or wrong prefix), a missing resistance in a loop, or loosen `accuracy: { relative }`',
  );
}
