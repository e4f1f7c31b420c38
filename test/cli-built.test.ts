import { readFileSync, readdirSync, statSync } from 'node:fs';
import { join } from 'node:path';
import { describe, expect, it } from 'vitest';
import { repoRoot, runCli } from './support/run-cli.ts';

const cli = join(repoRoot, 'packages/cli');

function sources(folder: string): string[] {
  return readdirSync(folder, { withFileTypes: true }).flatMap((e) => (e.isDirectory() ? sources(join(folder, e.name)) : e.name.endsWith('.ts') ? [join(folder, e.name)] : []));
}

describe('the compiled command', () => {
  it('runs plain JavaScript: no TypeScript loader in the launcher, the CLI or its worker', () => {
    for (const file of ['bin/voltcast.mjs', 'dist/main.js', 'dist/worker.js']) {
      const text = readFileSync(join(cli, file), 'utf8');
      expect(text).not.toMatch(/from ['"]tsx|import\(['"]tsx|--import/);
    }
  });

  it('is built from the sources as they are now (the tests never run a stale build)', () => {
    const built = statSync(join(cli, 'dist/main.js')).mtimeMs;
    const newest = Math.max(...[...sources(join(cli, 'src')), ...sources(join(repoRoot, 'packages/core/src'))].map((f) => statSync(f).mtimeMs));
    expect(built).toBeGreaterThanOrEqual(newest);
  });

  it('answers check on a small file', async () => {
    const { code, stdout } = await runCli(['check', join(repoRoot, 'fixtures/envelope-rc-filter.yaml')]);
    expect(code).toBe(0);
    expect(stdout).toMatch(/ok \(glasshouse-moisture-filter: /);
  });
});
