import type { MapReader } from '../reading/reader.ts';
import { parseQuantity } from '../units/si.ts';
import { quantities } from '../units/quantity.ts';
import type { PinRef } from './part-kind.ts';
import { pinRef } from './pins.ts';

/** A supply rail: a fixed voltage, or a node whose voltage the part follows. */
export type Supply = { readonly volts: number } | { readonly node: string };

/**
 * Read `supply: [low, high]` (volts or node names) of an amplifier or comparator. A rail
 * written as a node becomes a pin (`supply-low`, `supply-high`) pushed onto `pins`.
 */
export function readSupply(options: MapReader, required: boolean, pins: PinRef[]): readonly [Supply, Supply] | undefined {
  const v = required ? options.need('supply', 'write `supply: [-12, 12]` with volts or node names') : options.get('supply');
  if (v === undefined) return undefined;
  const items = v.list();
  if (items.length !== 2) {
    v.fail('`supply` needs two entries, [low, high]', 'write `supply: [-12, 12]` or `supply: [vee, vcc]`');
    return undefined;
  }
  const rails = items.map((item, i): Supply => {
    const text = item.node();
    const parsed = parseQuantity(text, quantities.voltage);
    if ('value' in parsed) return { volts: parsed.value };
    pins.push(pinRef(i === 0 ? 'supply-low' : 'supply-high', item));
    return { node: text };
  });
  const [low, high] = rails;
  if ('volts' in low && 'volts' in high && !(high.volts > low.volts)) v.fail(`the high supply (${high.volts} V) must be above the low one (${low.volts} V)`, 'write `supply: [low, high]`');
  return [low, high];
}
