import { execFileSync } from 'node:child_process';
import { mkdtempSync, readFileSync, rmSync, writeFileSync } from 'node:fs';
import { createRequire } from 'node:module';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { pathToFileURL } from 'node:url';
import { expect, test } from 'vitest';
import { repoRoot } from './support/run-cli.ts';

// The README's library snippet is run as written (from the repository root, as a reader
// would), with the core imported from its sources; a snippet that stops working fails here.
test("the README's library snippet runs, reading the file wave beside the circuit file", () => {
  const readme = readFileSync(join(repoRoot, 'README.md'), 'utf8');
  const section = readme.slice(readme.indexOf('## As a library'));
  const snippet = /```ts\n([\s\S]*?)```/.exec(section)![1];
  expect(snippet).toContain("from '@voltcast/core'");
  const core = pathToFileURL(join(repoRoot, 'packages/core/src/index.ts')).href;
  const program = `${snippet.replace("'@voltcast/core'", `'${core}'`)}
const sensor = run.transient.columns.get('sensor');
console.log(JSON.stringify({ rows: run.transient.time.length, column: sensor?.length, accepted: run.transient.stats.acceptedSteps, at: run.transient.valueAt('sensor', 12.34e-6), around: [sensor[123], sensor[124]], highest: run.transient.maximum[1], rowHighest: Math.max(...sensor) }));
`;
  const scratch = mkdtempSync(join(tmpdir(), 'voltcast-readme-'));
  try {
    writeFileSync(join(scratch, 'snippet.ts'), program);
    const tsx = pathToFileURL(createRequire(import.meta.url).resolve('tsx')).href;
    const printed = execFileSync(process.execPath, ['--import', tsx, join(scratch, 'snippet.ts')], { cwd: repoRoot, encoding: 'utf8' });
    const { rows, column, accepted, at, around, highest, rowHighest } = JSON.parse(printed);
    // fixtures/sensor-cable-rl.yaml: 100 µs in 100 ns rows, so 1001 rows with both ends.
    expect(rows).toBe(1001);
    expect(column).toBe(rows);
    expect(accepted).toBeGreaterThanOrEqual(rows - 1);
    // 12.34 µs lies 40% of the way from row 123 (12.3 µs) to row 124 (12.4 µs): linear interpolation.
    expect(at).toBeCloseTo(around[0] + 0.4 * (around[1] - around[0]), 12);
    expect(highest).toBeGreaterThanOrEqual(rowHighest);
  } finally {
    rmSync(scratch, { recursive: true, force: true });
  }
});
