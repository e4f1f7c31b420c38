import type { ValueReader } from '../reading/reader.ts';
import { suggestion } from '../reading/suggest.ts';
import type { PartSpecBase } from '../parts/part-kind.ts';
import { quantities } from '../units/quantity.ts';
import { formatSI } from '../units/format.ts';
import type { ResponseSettings } from './circuit.ts';

/** Points per decade when `per-decade` is left out. */
export const defaultPerDecade = 50;
/** Above this many points a sweep is probably a typo in a prefix. */
const manyPoints = 1e5;
/** Part kinds that can carry the test signal. */
const sourceKinds = ['voltage', 'current'];

/**
 * Read `response: { input, from, to, per-decade }`. `parts` are the circuit's own parts: the
 * input must name one of its voltage or current sources.
 */
export function readResponseSection(value: ValueReader | undefined, parts: readonly PartSpecBase[]): ResponseSettings | undefined {
  if (value === undefined) return undefined;
  const example = 'for example `response: { input: VIN, from: 10, to: 1M }`';
  if (value.kind() !== 'map') {
    value.fail('`response` must be a map of keys', example);
    return undefined;
  }
  const m = value.map();
  const input = readInput(m.need('input', 'write `input: VIN`, the voltage or current source that carries the test signal'), parts);
  const fromValue = m.need('from', 'write `from: 10`, the lowest frequency in Hz');
  const toValue = m.need('to', 'write `to: 1M`, the highest frequency in Hz');
  const from = fromValue?.number(quantities.frequency, { above: 0 }) ?? NaN;
  const to = toValue?.number(quantities.frequency, { above: 0 }) ?? NaN;
  const perDecade = m.numberOr('per-decade', quantities.count, defaultPerDecade, { min: 1, max: 10000, integer: true });
  m.finish();
  if (!(to > from)) {
    if (from > 0 && to > 0) toValue?.fail(`the sweep ends (${formatSI(to, 'Hz')}) at or below where it starts (${formatSI(from, 'Hz')})`, 'write `to:` above `from:`');
  } else if (Math.log10(to / from) * perDecade > manyPoints) {
    (m.get('per-decade') ?? value).warn(`the sweep makes ${Math.round(Math.log10(to / from) * perDecade)} points`, 'check the prefixes of `from` and `to`: m is milli, M is mega');
  }
  return { input, from, to, perDecade };
}

function readInput(value: ValueReader | undefined, parts: readonly PartSpecBase[]): string {
  if (value === undefined) return '';
  const name = value.text();
  const sources = parts.filter((p) => sourceKinds.includes(p.kind)).map((p) => p.name);
  const part = parts.find((p) => p.name === name);
  if (part === undefined) value.fail(`response input '${name}' names no part of this circuit`, suggestion(name, sources, 'voltage and current sources'));
  else if (!sourceKinds.includes(part.kind)) value.fail(`response input '${name}' is a ${part.kind}, not a voltage or current source`, sources.length > 0 ? `name a source: ${sources.join(', ')}` : 'add a voltage source at the stage input and name it here');
  return name;
}
