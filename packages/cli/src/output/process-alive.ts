/**
 * Whether a process with this id runs on this machine. Signal 0 checks without sending
 * anything; EPERM means it runs under another user. Used to tell the leftovers of an
 * interrupted voltcast (safe to remove) from those of one still at work (never touched).
 */
export function processAlive(pid: number): boolean {
  if (pid === process.pid) return true;
  try {
    process.kill(pid, 0);
    return true;
  } catch (error) {
    return (error as NodeJS.ErrnoException).code === 'EPERM';
  }
}
