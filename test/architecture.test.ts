import { mkdtempSync, mkdirSync, writeFileSync, rmSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { createRequire } from 'node:module';
import { afterAll, describe, expect, it } from 'vitest';
import { cruise, type IConfiguration } from 'dependency-cruiser';
import { repoRoot } from './support/run-cli.ts';

// The layer rules live in .dependency-cruiser.cjs; dependency-cruiser (a general-purpose
// dependency checker from the npm registry) applies them.
const rules = createRequire(import.meta.url)(join(repoRoot, '.dependency-cruiser.cjs')) as IConfiguration;

async function violations(paths: string[], cwd: string): Promise<string[]> {
  const previous = process.cwd();
  process.chdir(cwd);
  try {
    const result = await cruise(paths, { validate: true, ruleSet: { forbidden: rules.forbidden }, tsPreCompilationDeps: true, doNotFollow: { path: 'node_modules' } });
    if (typeof result.output === 'string') throw new Error(result.output);
    return result.output.summary.violations.map((v) => `${v.rule.name}: ${v.from} → ${v.to}`);
  } finally {
    process.chdir(previous);
  }
}

describe('layers', () => {
  it('core folders import only downward, without cycles, and the CLI uses the public API', async () => {
    expect(await violations(['packages/core/src', 'packages/cli/src'], repoRoot)).toEqual([]);
  });

  const scratch = mkdtempSync(join(tmpdir(), 'voltcast-layers-'));
  afterAll(() => rmSync(scratch, { recursive: true, force: true }));

  it('the rules catch an upward import and a cycle', async () => {
    const src = join(scratch, 'packages/core/src');
    for (const folder of ['units', 'analysis']) mkdirSync(join(src, folder), { recursive: true });
    writeFileSync(join(src, 'units/si.ts'), "import { run } from '../analysis/run.ts';\nexport const si = run;\n");
    writeFileSync(join(src, 'analysis/run.ts'), "import { si } from '../units/si.ts';\nexport const run = () => si;\n");
    const found = await violations(['packages/core/src'], scratch);
    expect(found).toContain('units-imports-upward: packages/core/src/units/si.ts → packages/core/src/analysis/run.ts');
    expect(found.some((v) => v.startsWith('no-cycles:'))).toBe(true);
  });
});
