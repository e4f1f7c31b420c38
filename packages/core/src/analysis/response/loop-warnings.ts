import type { ResponseSettings } from '../../circuit/circuit.ts';
import type { LoopResponse } from '../../small-signal/types.ts';
import { formatSI } from '../../units/format.ts';
import type { ResponseWarning } from './types.ts';

/**
 * Why a loop has no margins, or doubtful ones: an amplifier that is not in its linear region
 * at the operating point (linearized there it is a clipped or overdriven stage, not the one
 * the designer meant), or a crossover outside the sweep.
 */
export function loopWarning(loop: LoopResponse, operatingPoint: ReadonlyMap<string, number>, settings: ResponseSettings): ResponseWarning | undefined {
  const { part } = loop;
  const output = `${loop.output} = ${formatSI(operatingPoint.get(loop.output) ?? 0, 'V')}`;
  switch (loop.state) {
    case 'high rail':
    case 'low rail':
      return {
        part,
        message: `${part} sits at its ${loop.state} at the t = 0 operating point (${output}): linearized there it has almost no gain, so the response is that of a clipped stage and its loop has no margins`,
        hint: 'give the stage a DC operating point inside its swing: a resistor across an integrator\'s capacitor, less gain for the offset, or a different input value at t = 0',
      };
    case 'slewing':
      return {
        part,
        message: `${part}'s input stage is overdriven at the t = 0 operating point (${output}): its small-signal gain there is a fraction of the linear one, so no margins are given`,
        hint: 'check the feedback path at DC: the inputs of a stage in its linear region sit within microvolts of each other',
      };
    case 'current limit':
      return {
        part,
        message: `${part}'s output is at its current limit at the t = 0 operating point (${output}): its output resistance there is far above rout, so no margins are given`,
        hint: 'lighten the DC load on the output, or raise `current-limit`',
      };
    case 'linear':
      if (loop.crossover !== null) return undefined;
      if (loop.dB[loop.dB.length - 1] >= 0) {
        return { part, message: `${part}'s loop gain is still above 1 at the end of the sweep (${formatSI(settings.to, 'Hz')}): its crossover lies higher`, hint: 'raise `to` under response:' };
      }
      if (loop.dB.every((g) => g < 0)) {
        return { part, message: `${part}'s loop gain stays below 1 over the whole sweep: there is no crossover to take a margin at`, hint: 'lower `from` under response:, or check that the amplifier has negative feedback' };
      }
      return undefined;
  }
}
