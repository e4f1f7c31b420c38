// A child of `pnpm bench streaming`: the ringing differentiator with `ROWS` output rows and no
// kept columns, as `voltcast run` does it, in a process of its own so that its peak memory is
// its own. With `--share` it instead times the run against the simulation without analyses in
// processor time (steadier than wall time on a shared machine): once each to warm up, then
// alternating, the best of three each. Prints one line of JSON.
import { parseCircuit, runCircuit, simulate, type CircuitRun } from '@voltcast/core';
import { differentiatorTriangle } from './cases.ts';

const rows = Number(process.argv[2]);
const share = process.argv.includes('--share');
const circuit = parseCircuit(differentiatorTriangle(rows), { fileName: 'bench.yaml' });
const ignore = (): void => {};

function timed<T>(work: () => T): { seconds: number; cpuSeconds: number; value: T } {
  const start = performance.now();
  const cpu = process.cpuUsage();
  const value = work();
  const used = process.cpuUsage(cpu);
  return { seconds: (performance.now() - start) / 1000, cpuSeconds: (used.user + used.system) / 1e6, value };
}
const full = (): CircuitRun => runCircuit(circuit, { keepColumns: false, onRow: ignore });
const bare = (): unknown => simulate(circuit, { keepColumns: false, onRow: ignore });

let run = timed(full);
let bareCpuSeconds: number | undefined;
if (share) {
  timed(bare);
  bareCpuSeconds = Infinity;
  run = { ...run, cpuSeconds: Infinity };
  for (let r = 0; r < 3; r++) {
    bareCpuSeconds = Math.min(bareCpuSeconds, timed(bare).cpuSeconds);
    const again = timed(full);
    if (again.cpuSeconds < run.cpuSeconds) run = again;
  }
}
console.log(JSON.stringify({
  rows,
  runSeconds: run.seconds,
  runCpuSeconds: run.cpuSeconds,
  bareCpuSeconds,
  wallTime: run.value.wallTime,
  maxRss: process.resourceUsage().maxRSS * 1024,
  ringing: run.value.findings.ringing.length,
  events: run.value.findings.stats.events,
}));
