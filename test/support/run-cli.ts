import { spawn } from 'node:child_process';
import { fileURLToPath } from 'node:url';

export const repoRoot = fileURLToPath(new URL('../..', import.meta.url));

/** The built command as a user starts it (plain node; test/support/build-cli.ts builds it before the tests). */
const bin = `${repoRoot}packages/cli/bin/voltcast.mjs`;

export interface CliOutcome {
  readonly code: number | null;
  readonly stdout: string;
  readonly stderr: string;
}

/** Run the voltcast CLI as a user would (a separate Node process, from the repo root). */
export function runCli(args: readonly string[], cwd = repoRoot): Promise<CliOutcome> {
  return new Promise((resolve, reject) => {
    const child = spawn(process.execPath, [bin, ...args], {
      cwd,
      stdio: ['ignore', 'pipe', 'pipe'],
    });
    let stdout = '';
    let stderr = '';
    child.stdout.setEncoding('utf8').on('data', (chunk: string) => (stdout += chunk));
    child.stderr.setEncoding('utf8').on('data', (chunk: string) => (stderr += chunk));
    child.on('error', reject);
    child.on('close', (code) => resolve({ code, stdout, stderr }));
  });
}

/**
 * Start the CLI, wait until its stderr matches `until`, then stop it (SIGTERM, this child
 * only); resolves with what it printed so far. For commands that would run for long.
 */
export function runCliUntil(args: readonly string[], until: RegExp, cwd = repoRoot): Promise<string> {
  return new Promise((resolve, reject) => {
    const child = spawn(process.execPath, [bin, ...args], { cwd, stdio: ['ignore', 'ignore', 'pipe'] });
    let stderr = '';
    child.stderr.setEncoding('utf8').on('data', (chunk: string) => {
      stderr += chunk;
      if (until.test(stderr)) child.kill('SIGTERM');
    });
    child.on('error', reject);
    child.on('close', () => (until.test(stderr) ? resolve(stderr) : reject(new Error(`the CLI ended without printing ${until}:\n${stderr}`))));
  });
}
