import type { MapReader, ValueReader } from '../reading/reader.ts';
import { quantities } from '../units/quantity.ts';
import { readNamedPins } from './pins.ts';
import { opampPresetNames, opampPresets, type OpampParameters, type OpampPresetName } from './opamp-presets.ts';
import type { OpampSpec } from './opamp-spec.ts';
import { readSupply } from './supply.ts';
import { readPresetOrMap } from './preset.ts';

/**
 * Read an op-amp part: `opamp: general-purpose` or `opamp: { preset: jfet-input, gbw: 5MHz,
 * ... }`, with `plus`, `minus`, `out` and `supply: [low, high]` (volts or node names).
 */
export function readOpamp(name: string, main: ValueReader, options: MapReader): OpampSpec {
  const { preset, parameters } = readParameters(main);
  const pins = readNamedPins(options, ['plus', 'minus', 'out']);
  const supply = readSupply(options, preset !== 'ideal', pins);
  return { kind: 'opamp', name, preset, parameters, pins, ...(supply ? { supply } : {}) };
}

function readParameters(main: ValueReader): { preset: OpampPresetName; parameters: OpampParameters } {
  const { preset, overrides: m } = readPresetOrMap(main, opampPresetNames, 'op-amp', 'general-purpose', true);
  if (m === undefined) return { preset, parameters: opampPresets[preset] };
  const base: OpampParameters = opampPresets[preset];
  const parameters: OpampParameters = {
    gain: m.numberOr('gain', quantities.gain, base.gain, { above: 1 }),
    gbw: m.numberOr('gbw', quantities.frequency, base.gbw, { above: 0 }),
    slew: m.numberOr('slew', quantities.slewRate, base.slew, { above: 0 }),
    headroom: readHeadroom(m, base.headroom),
    rout: m.numberOr('rout', quantities.resistance, base.rout, { min: 0 }),
    offset: m.numberOr('offset', quantities.voltage, base.offset),
    bias: m.numberOr('bias', quantities.current, base.bias),
    ...optional(m, 'second-pole', 'secondPole', quantities.frequency, base.secondPole),
    ...optional(m, 'current-limit', 'currentLimit', quantities.current, base.currentLimit),
    noiseVoltage: m.numberOr('noise-voltage', quantities.voltageDensity, base.noiseVoltage, { min: 0 }),
    noiseCorner: m.numberOr('noise-corner', quantities.frequency, base.noiseCorner, { min: 0 }),
    noiseCurrent: m.numberOr('noise-current', quantities.currentDensity, base.noiseCurrent, { min: 0 }),
  };
  if (parameters.currentLimit !== undefined && parameters.rout === 0) {
    (m.get('current-limit') ?? m.get('rout') ?? main).fail('a current limit needs an output resistance above 0', 'set `rout:` (tens of ohms is typical) or remove `current-limit`');
  }
  m.finish();
  return { preset, parameters };
}

function readHeadroom(m: MapReader, fallback: readonly [number, number]): readonly [number, number] {
  const v = m.get('headroom');
  if (v === undefined) return fallback;
  if (v.kind() !== 'list') {
    const h = v.number(quantities.voltage, { min: 0 });
    return [h, h];
  }
  const items = v.list();
  if (items.length !== 2) {
    v.fail('`headroom` is one number or [low, high]', 'write `headroom: 1.5` or `headroom: [1.2, 1.5]`');
    return fallback;
  }
  return [items[0].number(quantities.voltage, { min: 0 }), items[1].number(quantities.voltage, { min: 0 })];
}

function optional<K extends string>(m: MapReader, key: string, field: K, q: typeof quantities.frequency | typeof quantities.current, fallback: number | undefined): Partial<Record<K, number>> {
  const v = m.get(key);
  const value = v !== undefined ? v.number(q, { above: 0 }) : fallback;
  return value === undefined ? {} : ({ [field]: value } as Record<K, number>);
}
