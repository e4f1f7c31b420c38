// `pnpm bench command`: the built `voltcast` command as a user starts it. Start-up against
// bare node, and a Monte Carlo envelope on one worker against two.
import { spawnSync } from 'node:child_process';
import { mkdtempSync, rmSync, writeFileSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { fileURLToPath } from 'node:url';

const bin = fileURLToPath(new URL('../packages/cli/bin/voltcast.mjs', import.meta.url));
const rcFilter = fileURLToPath(new URL('../fixtures/envelope-rc-filter.yaml', import.meta.url));

/** Wall seconds of `node args`, the best of `repeats`. */
function best(args: readonly string[], repeats: number): number {
  let seconds = Infinity;
  for (let r = 0; r < repeats; r++) {
    const start = performance.now();
    const run = spawnSync(process.execPath, args, { stdio: ['ignore', 'ignore', 'pipe'], encoding: 'utf8' });
    if (run.status !== 0) throw new Error(`node ${args.join(' ')} failed:\n${run.stderr}`);
    seconds = Math.min(seconds, (performance.now() - start) / 1000);
  }
  return seconds;
}

export function commandLineBench(target: (what: string, measured: string, goal: string, met: boolean) => void): void {
  const scratch = mkdtempSync(join(tmpdir(), 'voltcast-bench-'));
  try {
    const small = join(scratch, 'small.yaml');
    writeFileSync(small, 'circuit: bench-small\nparts:\n  V1: { voltage: 1, between: [a, gnd] }\n  R1: { resistor: 1k, between: [a, b] }\n  R2: { resistor: 1k, between: [b, gnd] }\n  C1: { capacitor: 1n, between: [b, gnd] }\nsimulate: { duration: 1m }\n');
    const bare = best(['-e', '0'], 7);
    const check = best([bin, 'check', small], 7);
    console.log(`  node -e 0: ${(bare * 1000).toFixed(0)} ms; voltcast check on a 4-part file: ${(check * 1000).toFixed(0)} ms (best of 7)`);
    target('voltcast check against bare node', `${(check / bare).toFixed(2)}×`, '≤ 2.5×', check / bare <= 2.5);
    const envelope = (workers: number) => best([bin, 'envelope', rcFilter, '--runs', '4000', '--workers', String(workers), '--out', join(scratch, `envelope-${workers}`), '--quiet', '--force'], 2);
    const one = envelope(1);
    const two = envelope(2);
    console.log(`  4,000 Monte Carlo runs of fixtures/envelope-rc-filter.yaml: ${one.toFixed(2)} s on 1 worker, ${two.toFixed(2)} s on 2 (best of 2, wall time)`);
    target('Monte Carlo, 2 workers against 1 (idle 2-core machine)', `${(one / two).toFixed(2)}×`, '≥ 1.7×', one / two >= 1.7);
  } finally {
    rmSync(scratch, { recursive: true, force: true });
  }
}
