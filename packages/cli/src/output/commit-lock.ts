import { randomBytes } from 'node:crypto';
import { linkSync, readFileSync, rmSync, writeFileSync } from 'node:fs';
import { setTimeout as sleep } from 'node:timers/promises';
import { InputError } from '../exit-codes.ts';
import { processAlive } from './process-alive.ts';

/** A commit takes milliseconds; a lock held this long belongs to a voltcast that hangs. */
const patienceMs = 60_000;
const pollMs = 25;

/**
 * Take the lock file `path` (waiting while another live voltcast holds it) and return the
 * function that gives it back. The lock is a hard link to a file that already holds our
 * process id, made in one step: a lock file never exists without its owner's id, so one left
 * by a process that has died is recognised and taken over.
 */
export async function takeCommitLock(path: string, folder: string): Promise<() => void> {
  const ticket = `${path}-${process.pid}-${randomBytes(4).toString('hex')}`;
  writeFileSync(ticket, `${process.pid}\n`);
  const giveUpAt = performance.now() + patienceMs;
  try {
    for (;;) {
      try {
        linkSync(ticket, path);
        return () => rmSync(path, { force: true });
      } catch (error) {
        if ((error as NodeJS.ErrnoException).code !== 'EEXIST') throw error;
      }
      const holder = holderOf(path);
      if (holder !== undefined && !processAlive(holder)) {
        rmSync(path, { force: true }); // left by an interrupted voltcast
        continue;
      }
      if (performance.now() > giveUpAt) {
        throw new InputError(`voltcast: ${folder} is locked by another voltcast (process ${holder ?? 'unknown'}) that has not finished writing it\n  wait for it, or give --out another folder; if no voltcast is running, delete ${path}`);
      }
      await sleep(pollMs);
    }
  } finally {
    rmSync(ticket, { force: true });
  }
}

function holderOf(path: string): number | undefined {
  try {
    const pid = Number.parseInt(readFileSync(path, 'utf8'), 10);
    return Number.isInteger(pid) && pid > 0 ? pid : undefined;
  } catch {
    return undefined;
  }
}
