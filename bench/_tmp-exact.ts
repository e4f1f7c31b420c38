import { readFileSync } from 'node:fs';
import { parseCircuit, simulate } from '../packages/core/src/index.ts';
const files = process.argv.slice(2);
for (const f of files) {
  const c = parseCircuit(readFileSync(f, 'utf8'), { fileName: f });
  for (const exact of [true, false, true, false, true, false]) {
    for (let i = 0; i < 5; i++) simulate(c, { exactSteps: exact });
    const u0 = process.cpuUsage();
    const reps = 200;
    let r;
    for (let i = 0; i < reps; i++) r = simulate(c, { exactSteps: exact });
    const u = process.cpuUsage(u0);
    console.log(f.padEnd(45), exact ? 'exact' : 'trap ', ((u.user + u.system) / 1000 / reps).toFixed(2), 'ms cpu', r!.stats.acceptedSteps, 'steps', (r!.stats as any).exactSteps ?? '');
  }
}
