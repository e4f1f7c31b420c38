import { parse } from 'csv-parse/sync';
import { InputError } from '../exit-codes.ts';
import { readTextFile } from '../read-text-file.ts';
import { detectSeparator, separatorName, type Separator } from './separator.ts';
import { numberIn, splitHeader, type ColumnKind } from './column-units.ts';

/** A CSV file of numbers with named columns, as read for `voltcast compare`. */
export interface CsvTable {
  readonly file: string;
  readonly separator: Separator;
  /** Column names without their units: `CH1 (mV)` is `CH1`. */
  readonly names: readonly string[];
  /** Each column's unit from the header or the units row; '' when none is given. */
  readonly units: readonly string[];
  /** The data rows as text, each with the line it starts on. */
  readonly rows: readonly { readonly fields: readonly string[]; readonly line: number }[];
}

/**
 * Read a CSV of numbers. The separator (comma, semicolon or tab) is found from the first
 * lines. The first row is a header when any of its fields is not a number (else columns are
 * named `column 1`, ...); a header may carry units in brackets (`time (ms)`, `CH1 [mV]`), and
 * a second row of words is a units row (`ms,mV`), as oscilloscopes and data loggers write.
 * `#` starts a comment line. Numbers are read by `column`, once the unit's meaning is known.
 */
export function readCsvTable(file: string): CsvTable {
  const text = readTextFile(file, 'CSV file');
  const separator = detectSeparator(text);
  let records: { record: string[]; info: { lines: number } }[];
  try {
    records = parse(text, { delimiter: separator, comment: '#', skip_empty_lines: true, trim: true, relax_column_count: true, info: true, bom: true }) as unknown as typeof records;
  } catch (error) {
    throw new InputError(`${file}: not a readable CSV: ${(error as Error).message}`);
  }
  if (records.length === 0) throw new InputError(`${file}: the file has no rows`);
  const isNumber = (field: string) => field !== '' && Number.isFinite(Number(field));
  const first = records[0].record;
  const hasHeader = !first.every(isNumber);
  const headers = hasHeader ? first.map(splitHeader) : first.map((_, i) => ({ name: `column ${i + 1}`, unit: '' }));
  let start = hasHeader ? 1 : 0;
  const units = headers.map((h) => h.unit);
  if (hasHeader && records.length > start && records[start].record.every(looksLikeUnit)) {
    // A units row: `ms`, or `(ms)` as some instruments write; an empty field keeps the header's unit.
    records[start].record.forEach((field, i) => {
      const unit = field.replace(/^[([]\s*|\s*[)\]]$/g, '');
      if (i < units.length && unit !== '') units[i] = unit;
    });
    start++;
  }
  const rows = records.slice(start).map(({ record, info }) => ({ fields: record, line: info.lines }));
  if (rows.length === 0) throw new InputError(`${file}: the file has a header but no data rows`);
  return { file, separator, names: headers.map((h) => h.name), units, rows };
}

/**
 * Column `index` as numbers in SI base units (seconds, volts) or codes, its unit applied. A
 * unit that is not one of `kind`, or a field that is not a number, is an error naming the
 * file, line and column.
 */
export function column(table: CsvTable, index: number, kind: ColumnKind): Float64Array {
  const { file, names, units, rows } = table;
  const values = new Float64Array(rows.length);
  const read = numberIn(units[index], kind, `${file}: column '${names[index]}'`);
  rows.forEach(({ fields, line }, r) => {
    if (fields.length < names.length) throw new InputError(`${file}: line ${line} has ${fields.length} fields, the header ${names.length}\n  every row needs a value for every column${separatorHint(table)}`);
    const value = read(fields[index]);
    if (value === undefined) throw new InputError(`${file}: line ${line}, column '${names[index]}': '${fields[index]}' is not a number\n  ${fieldHint(table, fields[index])}`);
    values[r] = value;
  });
  return values;
}

/** The index of the column called `name` (with or without its unit), or an error listing the columns. */
export function columnIndex(table: CsvTable, name: string, option: string): number {
  const index = table.names.indexOf(name);
  if (index < 0) throw new InputError(`${table.file}: no column '${name}'\n  the columns are ${table.names.join(', ')}; choose one with ${option}`);
  return index;
}

/** Check times increase strictly (captures and envelopes are both in time order). */
export function checkIncreasing(table: CsvTable, time: Float64Array, what: string): void {
  for (let i = 1; i < time.length; i++) {
    if (!(time[i] > time[i - 1])) throw new InputError(`${table.file}: ${what} does not increase at line ${table.rows[i].line} (${time[i - 1]} then ${time[i]})\n  sort the rows by time and remove repeated instants`);
  }
}

/** A field of a units row: letters and symbols such as `ms`, `(mV)`, `µs`, `V/V`, or empty; never digits. */
function looksLikeUnit(field: string): boolean {
  return /^[\p{L}µΩ°%/()[\]\s]*$/u.test(field);
}

function separatorHint(table: CsvTable): string {
  return table.names.length === 1 ? `; the file was read as one column separated by ${separatorName[table.separator]}` : '';
}

function fieldHint(table: CsvTable, field: string): string {
  if (table.separator !== ',' && /^[+-]?\d+,\d+$/.test(field)) return `the file is separated by ${separatorName[table.separator]} and writes a decimal comma; export it with a decimal point, or replace ',' by '.'`;
  const read = `the file was read as separated by ${separatorName[table.separator]}`;
  return `write plain numbers such as 0.0015 (${read}); give units in the header, such as 'time (ms)', or in a units row`;
}
