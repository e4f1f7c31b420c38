import type { MapReader, ValueReader } from '../reading/reader.ts';
import { quantities } from '../units/quantity.ts';
import { BOLTZMANN } from '../units/constants.ts';
import { stampAdmittance, stampConductance, stampCurrent } from './stamps.ts';
import { across } from './solution.ts';
import type { Binder, ComplexMna, Device, Link, Mna, NoiseSource, StepInfo } from './device.ts';
import type { Conditions, PartKind, PartSpecBase } from './part-kind.ts';
import { nodeOf, readBetween } from './pins.ts';
import { readPresetOrMap } from './preset.ts';
import { diodePresetNames, diodePresets, type DiodeCapacitance, type DiodeParameters, type DiodePresetName } from './diode-presets.ts';
import { Junction } from './junction.ts';
import { JunctionCharge } from './junction-charge.ts';

export interface DiodeSpec extends PartSpecBase {
  readonly kind: 'diode';
  readonly preset: DiodePresetName;
  readonly parameters: DiodeParameters;
}

/**
 * `diode: small-signal` or `diode: { preset: schottky, saturation-current, emission,
 * series-resistance, breakdown, capacitance }`, `between: [anode, cathode]`.
 */
export const diode: PartKind<DiodeSpec> = {
  key: 'diode',
  summary: 'diode: `diode: <class>` or `{ preset, saturation-current, emission, series-resistance, breakdown, capacitance }`, `between: [anode, cathode]`',
  read: (name, main, options) => {
    const { preset, overrides } = readPresetOrMap(main, diodePresetNames, 'diode', 'small-signal', false);
    const parameters = overrides === undefined ? diodePresets[preset] : readOverrides(overrides, diodePresets[preset]);
    return { kind: 'diode', name, preset, parameters, pins: readBetween(options) };
  },
  create: (spec, conditions) => new DiodeDevice(spec, conditions),
};

function readOverrides(m: MapReader, base: DiodeParameters): DiodeParameters {
  const breakdown = m.get('breakdown')?.number(quantities.voltage, { above: 0 }) ?? base.breakdown;
  const capacitance = readCapacitance(m.get('capacitance'), base.capacitance);
  const parameters: DiodeParameters = {
    saturationCurrent: m.numberOr('saturation-current', quantities.current, base.saturationCurrent, { above: 0 }),
    emission: m.numberOr('emission', quantities.count, base.emission, { above: 0 }),
    seriesResistance: m.numberOr('series-resistance', quantities.resistance, base.seriesResistance, { min: 0 }),
    ...(breakdown !== undefined ? { breakdown } : {}),
    ...(capacitance !== undefined ? { capacitance } : {}),
    energyGap: base.energyGap,
    temperatureExponent: base.temperatureExponent,
  };
  m.finish();
  return parameters;
}

/** `capacitance: 2p` (fixed; 0 for none) or `capacitance: { zero-bias: 4p, potential: 0.7, grading: 0.5 }`. */
function readCapacitance(value: ValueReader | undefined, base: DiodeCapacitance | undefined): DiodeCapacitance | undefined {
  if (value === undefined) return base;
  if (value.kind() !== 'map') {
    const fixed = value.number(quantities.capacitance, { min: 0 });
    return fixed === 0 ? undefined : { zeroBias: fixed, potential: 1, grading: 0 };
  }
  const m = value.map();
  const zeroBias = m.need('zero-bias', 'write `zero-bias: 4p`, the capacitance at 0 V')?.number(quantities.capacitance, { above: 0 }) ?? NaN;
  const potential = m.numberOr('potential', quantities.voltage, base?.potential ?? 0.7, { above: 0 });
  const gradingValue = m.get('grading');
  const grading = gradingValue?.number(quantities.count, { min: 0 }) ?? base?.grading ?? 0.5;
  if (grading >= 1) gradingValue?.fail(`grading ${grading} must be below 1`, '0.5 is an abrupt junction, 1/3 a linearly graded one, 0 a fixed capacitance');
  m.finish();
  return { zeroBias, potential, grading };
}

/**
 * The junction between an internal node and the cathode, with the series resistance from the
 * anode to that node (absent when 0) and the junction's capacitance across the junction.
 */
class DiodeDevice implements Device {
  readonly kind = 'diode';
  readonly name: string;
  private anode = -1;
  private cathode = -1;
  /** The junction's own node: internal with a series resistance, the anode without. */
  private inner = -1;
  private readonly junction: Junction;
  private readonly charge: JunctionCharge | null;

  constructor(
    private readonly spec: DiodeSpec,
    conditions: Conditions,
  ) {
    this.name = spec.name;
    this.junction = new Junction(spec.parameters, conditions.temperature);
    this.charge = spec.parameters.capacitance !== undefined ? new JunctionCharge(spec.parameters.capacitance) : null;
  }

  bind(binder: Binder): void {
    this.anode = binder.node(nodeOf(this.spec.pins, 'a'));
    this.cathode = binder.node(nodeOf(this.spec.pins, 'b'));
    this.inner = this.spec.parameters.seriesResistance > 0 ? binder.internal(`${this.name} junction`) : this.anode;
  }

  stampStatic(m: Mna): void {
    if (this.inner !== this.anode) stampConductance(m, this.anode, this.inner, 1 / this.spec.parameters.seriesResistance);
  }

  stampNewton(m: Mna, x: Float64Array, step: StepInfo): boolean {
    const v = across(x, this.inner, this.cathode);
    const u = this.junction.linearize(v);
    const g = this.junction.conductance;
    stampConductance(m, this.inner, this.cathode, g);
    stampCurrent(m, this.inner, this.cathode, this.junction.current - g * u);
    this.charge?.stamp(m, this.inner, this.cathode, u, step);
    return u !== v;
  }

  /** Series resistance, the junction's slope at the operating point, and its capacitance there. */
  stampSmallSignal(m: ComplexMna, x: Float64Array, omega: number): void {
    this.stampStatic(m);
    const v = across(x, this.inner, this.cathode);
    stampAdmittance(m, this.inner, this.cathode, this.junction.slope(v), this.charge === null ? 0 : omega * this.charge.capacitance(v));
  }

  /** The junction's shot noise at the operating point, and the series resistance's thermal noise. */
  noiseSources(x: Float64Array, kelvin: number): readonly NoiseSource[] {
    const shot: NoiseSource = { source: 'shot', into: this.inner, from: this.cathode, white: this.junction.shotNoise(across(x, this.inner, this.cathode)), corner: 0 };
    if (this.inner === this.anode) return [shot];
    return [shot, { source: 'thermal', into: this.anode, from: this.inner, white: (4 * BOLTZMANN * kelvin) / this.spec.parameters.seriesResistance, corner: 0 }];
  }

  accept(x: Float64Array, step: StepInfo): void {
    this.charge?.accept(across(x, this.inner, this.cathode), step);
  }

  links(): readonly Link[] {
    const junction: Link = { a: this.inner, b: this.cathode, kind: 'conductive' };
    return this.inner === this.anode ? [junction] : [{ a: this.anode, b: this.inner, kind: 'conductive' }, junction];
  }
}
