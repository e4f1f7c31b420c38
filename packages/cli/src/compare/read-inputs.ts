import type { EnvelopeTrace, Trace } from '@voltcast/core';
import { InputError } from '../exit-codes.ts';
import { checkIncreasing, column, type NumberTable } from './read-table.ts';

const limitSuffixes = ['.min', '.nominal', '.max'] as const;

/** The probe's limits from an `envelope.csv` table; `probe` may be left out when there is one. */
export function envelopeTrace(table: NumberTable, probe: string | undefined): { probe: string; limits: EnvelopeTrace } {
  const probes = [...new Set(table.names.filter((n) => n.endsWith('.nominal')).map((n) => n.slice(0, -'.nominal'.length)))];
  if (probes.length === 0) throw new InputError(`${table.file}: not an envelope file: no '<probe>.nominal' column\n  pass the envelope.csv written by voltcast envelope as the second file`);
  if (probe === undefined && probes.length > 1) throw new InputError(`${table.file}: holds the probes ${probes.join(', ')}\n  choose one with --probe NAME`);
  const name = probe ?? probes[0];
  if (!probes.includes(name)) throw new InputError(`${table.file}: no probe '${name}'\n  the probes are ${probes.join(', ')}`);
  const time = column(table, 'time', '--probe');
  checkIncreasing(table, time, 'time');
  const [min, nominal, max] = limitSuffixes.map((suffix) => column(table, name + suffix, '--probe'));
  return { probe: name, limits: { time, min, nominal, max } };
}

/**
 * The captured trace: time from a column named `time` or `t` (any case, units in brackets
 * allowed: `Time (s)`), else the first column; values from `--column`, else the column named
 * like the probe, else the only other column.
 */
export function measuredTrace(table: NumberTable, wanted: string | undefined, probe: string): Trace {
  const timeIndex = Math.max(0, table.names.findIndex((n) => /^(time|t)\b/i.test(n)));
  const time = table.columns[timeIndex];
  checkIncreasing(table, time, `time (column '${table.names[timeIndex]}')`);
  if (wanted !== undefined) return { time, values: column(table, wanted, '--column') };
  if (table.names.includes(probe)) return { time, values: column(table, probe, '--column') };
  const others = table.names.filter((_, i) => i !== timeIndex);
  if (others.length !== 1) throw new InputError(`${table.file}: which column holds '${probe}'? the columns are ${table.names.join(', ')}\n  choose one with --column NAME`);
  return { time, values: column(table, others[0], '--column') };
}
