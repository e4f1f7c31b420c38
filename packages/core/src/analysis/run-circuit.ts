import type { Circuit } from '../circuit/circuit.ts';
import type { SimulateOptions, TransientResult } from '../transient/result.ts';
import { simulate } from '../transient/simulate.ts';

/**
 * Everything one run of a circuit produces: the waveforms, and what the analyses made of
 * them (ADC readouts, saturation and ringing findings). Each analysis adds one field here and
 * one line in `runCircuit`.
 */
export interface CircuitRun {
  readonly circuit: Circuit;
  readonly transient: TransientResult;
}

/** Options for `runCircuit`: those of `simulate`, plus each analysis's own. */
export interface RunOptions extends SimulateOptions {}

/**
 * Simulate a circuit with every analysis it asks for. Analyses that need the exact solution
 * at chosen instants (an ADC's sample instants) watch the run as step observers; the others
 * work on the finished waveforms.
 */
export function runCircuit(circuit: Circuit, options: RunOptions = {}): CircuitRun {
  const transient = simulate(circuit, { ...options, observers: [...(options.observers ?? [])] });
  return { circuit, transient };
}
