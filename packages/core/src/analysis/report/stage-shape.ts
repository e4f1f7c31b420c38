import type { Circuit } from '../../circuit/circuit.ts';
import type { OpampSpec } from '../../parts/opamp.ts';
import type { PartSpecBase } from '../../parts/part-kind.ts';

/** What the parts around an op-amp's pins make of it, for hints and estimates. */
export type StageShape =
  | {
      /** Capacitor into the inverting input, resistor in feedback (plus an optional feedback capacitor and series input resistor). */
      readonly shape: 'differentiator';
      readonly inputCapacitor: PartSpecBase & { capacitance: number };
      readonly feedbackResistor: PartSpecBase & { resistance: number };
      readonly feedbackCapacitor?: PartSpecBase & { capacitance: number };
      readonly seriesResistor?: PartSpecBase & { resistance: number };
    }
  | {
      /** Only resistors at the inverting input: an inverting or non-inverting gain stage, or a follower. */
      readonly shape: 'inverting' | 'non-inverting' | 'follower';
      /** Signal gain from `input` to the output. */
      readonly gain: number;
      /** 1/beta of the resistive feedback: how much an input error is multiplied at the output. */
      readonly noiseGain: number;
      readonly input: string;
    }
  | { readonly shape: 'other' };

type Two = PartSpecBase & { resistance?: number; capacitance?: number };

/**
 * Recognize the stage from the two-pin parts at the inverting input (`minus`), by their kind
 * and where their other end goes: feedback parts end at `out`, input parts elsewhere. Only
 * the common textbook shapes are named; anything else is `other` and gets no hint.
 */
export function stageShape(circuit: Circuit, amp: OpampSpec): StageShape {
  const pin = (name: string): string => amp.pins.find((p) => p.pin === name)?.node ?? '';
  const [plus, minus, out] = [pin('plus'), pin('minus'), pin('out')];
  if (minus === out) return { shape: 'follower', gain: 1, noiseGain: 1, input: plus };
  const at = (node: string): { part: Two; other: string }[] =>
    circuit.parts
      .filter((p) => p !== amp && p.pins.length === 2 && p.pins.some((q) => q.node === node))
      .map((p) => ({ part: p as Two, other: p.pins[0].node === node ? p.pins[1].node : p.pins[0].node }));
  const around = at(minus);
  if (around.length !== circuit.parts.filter((p) => p !== amp && p.pins.some((q) => q.node === minus)).length) return { shape: 'other' };
  const feedback = around.filter((a) => a.other === out);
  const inputs = around.filter((a) => a.other !== out);
  const rf = feedback.find((a) => a.part.kind === 'resistor');
  const cf = feedback.find((a) => a.part.kind === 'capacitor');
  if (rf === undefined || feedback.length !== (cf ? 2 : 1) || inputs.length !== 1) return { shape: 'other' };
  const input = inputs[0];
  const resistance = (a: { part: Two }): number => a.part.resistance!;

  if (input.part.kind === 'capacitor') {
    const far = at(input.other).filter((a) => a.part !== input.part);
    const series = far.length === 1 && far[0].part.kind === 'resistor' ? far[0].part : undefined;
    return {
      shape: 'differentiator',
      inputCapacitor: input.part as PartSpecBase & { capacitance: number },
      feedbackResistor: rf.part as PartSpecBase & { resistance: number },
      ...(cf ? { feedbackCapacitor: cf.part as PartSpecBase & { capacitance: number } } : {}),
      ...(series ? { seriesResistor: series as PartSpecBase & { resistance: number } } : {}),
    };
  }
  if (input.part.kind !== 'resistor' || cf !== undefined) return { shape: 'other' };
  const noiseGain = 1 + resistance(rf) / resistance(input);
  // The input resistor's far end at ground: non-inverting (signal on plus); plus at ground: inverting.
  if (input.other === 'gnd' && plus !== 'gnd') return { shape: 'non-inverting', gain: noiseGain, noiseGain, input: plus };
  if (plus === 'gnd') return { shape: 'inverting', gain: -resistance(rf) / resistance(input), noiseGain, input: input.other };
  return { shape: 'other' };
}
