import { readdirSync, readFileSync } from 'node:fs';
import { join } from 'node:path';

/** Every file under `folder` (sub-folders included) with its content, keyed by relative path. */
export function snapshot(folder: string): Record<string, string> {
  const files: Record<string, string> = {};
  for (const entry of readdirSync(folder, { recursive: true, withFileTypes: true })) {
    if (entry.isFile()) files[join(entry.parentPath, entry.name).slice(folder.length + 1)] = readFileSync(join(entry.parentPath, entry.name), 'utf8');
  }
  return files;
}
