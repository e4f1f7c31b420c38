import type { Circuit } from '../circuit/circuit.ts';
import type { SimulateOptions, TransientResult } from '../transient/result.ts';
import { simulate } from '../transient/simulate.ts';
import { AdcSampler } from './adc/adc-sampler.ts';
import type { AdcReadout } from './adc/adc-readout.ts';
import { FindingsWatch } from './report/findings.ts';
import type { Findings, FindingsOptions } from './report/types.ts';
import { startWarnings } from './report/start-warnings.ts';
import type { ReportWarning } from './ringing/types.ts';

/**
 * Everything one run of a circuit produces: the waveforms, and what the analyses made of
 * them (ADC readouts, saturation and ringing findings). Each analysis adds one field here and
 * one line in `runCircuit`.
 */
export interface CircuitRun {
  readonly circuit: Circuit;
  readonly transient: TransientResult;
  /** What each converter of the `adc:` section read, in the section's order. */
  readonly adcs: readonly AdcReadout[];
  /** Saturation, slew, current-limit and ringing findings with the ADC reports (docs/report-schema.md). */
  readonly findings: Findings;
  /**
   * Wall-clock seconds of the simulation and of the analyses. The analyses are the windows
   * examined for ringing during the run and all the work after it; what the watchers do at
   * each step (saturation states, ADC samples, copying rows) counts as simulation.
   */
  readonly wallTime: { readonly simulation: number; readonly analyses: number };
}

/** Options for `runCircuit`: those of `simulate`, plus each analysis's own. */
export interface RunOptions extends SimulateOptions {
  /** Thresholds of the saturation and ringing analyses. */
  findings?: FindingsOptions;
  /**
   * Called with each warning found before the simulation starts (an amplifier on an unstable
   * balance, a duration far beyond the circuit's settling), so that it can be shown before a
   * long run; the findings list them too.
   */
  onWarning?: (warning: ReportWarning) => void;
  /** False: skip those checks (a tolerance envelope's variants; its nominal run makes them). Default true. */
  startChecks?: boolean;
}

/**
 * Simulate a circuit with every analysis it asks for. Analyses that need the exact solution
 * at chosen instants (an ADC's sample instants) watch the run as step observers; the others
 * work on the finished waveforms.
 */
export function runCircuit(circuit: Circuit, options: RunOptions = {}): CircuitRun {
  const adcs = circuit.adcs.map((spec) => new AdcSampler(spec, circuit.simulate.duration));
  const watch = new FindingsWatch(circuit, options.findings);
  const early = options.startChecks === false ? [] : startWarnings(circuit, options.noise !== undefined);
  for (const warning of early) options.onWarning?.(warning);
  // Date.now: the core has no finer timer in every host it runs in; milliseconds suffice here.
  const started = Date.now();
  const transient = simulate(circuit, { ...options, observers: [...(options.observers ?? []), ...adcs, ...watch.observers] });
  const simulated = Date.now();
  const run = { circuit, transient, adcs: adcs.map((adc) => adc.readout()) };
  const findings = watch.finish(transient, run.adcs.map((adc) => adc.report), early);
  const during = watch.examineSeconds;
  const wallTime = { simulation: (simulated - started) / 1000 - during, analyses: (Date.now() - simulated) / 1000 + during };
  return { ...run, findings, wallTime };
}
