#!/usr/bin/env node
// Launcher for the `voltcast` command: the CLI is TypeScript run through tsx, with no build step.
import { register } from 'tsx/esm/api';

register();
await import('../src/main.ts');
