import type { MapReader, ValueReader } from '../reading/reader.ts';
import { suggestion } from '../reading/suggest.ts';

/**
 * A class preset's name (`general-purpose`, `schottky`, ...) among `names` for a part of kind
 * `kind` (`op-amp`, `diode`); an unknown name is an error with the closest name suggested,
 * and `fallback` stands in.
 */
export function readPresetName<Name extends string>(value: ValueReader, names: readonly Name[], kind: string, fallback: Name): Name {
  const text = value.kind() === 'scalar' ? value.text() : '';
  if ((names as readonly string[]).includes(text)) return text as Name;
  const article = /^[aeiou]/.test(kind) ? 'an' : 'a';
  value.fail(`'${text}' is not ${article} ${kind} class`, suggestion(text, names, `${kind} classes`));
  return fallback;
}

/**
 * A part's main value: a class preset (`diode: schottky`), or a map of a preset and
 * overrides (`diode: { preset: schottky, breakdown: 5.1 }`). In a map `preset` may be left
 * out unless `presetRequired`; `fallback` is then the class. For a map the caller reads the
 * overrides from `overrides` and calls its `finish`.
 */
export function readPresetOrMap<Name extends string>(main: ValueReader, names: readonly Name[], kind: string, fallback: Name, presetRequired: boolean): { preset: Name; overrides?: MapReader } {
  if (main.kind() !== 'map') return { preset: readPresetName(main, names, kind, fallback) };
  const overrides = main.map();
  const value = presetRequired ? overrides.need('preset', `name a class: ${names.join(', ')}`) : overrides.get('preset');
  return { preset: value !== undefined ? readPresetName(value, names, kind, fallback) : fallback, overrides };
}
