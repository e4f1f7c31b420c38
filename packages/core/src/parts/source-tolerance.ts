import type { Quantity } from '../units/quantity.ts';
import { variedWave } from '../waves/varied-wave.ts';
import type { Wave } from '../waves/wave.ts';
import type { TolerableValue } from './tolerance.ts';

/**
 * The tolerance of an independent source: `tolerance: 2%` scales its whole wave (a reference
 * that is 2% high is 2% high at every instant), `tolerance: 10mV` shifts it.
 */
export function sourceTolerance<Spec extends { readonly wave: Wave }>(key: string, quantity: Quantity): TolerableValue<Spec> {
  return {
    key,
    quantity,
    // A wave has no single nominal number to check against limits: sources take any value.
    values: () => [],
    vary: (spec, change) => ({ ...spec, wave: variedWave(spec.wave, change) }),
  };
}
