import { dirname, join } from 'node:path';
import { readCircuit, formatIssue, type Circuit } from '@voltcast/core';
import { InputError } from './exit-codes.ts';
import { readTextFile, readTextWithin, reasonOf } from './read-text-file.ts';

/** A circuit file is typed by people: past this it is the wrong file (reading it would take minutes and gigabytes). */
const CIRCUIT_MOST_BYTES = 10e6;
/** A file wave's points: a long capture fits; past this the memory for its points runs out. */
const WAVE_MOST_BYTES = 200e6;

/** A circuit read from disk, with the warnings the reader found (already formatted). */
export interface CircuitFile {
  readonly circuit: Circuit;
  /** The path as the user wrote it; messages use it so editors can jump to the place. */
  readonly fileName: string;
  readonly warnings: readonly string[];
}

/**
 * Read and validate a circuit file. Files it names (file waves) are resolved relative to the
 * circuit file's folder, so a circuit and its data move together. Any error becomes an
 * `InputError` (exit 2) listing every issue as `file:line:column: ...` with its hint, warnings
 * included, so one run shows everything to fix.
 */
export function readCircuitFile(fileName: string): CircuitFile {
  const text = readTextFile(fileName, 'circuit file', CIRCUIT_MOST_BYTES);
  const folder = dirname(fileName);
  const { circuit, issues } = readCircuit(text, {
    fileName,
    // The reader reports a failure at the file name's line and column; say where we looked.
    readFile: (relativePath: string) => {
      const path = join(folder, relativePath);
      try {
        return readTextWithin(path, WAVE_MOST_BYTES);
      } catch (error) {
        throw new Error(`${reasonOf(error)} (looked for ${path})`);
      }
    },
  });
  const formatted = issues.map((issue) => formatIssue(issue, fileName));
  const errorCount = issues.filter((issue) => issue.severity === 'error').length;
  if (circuit === undefined || errorCount > 0) {
    const count = errorCount === 1 ? '1 error' : `${errorCount} errors`;
    throw new InputError(`${formatted.join('\n')}\n${fileName}: ${count}, nothing simulated`);
  }
  return {
    circuit,
    fileName,
    warnings: issues.filter((issue) => issue.severity === 'warning').map((issue) => formatIssue(issue, fileName)),
  };
}
