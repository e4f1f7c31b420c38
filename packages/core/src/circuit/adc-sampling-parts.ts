import type { PartSpecBase } from '../parts/part-kind.ts';
import { betweenPins } from '../parts/pins.ts';
import type { SwitchSchedule, SwitchSpec } from '../parts/switch.ts';
import { defaultOffResistance } from '../parts/switch.ts';
import type { CapacitorSpec } from '../parts/capacitor.ts';
import type { VoltageSourceSpec } from '../parts/voltage-source.ts';
import { ConstantWave } from '../waves/constant.ts';
import type { SamplingSpec, SampleTimes } from './adc-spec.ts';

/** On resistance of the switch that sets the capacitor to its precharge voltage. */
const prechargeResistance = 1;

/**
 * The ordinary parts that model a converter's sampling: per input node, a switch that
 * connects it to a capacitor for the acquisition window before each instant, and (with
 * `precharge`) a second switch that sets the capacitor to that voltage between windows.
 * Named `ADC.sample-switch`, `ADC.sample-capacitor`, ...; the capacitor's node is `ADC.hold`
 * (`ADC.hold-p` and `ADC.hold-n` for a differential input). The engine sees plain parts.
 */
export function samplingParts(adc: string, input: readonly [string, string], sampling: SamplingSpec, times: SampleTimes): { parts: PartSpecBase[]; held: [string, string] } {
  const windows = acquisitionWindows(sampling.acquisition, times);
  const sides = input[1] === 'gnd' ? [{ node: input[0], suffix: '' }] : [{ node: input[0], suffix: '-p' }, { node: input[1], suffix: '-n' }];
  const parts: PartSpecBase[] = [];
  if (sampling.precharge !== undefined) {
    const source: VoltageSourceSpec = { kind: 'voltage', name: `${adc}.precharge-source`, wave: new ConstantWave(sampling.precharge), pins: betweenPins(`${adc}.precharge`, 'gnd') };
    parts.push(source);
  }
  const held = sides.map(({ node, suffix }) => {
    const hold = `${adc}.hold${suffix}`;
    const sample: SwitchSpec = { kind: 'switch', name: `${adc}.sample-switch${suffix}`, onResistance: sampling.resistance, offResistance: defaultOffResistance, schedule: windows, pins: betweenPins(node, hold) };
    const capacitor: CapacitorSpec = { kind: 'capacitor', name: `${adc}.sample-capacitor${suffix}`, capacitance: sampling.capacitance, pins: betweenPins(hold, 'gnd') };
    parts.push(sample, capacitor);
    if (sampling.precharge !== undefined) {
      const reset: SwitchSpec = { kind: 'switch', name: `${adc}.precharge-switch${suffix}`, onResistance: prechargeResistance, offResistance: defaultOffResistance, schedule: { ...windows, inverted: true }, pins: betweenPins(hold, `${adc}.precharge`) };
      parts.push(reset);
    }
    return hold;
  });
  return { parts, held: [held[0], held[1] ?? 'gnd'] };
}

/** The windows (instant - acquisition, instant] as a switch schedule. */
function acquisitionWindows(acquisition: number, times: SampleTimes): SwitchSchedule {
  if ('rate' in times) return { edges: [0, acquisition], origin: times.start - acquisition, period: 1 / times.rate, inverted: false };
  return { edges: times.times.flatMap((t) => [t - acquisition, t]), origin: 0, period: Infinity, inverted: false };
}
