import type { ValueReader } from '../reading/reader.ts';
import type { Quantity } from '../units/quantity.ts';
import { quantities } from '../units/quantity.ts';
import { parseQuantity } from '../units/si.ts';
import type { Wave, WaveKind } from './wave.ts';
import { checkTimes, pointsWave, readPeriod } from './points.ts';

/** Reporting stops after this many problems in one CSV file; the rest are likely the same. */
const maxReportedRows = 10;

/** Rows of a `time,value` CSV: an optional header row, `#` comments, SI-prefixed numbers. */
interface CsvPoints {
  readonly times: number[];
  readonly values: number[];
  /** 1-based CSV line of each point. */
  readonly lines: number[];
}

/**
 * Parse the CSV text. `report(line, message, hint)` names the CSV line of each problem;
 * bad rows are skipped.
 */
export function parseCsvPoints(text: string, quantity: Quantity, report: (line: number, message: string, hint?: string) => void): CsvPoints {
  const points: CsvPoints = { times: [], values: [], lines: [] };
  const rows = text.split(/\r?\n/);
  let headerAllowed = true;
  for (let i = 0; i < rows.length; i++) {
    const line = i + 1;
    const row = rows[i].replace(/#.*/, '').trim();
    if (row === '') continue;
    const fields = row.split(',').map((field) => field.trim());
    const time = parseQuantity(fields[0], quantities.time);
    const value = parseQuantity(fields[1] ?? '', quantity);
    // A first row of words (`time,volts`) is a header; a row with one bad number is an error.
    const isHeader = headerAllowed && 'error' in time && 'error' in value;
    headerAllowed = false;
    if (isHeader) continue;
    if (fields.length !== 2) {
      report(line, `expected two columns, time,value, found ${fields.length}`, 'write one point per line, e.g. 1m,2.5');
      continue;
    }
    if ('error' in time || 'error' in value) {
      const bad = 'error' in time ? time : (value as { error: string; hint: string });
      report(line, bad.error, bad.hint);
      continue;
    }
    points.times.push(time.value);
    points.values.push(value.value);
    points.lines.push(line);
  }
  return points;
}

/** `file: input.csv`: points read from a CSV file next to the circuit file; optional `every`. */
export const file: WaveKind = {
  key: 'file',
  summary: 'points from a CSV file of time,value rows next to the circuit file; optional `every: period`',
  read(main: ValueReader, options, context, quantity): Wave {
    const fallback = pointsWave([], [], Infinity);
    const path = main.text();
    if (path === '') {
      if (main.kind() === 'scalar') main.fail('the file name is empty', 'write file: name.csv, relative to the circuit file');
      return fallback;
    }
    if (context.readFile === undefined) {
      main.fail('file waves need a host that can read files', 'pass a readFile function when reading the circuit (the command line does), or write the points into the circuit with points:');
      return fallback;
    }
    let text: string;
    try {
      text = context.readFile(path);
    } catch (error) {
      main.fail(`cannot read '${path}': ${error instanceof Error ? error.message : String(error)}`, 'the path is relative to the circuit file');
      return fallback;
    }
    let problems = 0;
    const report = (line: number, message: string, hint?: string) => {
      problems += 1;
      if (problems <= maxReportedRows) main.fail(`${path} line ${line}: ${message}`, hint);
      else if (problems === maxReportedRows + 1) main.fail(`${path}: more problems after line ${line} are not listed`);
    };
    const csv = parseCsvPoints(text, quantity, report);
    if (csv.times.length === 0 && problems === 0) main.fail(`${path} has no data rows`, 'write one time,value point per line, e.g. 0,0');
    checkTimes(csv.times, (i, message, hint) => report(csv.lines[i], message, hint));
    const period = readPeriod(options, csv.times.length > 0 ? csv.times[csv.times.length - 1] : 0);
    return pointsWave(csv.times, csv.values, period);
  },
};
