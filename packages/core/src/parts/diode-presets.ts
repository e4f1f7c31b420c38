/**
 * Capacitance across a diode's junction, C(V) = C₀/(1 − V/φ)^m (depletion capacitance,
 * semiconductor device textbooks). Grading m = 0 makes it a fixed capacitance C₀.
 */
export interface DiodeCapacitance {
  /** C₀, the capacitance at 0 V, farads. */
  readonly zeroBias: number;
  /** φ, the built-in potential, volts. */
  readonly potential: number;
  /** m: 0.5 for an abrupt junction, 1/3 for a linearly graded one, 0 for a fixed capacitance. */
  readonly grading: number;
}

/** Parameters of the diode model, in SI base units, at 25 °C. */
export interface DiodeParameters {
  /** Saturation current Is, amperes. */
  readonly saturationCurrent: number;
  /** Emission coefficient n of I = Is·(exp(V/(n·Vt)) − 1). */
  readonly emission: number;
  /** Ohms in series with the junction (bulk and leads). */
  readonly seriesResistance: number;
  /** Reverse voltage at which the junction conducts 1 mA in breakdown; absent: no breakdown. */
  readonly breakdown?: number;
  readonly capacitance?: DiodeCapacitance;
  /**
   * How Is follows temperature: Is(T) = Is·(T/T₀)^(exponent/n)·exp((gap/(n·Vt))·(T/T₀ − 1)),
   * with the barrier `energyGap` in eV (semiconductor device textbooks: 1.11 eV and exponent 3
   * for a silicon pn junction, about 0.69 eV and exponent 2 for a metal-silicon barrier).
   */
  readonly energyGap: number;
  readonly temperatureExponent: number;
}

const silicon = { energyGap: 1.11, temperatureExponent: 3 } as const;

/**
 * Presets by generic class: typical figures of diodes of each class across data sheets, from
 * memory, rounded, none of them one product's. Each gives about the forward voltage its class
 * is known for at 25 °C: small-signal 0.59 V at 1 mA and 0.70 V at 10 mA, Schottky 0.28 V at
 * 1 mA, rectifier 0.97 V at 1 A. None breaks down unless `breakdown:` is given.
 */
export const diodePresets = {
  /** Fast small-signal silicon switching diode: 3 nA, n = 1.8, 0.8 Ω, 2 pF at 0 V. */
  'small-signal': { saturationCurrent: 3e-9, emission: 1.8, seriesResistance: 0.8, capacitance: { zeroBias: 2e-12, potential: 0.7, grading: 0.4 }, ...silicon },
  /** Small-signal Schottky barrier diode: 30 nA, n = 1.05, 2 Ω, 8 pF at 0 V. */
  schottky: { saturationCurrent: 3e-8, emission: 1.05, seriesResistance: 2, capacitance: { zeroBias: 8e-12, potential: 0.5, grading: 0.5 }, energyGap: 0.69, temperatureExponent: 2 },
  /** General-purpose silicon rectifier of about 1 A: 5 nA, n = 1.9, 40 mΩ, 20 pF at 0 V. */
  rectifier: { saturationCurrent: 5e-9, emission: 1.9, seriesResistance: 0.04, capacitance: { zeroBias: 20e-12, potential: 0.7, grading: 0.4 }, ...silicon },
} as const satisfies Record<string, DiodeParameters>;

export type DiodePresetName = keyof typeof diodePresets;
export const diodePresetNames = Object.keys(diodePresets) as DiodePresetName[];
