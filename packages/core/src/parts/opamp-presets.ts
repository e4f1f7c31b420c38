/** Parameters of the op-amp macro-model, in SI base units. */
export interface OpampParameters {
  /** Open-loop DC gain, V/V. */
  readonly gain: number;
  /** Gain-bandwidth product, Hz. */
  readonly gbw: number;
  /** Slew rate, V/s. */
  readonly slew: number;
  /** How far short of the low and the high supply the output saturates, volts. */
  readonly headroom: readonly [low: number, high: number];
  /** Open-loop output resistance, ohms (0: an ideal voltage output). */
  readonly rout: number;
  /** Input offset voltage, added to v(plus) - v(minus), volts. */
  readonly offset: number;
  /** Input bias current drawn into each input, amperes. */
  readonly bias: number;
  /** Optional second pole, Hz. */
  readonly secondPole?: number;
  /** Optional output current limit, amperes (needs rout > 0). */
  readonly currentLimit?: number;
}

/**
 * Presets by generic class. Every value sits inside the range that amplifiers of that class
 * show across data sheets (from memory), chosen near the middle of each range one by one, so
 * that no preset repeats any one product's figures. Every value can be overridden in the
 * circuit file; docs/guide-opamp.md lists the class ranges.
 */
export const opampPresets = {
  /** Textbook amplifier: very high gain and bandwidth, no slew limit worth the name, swings to the rails. */
  ideal: { gain: 1e6, gbw: 1e9, slew: 1e12, headroom: [0, 0], rout: 0, offset: 0, bias: 0 },
  /** Bipolar general-purpose class: 106 dB, 1.5 MHz, 1 V/µs, 1.5 V short of each rail (class ranges, from memory). */
  'general-purpose': { gain: 2e5, gbw: 1.5e6, slew: 1e6, headroom: [1.5, 1.5], rout: 100, offset: 2e-3, bias: 50e-9, currentLimit: 20e-3 },
  /** JFET-input class: 110 dB, 4 MHz, 10 V/µs, picoamp bias, 1.5 V headroom (class ranges, from memory). */
  'jfet-input': { gain: 3e5, gbw: 4e6, slew: 10e6, headroom: [1.5, 1.5], rout: 80, offset: 2e-3, bias: 50e-12, currentLimit: 25e-3 },
  /** CMOS rail-to-rail output class: 100 dB, 10 MHz, 5 V/µs, swings to 50 mV of each rail (from memory). */
  'rail-to-rail': { gain: 1e5, gbw: 10e6, slew: 5e6, headroom: [0.05, 0.05], rout: 50, offset: 0.5e-3, bias: 1e-12, currentLimit: 40e-3 },
  /** Precision class: 130 dB, 0.5 MHz, 0.2 V/µs, 25 µV offset (from memory). */
  precision: { gain: 3e6, gbw: 0.5e6, slew: 0.2e6, headroom: [1.2, 1.2], rout: 60, offset: 25e-6, bias: 1e-9, currentLimit: 15e-3 },
  /** High-speed voltage-feedback class: 80 dB, 100 MHz, 300 V/µs, second pole near 200 MHz (from memory). */
  'high-speed': { gain: 1e4, gbw: 100e6, slew: 300e6, headroom: [1.5, 1.5], rout: 20, offset: 2e-3, bias: 5e-6, secondPole: 200e6, currentLimit: 60e-3 },
} as const satisfies Record<string, OpampParameters>;

export type OpampPresetName = keyof typeof opampPresets;
export const opampPresetNames = Object.keys(opampPresets) as OpampPresetName[];
