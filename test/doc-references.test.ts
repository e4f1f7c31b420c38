import { existsSync, readdirSync, readFileSync } from 'node:fs';
import { join } from 'node:path';
import { expect, test } from 'vitest';
import { repoRoot } from './support/run-cli.ts';

// The project stands on its own: every document a source or test names is in the repository.
test('every .md file named in the sources and tests exists in the repository', () => {
  const folders = ['packages/core/src', 'packages/core/test', 'packages/cli/src', 'packages/cli/test', 'test', 'bench'];
  const missing: string[] = [];
  for (const folder of folders) {
    for (const entry of readdirSync(join(repoRoot, folder), { recursive: true, withFileTypes: true })) {
      if (!entry.isFile() || !entry.name.endsWith('.ts')) continue;
      const path = join(entry.parentPath, entry.name);
      for (const [name] of readFileSync(path, 'utf8').matchAll(/[\w./-]+\.md\b/g)) {
        if (!existsSync(join(repoRoot, name))) missing.push(`${path.slice(repoRoot.length)}: ${name}`);
      }
    }
  }
  expect(missing).toEqual([]);
});
