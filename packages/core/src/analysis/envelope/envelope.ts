import type { Circuit } from '../../circuit/circuit.ts';
import { runCircuit, type CircuitRun } from '../run-circuit.ts';
import { SimulationError } from '../../transient/simulation-error.ts';
import { cornerCount, cornerDeviations } from './corners.ts';
import { RunDraws } from './draws.ts';
import { EnvelopeFold, type EnvelopeBounds } from './fold.ts';
import { toleranceSlots, variedCircuit, type ToleranceSlot } from './varied-circuit.ts';

export interface EnvelopeOptions {
  /** Monte Carlo runs (default 0). */
  runs?: number;
  /** Seed of the Monte Carlo draws (default 1); a seed and a run count fix every run. */
  seed?: number;
  /** Also run the worst-case corners (see `cornerDeviations`). */
  corners?: boolean;
  /** Called after each varied run with how many are done and how many there are. */
  onProgress?: (done: number, total: number) => void;
}

/**
 * What an envelope runs: variant i < `runs` is Monte Carlo draw i, the next `corners` are the
 * worst-case corners. A plan is a pure function of the circuit and the options, so workers
 * that read the same circuit file build the same plan and can each run a slice of it.
 */
export interface EnvelopePlan {
  readonly circuit: Circuit;
  readonly slots: readonly ToleranceSlot[];
  readonly runs: number;
  readonly seed: number;
  readonly corners: number;
  /** runs + corners. */
  readonly variants: number;
}

/** The code envelope of one converter: lowest, nominal and highest code per conversion. */
export interface AdcEnvelope {
  readonly name: string;
  readonly index: Int32Array;
  readonly time: Float64Array;
  readonly min: Int32Array;
  readonly nominal: Int32Array;
  readonly max: Int32Array;
}

/** Min, nominal and max per recorded node on the circuit's output grid, and per ADC its codes. */
export interface Envelope {
  readonly time: Float64Array;
  readonly recorded: readonly string[];
  readonly nominal: ReadonlyMap<string, Float64Array>;
  readonly min: ReadonlyMap<string, Float64Array>;
  readonly max: ReadonlyMap<string, Float64Array>;
  /** Per converter of the `adc:` section, in its order. */
  readonly adcs: readonly AdcEnvelope[];
  /** The toleranced values that were varied. */
  readonly varied: readonly { readonly part: string; readonly key: string; readonly mode: 'relative' | 'absolute'; readonly amount: number; readonly distribution: string }[];
  readonly runs: number;
  readonly corners: number;
  readonly seed: number;
}

export function envelopePlan(circuit: Circuit, options: EnvelopeOptions = {}): EnvelopePlan {
  const slots = toleranceSlots(circuit);
  const runs = options.runs ?? 0;
  if (!Number.isInteger(runs) || runs < 0) throw new RangeError(`runs must be a whole number of at least 0, not ${runs}`);
  const seed = options.seed ?? 1;
  if (!Number.isInteger(seed)) throw new RangeError(`seed must be a whole number, not ${seed}`);
  const corners = options.corners ? cornerCount(slots.length) : 0;
  return { circuit, slots, runs, seed, corners, variants: runs + corners };
}

/** The varied circuits of variants `from` to `end - 1`, in order. */
export function* planVariants(plan: EnvelopePlan, from: number, end: number): Generator<{ index: number; circuit: Circuit; deviations: Float64Array }> {
  const monteCarloEnd = Math.min(end, plan.runs);
  if (from < monteCarloEnd) {
    const draws = new RunDraws(plan.seed, from, plan.slots.map((s) => s.tolerance.distribution));
    for (let i = from; i < monteCarloEnd; i++) {
      const deviations = draws.next();
      yield { index: i, circuit: variedCircuit(plan.circuit, plan.slots, deviations), deviations };
    }
  }
  const cornerFrom = Math.max(from, plan.runs) - plan.runs;
  const cornerEnd = end - plan.runs;
  if (cornerFrom >= cornerEnd) return;
  let index = plan.runs + cornerFrom;
  for (const deviations of cornerDeviations(plan.slots.length, plan.seed, cornerFrom, cornerEnd)) {
    yield { index: index++, circuit: variedCircuit(plan.circuit, plan.slots, deviations), deviations };
  }
}

/**
 * Run variants `from` to `end - 1` and fold them. A failed run throws a SimulationError whose
 * message names the variant and the values it drew, so the failure can be reproduced.
 */
export function runVariants(plan: EnvelopePlan, from: number, end: number, onRun?: () => void): EnvelopeBounds {
  let fold: EnvelopeFold | undefined;
  for (const variant of planVariants(plan, from, end)) {
    let run: CircuitRun;
    try {
      run = runCircuit(variant.circuit, { startChecks: false });
    } catch (error) {
      if (!(error instanceof SimulationError)) throw error;
      throw new SimulationError(`${describeVariant(plan, variant.index, variant.deviations)}: ${error.message}`, error.time, error.nodes, error.hint, error.parts);
    }
    fold ??= foldFor(plan, run);
    fold.add(run);
    onRun?.();
  }
  return fold?.bounds() ?? { min: [], max: [], codeMin: [], codeMax: [], runs: 0 };
}

/** An empty fold shaped like `run` (every run of a plan has the same rows and conversions). */
export function foldFor(plan: EnvelopePlan, run: CircuitRun): EnvelopeFold {
  return new EnvelopeFold(plan.circuit.recorded, run.transient.time.length, run.adcs.map((adc) => adc.code.length));
}

/** "Monte Carlo run 17 (seed 1), R1.resistor at -43.0% of its tolerance, ...", for failure messages. */
export function describeVariant(plan: EnvelopePlan, index: number, deviations: ArrayLike<number>): string {
  const what = index < plan.runs ? `Monte Carlo run ${index} (seed ${plan.seed})` : `corner ${index - plan.runs}`;
  const values = plan.slots.map((s, i) => `${s.part}.${s.tolerance.key} at ${(deviations[i] * 100).toFixed(1)}% of its tolerance`);
  return `${what}, ${values.join(', ')}`;
}

/** Put the nominal run and the folded variants together (the nominal is inside the bounds). */
export function assembleEnvelope(plan: EnvelopePlan, nominal: CircuitRun, variants: EnvelopeBounds): Envelope {
  const { time, columns } = nominal.transient;
  const recorded = plan.circuit.recorded;
  const fold = foldFor(plan, nominal);
  fold.add(nominal);
  if (variants.runs > 0) fold.merge(variants);
  const { min, max, codeMin, codeMax } = fold.bounds();
  return {
    time,
    recorded,
    nominal: new Map(recorded.map((p) => [p, columns.get(p)!])),
    min: new Map(recorded.map((p, i) => [p, min[i]])),
    max: new Map(recorded.map((p, i) => [p, max[i]])),
    adcs: nominal.adcs.map((adc, a) => ({ name: adc.spec.name, index: adc.index, time: adc.time, min: codeMin[a], nominal: adc.code, max: codeMax[a] })),
    varied: plan.slots.map((s) => ({ part: s.part, key: s.tolerance.key, mode: s.tolerance.mode, amount: s.tolerance.amount, distribution: s.tolerance.distribution })),
    runs: plan.runs,
    corners: plan.corners,
    seed: plan.seed,
  };
}

/**
 * Tolerance envelope of a circuit in this thread: the nominal run, `runs` seeded Monte Carlo
 * draws and, when asked, the worst-case corners, folded into min, nominal and max per recorded node.
 * The command line spreads the same plan over worker threads with identical results.
 */
export function envelope(circuit: Circuit, options: EnvelopeOptions = {}): Envelope {
  const plan = envelopePlan(circuit, options);
  const nominal = runCircuit(circuit);
  let done = 0;
  const variants = runVariants(plan, 0, plan.variants, () => options.onProgress?.(++done, plan.variants));
  return assembleEnvelope(plan, nominal, variants);
}
