import { randomBytes } from 'node:crypto';
import { accessSync, constants, mkdirSync, readdirSync, renameSync, rmSync, rmdirSync, writeFileSync } from 'node:fs';
import { basename, dirname, join, resolve } from 'node:path';
import { InputError } from '../exit-codes.ts';
import { reasonOf } from '../read-text-file.ts';
import { takeCommitLock } from './commit-lock.ts';
import { inspectFolder, replaceableWhole, type FolderState } from './folder-state.ts';
import { markerName, markerText, type Marker } from './marker.ts';
import { processAlive } from './process-alive.ts';

export interface OutputOptions {
  /** Write into a folder that holds files voltcast did not write, beside those files. */
  readonly force?: boolean;
}

/**
 * Run `write` against a fresh staging folder, then move what it wrote into `dir`; returns what
 * `write` returned. voltcast never deletes a file it did not write:
 * - `dir` is checked before `write` runs: a folder that holds files voltcast did not write and
 *   has no marker (see marker.ts) is refused (exit 2) unless `force` is given.
 * - A folder voltcast created and that holds only its files is replaced whole: the staging
 *   folder is its sibling and is renamed into place.
 * - Any other folder (one that existed before, or where other files have appeared) keeps every
 *   file the marker does not list; voltcast's listed files are swapped for the new ones.
 * - Committing holds a lock beside the folder, so two runs into one folder each put a complete
 *   run in place, the later one last. Each staging folder carries its process id and only
 *   those of processes that have ended are swept away.
 * - If `write` or the commit fails, the staging folder and any parent folders created for it
 *   are removed: a failed run never leaves files that look like a finished run.
 */
export async function writeOutputDir<T>(dir: string, options: OutputOptions, write: (staging: string) => T | Promise<T>): Promise<T> {
  const target = resolve(dir);
  const parent = dirname(target);
  let createdParent: string | undefined;
  let staging: string | undefined;
  try {
    const before = inspectFolder(dir, target, options.force === true);
    createdParent = mkdirSync(parent, { recursive: true });
    // Beside the folder when it may be replaced whole (the rename needs the same parent), else inside it.
    const home = before.kind === 'absent' || replaceableWhole(before, target) ? parent : target;
    const prefix = home === parent ? `.${basename(target)}.voltcast-partial-` : '.voltcast-partial-';
    sweepInterrupted(home);
    staging = join(home, `${prefix}${process.pid}-${randomBytes(4).toString('hex')}`);
    mkdirSync(staging);
    const value = await write(staging);
    await commit(dir, target, staging, options.force === true);
    return value;
  } catch (error) {
    if (staging !== undefined) rmSync(staging, { recursive: true, force: true });
    if (createdParent !== undefined) removeEmptyFolders(parent, createdParent);
    throw isSystemError(error) ? new InputError(`voltcast: cannot write the output folder ${dir}: ${reasonOf(error)} (${error.path ?? dir})\n  give --out a folder you can write to, such as out/results`) : error;
  }
}

/** Put the staged files in place, under the folder's lock; the state is looked at again there. */
async function commit(dir: string, target: string, staging: string, force: boolean): Promise<void> {
  const release = await takeCommitLock(lockPath(target), dir);
  let previous: { folder: string; marker: Marker } | undefined;
  try {
    const now = inspectFolder(dir, target, force);
    const files = readdirSync(staging);
    if (now.kind === 'absent') {
      writeFileSync(join(staging, markerName), markerText({ folder: 'own', files }));
      renameSync(staging, target);
    } else if (dirname(staging) === dirname(target) && replaceableWhole(now, target)) {
      writeFileSync(join(staging, markerName), markerText({ folder: 'own', files }));
      // rename(2) cannot replace a folder that is not empty: set the old one aside first.
      previous = { folder: `${staging}.previous`, marker: now.marker! };
      renameSync(target, previous.folder);
      try {
        renameSync(staging, target);
      } catch (error) {
        renameSync(previous.folder, target);
        previous = undefined;
        throw error;
      }
    } else {
      swapListedFiles(dir, target, staging, now, files);
      rmSync(staging, { recursive: true, force: true });
    }
  } finally {
    release();
  }
  if (previous !== undefined) removeListed(previous.folder, previous.marker);
}

/**
 * In a folder that holds other files: move voltcast's earlier files aside into the staging
 * folder, the new ones in, then the new marker; undo every move if one fails. A new file
 * whose name is taken by a file voltcast did not write is refused, never overwritten.
 */
function swapListedFiles(dir: string, target: string, staging: string, now: Extract<FolderState, { kind: 'present' }>, files: readonly string[]): void {
  const earlier = now.marker?.files.filter((name) => now.files.includes(name)) ?? [];
  const taken = [...files, markerName].filter((name) => now.entries.includes(name) && !earlier.includes(name));
  if (taken.length > 0) {
    throw new InputError(`voltcast: ${dir} already holds ${taken.join(', ')}, which voltcast did not write; nothing was written there\n  move or rename ${taken.length === 1 ? 'that file' : 'those files'}, or give --out another folder`);
  }
  const replaced = join(staging, '.replaced');
  mkdirSync(replaced);
  writeFileSync(join(replaced, markerName), markerText({ folder: now.marker?.folder ?? 'shared', files }));
  const moves: [from: string, to: string][] = [
    ...earlier.map((name): [string, string] => [join(target, name), join(replaced, name)]),
    ...files.map((name): [string, string] => [join(staging, name), join(target, name)]),
    [join(replaced, markerName), join(target, markerName)],
  ];
  const done: [string, string][] = [];
  try {
    for (const move of moves) {
      renameSync(...move);
      done.push(move);
    }
  } catch (error) {
    for (const [from, to] of done.reverse()) renameSync(to, from);
    throw error;
  }
}

/** Delete the files a marker lists, the marker, then the folder if nothing else is left. */
function removeListed(folder: string, marker: Marker): void {
  for (const name of [...marker.files, markerName]) rmSync(join(folder, name), { force: true });
  try {
    rmdirSync(folder);
  } catch {
    console.error(`voltcast: warning: kept ${folder}: it holds files voltcast did not write`);
  }
}

/** A staging folder's name, for any output folder: `.NAME.voltcast-partial-PID-XXXXXXXX` or `.voltcast-partial-PID-XXXXXXXX`. */
const STAGING_NAME = /^\.(?:.+\.)?voltcast-partial-(\d+)-[0-9a-f]{8}$/;

/**
 * The staging folders in `home` of voltcast processes that have ended (interrupted runs, for
 * this output folder or a sibling); those of live processes stay.
 */
function sweepInterrupted(home: string): void {
  for (const name of readdirSync(home)) {
    const pid = STAGING_NAME.exec(name)?.[1];
    if (pid !== undefined && !processAlive(Number(pid))) rmSync(join(home, name), { recursive: true, force: true });
  }
}

/** Beside the folder when its parent is writable (the folder may not exist yet), else inside it. */
function lockPath(target: string): string {
  try {
    accessSync(dirname(target), constants.W_OK);
    return join(dirname(target), `.${basename(target)}.voltcast-lock`);
  } catch {
    return join(target, '.voltcast-lock');
  }
}

/** Remove `folder` and its parents up to and including `top`, while they are empty. */
function removeEmptyFolders(folder: string, top: string): void {
  for (let current = folder; current.startsWith(top); current = dirname(current)) {
    try {
      rmdirSync(current);
    } catch {
      return; // not empty (something else lives there): keep it
    }
    if (current === top) return;
  }
}

function isSystemError(error: unknown): error is NodeJS.ErrnoException {
  return error instanceof Error && typeof (error as NodeJS.ErrnoException).syscall === 'string';
}
