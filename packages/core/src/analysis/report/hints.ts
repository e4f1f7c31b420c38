import type { Circuit } from '../../circuit/circuit.ts';
import type { OpampSpec } from '../../parts/opamp.ts';
import { formatSI } from '../../units/format.ts';
import type { SaturationInterval } from '../saturation/types.ts';
import type { RingingFinding } from '../ringing/types.ts';
import type { StageShape } from './stage-shape.ts';

/** A textbook remedy: one sentence, and the numbers behind it (SI base units). */
export interface Hint {
  readonly text: string;
  readonly values: Readonly<Record<string, number>>;
}

/**
 * Ringing of a differentiator-like stage (docs/guide-reports.md): its noise gain rises at
 * 20 dB/decade from f0 = 1/(2 pi Rf Cin) and meets the open-loop gain near
 * fr = sqrt(f0 GBW), where the loop has almost no phase margin. A feedback capacitor
 * Cf = 1/(2 pi Rf fr) puts a zero there; a series input resistor Rs = Rf / G limits the
 * high-frequency gain to G (by default G = fr / f0, which puts the Rs-Cin corner at fr).
 */
export function ringingHint(finding: RingingFinding, amp: OpampSpec, shape: StageShape): Hint | undefined {
  if (shape.shape !== 'differentiator') return undefined;
  const rf = shape.feedbackResistor.resistance;
  const cin = shape.inputCapacitor.capacitance;
  const gbw = amp.parameters.gbw;
  const f0 = 1 / (2 * Math.PI * rf * cin);
  const resonance = Math.sqrt(f0 * gbw);
  const feedbackCapacitor = 1 / (2 * Math.PI * rf * resonance);
  const highFrequencyGain = resonance / f0;
  const seriesResistor = rf / highFrequencyGain;
  const name = shape.feedbackResistor.name;
  const measured = `rings at ${formatSI(finding.frequency, 'Hz')}; a differentiator's loop resonates near sqrt(f0·GBW) = sqrt(${formatSI(f0, 'Hz')} · ${formatSI(gbw, 'Hz')}) = ${formatSI(resonance, 'Hz')}`;
  const present = [
    shape.feedbackCapacitor ? `${shape.feedbackCapacitor.name} (${formatSI(shape.feedbackCapacitor.capacitance, 'F')}) already sits across ${name}` : '',
    shape.seriesResistor ? `${shape.seriesResistor.name} (${formatSI(shape.seriesResistor.resistance, 'Ω')}) already limits the high-frequency gain to ${formatSI(rf / shape.seriesResistor.resistance, '', 3)}` : '',
  ].filter((s) => s !== '');
  const text =
    `${amp.name} ${measured}. ` +
    (present.length > 0 ? `${present.join('; ')}. To damp it further: ` : 'To damp it: ') +
    `put ${formatSI(feedbackCapacitor, 'F')} across ${name} (Cf = 1/(2π·Rf·fr), a zero at the resonance), ` +
    `or ${formatSI(seriesResistor, 'Ω')} in series with ${shape.inputCapacitor.name} (Rs = Rf/G for a high-frequency gain G = ${formatSI(highFrequencyGain, '', 3)}).`;
  return { text, values: { f0, gbw, resonance, feedbackCapacitor, seriesResistor, highFrequencyGain } };
}

/**
 * Clipping of a resistive gain stage: the input level at which the output reaches the clamp
 * is limit / gain; the demanded swing (limit + overdrive) says what gain would just fit.
 */
export function saturationHint(interval: SaturationInterval, shape: StageShape): Hint | undefined {
  if (shape.shape !== 'inverting' && shape.shape !== 'non-inverting' && shape.shape !== 'follower') return undefined;
  const clipsAt = interval.limit / shape.gain;
  const demanded = Math.abs(interval.limit) + (interval.overdrive ?? 0);
  const fittingGain = Math.abs(shape.gain) * (Math.abs(interval.limit) / demanded);
  const text =
    `${interval.part} (${shape.shape}, gain ${formatSI(shape.gain, '', 3)}) reaches its ${interval.rail} limit of ${formatSI(interval.limit, 'V')} when ${shape.input} is at ${formatSI(clipsAt, 'V')}` +
    (interval.overdrive !== undefined ? `; it was asked for about ${formatSI(demanded * Math.sign(interval.limit), 'V')}: a gain of ${formatSI(fittingGain, '', 3)} or less would keep it off the rail` : '') +
    '.';
  return { text, values: { clipsAt, gain: shape.gain, ...(interval.overdrive !== undefined ? { fittingGain } : {}) } };
}

/** The op-amp whose output is `node`, if any. */
export function ampDriving(circuit: Circuit, node: string): OpampSpec | undefined {
  return circuit.parts.find((p): p is OpampSpec => p.kind === 'opamp' && p.pins.some((q) => q.pin === 'out' && q.node === node));
}
