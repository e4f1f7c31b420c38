import { formatSI } from '../../units/format.ts';
import { oscillationFigures } from './oscillation.ts';
import type { SpectralPeak } from './spectral-peak.ts';
import type { ReportWarning, RingingFinding, RingingOptions } from './types.ts';

/** Under this many output rows per period the figures are too coarse to trust. */
const COARSE_ROWS = 8;
/** A period this close to two steps is the trapezoidal rule's oscillation. */
const METHOD_ROWS = 2.5;

/** A run of events close together: ringing is looked for after the last one. */
export interface EventCluster {
  readonly first: number;
  readonly last: number;
  readonly cause: string;
}

/** What one node shows in the window after one cluster of events. */
export interface WindowVerdict {
  /** A confirmed oscillation, `repeats` still 0. */
  readonly finding?: RingingFinding;
  readonly warning?: ReportWarning;
}

/**
 * Look at rows [from, to) of one node after `cluster` for a damped oscillation about the
 * settling value; `before` is the node's value just before the cluster's first event. The
 * rows are output rows, so the time resolution is the output step: a period under 8 rows is
 * flagged as coarse, and one near 2 rows is the integration method's oscillation, a solver
 * warning and never ringing. A finding must also be confirmed by the spectral peak, which
 * rules out noise whose crossings happen to look regular.
 */
export function examineWindow(
  node: string,
  time: Float64Array,
  values: Float64Array,
  from: number,
  to: number,
  before: number,
  cluster: EventCluster,
  outputStep: number,
  options: RingingOptions,
  spectrum: SpectralPeak,
): WindowVerdict {
  const found = oscillationFigures(time, values, from, to, before, cluster.last, options.settleBand ?? 0.01);
  if (found === null) return {};
  const rowsPerPeriod = 1 / (found.frequency * outputStep);
  if (rowsPerPeriod < METHOD_ROWS) {
    return {
      warning: { kind: 'solver', node, time: cluster.last, message: `node ${node} alternates with a period of about two output steps after ${formatSI(cluster.last, 's')}: the integration method's own oscillation, not ringing of the circuit; lower \`max-step\` to check` },
    };
  }
  const spectralFrequency = spectrum.frequency(values, found.from, found.to, found.settlingValue, outputStep, rowsPerPeriod);
  if (Math.abs(spectralFrequency - found.frequency) > (options.spectralTolerance ?? 0.15) * found.frequency) return {};
  const finding: RingingFinding = {
    node,
    start: cluster.last,
    cause: cluster.cause,
    frequency: found.frequency,
    spectralFrequency,
    dampingRatio: found.dampingRatio,
    logDecrement: found.logDecrement,
    overshoot: found.overshoot,
    settlingValue: found.settlingValue,
    step: found.step,
    settlingTime: found.settlingTime,
    cycles: found.cycles,
    sustained: found.dampingRatio < (options.sustainedBelow ?? 0.01),
    rowsPerPeriod,
    repeats: 0,
  };
  if (rowsPerPeriod >= COARSE_ROWS) return { finding };
  return {
    finding,
    warning: { kind: 'resolution', node, time: cluster.last, message: `ringing on ${node} at ${formatSI(finding.frequency, 'Hz')} spans only ${rowsPerPeriod.toFixed(1)} output rows per period: its figures are coarse; set \`output-step\` to ${formatSI(1 / (finding.frequency * 20), 's')} or less to measure it` },
  };
}
