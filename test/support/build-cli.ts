import { execFileSync } from 'node:child_process';
import { fileURLToPath } from 'node:url';

/**
 * Vitest global setup: build the `voltcast` command once before any test, so that the tests
 * that start it run today's sources as plain JavaScript, never a stale build.
 */
export default function setup(): void {
  execFileSync(process.execPath, [fileURLToPath(new URL('../../packages/cli/build.mjs', import.meta.url))], { stdio: 'inherit' });
}
