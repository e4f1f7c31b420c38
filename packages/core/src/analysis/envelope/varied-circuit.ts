import type { Circuit } from '../../circuit/circuit.ts';
import { partKind } from '../../parts/index.ts';
import type { PartSpecBase } from '../../parts/part-kind.ts';
import { deviated, type TolerableValue, type Tolerance } from '../../parts/tolerance.ts';

/** One toleranced value of a circuit: which part, which of its values, how far it may stray. */
/** One toleranced value of a circuit: an axis along which an envelope varies it. */
export interface ToleranceSlot {
  readonly part: string;
  readonly partIndex: number;
  readonly tolerance: Tolerance;
  readonly tolerable: TolerableValue<PartSpecBase>;
}

/** Every toleranced value of `circuit`, in part order: the axes of its variation. */
export function toleranceSlots(circuit: Circuit): ToleranceSlot[] {
  const slots: ToleranceSlot[] = [];
  circuit.parts.forEach((spec, partIndex) => {
    const tolerable = partKind(spec.kind).tolerable ?? [];
    for (const tolerance of spec.tolerances ?? []) {
      const value = tolerable.find((t) => t.key === tolerance.key);
      if (value === undefined) throw new Error(`internal: ${spec.kind} has no tolerable value ${tolerance.key}`);
      slots.push({ part: spec.name, partIndex, tolerance, tolerable: value });
    }
  });
  return slots;
}

/**
 * `circuit` with every slot's value moved to its deviation (one number per slot in [-1, 1],
 * ±1 being the tolerance's limits). The circuit itself is left untouched.
 */
export function variedCircuit(circuit: Circuit, slots: readonly ToleranceSlot[], deviations: ArrayLike<number>): Circuit {
  const parts = circuit.parts.slice();
  slots.forEach((slot, i) => {
    const d = deviations[i];
    parts[slot.partIndex] = slot.tolerable.vary(parts[slot.partIndex], (nominal) => deviated(slot.tolerance, nominal, d));
  });
  return { ...circuit, parts };
}
