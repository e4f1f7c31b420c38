#!/usr/bin/env node
import { CommanderError } from 'commander';
import { program } from './program.ts';
import { describeFailure, exitCodes } from './exit-codes.ts';

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
