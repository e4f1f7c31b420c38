import { quantities } from '../units/quantity.ts';
import type { OpampParameters } from './opamp-presets.ts';
import type { OpampSpec } from './opamp-spec.ts';
import type { TolerableValue } from './tolerance.ts';
import type { NumberLimits } from '../reading/reader.ts';
import type { Quantity } from '../units/quantity.ts';

type Numeric = 'gbw' | 'slew' | 'offset';

function parameter(field: Numeric, quantity: Quantity, limits?: NumberLimits): TolerableValue<OpampSpec> {
  return {
    key: field,
    quantity,
    ...(limits ? { limits } : {}),
    values: (spec) => [spec.parameters[field]],
    vary: (spec, change) => withParameters(spec, { [field]: change(spec.parameters[field]) }),
  };
}

function withParameters(spec: OpampSpec, changes: Partial<OpampParameters>): OpampSpec {
  return { ...spec, parameters: { ...spec.parameters, ...changes } };
}

/**
 * What `tolerance: { gbw: 33%, offset: 2mV, slew: 20%, headroom: 0.2 }` may vary on an op-amp:
 * the figures that spread most between units of one class. One draw moves both headrooms
 * together (the output stage is one piece of silicon).
 */
export const opampTolerable: readonly TolerableValue<OpampSpec>[] = [
  parameter('gbw', quantities.frequency, { above: 0 }),
  parameter('slew', quantities.slewRate, { above: 0 }),
  parameter('offset', quantities.voltage),
  {
    key: 'headroom',
    quantity: quantities.voltage,
    limits: { min: 0 },
    values: (spec) => spec.parameters.headroom,
    vary: (spec, change) => withParameters(spec, { headroom: [change(spec.parameters.headroom[0]), change(spec.parameters.headroom[1])] }),
  },
];
