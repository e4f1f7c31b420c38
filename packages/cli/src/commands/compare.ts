import { renameSync, writeFileSync } from 'node:fs';
import { compare, formatSI, parseQuantity, quantities, type Comparison } from '@voltcast/core';
import { InputError, exitCodes } from '../exit-codes.ts';
import { readNumberTable } from '../compare/read-table.ts';
import { envelopeTrace, measuredTrace } from '../compare/read-inputs.ts';
import { compareFigure } from '../plot/compare-plot.ts';
import { renderFigure } from '../plot/render-figure.ts';

export interface CompareCommandOptions {
  signal?: string;
  column?: string;
  shift?: string;
  margin?: string;
  timeMargin?: string;
  json?: boolean;
  plot?: string;
}

/**
 * `voltcast compare MEASURED.csv ENVELOPE.csv`: check a capture against an envelope. Prints
 * the verdict (or JSON with `--json`) and returns the exit code: 0 pass, 1 fail.
 */
export function compareCommand(measuredFile: string, envelopeFile: string, options: CompareCommandOptions): number {
  const shift = options.shift === undefined || options.shift === 'auto' ? (options.shift ?? 0) : quantity(options.shift, '--shift', quantities.time);
  const margin = options.margin === undefined ? 0 : quantity(options.margin, '--margin', quantities.voltage);
  const timeMargin = options.timeMargin === undefined ? 0 : quantity(options.timeMargin, '--time-margin', quantities.time);
  const { signal, limits } = envelopeTrace(readNumberTable(envelopeFile), options.signal);
  const measured = measuredTrace(readNumberTable(measuredFile), options.column, signal);
  const verdict = compare(measured, limits, { shift, margin, timeMargin });
  if (options.plot !== undefined) {
    // Written beside, then renamed: a reader never sees half a plot.
    const partial = `${options.plot}.partial`;
    writeFileSync(partial, renderFigure(compareFigure(signal, measured, limits, verdict, `${measuredFile} against ${envelopeFile}`)));
    renameSync(partial, options.plot);
  }
  console.log(options.json ? JSON.stringify(jsonVerdict(signal, measuredFile, envelopeFile, verdict), null, 2) : textVerdict(signal, verdict));
  return verdict.pass ? exitCodes.ok : exitCodes.simulationFailed;
}

function quantity(text: string, option: string, q: typeof quantities.time | typeof quantities.voltage): number {
  const parsed = parseQuantity(text, q);
  if ('error' in parsed) throw new InputError(`voltcast compare: ${option} ${text}: ${parsed.error}${parsed.hint ? `\n  ${parsed.hint}` : ''}`);
  return parsed.value;
}

function textVerdict(signal: string, v: Comparison): string {
  const share = `${(v.fractionInside * 100).toFixed(2)}% of ${v.compared} samples inside`;
  const shift = `shift ${formatSI(v.shift, 's')}`;
  const skipped = v.skipped > 0 ? `, ${v.skipped} outside the envelope's time span not checked` : '';
  if (v.compared === 0) return `FAIL ${signal}: no sample falls within the envelope's time span (${shift})\n  check the time column's unit (seconds) or give --shift`;
  if (v.pass) return `PASS ${signal}: ${share} (${shift}${skipped})`;
  const f = v.firstViolation!;
  return [
    `FAIL ${signal}: ${share} (${shift}${skipped})`,
    `  first violation at t = ${formatSI(f.time, 's')}: ${formatSI(f.value, 'V')} outside [${formatSI(f.min, 'V')}, ${formatSI(f.max, 'V')}]`,
  ].join('\n');
}

function jsonVerdict(signal: string, measured: string, envelope: string, v: Comparison): object {
  const { violations, ...rest } = v;
  return { signal, measured, envelope, ...rest, violations: violations.length };
}
