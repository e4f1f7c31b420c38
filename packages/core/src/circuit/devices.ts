import type { Device } from '../parts/device.ts';
import { partKind } from '../parts/index.ts';
import type { Circuit } from './circuit.ts';

/** The devices of a circuit's parts, in part order, under the run's conditions. */
export function createDevices(circuit: Circuit): Device[] {
  const conditions = { temperature: circuit.simulate.temperature };
  return circuit.parts.map((spec) => partKind(spec.kind).create(spec, conditions));
}
