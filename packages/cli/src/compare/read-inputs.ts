import type { EnvelopeTrace, Trace } from '@voltcast/core';
import { InputError } from '../exit-codes.ts';
import { checkIncreasing, column, type NumberTable } from './read-table.ts';

const limitSuffixes = ['.min', '.nominal', '.max'] as const;

/** The signal's limits from an `envelope.csv` table; `signal` may be left out when there is one. */
export function envelopeTrace(table: NumberTable, signal: string | undefined): { signal: string; limits: EnvelopeTrace } {
  const signals = [...new Set(table.names.filter((n) => n.endsWith('.nominal')).map((n) => n.slice(0, -'.nominal'.length)))];
  if (signals.length === 0) throw new InputError(`${table.file}: not an envelope file: no '<node>.nominal' column\n  pass the envelope.csv written by voltcast envelope as the second file`);
  if (signal === undefined && signals.length > 1) throw new InputError(`${table.file}: holds the signals ${signals.join(', ')}\n  choose one with --signal NAME`);
  const name = signal ?? signals[0];
  if (!signals.includes(name)) throw new InputError(`${table.file}: no signal '${name}'\n  the signals are ${signals.join(', ')}`);
  const time = column(table, 'time', '--signal');
  checkIncreasing(table, time, 'time');
  const [min, nominal, max] = limitSuffixes.map((suffix) => column(table, name + suffix, '--signal'));
  return { signal: name, limits: { time, min, nominal, max } };
}

/**
 * The captured trace: time from a column named `time` or `t` (any case, units in brackets
 * allowed: `Time (s)`), else the first column; values from `--column`, else the column named
 * like the signal, else the only other column.
 */
export function measuredTrace(table: NumberTable, wanted: string | undefined, signal: string): Trace {
  const timeIndex = Math.max(0, table.names.findIndex((n) => /^(time|t)\b/i.test(n)));
  const time = table.columns[timeIndex];
  checkIncreasing(table, time, `time (column '${table.names[timeIndex]}')`);
  if (wanted !== undefined) return { time, values: column(table, wanted, '--column') };
  if (table.names.includes(signal)) return { time, values: column(table, signal, '--column') };
  const others = table.names.filter((_, i) => i !== timeIndex);
  if (others.length !== 1) throw new InputError(`${table.file}: which column holds '${signal}'? the columns are ${table.names.join(', ')}\n  choose one with --column NAME`);
  return { time, values: column(table, others[0], '--column') };
}
