import type { Circuit } from '../../circuit/circuit.ts';
import type { LinearizedCircuit } from '../../small-signal/linearized-circuit.ts';
import { slowestMode } from '../../small-signal/slowest-mode.ts';
import { formatSI } from '../../units/format.ts';
import type { ReportWarning } from '../ringing/types.ts';

/** A duration beyond this many times (the drive's last change + the slowest time constant) shows nothing new. */
export const FAR_BEYOND = 1000;
/** Time constants after the last change that a run needs to show the circuit settle (e⁻¹⁰ ≈ 5·10⁻⁵). */
const SETTLE = 10;

/**
 * A duration far beyond the circuit's slowest time constant, with a drive that has gone quiet
 * (`quietFrom`, the last change of any source or switch): after the last change and a few
 * time constants nothing moves, so the rest of the run is work with nothing to show, and
 * usually a prefix left off (`duration: 500` for 500u). Names the duration, the time
 * constant and the node it shows at.
 */
export function longDuration(circuit: Circuit, linear: LinearizedCircuit, quietFrom: number): ReportWarning | undefined {
  const duration = circuit.simulate.duration;
  const mode = slowestMode(linear);
  if (mode === undefined || !(duration > FAR_BEYOND * (quietFrom + mode.timeConstant))) return undefined;
  const ring = mode.frequency > 0 ? `, a ring at ${formatSI(mode.frequency, 'Hz')} decaying with it,` : '';
  const [quiet, after] = quietFrom > 0 ? [`its drive holds from ${formatSI(quietFrom, 's')}`, 'the last change and '] : ['its drive never changes', ''];
  return {
    kind: 'duration',
    node: mode.node,
    message: `the duration ${formatSI(duration, 's')} is ${formatSI(duration / mode.timeConstant, '')} times the circuit's slowest time constant, ${formatSI(mode.timeConstant, 's')}${ring} at node ${mode.node}, and ${quiet}: the circuit has settled long before the end. Check the duration's prefix (m is milli, u is micro, n is nano), or end the run near ${formatSI(quietFrom + SETTLE * mode.timeConstant, 's')}, ${after}${SETTLE} time constants`,
  };
}
