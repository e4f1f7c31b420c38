import type { Circuit } from '../../circuit/circuit.ts';
import { partKind } from '../../parts/index.ts';
import { LinearizedCircuit } from '../../small-signal/linearized-circuit.ts';
import { SimulationError } from '../../transient/simulation-error.ts';
import type { ReportWarning } from '../ringing/types.ts';
import { FAR_BEYOND, longDuration } from './long-duration.ts';
import { unstableBalances } from './unstable-balance.ts';

/**
 * What is wrong with a run as set up, found before it starts, on the circuit linearized at its
 * t = 0 operating point: amplifiers on an unstable balance, a duration far beyond the time the
 * circuit needs to settle. The linearization (one operating-point solve) is made only when a
 * check applies: an amplifier in the circuit, a drive that goes quiet well before the end
 * (never with the parts' noise added: `noisy`).
 */
export function startWarnings(circuit: Circuit, noisy: boolean): ReportWarning[] {
  const amplifiers = circuit.parts.some((part) => part.kind === 'opamp');
  const quietFrom = circuit.parts.reduce((latest, spec) => Math.max(latest, partKind(spec.kind).holdsFrom?.(spec) ?? 0), 0);
  const mayBeLong = !noisy && circuit.simulate.duration > FAR_BEYOND * quietFrom;
  if (!amplifiers && !mayBeLong) return [];
  try {
    const linear = new LinearizedCircuit(circuit);
    const long = mayBeLong ? longDuration(circuit, linear, quietFrom) : undefined;
    return [...(amplifiers ? unstableBalances(linear) : []), ...(long !== undefined ? [long] : [])];
  } catch (error) {
    // No operating point, a part without a small-signal model, equations singular at DC: the
    // checks do not apply (a run that cannot start reports its own failure).
    if (error instanceof SimulationError) return [];
    throw error;
  }
}
