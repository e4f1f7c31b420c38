#!/usr/bin/env node
import { Command, CommanderError } from 'commander';
import cliPackage from '../package.json' with { type: 'json' };
import { runCommand } from './commands/run.ts';
import { checkCommand } from './commands/check.ts';
import { describeFailure, exitCodes } from './exit-codes.ts';

const examples = `
Examples:
  voltcast check fixtures/supply-ringing.yaml
      validate a circuit file; errors are listed as file:line:column
  voltcast run fixtures/supply-ringing.yaml
      simulate; writes out/supply-ringing/{waveforms.csv,report.json,report.txt}
  voltcast run board.yaml --out results/board-a --quiet
      write elsewhere and print nothing but errors

Exit codes: 0 done, 1 the simulation failed, 2 bad input or usage.`;

function program(): Command {
  const root = new Command('voltcast')
    .description('Simulate small analog circuits in time and write their waveforms as CSV.')
    .version(cliPackage.version, '-v, --version', 'print the version')
    .helpOption('-h, --help', 'show this help')
    .addHelpText('after', examples)
    .showHelpAfterError('(voltcast --help shows the commands and options)')
    .exitOverride();

  root
    .command('run')
    .description('simulate a circuit file and write waveforms.csv, report.json and report.txt')
    .argument('<file>', 'circuit file (YAML)')
    .option('-o, --out <dir>', 'output folder (default: out/<file name without extension>)')
    .option('-q, --quiet', 'no progress bar and no summary')
    .action((file: string, options: { out?: string; quiet?: boolean }) => runCommand(file, options));

  root
    .command('check')
    .description('validate a circuit file without simulating it')
    .argument('<file>', 'circuit file (YAML)')
    .action((file: string) => checkCommand(file));

  // Point a mistyped subcommand at its own help rather than the overview.
  for (const command of root.commands) {
    command.showHelpAfterError(`(voltcast ${command.name()} --help shows its options)`);
  }
  return root;
}

export function main(argv: readonly string[]): number {
  try {
    program().parse(argv as string[]);
    return exitCodes.ok;
  } catch (error) {
    // Commander has already printed its own message; help and version end with code 0.
    if (error instanceof CommanderError) return error.exitCode === 0 ? exitCodes.ok : exitCodes.badInput;
    const { message, exitCode } = describeFailure(error);
    console.error(message);
    return exitCode;
  }
}

process.exitCode = main(process.argv);
