// `pnpm bench`: how fast the engine runs, printed with the targets of the work that set them
// (each target beside the ratio measured in this same run). Speed is shown here, never
// asserted by a timed test. `pnpm bench WORD` runs only the sections whose title contains WORD;
// `pnpm bench accuracy` prints error against references with the time (bench/accuracy.ts).
import { readFileSync } from 'node:fs';
import { frequencyResponse, noiseAnalysis, parseCircuit, simulate, type SimulateOptions } from '@voltcast/core';
import { spawnSync } from 'node:child_process';
import { fileURLToPath } from 'node:url';
import { differentiatorIntoRails, linearNetwork, rcLadder } from './cases.ts';
import { bareSolveLoop } from './bare-loop.ts';
import { accuracyBench } from './accuracy.ts';
import { commandLineBench } from './command-line.ts';
// An internal constant, printed beside the measurements that chose it.
import { SPARSE_FROM } from '../packages/core/src/transient/equations.ts';

interface Timed {
  seconds: number;
  steps: number;
  factorizations: number;
  newtonPerStep: number;
}

/** Simulate `text` (parsed first, not timed); the fastest of `repeats` runs. */
function run(text: string, matrix: SimulateOptions['matrix'] = 'auto', repeats = 1): Timed {
  const circuit = parseCircuit(text, { fileName: 'bench.yaml' });
  let best: Timed | undefined;
  for (let r = 0; r < repeats; r++) {
    const start = performance.now();
    const result = simulate(circuit, { keepColumns: false, matrix });
    const seconds = (performance.now() - start) / 1000;
    const s = result.stats;
    if (best === undefined || seconds < best.seconds) best = { seconds, steps: s.acceptedSteps, factorizations: s.factorizations, newtonPerStep: s.newtonIterations / s.acceptedSteps };
  }
  return best!;
}

function target(what: string, measured: string, goal: string, met: boolean): void {
  console.log(`  target: ${what}: ${measured} (target ${goal}) ${met ? 'met' : 'NOT MET'}`);
}

/** What `bench/streaming-run.ts` prints. */
interface StreamedRun {
  rows: number;
  runSeconds: number;
  runCpuSeconds: number;
  bareCpuSeconds?: number;
  wallTime: { simulation: number; analyses: number };
  maxRss: number;
  ringing: number;
  events: number;
}

/** One run of `bench/streaming-run.ts` in a child process (the same loader as this one). */
function streamedRun(rows: number, share: boolean): StreamedRun {
  const script = fileURLToPath(new URL('./streaming-run.ts', import.meta.url));
  const child = spawnSync(process.execPath, [...process.execArgv, script, String(rows), ...(share ? ['--share'] : [])], { encoding: 'utf8' });
  if (child.status !== 0) throw new Error(`bench/streaming-run.ts ${rows} failed: ${child.stderr}`);
  return JSON.parse(child.stdout.trim().split('\n').pop()!) as StreamedRun;
}

const perStep = (t: Timed) => (t.seconds / t.steps) * 1e3;
const mb = (bytes: number) => `${Math.round(bytes / 2 ** 20)} MB`;

const sections: { title: string; run(): void }[] = [
  // First, while the process has run no other circuit: later ones make the engine's calls
  // to devices polymorphic, which a program that runs one kind of circuit does not pay.
  {
    title: 'small circuit against a bare loop',
    run() {
      const steps = 1_000_000;
      const text = rcLadder(6, steps * 1e-8, 1e-8);
      // Alternate the two, best of three each: a busy machine slows both alike.
      let t = run(text);
      let bare = bareSolveLoop(8, steps);
      for (let r = 0; r < 2; r++) {
        const again = run(text);
        if (again.seconds < t.seconds) t = again;
        bare = Math.min(bare, bareSolveLoop(8, steps));
      }
      const ratio = (t.seconds / t.steps) / (bare / steps);
      console.log(`  6-section RC ladder, fixed steps: ${Math.round(t.steps / t.seconds).toLocaleString('en-US')} steps/s; bare loop (dense triangular solves and a right-hand side, 8 unknowns): ${Math.round(steps / bare).toLocaleString('en-US')} steps/s`);
      target('cost per step against the bare loop', `${ratio.toFixed(2)}×`, '≤ 3×', ratio <= 3);
    },
  },
  {
    title: 'steps per second',
    run() {
      const cases = [
        { name: 'linear network, 6 nodes, 1,000,000 fixed steps', text: linearNetwork(1_000_000, 1e-7) },
        ...[10, 100, 1000].map((n) => ({ name: `RC ladder, ${n} sections, 10,000 fixed steps`, text: rcLadder(n, 1e-3, 1e-7) })),
        { name: 'op-amp differentiator into its rails, 60 periods', text: differentiatorIntoRails(60) },
      ];
      console.log('  ' + 'case'.padEnd(52), 'steps'.padStart(10), 'steps/s'.padStart(12), 'seconds'.padStart(9), 'LU'.padStart(5), 'newton/step'.padStart(12));
      for (const c of cases) {
        const t = run(c.text);
        console.log(
          '  ' + c.name.padEnd(52),
          String(t.steps).padStart(10),
          Math.round(t.steps / t.seconds).toLocaleString('en-US').padStart(12),
          t.seconds.toFixed(2).padStart(9),
          String(t.factorizations).padStart(5),
          t.newtonPerStep.toFixed(2).padStart(12),
        );
      }
    },
  },
  {
    title: 'ladder: per-step cost against size (fixed steps)',
    run() {
      const costs = new Map<number, number>();
      // Warm the code up first, so that the smallest size does not pay for compilation.
      run(rcLadder(300, 200e-7, 1e-7));
      for (const [n, steps] of [[300, 4000], [1000, 2000], [3000, 1000], [10000, 400]] as const) {
        const start = performance.now();
        const text = rcLadder(n, steps * 1e-7, 1e-7);
        const t = run(text);
        const total = (performance.now() - start) / 1000;
        costs.set(n, perStep(t));
        console.log(`  ${String(n).padStart(6)} sections: ${perStep(t).toFixed(4)} ms per step (setup included) over ${t.steps} steps, ${t.factorizations} LU; ${total.toFixed(2)} s with writing, parsing and setup`);
        if (n === 10000) {
          const rss = process.resourceUsage().maxRSS * 1024;
          target('10,000 sections, 400 steps including setup', `${total.toFixed(2)} s`, '≤ 30 s', total <= 30);
          target('10,000 sections, peak memory of this process (maxRSS)', mb(rss), '≤ 1024 MB', rss <= 2 ** 30);
        }
      }
      const ratio = costs.get(3000)! / costs.get(300)!;
      target('per-step cost 3,000 / 300 sections', `${ratio.toFixed(1)}×`, '≤ 15×, linear is 10×', ratio <= 15);
    },
  },
  {
    title: 'matrix: dense against sparse by size (RC ladder, step control, 2 ms; best of 3)',
    run() {
      console.log(`  the automatic choice is sparse from ${SPARSE_FROM} unknowns on`);
      console.log('  ' + 'unknowns'.padStart(8), 'dense µs/step'.padStart(14), 'sparse µs/step'.padStart(15), 'sparse/dense'.padStart(13), 'LU'.padStart(6));
      for (const n of [4, 8, 12, 16, 22, 30, 62, 126]) {
        const text = rcLadder(n, 2e-3);
        const dense = run(text, 'dense', 3);
        const sparse = run(text, 'sparse', 3);
        console.log(
          '  ' + String(n + 2).padStart(8),
          ((perStep(dense) * 1e3).toFixed(2)).padStart(14),
          ((perStep(sparse) * 1e3).toFixed(2)).padStart(15),
          (perStep(sparse) / perStep(dense)).toFixed(2).padStart(13),
          String(sparse.factorizations).padStart(6),
        );
      }
    },
  },
  {
    title: 'frequency sweeps: 10 Hz to 10 MHz, 50 points per decade (second run of each)',
    run() {
      // One complex factorization per point for the response, one per point and op-amp for
      // the loop gains, plus the solves that refine crossings and peaks, and for a short
      // margin the trial sweeps of its hints. The first run compiles the code; the second is timed.
      const cases = [
        { name: 'RC ladder, 10 sections', text: rcLadder(10, 1e-3), input: 'SRC' },
        { name: 'RC ladder, 100 sections', text: rcLadder(100, 1e-3), input: 'SRC' },
        { name: 'RC ladder, 1,000 sections (sparse complex system)', text: rcLadder(1000, 1e-3), input: 'SRC' },
        { name: 'op-amp differentiator, with margin hints', text: differentiatorIntoRails(1), input: 'SQ' },
      ];
      console.log('  ' + 'case'.padEnd(52), 'points'.padStart(10), 'points/s'.padStart(12), 'seconds'.padStart(9), 'LU'.padStart(7));
      for (const c of cases) {
        const circuit = parseCircuit(`${c.text}\nresponse: { input: ${c.input}, from: 10, to: 10M }\n`, { fileName: 'bench.yaml' });
        frequencyResponse(circuit);
        const start = performance.now();
        const response = frequencyResponse(circuit);
        const seconds = (performance.now() - start) / 1000;
        const points = response.frequency.length;
        console.log(
          '  ' + c.name.padEnd(52),
          String(points).padStart(10),
          Math.round(points / seconds).toLocaleString('en-US').padStart(12),
          seconds.toFixed(3).padStart(9),
          String(response.stats.factorizations).padStart(7),
        );
      }
    },
  },
  {
    title: 'streaming: memory and analysis time against rows (no kept columns, as voltcast run)',
    run() {
      console.log('  the plain differentiator, 5 Hz triangle, 1 µs rows: rings at 12.6 kHz after every corner; each run in a process of its own');
      const small = streamedRun(200_000, false);
      const large = streamedRun(2_000_000, false);
      for (const r of [small, large]) {
        console.log(`  ${r.rows.toLocaleString('en-US').padStart(9)} rows: ${r.runSeconds.toFixed(2)} s (simulation ${r.wallTime.simulation.toFixed(2)} s, analyses ${r.wallTime.analyses.toFixed(3)} s), peak memory ${mb(r.maxRss)}, ${r.events} events, ${r.ringing} ringing finding(s)`);
      }
      const ratio = large.maxRss / small.maxRss;
      console.log(`  growth: ${((large.maxRss - small.maxRss) / (large.rows - small.rows)).toFixed(1)} bytes per row`);
      target('peak memory (maxRSS), 2,000,000 / 200,000 rows', `${ratio.toFixed(2)}×`, '≤ 1.2×, flat', ratio <= 1.2);
      const examined = large.wallTime.analyses / large.runSeconds;
      target('analyses of a cold run, 2,000,000 rows (windows and the work after the run: report.json wallTime)', `${(100 * examined).toFixed(1)}%`, '≤ 10%', examined <= 0.1);
      // Everything the analyses cost, watching at every step included (the saturation states,
      // the two-step guard, the rows for the ringing windows): against the bare simulation.
      const warm = streamedRun(200_000, true);
      const share = (warm.runCpuSeconds - warm.bareCpuSeconds!) / warm.runCpuSeconds;
      console.log(`  200,000 rows, warm, processor time, best of 3: ${warm.bareCpuSeconds!.toFixed(2)} s simulating alone, ${warm.runCpuSeconds.toFixed(2)} s with every analysis`);
      target('analyses\' share of the run time, watching at every step included', `${(100 * share).toFixed(1)}%`, '≤ 10%', share <= 0.1);
    },
  },
  {
    title: 'command line: start-up of the built command, and envelope workers',
    run: () => commandLineBench(target),
  },
  {
    title: 'accuracy: error against references and CPU time, with odex as the peer',
    run: accuracyBench,
  },
  {
    title: 'noise: 1 Hz to 1 MHz, 20 points per decade, and a run with noise (second run of each)',
    run() {
      // Per point one complex factorization and one adjoint solve per output, whatever the
      // number of noise generators (one per resistor).
      const cases = [
        { name: 'RC ladder, 10 sections, 1 output', text: rcLadder(10, 1e-3) },
        { name: 'RC ladder, 100 sections, 1 output', text: rcLadder(100, 1e-3) },
        { name: 'RC ladder, 1,000 sections, 1 output', text: rcLadder(1000, 1e-3) },
      ];
      console.log('  ' + 'case'.padEnd(52), 'points'.padStart(10), 'points/s'.padStart(12), 'seconds'.padStart(9), 'solves'.padStart(7));
      for (const c of cases) {
        const circuit = parseCircuit(c.text, { fileName: 'bench.yaml' });
        const last = { ...circuit, recorded: circuit.recorded.slice(-1) };
        noiseAnalysis(last, { to: 1e6, hints: false });
        const start = performance.now();
        const noise = noiseAnalysis(last, { to: 1e6, hints: false });
        const seconds = (performance.now() - start) / 1000;
        const points = noise.frequency.length;
        console.log('  ' + c.name.padEnd(52), String(points).padStart(10), Math.round(points / seconds).toLocaleString('en-US').padStart(12), seconds.toFixed(3).padStart(9), String(noise.stats.solves).padStart(7));
      }
      // The leaf thermopile fixture for 50 ms with the parts' noise: the step is held to 1/(20·50 kHz).
      const leaf = parseCircuit(readFileSync(new URL('../fixtures/noise-leaf-thermopile.yaml', import.meta.url), 'utf8'));
      const short = { ...leaf, simulate: { ...leaf.simulate, duration: 0.05 } };
      simulate(short, { noise: { seed: 1 } });
      const start = performance.now();
      const result = simulate(short, { noise: { seed: 1 } });
      const seconds = (performance.now() - start) / 1000;
      console.log(`  leaf thermopile, 50 ms with noise: ${result.stats.acceptedSteps} steps in ${seconds.toFixed(2)} s, ${Math.round(result.stats.acceptedSteps / seconds).toLocaleString('en-US')} steps/s`);
    },
  },
  {
    title: 'parse: 10,001 parts (best of 5)',
    run() {
      const text = rcLadder(5000, 1e-3, 1e-7);
      let seconds = Infinity;
      let parts = 0;
      for (let r = 0; r < 5; r++) {
        const start = performance.now();
        parts = parseCircuit(text, { fileName: 'bench.yaml' }).parts.length;
        seconds = Math.min(seconds, (performance.now() - start) / 1000);
      }
      console.log(`  ${parts} parts, ${Math.round(text.length / 1024)} KiB of text`);
      target('parse 10,001 parts', `${seconds.toFixed(3)} s`, '≤ 0.5 s', seconds <= 0.5);
    },
  },
];

const only = process.argv[2];
for (const section of sections) {
  if (only !== undefined && !section.title.includes(only)) continue;
  console.log(`\n${section.title}`);
  section.run();
}
