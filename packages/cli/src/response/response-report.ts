import { writeFileSync } from 'node:fs';
import { join } from 'node:path';
import { formatSI, type FrequencyResponse, type Hint, type ResponsePeak, type ResponseWarning } from '@voltcast/core';
import { textTable } from '../text-table.ts';
import { wrap } from '../findings-text.ts';

/**
 * What `response.json` holds: the sweep, each amplifier's loop figures (with the hint that
 * restores a short margin), the closed loop's peaks, and per node its low-frequency gain and
 * -3 dB bandwidth. Hertz, decibels and degrees; null where a figure does not exist within the
 * sweep (docs/cli.md).
 */
export interface ResponseReport {
  readonly circuit: string;
  readonly file: string;
  readonly input: string;
  readonly sweep: { readonly from: number; readonly to: number; readonly perDecade: number; readonly points: number };
  readonly targetMargin: number;
  readonly loops: readonly {
    readonly part: string;
    readonly output: string;
    readonly state: string;
    readonly crossover: number | null;
    readonly phaseMargin: number | null;
    readonly gainMargin: number | null;
    readonly phaseCrossover: number | null;
    readonly hint?: Hint;
  }[];
  readonly peaks: readonly ResponsePeak[];
  /** dB per recorded node at the sweep's lowest frequency (null for a node that does not move). */
  readonly lowFrequencyGain: Readonly<Record<string, number | null>>;
  /** -3 dB bandwidth per recorded node, Hz; null when the response does not start flat or stays within 3 dB. */
  readonly bandwidth: Readonly<Record<string, number | null>>;
  readonly warnings: readonly ResponseWarning[];
  /** Voltage of every named node at the operating point the circuit is linearized at. */
  readonly operatingPoint: Readonly<Record<string, number>>;
  readonly stats: { readonly factorizations: number; readonly solves: number };
}

export function buildResponseReport(circuit: string, file: string, response: FrequencyResponse): ResponseReport {
  const { settings } = response;
  return {
    circuit,
    file,
    input: settings.input,
    sweep: { from: settings.from, to: settings.to, perDecade: settings.perDecade, points: response.frequency.length },
    targetMargin: response.targetMargin,
    loops: response.loops.map((l) => ({
      part: l.part,
      output: l.output,
      state: l.state,
      crossover: l.crossover,
      phaseMargin: l.phaseMargin,
      gainMargin: l.gainMargin,
      phaseCrossover: l.phaseCrossover,
      ...(l.hint !== undefined ? { hint: l.hint } : {}),
    })),
    peaks: response.nodes.flatMap((n) => n.peaks),
    lowFrequencyGain: Object.fromEntries(response.nodes.map((n) => [n.node, Number.isFinite(n.lowFrequencyGain) ? n.lowFrequencyGain : null])),
    bandwidth: Object.fromEntries(response.nodes.map((n) => [n.node, n.bandwidth])),
    warnings: response.warnings,
    operatingPoint: Object.fromEntries(response.operatingPoint),
    stats: { ...response.stats },
  };
}

/** Write `response.json` and `response.txt` into `folder`; returns their names. */
export function writeResponseReport(folder: string, report: ResponseReport): string[] {
  writeFileSync(join(folder, 'response.json'), JSON.stringify(report, null, 2) + '\n');
  writeFileSync(join(folder, 'response.txt'), responseText(report));
  return ['response.json', 'response.txt'];
}

const hertz = (f: number | null): string => (f === null ? 'none' : formatSI(f, 'Hz'));
const decibels = (g: number | null): string => (g === null ? 'none' : `${g.toFixed(2)} dB`);
const angle = (a: number | null): string => (a === null ? 'none' : `${a.toFixed(1)}°`);

/** One screen: the loops and their margins with the hints, the nodes' figures, the warnings. */
export function responseText(report: ResponseReport): string {
  const { sweep } = report;
  const lines = [
    `voltcast response: ${report.circuit}`,
    `file: ${report.file}`,
    `per 1 V (1 A) at ${report.input}, ${formatSI(sweep.from, 'Hz')} to ${formatSI(sweep.to, 'Hz')}, ${sweep.perDecade} points per decade; linearized at the t = 0 operating point`,
    '',
    'loops (return ratio T of each amplifier\'s gain stage; phase margin = 180° + ∠T where |T| = 1)',
  ];
  if (report.loops.length === 0) lines.push('  none: no amplifier');
  else {
    lines.push(...textTable([['part', 'state', 'crossover', 'phase margin', 'gain margin', 'at -180°', `against ${report.targetMargin}°`], ...report.loops.map((l) => [l.part, l.state, hertz(l.crossover), angle(l.phaseMargin), decibels(l.gainMargin), hertz(l.phaseCrossover), judgement(l.phaseMargin, report.targetMargin)])], 2));
    for (const l of report.loops) if (l.hint !== undefined) lines.push(...wrap(`hint: ${l.hint.text}`, 100, '      '));
  }
  lines.push('', 'nodes (gain and phase relative to the input)');
  lines.push(
    ...textTable([
      ['node', `gain at ${formatSI(sweep.from, 'Hz')}`, '-3 dB bandwidth', 'peaks'],
      ...Object.keys(report.lowFrequencyGain).map((node) => {
        const peaks = report.peaks.filter((p) => p.node === node).map((p) => `${p.dB.toFixed(2)} dB at ${formatSI(p.frequency, 'Hz')}`);
        return [node, decibels(report.lowFrequencyGain[node]), hertz(report.bandwidth[node]), peaks.join(', ') || 'none'];
      }),
    ], 4),
  );
  if (report.warnings.length > 0) {
    lines.push('', 'warnings');
    for (const w of report.warnings) lines.push(...wrap(`${w.message}. ${w.hint}.`, 100, '  '));
  }
  return lines.join('\n') + '\n';
}

function judgement(margin: number | null, target: number): string {
  if (margin === null) return '';
  if (margin < 0) return 'oscillates';
  return margin >= target ? 'meets it' : 'short';
}
