import { randomBytes } from 'node:crypto';
import { existsSync, mkdirSync, readdirSync, renameSync, rmSync, rmdirSync } from 'node:fs';
import { basename, dirname, join, resolve } from 'node:path';

/**
 * Run `write` against a fresh staging folder, then put the folder in place as `finalDir`.
 *
 * Outputs are written into a hidden sibling (`.NAME.partial-XXXXXX`) so the final rename stays
 * on one file system and is atomic. `finalDir` from an earlier run is replaced only once the
 * new one is complete; if `write` throws, the staging folder is removed, along with any parent
 * folders created for it, so a failed run never leaves files that look like a finished run.
 * Returns what `write` returned.
 *
 * No signal handler: the simulation runs synchronously, so a JavaScript handler would only run
 * after it ends and Ctrl-C would seem dead. An interrupted run leaves just its hidden
 * `.partial-` folder, which the next run into the same folder sweeps away.
 */
export function writeOutputDir<T>(finalDir: string, write: (stagingDir: string) => T): T {
  const target = resolve(finalDir);
  const parent = dirname(target);
  // mkdirSync reports the first folder it had to create; remove from there on failure.
  const createdParent = mkdirSync(parent, { recursive: true });
  const prefix = `.${basename(target)}.partial-`;
  removeInterruptedRuns(parent, prefix);
  // Not mkdtemp: its folders are private (mode 0700); outputs get the user's usual mode.
  const staging = join(parent, prefix + randomBytes(6).toString('hex'));
  mkdirSync(staging);
  try {
    const value = write(staging);
    putInPlace(staging, target);
    return value;
  } catch (error) {
    rmSync(staging, { recursive: true, force: true });
    if (createdParent !== undefined) removeEmptyFolders(parent, createdParent);
    throw error;
  }
}

function removeInterruptedRuns(parent: string, prefix: string): void {
  for (const name of readdirSync(parent)) {
    if (name.startsWith(prefix)) rmSync(join(parent, name), { recursive: true, force: true });
  }
}

/** Swap the staging folder in; the previous run's folder is set aside first, then deleted. */
function putInPlace(staging: string, target: string): void {
  if (!existsSync(target)) {
    renameSync(staging, target);
    return;
  }
  const previous = `${staging}.previous`;
  renameSync(target, previous);
  try {
    renameSync(staging, target);
  } catch (error) {
    renameSync(previous, target);
    throw error;
  }
  rmSync(previous, { recursive: true, force: true });
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
