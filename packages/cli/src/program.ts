import { Command, Help } from 'commander';
import cliPackage from '../package.json' with { type: 'json' };
import { runCommand, type RunOptions } from './commands/run.ts';
import { checkCommand } from './commands/check.ts';
import { envelopeCommand, type EnvelopeCommandOptions } from './commands/envelope.ts';
import { mergeCommand, type MergeCommandOptions } from './commands/merge.ts';
import { compareCommand, type CompareCommandOptions } from './commands/compare.ts';
import { responseCommand, type ResponseCommandOptions } from './commands/response.ts';
import { noiseCommand, type NoiseCommandOptions } from './commands/noise.ts';

const examples = `
Examples:
  voltcast check fixtures/supply-ringing.yaml
      validate a circuit file; errors are listed as file:line:column
  voltcast run fixtures/supply-ringing.yaml
      simulate; writes out/supply-ringing/{waveforms.csv,report.json,report.txt}
  voltcast run board.yaml --out results/board-a --quiet
      write elsewhere and print nothing but errors
  voltcast response fixtures/differentiator-plain.yaml --plot
      gain, phase and loop margins; writes out/differentiator-plain-response/response.{csv,json,txt}
  voltcast noise fixtures/noise-leaf-thermopile.yaml --plot
      noise at each node and converter in LSB; writes out/noise-leaf-thermopile-noise/noise.{csv,json,txt}
  voltcast envelope fixtures/envelope-rc-filter.yaml --runs 500 --seed 7 --corners --plot
      tolerance envelope; writes out/envelope-rc-filter-envelope/envelope.csv
  voltcast envelope board.yaml --runs 4000 --shard 3/8 --out parts/3
      the third of eight slices, e.g. on the third machine; then:
  voltcast merge parts/*/ --out out/board-envelope
      fold the eight parts into envelope.csv, the same bytes as one run
  voltcast compare capture.csv out/board-envelope/envelope.csv --signal adc --shift auto
      check a capture against an envelope: exit 0 pass, 1 fail

Exit codes: 0 done, 1 the simulation failed, 2 bad input or usage.`;

/**
 * The `voltcast` command line. `setOutcome` receives the exit code of a command whose verdict is
 * its result (compare).
 */
export function program(setOutcome: (code: number) => void): Command {
  const root = new Command('voltcast')
    .description('Simulate small analog circuits in time and write their waveforms as CSV.')
    .version(cliPackage.version, '-v, --version', 'print the version')
    .helpOption('-h, --help', 'show this help')
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
    .option('--noise [seed]', 'add seeded thermal and amplifier noise to every resistor and amplifier (same seed, same run; default seed 1)')
    .option('--force', "write into a folder that holds other files: voltcast's own files are replaced, every other file is left in place")
    .action((file: string, options: RunOptions) => runCommand(file, options));

  root
    .command('response')
    .description('frequency response and loop stability: response.csv, response.json and response.txt')
    .argument('<file>', 'circuit file (YAML) with a response: section')
    .option('-o, --out <dir>', 'output folder (default: out/<file name>-response)')
    .option('--plot', 'also write plot.svg: gain and phase against log frequency, open-loop gain and crossover')
    .option('--phase-margin <degrees>', 'phase margin the hints aim for', '60')
    .option('-q, --quiet', 'no summary')
    .option('--force', "write into a folder that holds other files: voltcast's own files are replaced, every other file is left in place")
    .action((file: string, options: ResponseCommandOptions) => responseCommand(file, options));

  root
    .command('noise')
    .description('noise at every node and converter: noise.csv, noise.json and noise.txt, largest contributor first')
    .argument('<file>', 'circuit file (YAML); the band is its noise: section, or 1 Hz to the highest ADC Nyquist rate')
    .option('-o, --out <dir>', 'output folder (default: out/<file name>-noise)')
    .option('--plot', 'also write plot.svg: noise density against log frequency, stacked by contributor')
    .option('-q, --quiet', 'no summary')
    .option('--force', "write into a folder that holds other files: voltcast's own files are replaced, every other file is left in place")
    .action((file: string, options: NoiseCommandOptions) => noiseCommand(file, options));

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
    .option('--force', "write into a folder that holds other files: voltcast's own files are replaced, every other file is left in place")
    .option('--shard <K/N>', 'run only the K-th of N equal slices of the runs and corners and write a part for voltcast merge (one per machine or job)')
    .action((file: string, options: EnvelopeCommandOptions) => envelopeCommand(file, options));

  root
    .command('merge')
    .description('fold the parts of an envelope run in shards (envelope --shard K/N) into the files one envelope run writes')
    .argument('<parts...>', 'envelope-part-K-of-N.json files, or the folders envelope --shard wrote')
    .option('-o, --out <dir>', 'output folder (default: out/<circuit name>-envelope)')
    .option('--plot', 'also write plot.svg: bands, nominals and ADC codes')
    .option('-q, --quiet', 'no summary')
    .option('--force', "write into a folder that holds other files: voltcast's own files are replaced, every other file is left in place")
    .action((parts: string[], options: MergeCommandOptions) => mergeCommand(parts, options));

  root
    .command('compare')
    .description('check a captured waveform against an envelope of volts or of ADC codes: exit 0 pass, 1 fail')
    .argument('<measured>', "captured CSV (comma, semicolon or tab separated): a time column and value column(s); units in a header such as 'time (ms)' or in a units row")
    .argument('<envelope>', 'envelope.csv (volts) or envelope-adc-NAME.csv (codes) written by voltcast envelope')
    .option('--signal <name>', 'signal of the envelope (needed when it holds several)')
    .option('--column <name>', 'column of the capture (default: named like the signal, or the only one)')
    .option('--shift <auto|T>', 'delay of the capture: auto (cross-correlation) or a time such as 150u', '0')
    .option('--margin <V|LSB>', 'widen the limits by this much, for measurement noise: volts (5m), or codes for an ADC envelope (2LSB)')
    .option('--time-margin <T>', 'check each sample against the limits within ±T, for jitter')
    .option('--json', 'print the verdict as JSON')
    .option('--plot <file>', 'also write an SVG of capture, band and violations')
    .action((measured: string, envelope: string, options: CompareCommandOptions) => setOutcome(compareCommand(measured, envelope, options)));

  root
    .command('check')
    .description('validate a circuit file without simulating it')
    .argument('<file>', 'circuit file (YAML)')
    .action((file: string) => checkCommand(file));

  root.addHelpText('after', () => `\n${everyCommandsOptions(root)}\n${examples}`);
  // Point a mistyped subcommand at its own help rather than the overview.
  for (const command of root.commands) {
    command.showHelpAfterError(`(voltcast ${command.name()} --help shows its options)`);
  }
  return root;
}

/** Each command's usage and options, for the overview: one `--help` shows everything. */
function everyCommandsOptions(root: Command): string {
  const help = new Help();
  const lines = ['Commands and their options:'];
  for (const command of root.commands) {
    lines.push(`  ${help.commandUsage(command)}`);
    const options = help.visibleOptions(command).filter((option) => option.long !== '--help');
    const width = Math.max(...options.map((option) => help.optionTerm(option).length));
    for (const option of options) lines.push(`      ${help.optionTerm(option).padEnd(width)}  ${help.optionDescription(option)}`);
  }
  return lines.join('\n');
}
