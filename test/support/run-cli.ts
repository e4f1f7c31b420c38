import { spawn } from 'node:child_process';
import { createRequire } from 'node:module';
import { fileURLToPath, pathToFileURL } from 'node:url';

export const repoRoot = fileURLToPath(new URL('../..', import.meta.url));

/** tsx's loader by absolute URL, so the CLI can be started from any working folder. */
const tsxLoader = pathToFileURL(createRequire(import.meta.url).resolve('tsx')).href;

export interface CliOutcome {
  readonly code: number | null;
  readonly stdout: string;
  readonly stderr: string;
}

/** Run the voltcast CLI as a user would (a separate Node process, from the repo root). */
export function runCli(args: readonly string[], cwd = repoRoot): Promise<CliOutcome> {
  return new Promise((resolve, reject) => {
    const child = spawn(process.execPath, ['--import', tsxLoader, `${repoRoot}packages/cli/src/main.ts`, ...args], {
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
    const child = spawn(process.execPath, ['--import', tsxLoader, `${repoRoot}packages/cli/src/main.ts`, ...args], { cwd, stdio: ['ignore', 'ignore', 'pipe'] });
    let stderr = '';
    child.stderr.setEncoding('utf8').on('data', (chunk: string) => {
      stderr += chunk;
      if (until.test(stderr)) child.kill('SIGTERM');
    });
    child.on('error', reject);
    child.on('close', () => (until.test(stderr) ? resolve(stderr) : reject(new Error(`the CLI ended without printing ${until}:\n${stderr}`))));
  });
}
