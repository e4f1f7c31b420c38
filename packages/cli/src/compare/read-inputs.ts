import type { EnvelopeTrace, Trace } from '@voltcast/core';
import { InputError } from '../exit-codes.ts';
import { checkIncreasing, column, columnIndex, type CsvTable } from './read-table.ts';

const limitSuffixes = ['.min', '.nominal', '.max'] as const;

/** One signal's limits from an envelope file, and whether they are volts or ADC codes. */
export interface EnvelopeSignal {
  readonly signal: string;
  readonly limits: EnvelopeTrace;
  readonly kind: 'voltage' | 'code';
}

/**
 * A signal's limits from `envelope.csv` (volts) or `envelope-adc-NAME.csv` (codes, its first
 * column the conversion index); `signal` may be left out when the file holds one.
 */
export function envelopeTrace(table: CsvTable, signal: string | undefined): EnvelopeSignal {
  const signals = [...new Set(table.names.filter((n) => n.endsWith('.nominal')).map((n) => n.slice(0, -'.nominal'.length)))];
  if (signals.length === 0) throw new InputError(`${table.file}: not an envelope file: no '<signal>.nominal' column\n  pass the envelope.csv or envelope-adc-NAME.csv written by voltcast envelope as the second file`);
  if (signal === undefined && signals.length > 1) throw new InputError(`${table.file}: holds the signals ${signals.join(', ')}\n  choose one with --signal NAME`);
  const name = signal ?? signals[0];
  if (!signals.includes(name)) throw new InputError(`${table.file}: no signal '${name}'\n  the signals are ${signals.join(', ')}`);
  const kind = table.names[0] === 'index' ? 'code' : 'voltage';
  const time = column(table, columnIndex(table, 'time', '--signal'), 'time');
  checkIncreasing(table, time, 'time');
  const [min, nominal, max] = limitSuffixes.map((suffix) => column(table, columnIndex(table, name + suffix, '--signal'), kind));
  return { signal: name, limits: { time, min, nominal, max }, kind };
}

/**
 * The captured trace: time from a column named `time` or `t` (any case, with its unit:
 * `Time (ms)`), else the first column; values from `--column`, else the column named like the
 * signal, else (for codes) one named `code`, else the only other column besides an `index`.
 */
export function measuredTrace(table: CsvTable, wanted: string | undefined, signal: string, kind: EnvelopeSignal['kind']): Trace {
  const timeIndex = Math.max(0, table.names.findIndex((n) => /^(time|t)\b/i.test(n)));
  const time = column(table, timeIndex, 'time');
  checkIncreasing(table, time, `time (column '${table.names[timeIndex]}')`);
  return { time, values: column(table, valueIndex(table, wanted, signal, kind, timeIndex), kind) };
}

function valueIndex(table: CsvTable, wanted: string | undefined, signal: string, kind: EnvelopeSignal['kind'], timeIndex: number): number {
  if (wanted !== undefined) return columnIndex(table, wanted, '--column');
  for (const name of kind === 'code' ? [signal, 'code'] : [signal]) {
    if (table.names.includes(name)) return table.names.indexOf(name);
  }
  const others = table.names.map((_, i) => i).filter((i) => i !== timeIndex && table.names[i] !== 'index');
  if (others.length !== 1) throw new InputError(`${table.file}: which column holds '${signal}'? the columns are ${table.names.join(', ')}\n  choose one with --column NAME`);
  return others[0];
}
