import { renameSync, writeFileSync } from 'node:fs';
import { compare, parseQuantity, quantities, type Quantity } from '@voltcast/core';
import { InputError, exitCodes } from '../exit-codes.ts';
import { readCsvTable } from '../compare/read-table.ts';
import { envelopeTrace, measuredTrace } from '../compare/read-inputs.ts';
import { quantityOf } from '../compare/column-units.ts';
import { checkOverlap } from '../compare/overlap.ts';
import { jsonVerdict, textVerdict } from '../compare/verdict-text.ts';
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
 * `voltcast compare MEASURED.csv ENVELOPE.csv`: check a capture against an envelope of volts
 * (`envelope.csv`) or of ADC codes (`envelope-adc-NAME.csv`). Prints the verdict (or JSON with
 * `--json`) and returns the exit code: 0 pass, 1 fail.
 */
export function compareCommand(measuredFile: string, envelopeFile: string, options: CompareCommandOptions): number {
  const { signal, limits, kind } = envelopeTrace(readCsvTable(envelopeFile), options.signal);
  const shift = options.shift === undefined || options.shift === 'auto' ? (options.shift ?? 0) : quantity(options.shift, '--shift', quantities.time);
  const margin = options.margin === undefined ? 0 : marginOf(options.margin, kind);
  const timeMargin = options.timeMargin === undefined ? 0 : quantity(options.timeMargin, '--time-margin', quantities.time);
  const measured = measuredTrace(readCsvTable(measuredFile), options.column, signal, kind);
  const verdict = compare(measured, limits, { shift, margin, timeMargin });
  checkOverlap(measuredFile, measured, limits, verdict);
  if (options.plot !== undefined) {
    // Written beside, then renamed: a reader never sees half a plot.
    const partial = `${options.plot}.partial-${process.pid}`;
    writeFileSync(partial, renderFigure(compareFigure(signal, kind, measured, limits, verdict, `${measuredFile} against ${envelopeFile}`)));
    renameSync(partial, options.plot);
  }
  console.log(options.json ? JSON.stringify(jsonVerdict(signal, kind, measuredFile, envelopeFile, verdict), null, 2) : textVerdict(signal, kind, verdict));
  return verdict.pass ? exitCodes.ok : exitCodes.simulationFailed;
}

/**
 * The --margin: volts for a voltage envelope; for codes a plain count with an optional `LSB`
 * (no SI prefix: `5m` there is far likelier meant as millivolts than as thousandths of a code).
 */
function marginOf(text: string, kind: 'voltage' | 'code'): number {
  if (kind === 'code' && !/^\s*\d*\.?\d+\s*(LSB|codes?)?\s*$/.test(text)) {
    throw new InputError(`voltcast compare: --margin ${text}: the envelope holds ADC codes, so the margin is a number of codes\n  write it as 2LSB or 2; to check volts, compare against envelope.csv`);
  }
  return quantity(text, '--margin', quantityOf(kind));
}

function quantity(text: string, option: string, q: Quantity): number {
  const parsed = parseQuantity(text, q);
  if ('error' in parsed) throw new InputError(`voltcast compare: ${option} ${text}: ${parsed.error}\n  ${parsed.hint}${option === '--margin' ? '; a margin is in volts for envelope.csv and in codes (2LSB) for envelope-adc-NAME.csv' : ''}`);
  return parsed.value;
}
