import { describe, expect, test } from 'vitest';
import { program } from '../packages/cli/src/program.ts';
import { runCli } from './support/run-cli.ts';

describe('voltcast --help', () => {
  test("lists every command's options, as the README says", async () => {
    const { code, stdout } = await runCli(['--help']);
    expect(code).toBe(0);
    const root = program(() => undefined);
    for (const command of root.commands) {
      expect(stdout).toContain(`voltcast ${command.name()} `);
      for (const option of command.options) expect(stdout, `${command.name()} ${option.flags}`).toContain(option.flags);
    }
    // The commands' options are really there, and the options that the docs name too.
    expect(root.commands.map((c) => c.name())).toEqual(['run', 'response', 'noise', 'envelope', 'merge', 'compare', 'check']);
    for (const flags of ['-o, --out <dir>', '--force', '--codes-as <formats>', '-n, --runs <n>', '--signal <name>', '--margin <V|LSB>', '--phase-margin <degrees>']) expect(stdout).toContain(flags);
  });
});
