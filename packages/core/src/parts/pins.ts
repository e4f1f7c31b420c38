import type { MapReader } from '../reading/reader.ts';
import type { PinRef } from './part-kind.ts';

/**
 * Read `between: [a, b]`, the two pins of a two-pin part. For sources `a` is the positive
 * end; a current source drives its current from `a` through itself into `b`.
 */
export function readBetween(options: MapReader): PinRef[] {
  const value = options.need('between', 'write `between: [a, b]` with the two node names');
  if (value === undefined) return [];
  const items = value.list();
  if (items.length !== 2) {
    value.fail(`\`between\` needs exactly two node names, found ${items.length}`, 'write `between: [a, b]`');
    return [];
  }
  return items.map((item, i) => pinRef(i === 0 ? 'a' : 'b', item));
}

/** Pins written as keys of their own (`plus: in`, `out: vout`), each required. */
export function readNamedPins(options: MapReader, names: readonly string[]): PinRef[] {
  const pins: PinRef[] = [];
  for (const pin of names) {
    const v = options.need(pin, `write \`${pin}: <node>\``);
    if (v !== undefined) pins.push(pinRef(pin, v));
  }
  return pins;
}

/** A named pin read from one value (e.g. an op-amp's `out: vout`). */
export function pinRef(pin: string, value: { node(): string; path: readonly (string | number)[]; position?: { line: number; column: number } }): PinRef {
  return { pin, node: value.node(), path: value.path, position: value.position };
}

/** The pins `a` and `b` of a two-pin part made in code (a converter's sampling parts, a hint's trial part): no place in a file. */
export function betweenPins(a: string, b: string): PinRef[] {
  return [
    { pin: 'a', node: a, path: [] },
    { pin: 'b', node: b, path: [] },
  ];
}

/** The node of pin `pin` of a spec, for `bind`. */
export function nodeOf(pins: readonly PinRef[], pin: string): string {
  const found = pins.find((p) => p.pin === pin);
  if (found === undefined) throw new Error(`internal: pin ${pin} missing`);
  return found.node;
}
