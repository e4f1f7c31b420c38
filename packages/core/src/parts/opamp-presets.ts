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
  /** Input voltage noise density above its 1/f corner, V/√Hz (0: none). */
  readonly noiseVoltage: number;
  /** Where the input voltage noise's 1/f rise meets its white floor, Hz (0: white throughout). */
  readonly noiseCorner: number;
  /** Input current noise density at each input, A/√Hz, white (0: none). */
  readonly noiseCurrent: number;
}

/**
 * Presets by generic class. Every value sits inside the range that amplifiers of that class
 * show across data sheets (from memory), chosen near the middle of each range one by one, so
 * that no preset repeats any one product's figures. Every value can be overridden in the
 * circuit file; docs/guide-opamp.md lists the class ranges.
 */
export const opampPresets = {
  /** Textbook amplifier: very high gain and bandwidth, no slew limit worth the name, swings to the rails, makes no noise. */
  ideal: { gain: 1e6, gbw: 1e9, slew: 1e12, headroom: [0, 0], rout: 0, offset: 0, bias: 0, noiseVoltage: 0, noiseCorner: 0, noiseCurrent: 0 },
  /** Bipolar general-purpose class: 106 dB, 1.5 MHz, 1 V/µs, 1.5 V short of each rail; 20 nV/√Hz with a 50 Hz corner, 0.5 pA/√Hz (class ranges, from memory). */
  'general-purpose': { gain: 2e5, gbw: 1.5e6, slew: 1e6, headroom: [1.5, 1.5], rout: 100, offset: 2e-3, bias: 50e-9, currentLimit: 20e-3, noiseVoltage: 20e-9, noiseCorner: 50, noiseCurrent: 0.5e-12 },
  /** JFET-input class: 110 dB, 4 MHz, 10 V/µs, picoamp bias, 1.5 V headroom; 16 nV/√Hz, 200 Hz corner, 5 fA/√Hz (class ranges, from memory). */
  'jfet-input': { gain: 3e5, gbw: 4e6, slew: 10e6, headroom: [1.5, 1.5], rout: 80, offset: 2e-3, bias: 50e-12, currentLimit: 25e-3, noiseVoltage: 16e-9, noiseCorner: 200, noiseCurrent: 5e-15 },
  /** CMOS rail-to-rail output class: 100 dB, 10 MHz, 5 V/µs, swings to 50 mV of each rail; 25 nV/√Hz with a 2 kHz corner, 3 fA/√Hz (from memory). */
  'rail-to-rail': { gain: 1e5, gbw: 10e6, slew: 5e6, headroom: [0.05, 0.05], rout: 50, offset: 0.5e-3, bias: 1e-12, currentLimit: 40e-3, noiseVoltage: 25e-9, noiseCorner: 2e3, noiseCurrent: 3e-15 },
  /** Precision class: 130 dB, 0.5 MHz, 0.2 V/µs, 25 µV offset; 8 nV/√Hz with a 5 Hz corner, 0.2 pA/√Hz (from memory). */
  precision: { gain: 3e6, gbw: 0.5e6, slew: 0.2e6, headroom: [1.2, 1.2], rout: 60, offset: 25e-6, bias: 1e-9, currentLimit: 15e-3, noiseVoltage: 8e-9, noiseCorner: 5, noiseCurrent: 0.2e-12 },
  /** High-speed voltage-feedback class: 80 dB, 100 MHz, 300 V/µs, second pole near 200 MHz; 6 nV/√Hz, 1 kHz corner, 2 pA/√Hz (from memory). */
  'high-speed': { gain: 1e4, gbw: 100e6, slew: 300e6, headroom: [1.5, 1.5], rout: 20, offset: 2e-3, bias: 5e-6, secondPole: 200e6, currentLimit: 60e-3, noiseVoltage: 6e-9, noiseCorner: 1e3, noiseCurrent: 2e-12 },
} as const satisfies Record<string, OpampParameters>;

export type OpampPresetName = keyof typeof opampPresets;
export const opampPresetNames = Object.keys(opampPresets) as OpampPresetName[];
