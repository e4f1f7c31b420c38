import type { MapReader, ValueReader } from '../reading/reader.ts';
import { suggestion } from '../reading/suggest.ts';
import type { PartSpecBase } from '../parts/part-kind.ts';
import { quantities } from '../units/quantity.ts';
import type { Quantity } from '../units/quantity.ts';
import { formatSI } from '../units/format.ts';
import { parseQuantity } from '../units/si.ts';
import { checkTimes } from '../waves/points.ts';
import type { AdcSpec, SampleTimes, SamplingSpec } from './adc-spec.ts';
import { samplingParts } from './adc-sampling-parts.ts';

/** Converter errors and noise are written in LSB: `offset: 1.5` or `offset: 1.5LSB`. */
const lsbs: Quantity = { name: 'number of LSB', units: ['LSB'] };
/** Above this many samples a rate is probably a prefix typo. */
const manySamples = 1e7;
/** Above this many samples a converter's codes could not be kept: refused. */
const mostSamples = 1e9;

/** The `adc:` section read: the converters, and the parts their sampling adds to the circuit. */
export interface AdcSection {
  readonly adcs: AdcSpec[];
  readonly parts: PartSpecBase[];
}

/**
 * Read `adc: { NAME: { input, bits, range, rate | times, ... } }`. `nodes` are the circuit's
 * nodes (inputs must name one of them); `duration` is the run's length (instants after it
 * are never reached).
 */
export function readAdcSection(value: ValueReader | undefined, nodes: readonly string[], duration: number): AdcSection {
  const section: AdcSection = { adcs: [], parts: [] };
  if (value === undefined) return section;
  const map = value.map();
  if (value.kind() === 'map' && map.keys().length === 0) value.fail('the adc section is empty', 'add a converter, e.g. MCU: { input: out, bits: 12, range: [0, 3.3], rate: 20k }');
  for (const name of map.keys()) {
    const entry = map.get(name)!;
    if (!/^[A-Za-z0-9_.-]+$/.test(name)) entry.fail(`ADC name '${name}' has characters other than letters, digits, _, - and .`, 'the name becomes a file name (adc-NAME.csv): rename it');
    const spec = readAdc(name, entry, nodes, duration);
    if (spec === undefined) continue;
    if (spec.sampling === undefined) {
      section.adcs.push(spec);
      continue;
    }
    const { parts, held } = samplingParts(name, spec.input, spec.sampling, spec.times);
    section.parts.push(...parts);
    section.adcs.push({ ...spec, held });
  }
  return section;
}

function readAdc(name: string, value: ValueReader, nodes: readonly string[], duration: number): AdcSpec | undefined {
  if (value.kind() !== 'map') {
    value.fail(`ADC '${name}' must be a map of keys`, `for example ${name}: { input: out, bits: 12, range: [0, 3.3], rate: 20k }`);
    return undefined;
  }
  const m = value.map();
  const input = readInput(m.need('input', 'write `input: out`, or `input: [p, n]` for a differential input'), nodes);
  const bits = m.need('bits', 'write `bits: 12`')?.number(quantities.count, { min: 1, max: 24, integer: true }) ?? NaN;
  const [low, high] = readRange(m.need('range', 'write `range: [0, 3.3]`, the input volts of code 0 and of full scale'), nodes);
  const times = readTimes(m, duration);
  const spec: AdcSpec = {
    name,
    input,
    held: input,
    bits,
    low,
    high,
    times,
    rounding: m.choiceOr('rounding', ['nearest', 'down'] as const, 'nearest'),
    coding: m.choiceOr('coding', ['unsigned', 'offset-binary', 'twos-complement'] as const, 'unsigned'),
    offset: m.numberOr('offset', lsbs, 0),
    gainError: m.numberOr('gain-error', lsbs, 0),
    noise: m.numberOr('noise', lsbs, 0, { min: 0 }),
    seed: m.numberOr('seed', quantities.count, 1, { min: 0, max: 2 ** 31 - 1, integer: true }),
    average: m.numberOr('average', quantities.count, 1, { min: 1, max: 65536, integer: true }),
  };
  const samplingValue = m.get('sampling');
  const sampling = samplingValue === undefined ? undefined : readSampling(samplingValue, times);
  m.finish();
  return sampling === undefined ? spec : { ...spec, sampling };
}

function readInput(value: ValueReader | undefined, nodes: readonly string[]): [string, string] {
  if (value === undefined) return ['', 'gnd'];
  const known = (item: ValueReader): string => {
    const node = item.node();
    if (node === '' || node === 'gnd' || nodes.includes(node)) return node;
    item.fail(`ADC input '${node}' names no node of this circuit`, suggestion(node, nodes, 'nodes'));
    return '';
  };
  if (value.kind() !== 'list') {
    const node = known(value);
    if (node === 'gnd') value.fail('the ADC input is gnd, always 0 V', 'name the node to convert, e.g. `input: out`');
    return [node, 'gnd'];
  }
  const items = value.list();
  if (items.length !== 2) {
    value.fail(`a differential input needs two nodes, [p, n], found ${items.length}`, 'write `input: [p, n]`, or one node for a single-ended input');
    return ['', 'gnd'];
  }
  const [p, n] = items.map(known);
  if (p !== '' && p === n) value.fail(`both ends of the differential input are '${p}'`, 'write `input: [p, n]` with two different nodes');
  return [p, n];
}

/** `range: [low, high]`: volts, or node names for a ratiometric converter. */
function readRange(value: ValueReader | undefined, nodes: readonly string[]): [number | string, number | string] {
  const items = value?.list() ?? [];
  if (value === undefined || (value.kind() === 'list' && items.length !== 2)) {
    value?.fail(`range needs two voltages or node names, [low, high], found ${items.length}`, 'write `range: [0, 3.3]`, `range: [-5, 5]` or, for a reference that is a node, `range: [gnd, vref]`');
    return [NaN, NaN];
  }
  const [low, high] = items.map((item): number | string => {
    const text = item.node();
    const volts = parseQuantity(text, quantities.voltage);
    if ('value' in volts) return volts.value;
    if (text === 'gnd') return 0;
    if (text !== '' && !nodes.includes(text)) item.fail(`range: '${text}' is neither a voltage nor a node of this circuit`, suggestion(text, nodes, 'nodes'));
    return text;
  });
  if (typeof low === 'number' && typeof high === 'number' && items.length === 2 && !(high > low)) value.fail(`the range's high end (${high} V) must be above its low end (${low} V)`, 'write `range: [low, high]`');
  return [low, high];
}

function readTimes(m: MapReader, duration: number): SampleTimes {
  const rateValue = m.get('rate');
  const timesValue = m.get('times');
  const startValue = m.get('start');
  if (rateValue !== undefined && timesValue !== undefined) {
    timesValue.fail('an ADC takes `rate:` or `times:`, not both', 'keep `rate:` (with `start:`) for regular sampling, or `times:` for listed instants');
  }
  if (timesValue !== undefined && rateValue === undefined) {
    if (startValue !== undefined) startValue.fail('`start:` goes with `rate:`; listed `times:` already say when', 'remove `start:`');
    const items = timesValue.list();
    const times = items.map((item) => item.number(quantities.time));
    if (items.length === 0 && timesValue.kind() === 'list') timesValue.fail('the list of sample times is empty', 'write e.g. `times: [1m, 2m, 5m]`');
    checkTimes(times, (i, message, hint) => items[i].fail(message.replace('point', 'sample'), hint));
    const late = times.filter((t) => t > duration).length;
    if (late > 0) timesValue.warn(`${late} sample time(s) lie after the end of the run (${formatSI(duration, 's')}) and are never converted`, 'lengthen `duration` under simulate, or remove them');
    return { times };
  }
  if (rateValue === undefined) m.fail('an ADC needs `rate:` or `times:`', 'write e.g. `rate: 20k` (samples per second)');
  const rate = rateValue?.number(quantities.sampleRate, { above: 0 }) ?? NaN;
  const start = m.numberOr('start', quantities.time, 0, { min: 0 });
  const samples = (duration - start) * rate;
  const prefixHint = 'check the prefix: k is kilo, M is mega, m is milli';
  if (start > duration) startValue?.fail(`start ${formatSI(start, 's')} is after the end of the run (${formatSI(duration, 's')})`, 'make it at most the duration under simulate');
  else if (samples > mostSamples) rateValue?.fail(`rate ${formatSI(rate, 'Hz')} makes ${samples.toExponential(1)} samples, more than a run can keep (${mostSamples.toExponential()})`, prefixHint);
  else if (samples > manySamples) rateValue?.warn(`rate ${formatSI(rate, 'Hz')} makes ${formatSI(samples, '')} samples`, prefixHint);
  return { rate, start };
}

function readSampling(value: ValueReader, times: SampleTimes): SamplingSpec | undefined {
  const m = value.map();
  if (value.kind() !== 'map') return undefined;
  const positive = { above: 0 };
  const capacitance = m.need('capacitance', 'write `capacitance: 10p`, the sampling capacitor')?.number(quantities.capacitance, positive) ?? NaN;
  const resistance = m.need('resistance', 'write `resistance: 1k`, the switch and input path in series')?.number(quantities.resistance, positive) ?? NaN;
  const acquisitionValue = m.need('acquisition', 'write `acquisition: 2u`, how long the capacitor sees the input before each instant');
  const acquisition = acquisitionValue?.number(quantities.time, positive) ?? NaN;
  const prechargeValue = m.get('precharge');
  const precharge = prechargeValue?.number(quantities.voltage);
  m.finish();
  const gap = shortestGap(times);
  if (acquisitionValue !== undefined && acquisition >= gap) {
    acquisitionValue.fail(`the acquisition window ${formatSI(acquisition, 's')} is not shorter than the time between samples (${formatSI(gap, 's')})`, 'shorten `acquisition`, or sample less often');
  }
  return { capacitance, resistance, acquisition, ...(precharge !== undefined ? { precharge } : {}) };
}

/** Shortest time between consecutive instants (Infinity with one or none). */
function shortestGap(times: SampleTimes): number {
  if ('rate' in times) return 1 / times.rate;
  let gap = Infinity;
  for (let i = 1; i < times.times.length; i++) gap = Math.min(gap, times.times[i] - times.times[i - 1]);
  return gap;
}
