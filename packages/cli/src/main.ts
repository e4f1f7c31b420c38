#!/usr/bin/env node
import { Command, CommanderError } from 'commander';
import cliPackage from '../package.json' with { type: 'json' };
import { runCommand } from './commands/run.ts';
import { checkCommand } from './commands/check.ts';
import { envelopeCommand, type EnvelopeCommandOptions } from './commands/envelope.ts';
import { compareCommand, type CompareCommandOptions } from './commands/compare.ts';
import { describeFailure, exitCodes } from './exit-codes.ts';

const examples = `
Examples:
  voltcast check fixtures/supply-ringing.yaml
      validate a circuit file; errors are listed as file:line:column
  voltcast run fixtures/supply-ringing.yaml
      simulate; writes out/supply-ringing/{waveforms.csv,report.json,report.txt}
  voltcast run board.yaml --out results/board-a --quiet
      write elsewhere and print nothing but errors
  voltcast envelope fixtures/envelope-rc-filter.yaml --runs 500 --seed 7 --corners --plot
      tolerance envelope; writes out/envelope-rc-filter-envelope/envelope.csv
  voltcast compare capture.csv out/board-envelope/envelope.csv --signal adc --shift auto
      check a capture against an envelope: exit 0 pass, 1 fail

Exit codes: 0 done, 1 the simulation failed, 2 bad input or usage.`;

/** `setOutcome` receives the exit code of a command whose verdict is its result (compare). */
function program(setOutcome: (code: number) => void): Command {
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
    .option('--plot', 'also write plot.svg: the waveforms and ADC codes')
    .option('--codes-as <formats>', "also write each ADC's codes as c-header and/or json (comma-separated), beside adc-NAME.csv")
    .action((file: string, options: { out?: string; quiet?: boolean; plot?: boolean; codesAs?: string }) => runCommand(file, options));

  root
    .command('envelope')
    .description('tolerance envelope: seeded Monte Carlo runs and worst-case corners, written as envelope.csv')
    .argument('<file>', 'circuit file (YAML) with tolerance: on its parts')
    .option('-n, --runs <n>', 'Monte Carlo runs', '0')
    .option('-s, --seed <s>', 'seed of the draws: same seed and runs, same envelope', '1')
    .option('-c, --corners', 'also run the worst-case corners (every toleranced value at a limit)')
    .option('-w, --workers <w>', 'worker threads (default: every core)')
    .option('-o, --out <dir>', 'output folder (default: out/<file name>-envelope)')
    .option('--plot', 'also write plot.svg: bands, nominals and ADC codes')
    .option('-q, --quiet', 'no progress bar and no summary')
    .action((file: string, options: EnvelopeCommandOptions) => envelopeCommand(file, options));

  root
    .command('compare')
    .description('check a captured waveform against an envelope: exit 0 pass, 1 fail')
    .argument('<measured>', 'captured CSV: time column and value column(s), header and unit rows allowed')
    .argument('<envelope>', 'envelope.csv written by voltcast envelope')
    .option('--signal <name>', 'signal (recorded node) of the envelope, needed when it holds several')
    .option('--column <name>', 'column of the capture (default: named like the signal, or the only one)')
    .option('--shift <auto|T>', 'delay of the capture: auto (cross-correlation) or a time such as 150u', '0')
    .option('--margin <V>', 'widen the limits by this much, for measurement noise')
    .option('--time-margin <T>', 'check each sample against the limits within ±T, for jitter')
    .option('--json', 'print the verdict as JSON')
    .option('--plot <file>', 'also write an SVG of capture, band and violations')
    .action((measured: string, envelope: string, options: CompareCommandOptions) => setOutcome(compareCommand(measured, envelope, options)));

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

export async function main(argv: readonly string[]): Promise<number> {
  let outcome: number = exitCodes.ok;
  try {
    await program((code) => (outcome = code)).parseAsync(argv as string[]);
    return outcome;
  } catch (error) {
    // Commander has already printed its own message; help and version end with code 0.
    if (error instanceof CommanderError) return error.exitCode === 0 ? exitCodes.ok : exitCodes.badInput;
    const { message, exitCode } = describeFailure(error);
    console.error(message);
    return exitCode;
  }
}

process.exitCode = await main(process.argv);
