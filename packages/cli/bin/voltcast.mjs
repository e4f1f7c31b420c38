#!/usr/bin/env node
// Launcher for the `voltcast` command: plain node on the built CLI (dist/main.js, made by
// `npx -y pnpm@10 build`, which the install runs too). No TypeScript loader at run time.
import { existsSync } from 'node:fs';

const built = new URL('../dist/main.js', import.meta.url);
if (!existsSync(built)) {
  console.error('voltcast: the command is not built yet (packages/cli/dist/main.js is missing)\n  run `npx -y pnpm@10 build` in the voltcast folder, then try again');
  process.exit(2);
}
await import(built.href);
