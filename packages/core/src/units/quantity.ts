/**
 * A physical quantity a circuit value may carry: its accepted unit symbols (after the SI
 * prefix) and any special notation. A plain number is always accepted in base units.
 */
export interface Quantity {
  /** Word used in error messages, e.g. "resistance". */
  readonly name: string;
  /** Unit symbols accepted after the prefix; the first one is used when formatting. */
  readonly units: readonly string[];
  /** Accept `dB` (voltage ratio, 20·log10) as well: `100dB` is 1e5. */
  readonly decibels?: boolean;
  /** Accept `%`: `1%` is 0.01. */
  readonly percent?: boolean;
  /** A rate per time: the denominator takes its own prefix, `13V/us` is 13e6 V/s. */
  readonly perTime?: boolean;
}

export const quantities = {
  resistance: { name: 'resistance', units: ['Ω', 'ohm', 'Ohm', 'R'] },
  capacitance: { name: 'capacitance', units: ['F'] },
  inductance: { name: 'inductance', units: ['H'] },
  voltage: { name: 'voltage', units: ['V'] },
  current: { name: 'current', units: ['A'] },
  frequency: { name: 'frequency', units: ['Hz'] },
  /** Samples per second as data sheets write them: `10kS/s`, `10ksps`, `1MSPS`, or hertz. */
  sampleRate: { name: 'sample rate', units: ['S/s', 'sps', 'SPS', 'Hz'] },
  time: { name: 'time', units: ['s'] },
  slewRate: { name: 'slew rate', units: ['V/s'], perTime: true },
  gain: { name: 'gain', units: ['V/V'], decibels: true },
  fraction: { name: 'fraction', units: [], percent: true },
  angle: { name: 'angle', units: ['°', 'deg'] },
  /** Degrees Celsius (`simulate: temperature`). */
  temperature: { name: 'temperature', units: ['°C', 'degC'] },
  /** Noise voltage density (an amplifier's `noise-voltage`). */
  voltageDensity: { name: 'voltage noise density', units: ['V/√Hz', 'V/rtHz'] },
  /** Noise current density (an amplifier's `noise-current`). */
  currentDensity: { name: 'current noise density', units: ['A/√Hz', 'A/rtHz'] },
  /** A pure number (counts, bits); no unit, SI prefixes still allowed. */
  count: { name: 'number', units: [] },
} as const satisfies Record<string, Quantity>;
