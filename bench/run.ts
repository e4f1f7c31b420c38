// `pnpm bench`: accepted steps per second and total seconds per case. Speed is shown here,
// never asserted by a timed test.
import { parseCircuit, simulate } from '@voltcast/core';
import { differentiatorIntoRails, linearNetwork, rcLadder } from './cases.ts';

interface Case {
  name: string;
  text: string;
}

const cases: Case[] = [
  { name: 'linear network, 6 nodes, 1,000,000 fixed steps', text: linearNetwork(1_000_000, 1e-7) },
  ...[10, 100, 1000].map((n) => ({ name: `RC ladder, ${n} sections, 10,000 fixed steps`, text: rcLadder(n, 10_000, 1e-7) })),
  { name: 'op-amp differentiator into its rails, 60 periods', text: differentiatorIntoRails(60) },
];

const only = process.argv[2];
console.log('case'.padEnd(52), 'steps'.padStart(10), 'steps/s'.padStart(12), 'seconds'.padStart(9), 'LU'.padStart(5), 'newton/step'.padStart(12));
for (const c of cases) {
  if (only !== undefined && !c.name.includes(only)) continue;
  const circuit = parseCircuit(c.text, { fileName: `${c.name}.yaml` });
  const start = performance.now();
  const result = simulate(circuit, { keepColumns: false });
  const seconds = (performance.now() - start) / 1000;
  const s = result.stats;
  console.log(
    c.name.padEnd(52),
    String(s.acceptedSteps).padStart(10),
    Math.round(s.acceptedSteps / seconds).toLocaleString('en-US').padStart(12),
    seconds.toFixed(2).padStart(9),
    String(s.factorizations).padStart(5),
    (s.newtonIterations / s.acceptedSteps).toFixed(2).padStart(12),
  );
}
