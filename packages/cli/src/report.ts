import { writeFileSync } from 'node:fs';
import { join } from 'node:path';
import { formatSI, type Circuit, type CircuitRun, type Findings } from '@voltcast/core';
import { findingsText } from './findings-text.ts';
import { adcText } from './adc-text.ts';
import { rowsText } from './rows-text.ts';
import type { NodeExtremes } from './node-extremes.ts';
import { textTable } from './text-table.ts';

/**
 * What `report.json` holds (docs/report-schema.md): the run's settings and extremes, then the
 * findings of `runCircuit` (saturation, slew, current limit, ringing, ADC, warnings, stats).
 * Every number is in SI base units (seconds, volts, amperes).
 */
export interface RunReport extends Findings {
  readonly circuit: string;
  /** The circuit file as given on the command line. */
  readonly file: string;
  readonly settings: Circuit['simulate'];
  /** Voltage of every named node at t = 0. */
  readonly operatingPoint: Record<string, number>;
  readonly recorded: Record<string, { min: number; max: number; final: number }>;
  /** Seconds of wall-clock time the simulation and the analyses took. */
  readonly wallTime: CircuitRun['wallTime'];
  /** Present when the run added the parts' noise (`run --noise`): its seed. */
  readonly noise?: { readonly seed: number };
}

/**
 * `wallTime` is the one field that differs between runs of the same circuit (it is not in
 * report.txt): leave it out when comparing reports or keeping them as expected data.
 */
export function buildReport(file: string, run: CircuitRun, extremes: readonly NodeExtremes[]): RunReport {
  const { circuit, transient, findings } = run;
  return {
    circuit: circuit.name,
    file,
    settings: circuit.simulate,
    operatingPoint: Object.fromEntries(transient.operatingPoint),
    recorded: Object.fromEntries(extremes.map(({ node, min, max, final }) => [node, { min, max, final }])),
    ...findings,
    wallTime: run.wallTime,
  };
}

/** Write `report.json` and `report.txt` into `folder`; returns their paths. */
export function writeReport(folder: string, report: RunReport): string[] {
  const jsonPath = join(folder, 'report.json');
  const textPath = join(folder, 'report.txt');
  writeFileSync(jsonPath, JSON.stringify(report, null, 2) + '\n');
  writeFileSync(textPath, reportText(report));
  return [jsonPath, textPath];
}

/** The report for people: the same content as the JSON, aligned, with SI prefixes. */
export function reportText(report: RunReport): string {
  const { settings, stats } = report;
  const lines = [
    `voltcast run report: ${report.circuit}`,
    `file: ${report.file}`,
    '',
    ...findingsText(report),
    ...adcText(report.adc),
    '',
    'settings',
    ...textTable([
      ['duration', formatSI(settings.duration, 's')],
      ['output step', rowsText(settings)],
      ['max step', formatSI(settings.maxStep, 's')],
      ...(settings.fixedStep !== undefined ? [['fixed step', formatSI(settings.fixedStep, 's')]] : []),
      ['accuracy, relative', String(settings.accuracy.relative)],
      ['accuracy, volts', formatSI(settings.accuracy.volts, 'V')],
      ['accuracy, amps', formatSI(settings.accuracy.amps, 'A')],
      ['temperature', `${settings.temperature} °C`],
      ...(report.noise !== undefined ? [['noise of the parts, seed', String(report.noise.seed)]] : []),
    ]),
    '',
    'work',
    ...textTable([
      ['steps accepted', String(stats.acceptedSteps)],
      ['steps rejected', String(stats.rejectedSteps)],
      ['damping steps (backward Euler)', String(stats.dampingSteps)],
      ['LU factorizations', String(stats.factorizations)],
      ['linear solves', String(stats.solves)],
      ['Newton iterations', String(stats.newtonIterations)],
      ['Newton failures', String(stats.newtonFailures)],
      ['smallest step', formatSI(stats.minStep, 's')],
      ['largest step', formatSI(stats.maxStep, 's')],
    ]),
    '',
    'operating point (t = 0)',
    ...textTable(Object.entries(report.operatingPoint).map(([node, volts]) => [node, formatSI(volts, 'V')])),
    '',
    'recorded nodes',
    ...nodeTable(report.recorded, true),
  ];
  return lines.join('\n') + '\n';
}

/** Per-node table with a header row; `withFinal` adds the final value column. */
export function nodeTable(recorded: RunReport['recorded'], withFinal: boolean): string[] {
  const header = withFinal ? ['node', 'min', 'max', 'final'] : ['node', 'min', 'max'];
  const rows = Object.entries(recorded).map(([node, p]) => {
    const row = [node, formatSI(p.min, 'V'), formatSI(p.max, 'V')];
    return withFinal ? [...row, formatSI(p.final, 'V')] : row;
  });
  return textTable([header, ...rows]);
}
