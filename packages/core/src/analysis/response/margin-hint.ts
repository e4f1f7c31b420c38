import type { Circuit, ResponseSettings } from '../../circuit/circuit.ts';
import type { OpampSpec } from '../../parts/opamp.ts';
import { loopOf } from '../../small-signal/frequency-sweep.ts';
import type { LoopResponse } from '../../small-signal/types.ts';
import { formatSI } from '../../units/format.ts';
import type { Hint } from '../report/hints.ts';
import type { StageShape } from '../report/stage-shape.ts';
import { withFeedbackCapacitor, withSeriesResistor } from './circuit-edits.ts';

/** Trial values per search range before the bisection: the smallest value that reaches the target is found, not just any. */
const SCAN_POINTS = 12;
/** Bisections in log value: the range shrinks by 2^-20, far finer than any part's tolerance. */
const BISECTIONS = 20;
/** The trial sweeps need only bracket the crossover; its refinement solves at the true frequency. */
const TRIAL_PER_DECADE = 10;

/**
 * For a differentiator whose loop keeps less phase margin than `target`: the feedback
 * capacitor across Rf, and the series resistor in front of Cin, each of which alone brings
 * the margin to `target`, found by re-solving the linearized circuit with the part in place
 * (so the amplifier's second pole, output resistance and load count). The smallest value that
 * reaches the target is taken: it costs the least signal bandwidth. Common practice behind
 * both: the capacitor puts a zero in the loop near the crossover; the resistor limits the
 * noise gain at high frequency to 1 + Rf/Rs.
 */
export function marginHint(circuit: Circuit, loop: LoopResponse, amp: OpampSpec, shape: StageShape, settings: ResponseSettings, target: number): Hint | undefined {
  if (shape.shape !== 'differentiator' || loop.phaseMargin === null || loop.crossover === null || loop.phaseMargin >= target) return undefined;
  const minus = amp.pins.find((p) => p.pin === 'minus')!.node;
  const trial: ResponseSettings = { ...settings, perDecade: Math.min(settings.perDecade, TRIAL_PER_DECADE) };
  const marginWith = (edited: Circuit): number => loopOf(edited, amp.name, trial).phaseMargin ?? -Infinity;
  const rf = shape.feedbackResistor.resistance;
  const cin = shape.inputCapacitor.capacitance;
  // Ranges: from well below the textbook value (the zero, or the Rs-Cin corner, at the crossover) up to where the stage stops differentiating (Cf = Cin, Rs = Rf).
  const textbookCf = 1 / (2 * Math.PI * rf * loop.crossover);
  const textbookRs = 1 / (2 * Math.PI * cin * loop.crossover);
  const feedbackCapacitor = smallestReaching(target, textbookCf / 100, cin, (c) => marginWith(withFeedbackCapacitor(circuit, shape, c)));
  const seriesResistor = smallestReaching(target, textbookRs / 100, rf, (r) => marginWith(withSeriesResistor(circuit, shape, r, minus)));

  const rfName = shape.feedbackResistor.name;
  const cinName = shape.inputCapacitor.name;
  const now = `${amp.name}'s loop crosses over at ${formatSI(loop.crossover, 'Hz')} with ${loop.phaseMargin.toFixed(1)}° of phase margin${loop.phaseMargin < 0 ? ' (it oscillates)' : ''}; for ${target}°`;
  const remedies = [
    feedbackCapacitor !== undefined
      ? shape.feedbackCapacitor !== undefined
        ? `make ${shape.feedbackCapacitor.name} ${formatSI(feedbackCapacitor, 'F')} (now ${formatSI(shape.feedbackCapacitor.capacitance, 'F')})`
        : `put ${formatSI(feedbackCapacitor, 'F')} across ${rfName} (a zero in the loop near the crossover)`
      : `no capacitor across ${rfName} up to ${formatSI(cin, 'F')} is enough`,
    seriesResistor !== undefined
      ? shape.seriesResistor !== undefined
        ? `make ${shape.seriesResistor.name} ${formatSI(seriesResistor, 'Ω')} (now ${formatSI(shape.seriesResistor.resistance, 'Ω')})`
        : `put ${formatSI(seriesResistor, 'Ω')} in series with ${cinName} (the high-frequency gain becomes ${rfName}/Rs = ${formatSI(rf / seriesResistor, '', 3)})`
      : `no resistor in series with ${cinName} up to ${formatSI(rf, 'Ω')} is enough`,
  ];
  const values: Record<string, number> = { crossover: loop.crossover, phaseMargin: loop.phaseMargin, targetMargin: target };
  if (feedbackCapacitor !== undefined) values.feedbackCapacitor = feedbackCapacitor;
  if (seriesResistor !== undefined) values.seriesResistor = seriesResistor;
  return { text: `${now}: ${remedies[0]}, or ${remedies[1]}.`, values };
}

/**
 * The smallest value in [low, high] at which `margin(value)` reaches `target`: a log-spaced
 * scan for the first value that does, then bisection between it and the one before.
 * Undefined when none does.
 */
function smallestReaching(target: number, low: number, high: number, margin: (value: number) => number): number | undefined {
  if (!(high > low)) return undefined;
  const step = Math.log(high / low) / (SCAN_POINTS - 1);
  let below = -Infinity;
  for (let i = 0; i < SCAN_POINTS; i++) {
    const value = low * Math.exp(i * step);
    if (margin(value) < target) {
      below = Math.log(value);
      continue;
    }
    if (i === 0) return value;
    let lo = below;
    let hi = Math.log(value);
    for (let k = 0; k < BISECTIONS; k++) {
      const mid = (lo + hi) / 2;
      if (margin(Math.exp(mid)) < target) lo = mid;
      else hi = mid;
    }
    return Math.exp(hi);
  }
  return undefined;
}
