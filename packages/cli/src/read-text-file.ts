import { readFileSync } from 'node:fs';
import { resolve } from 'node:path';
import { InputError } from './exit-codes.ts';

/**
 * The text of a file the user named. A file that cannot be read is bad input (exit 2): the
 * message says which file (`what`, e.g. "circuit file"), why in words, and where we looked.
 */
export function readTextFile(path: string, what: string): string {
  try {
    return readFileSync(path, 'utf8');
  } catch (error) {
    throw new InputError(`cannot read ${what} ${path}: ${reasonOf(error)} (looked for ${resolve(path)})`);
  }
}

/** Why a file could not be read, in words rather than an error code. */
export function reasonOf(error: unknown): string {
  const code = (error as NodeJS.ErrnoException).code;
  if (code === 'ENOENT') return 'no such file';
  if (code === 'EISDIR') return 'it is a folder, not a file';
  if (code === 'EACCES') return 'permission denied';
  return error instanceof Error ? error.message : String(error);
}
