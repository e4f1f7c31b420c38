import { readFileSync } from 'node:fs';
import { parseCircuit, simulate } from '../packages/core/src/index.ts';
const c = parseCircuit(readFileSync('fixtures/envelope-rc-filter.yaml', 'utf8'), { fileName: 'x' });
const exact = process.argv[2] !== 'trap';
let r; for (let i = 0; i < 400; i++) r = simulate(c, { exactSteps: exact });
console.log(r!.stats);
