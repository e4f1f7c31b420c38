import type { Circuit } from '../../circuit/circuit.ts';
import type { CapacitorSpec } from '../../parts/capacitor.ts';
import type { PartSpecBase } from '../../parts/part-kind.ts';
import { betweenPins } from '../../parts/pins.ts';
import type { ResistorSpec } from '../../parts/resistor.ts';
import type { StageShape } from '../report/stage-shape.ts';

type Differentiator = Extract<StageShape, { shape: 'differentiator' }>;

/**
 * `circuit` with a feedback capacitor of `capacitance` across the differentiator's feedback
 * resistor: the existing one changed, or a new one added. The circuit itself is untouched.
 */
export function withFeedbackCapacitor(circuit: Circuit, shape: Differentiator, capacitance: number): Circuit {
  if (shape.feedbackCapacitor !== undefined) return replaced(circuit, shape.feedbackCapacitor, { capacitance });
  const rf = shape.feedbackResistor;
  const added: CapacitorSpec = { kind: 'capacitor', name: `${rf.name}.feedback-capacitor`, capacitance, pins: betweenPins(rf.pins[0].node, rf.pins[1].node) };
  return { ...circuit, parts: [...circuit.parts, added] };
}

/**
 * `circuit` with a resistor of `resistance` in series with the differentiator's input
 * capacitor, at its far end from the summing node: the existing one changed, or a new one
 * inserted. The circuit itself is untouched.
 */
export function withSeriesResistor(circuit: Circuit, shape: Differentiator, resistance: number, summingNode: string): Circuit {
  if (shape.seriesResistor !== undefined) return replaced(circuit, shape.seriesResistor, { resistance });
  const cin = shape.inputCapacitor;
  const far = cin.pins.find((p) => p.node !== summingNode)!.node;
  const between = `${cin.name}.series-node`;
  const moved: PartSpecBase = { ...cin, pins: cin.pins.map((p) => (p.node === far ? { ...p, node: between } : p)) };
  const added: ResistorSpec = { kind: 'resistor', name: `${cin.name}.series-resistor`, resistance, pins: betweenPins(far, between) };
  return { ...circuit, parts: [...circuit.parts.map((p) => (p === cin ? moved : p)), added] };
}

/** `circuit` with `part`'s spec changed by `change`; the circuit itself is untouched. */
export function replaced(circuit: Circuit, part: PartSpecBase, change: object): Circuit {
  return { ...circuit, parts: circuit.parts.map((p) => (p === part ? { ...p, ...change } : p)) };
}
