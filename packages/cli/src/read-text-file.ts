import { readFileSync, statSync } from 'node:fs';
import { resolve } from 'node:path';
import { InputError } from './exit-codes.ts';

/**
 * The text of a file the user named. A file that cannot be read is bad input (exit 2): the
 * message says which file (`what`, e.g. "circuit file"), why in words, and where we looked.
 */
export function readTextFile(path: string, what: string, mostBytes = Infinity): string {
  try {
    return readTextWithin(path, mostBytes);
  } catch (error) {
    if (error instanceof FileTooLarge) {
      throw new InputError(`${what} ${path} is ${megabytes(error.size)}, more than the ${megabytes(error.most)} voltcast reads as a ${what}\n  check that this is the file you meant`);
    }
    throw new InputError(`cannot read ${what} ${path}: ${reasonOf(error)} (looked for ${resolve(path)})`);
  }
}

/** A file larger than voltcast reads for its purpose: refused before it is read. */
class FileTooLarge extends Error {
  constructor(
    readonly size: number,
    readonly most: number,
  ) {
    super(`it is ${megabytes(size)}, more than the ${megabytes(most)} voltcast reads`);
  }
}

/** The text of `path`, refusing one larger than `mostBytes` (a `FileTooLarge`) before reading it. */
export function readTextWithin(path: string, mostBytes: number): string {
  const size = statSync(path).size;
  if (size > mostBytes) throw new FileTooLarge(size, mostBytes);
  return readFileSync(path, 'utf8');
}

function megabytes(bytes: number): string {
  return `${Number((bytes / 1e6).toPrecision(3))} MB`;
}

const reasons: Readonly<Record<string, string>> = {
  ENOENT: 'no such file',
  EISDIR: 'it is a folder, not a file',
  ENOTDIR: 'a part of the path is a file, not a folder',
  EEXIST: 'a file of that name is in the way',
  EACCES: 'permission denied',
  EPERM: 'permission denied',
  EROFS: 'the file system is read-only',
  ENOSPC: 'the disk is full',
};

/** Why a file could not be read or written, in words rather than an error code. */
export function reasonOf(error: unknown): string {
  const reason = reasons[(error as NodeJS.ErrnoException).code ?? ''];
  return reason ?? (error instanceof Error ? error.message : String(error));
}
