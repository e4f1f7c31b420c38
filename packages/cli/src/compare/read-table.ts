import { parse } from 'csv-parse/sync';
import { InputError } from '../exit-codes.ts';
import { readTextFile } from '../read-text-file.ts';

/** A CSV file of numbers with named columns, as read for `voltcast compare`. */
export interface NumberTable {
  readonly file: string;
  readonly names: readonly string[];
  /** Column by index, same length each. */
  readonly columns: readonly Float64Array[];
}

/**
 * Read a CSV of numbers. The first row is a header when any of its fields is not a number
 * (else columns are named `column 1`, ...); a second row of words (units, as oscilloscopes
 * and data loggers write: `s,V`) is skipped. `#` starts a comment line. A field that is not a
 * number is an error naming the file, line and column.
 */
export function readNumberTable(file: string): NumberTable {
  const text = readTextFile(file, 'CSV file');
  let rows: string[][];
  try {
    rows = parse(text, { comment: '#', skip_empty_lines: true, trim: true, relax_column_count: true, info: false, bom: true });
  } catch (error) {
    throw new InputError(`${file}: not a readable CSV: ${(error as Error).message}`);
  }
  if (rows.length === 0) throw new InputError(`${file}: the file has no rows`);
  const isNumber = (field: string) => field !== '' && Number.isFinite(Number(field));
  const hasHeader = !rows[0].every(isNumber);
  const names = hasHeader ? rows[0] : rows[0].map((_, i) => `column ${i + 1}`);
  let first = hasHeader ? 1 : 0;
  if (hasHeader && rows.length > first && !rows[first].some(isNumber)) first++; // a unit row
  const data = rows.slice(first);
  if (data.length === 0) throw new InputError(`${file}: the file has a header but no data rows`);
  const columns = names.map(() => new Float64Array(data.length));
  data.forEach((row, r) => {
    if (row.length < names.length) throw new InputError(`${file}: row ${r + first + 1} has ${row.length} fields, the header ${names.length}\n  every row needs a value for every column`);
    names.forEach((name, c) => {
      const value = Number(row[c]);
      if (row[c] === '' || !Number.isFinite(value)) throw new InputError(`${file}: row ${r + first + 1}, column '${name}': '${row[c]}' is not a number\n  write plain numbers in SI base units (seconds, volts), e.g. 0.0015`);
      columns[c][r] = value;
    });
  });
  return { file, names, columns };
}

/** The column called `name`, or an error listing the columns there are. */
export function column(table: NumberTable, name: string, option: string): Float64Array {
  const index = table.names.indexOf(name);
  if (index < 0) throw new InputError(`${table.file}: no column '${name}'\n  the columns are ${table.names.join(', ')}; choose one with ${option}`);
  return table.columns[index];
}

/** Check times increase strictly (captures and envelopes are both in time order). */
export function checkIncreasing(table: NumberTable, time: Float64Array, what: string): void {
  for (let i = 1; i < time.length; i++) {
    if (!(time[i] > time[i - 1])) throw new InputError(`${table.file}: ${what} does not increase at data row ${i + 1} (${time[i - 1]} then ${time[i]})\n  sort the rows by time and remove repeated instants`);
  }
}
