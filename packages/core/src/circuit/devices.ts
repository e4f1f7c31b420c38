import type { Device } from '../parts/device.ts';
import { partKind } from '../parts/index.ts';
import type { PartSpecBase } from '../parts/part-kind.ts';
import type { SimulateSettings } from './circuit.ts';

/** The devices of parts, in order, under the conditions a run's settings put them in. */
export function createDevices(parts: readonly PartSpecBase[], settings: Pick<SimulateSettings, 'temperature'>): Device[] {
  const conditions = { temperature: settings.temperature };
  return parts.map((spec) => partKind(spec.kind).create(spec, conditions));
}
