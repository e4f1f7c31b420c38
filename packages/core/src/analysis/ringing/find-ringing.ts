import { formatSI } from '../../units/format.ts';
import { clusterEvents } from './events.ts';
import { oscillationFigures } from './oscillation.ts';
import { spectralPeak } from './spectral-peak.ts';
import type { ReportWarning, RingingEvent, RingingFinding, RingingOptions } from './types.ts';

/** Waveforms on the output grid, as `TransientResult` or the row recorder holds them. */
export interface RowWaveforms {
  readonly time: Float64Array;
  readonly columns: ReadonlyMap<string, Float64Array>;
  /** Rows filled (defaults to time.length). */
  readonly rows?: number;
}

/** Under this many output rows per period the figures are too coarse to trust. */
const COARSE_ROWS = 8;
/** A period this close to two steps is the trapezoidal rule's oscillation. */
const METHOD_ROWS = 2.5;
/** Repeats of a finding: same node, frequency within this fraction. */
const SAME_FREQUENCY = 0.05;

/**
 * After each event (clusters of stimulus corners and rail exits), look on every column for a
 * damped oscillation about the settling value. The waveforms are the output rows, so the
 * time resolution is the output step: a period under 8 rows is flagged as coarse, and one
 * near 2 rows is the integration method's oscillation: a solver warning, never ringing.
 * A finding must also be confirmed by the spectral peak, which rules out noise whose
 * crossings happen to look regular.
 */
export function findRinging(
  waves: RowWaveforms,
  events: readonly RingingEvent[],
  outputStep: number,
  options: RingingOptions = {},
): { ringing: RingingFinding[]; warnings: ReportWarning[]; events: number } {
  const settleBand = options.settleBand ?? 0.01;
  const sustainedBelow = options.sustainedBelow ?? 0.01;
  const tolerance = options.spectralTolerance ?? 0.15;
  const clusters = clusterEvents(events, options.eventGap ?? 4 * outputStep);
  const { time } = waves;
  const rows = waves.rows ?? time.length;
  const rowAtOrAfter = (t: number): number => {
    let lo = 0;
    let hi = rows;
    while (lo < hi) {
      const mid = (lo + hi) >> 1;
      if (time[mid] < t - outputStep * 1e-6) lo = mid + 1;
      else hi = mid;
    }
    return lo;
  };
  const ringing: RingingFinding[] = [];
  const warnings: ReportWarning[] = [];

  for (const [node, values] of waves.columns) {
    let previous: RingingFinding | null = null;
    clusters.forEach((cluster, c) => {
      const i0 = rowAtOrAfter(cluster.last);
      const i1 = c + 1 < clusters.length ? Math.min(rows, rowAtOrAfter(clusters[c + 1].first) + 1) : rows;
      // The last row at or before the event's first corner: the value before the event.
      const atFirst = Math.min(rowAtOrAfter(cluster.first), rows - 1);
      const iBefore = time[atFirst] > cluster.first + outputStep * 1e-6 ? Math.max(0, atFirst - 1) : atFirst;
      const found = oscillationFigures(time, values, i0, i1, values[iBefore], cluster.last, settleBand);
      if (found === null) return;
      const rowsPerPeriod = 1 / (found.frequency * outputStep);
      if (rowsPerPeriod < METHOD_ROWS) {
        warnings.push({ kind: 'solver', node, time: cluster.last, message: `node ${node} alternates with a period of about two output steps after ${formatSI(cluster.last, 's')}: the integration method's own oscillation, not ringing of the circuit; lower \`max-step\` to check` });
        return;
      }
      const spectralFrequency = spectralPeak(values, found.from, found.to, found.settlingValue, outputStep);
      if (Math.abs(spectralFrequency - found.frequency) > tolerance * found.frequency) return;
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
        sustained: found.dampingRatio < sustainedBelow,
        rowsPerPeriod,
        repeats: 0,
      };
      if (previous !== null && Math.abs(previous.frequency - finding.frequency) <= SAME_FREQUENCY * previous.frequency && previous.sustained === finding.sustained) {
        previous = { ...previous, repeats: previous.repeats + 1 };
        ringing[ringing.length - 1] = previous;
        return;
      }
      previous = finding;
      ringing.push(finding);
      if (rowsPerPeriod < COARSE_ROWS) {
        warnings.push({ kind: 'resolution', node, time: cluster.last, message: `ringing on ${node} at ${formatSI(finding.frequency, 'Hz')} spans only ${rowsPerPeriod.toFixed(1)} output rows per period: its figures are coarse; set \`output-step\` to ${formatSI(1 / (finding.frequency * 20), 's')} or less to measure it` });
      }
    });
  }
  ringing.sort((a, b) => a.start - b.start || a.node.localeCompare(b.node));
  return { ringing, warnings, events: clusters.length };
}
