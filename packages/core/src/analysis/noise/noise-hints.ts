import type { Circuit } from '../../circuit/circuit.ts';
import type { OpampSpec } from '../../parts/opamp.ts';
import { opampPresetNames, opampPresets, type OpampParameters } from '../../parts/opamp-presets.ts';
import type { ResistorSpec } from '../../parts/resistor.ts';
import { formatSI } from '../../units/format.ts';
import type { Hint } from '../report/hints.ts';
import { replaced } from '../response/circuit-edits.ts';
import { bandPower } from './band-power.ts';
import type { NoiseContribution } from './types.ts';

/** What the hints need of one output's noise. */
export interface OutputForHints {
  readonly node: string;
  readonly rms: number;
  readonly largest?: NoiseContribution;
  readonly frequency: Float64Array;
  /** Total density, V²/Hz. */
  readonly power: Float64Array;
}

/** Output rms of the same output in a changed circuit. */
export type Reanalyse = (circuit: Circuit) => number;

/**
 * What would halve an output's noise: for its largest contributor, a resistor of a quarter of
 * the value (4kTR halves in volts) or an amplifier class with at most half the density (each
 * tried by a further sweep, so the new total is the circuit's own); and, for any spectrum,
 * the corner of a first-order low-pass at the output that halves the rms.
 */
export function noiseHints(circuit: Circuit, output: OutputForHints, reanalyse: Reanalyse): Hint[] {
  const hints: Hint[] = [];
  if (!(output.rms > 0)) return hints;
  const largest = output.largest;
  const part = largest === undefined ? undefined : circuit.parts.find((p) => p.name === largest.part);
  if (largest !== undefined && part !== undefined) {
    const hint = part.kind === 'resistor' ? resistorHint(circuit, part as ResistorSpec, largest, output, reanalyse) : part.kind === 'opamp' ? amplifierHint(circuit, part as OpampSpec, largest, output, reanalyse) : undefined;
    if (hint !== undefined) hints.push(hint);
  }
  const corner = halvingCorner(output.frequency, output.power, output.rms);
  if (corner !== null) {
    hints.push({
      text: `A first-order low-pass with its corner at ${formatSI(corner, 'Hz', 3)} on ${output.node} would halve its noise to ${formatSI(output.rms / 2, 'V', 3)} rms, if the signal fits below that corner.`,
      values: { corner, rms: output.rms / 2 },
    });
  }
  return hints;
}

const percent = (share: number): string => `${Math.round(share * 100)}%`;

function resistorHint(circuit: Circuit, part: ResistorSpec, largest: NoiseContribution, output: OutputForHints, reanalyse: Reanalyse): Hint {
  const resistance = part.resistance / 4;
  const rms = reanalyse(replaced(circuit, part, { resistance }));
  const said = `${part.name} (${formatSI(part.resistance, 'Ω', 3)}) makes ${percent(largest.share)} of the noise power at ${output.node}.`;
  const change = `from ${formatSI(output.rms, 'V', 3)} to ${formatSI(rms, 'V', 3)} rms`;
  if (rms > 0.9 * output.rms) {
    // A resistor that charges a capacitance: its noise over the whole band is kT/C whatever its value.
    return { text: `${said} A smaller value would not help (${formatSI(resistance, 'Ω', 3)} takes the total ${change}): its noise is limited by the capacitance it works into (kT/C), which a larger capacitance or a lower corner reduces.`, values: { resistance, rms } };
  }
  return {
    text: `${said} At ${formatSI(resistance, 'Ω', 3)} its thermal noise (√(4kTR)) halves; the total would go ${change}. A smaller resistance also moves the gains and corners it sets: check them with voltcast response.`,
    values: { resistance, rms },
  };
}

const figures = {
  voltage: { field: 'noiseVoltage', unit: 'V/√Hz', words: 'input voltage noise' },
  'current at plus': { field: 'noiseCurrent', unit: 'A/√Hz', words: 'input current noise' },
  'current at minus': { field: 'noiseCurrent', unit: 'A/√Hz', words: 'input current noise' },
} as const satisfies Record<string, { field: keyof OpampParameters; unit: string; words: string }>;

function amplifierHint(circuit: Circuit, part: OpampSpec, largest: NoiseContribution, output: OutputForHints, reanalyse: Reanalyse): Hint | undefined {
  const figure = figures[largest.source as keyof typeof figures];
  if (figure === undefined) return undefined;
  const present = part.parameters[figure.field];
  const said = `${part.name}'s ${figure.words} (${formatSI(present, figure.unit, 3)}) makes ${percent(largest.share)} of the noise power at ${output.node}.`;
  // The quietest-but-one is not the point: the class closest to half the figure changes least else.
  const quieter = opampPresetNames.filter((name) => opampPresets[name][figure.field] > 0 && opampPresets[name][figure.field] <= present / 2).sort((a, b) => opampPresets[b][figure.field] - opampPresets[a][figure.field]);
  if (quieter.length === 0) {
    return { text: `${said} No class among the presets has half of it; a lower noise gain (less gain in this stage, more after the filter) reduces its share.`, values: {} };
  }
  const preset = opampPresets[quieter[0]];
  const noise = { noiseVoltage: preset.noiseVoltage, noiseCorner: preset.noiseCorner, noiseCurrent: preset.noiseCurrent };
  const rms = reanalyse(replaced(circuit, part, { parameters: { ...part.parameters, ...noise } }));
  return {
    text:
      `${said} An amplifier of the ${quieter[0]} class (${formatSI(preset[figure.field], figure.unit, 3)}) at least halves it; ` +
      `with that class's noise figures the total would go from ${formatSI(output.rms, 'V', 3)} to ${formatSI(rms, 'V', 3)} rms (check its other figures against the stage).`,
    values: { [figure.field]: preset[figure.field], rms },
  };
}

/**
 * The corner fc of a first-order low-pass 1/(1 + (f/fc)²) on the output's density that halves
 * its rms over the band, by bisection on log fc; null when even a corner at the band's low end
 * does not (the noise lies below it).
 */
export function halvingCorner(f: Float64Array, power: Float64Array, rms: number): number | null {
  const target = (rms / 2) ** 2;
  const filtered = new Float64Array(power.length);
  const through = (corner: number): number => {
    for (let i = 0; i < f.length; i++) filtered[i] = power[i] / (1 + (f[i] / corner) ** 2);
    return bandPower(f, filtered);
  };
  let low = Math.log(f[0]);
  let high = Math.log(f[f.length - 1]) + Math.log(100);
  if (through(Math.exp(low)) > target) return null;
  for (let i = 0; i < 60; i++) {
    const middle = (low + high) / 2;
    if (through(Math.exp(middle)) > target) high = middle;
    else low = middle;
  }
  return Math.exp(low);
}
