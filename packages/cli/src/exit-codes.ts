import { SimulationError, formatSI } from '@voltcast/core';

/** Process exit codes of the command line (docs/cli.md, "Exit status"). */
export const exitCodes = {
  ok: 0,
  /** The circuit was valid but the simulation itself failed. */
  simulationFailed: 1,
  /** Bad input or usage: a circuit file error, a missing file, an unknown option. */
  badInput: 2,
} as const;

/**
 * Bad input or usage (exit 2). The message is complete and ready for people: it already names
 * the file (and line and column when there is one) and what to do.
 */
export class InputError extends Error {
  constructor(message: string) {
    super(message);
    this.name = 'InputError';
  }
}

/** What to print on stderr for a failed command, and the exit code to leave with. */
export function describeFailure(error: unknown): { message: string; exitCode: number } {
  if (error instanceof InputError) return { message: error.message, exitCode: exitCodes.badInput };
  if (error instanceof SimulationError) {
    return { message: describeSimulationError(error), exitCode: exitCodes.simulationFailed };
  }
  // Anything else is a defect in voltcast, not in the user's circuit: show the stack.
  const text = error instanceof Error ? (error.stack ?? error.message) : String(error);
  return { message: `voltcast: internal error\n${text}`, exitCode: exitCodes.simulationFailed };
}

function describeSimulationError(error: SimulationError): string {
  const when = Number.isFinite(error.frequency) ? `at f = ${formatSI(error.frequency, 'Hz')}` : Number.isNaN(error.time) ? 'at the DC operating point' : `at t = ${formatSI(error.time, 's')}`;
  const lines = [`simulation failed ${when}: ${error.message}`];
  if (error.nodes.length > 0) lines.push(`  nodes: ${error.nodes.join(', ')}`);
  if (error.parts.length > 0) lines.push(`  parts: ${error.parts.join(', ')}`);
  if (error.hint) lines.push(`  ${error.hint}`);
  return lines.join('\n');
}
