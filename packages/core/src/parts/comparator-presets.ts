/** How a comparator's output drives its pin. */
export type ComparatorOutput = 'push-pull' | 'open-drain';
export const comparatorOutputs = ['push-pull', 'open-drain'] as const satisfies readonly ComparatorOutput[];

/** Parameters of the comparator model, in SI base units. */
export interface ComparatorParameters {
  /** Total width of the hysteresis band, volts, centred on the other input. */
  readonly hysteresis: number;
  /** Propagation delay from the input crossing to the start of the output edge, seconds. */
  readonly delay: number;
  /** Time the output takes from one level to the other, seconds (0: a jump). */
  readonly edge: number;
  readonly output: ComparatorOutput;
  /** Output resistance, ohms: of both levels for push-pull, of the pull-down for open-drain. */
  readonly rout: number;
}

/**
 * Presets by generic class: typical figures of each class across data sheets, from memory,
 * rounded, none of them one product's. Hysteresis is 0 in every class: write `hysteresis:`.
 */
export const comparatorPresets = {
  /** Switches at once, to the rails, through 1 Ω. */
  ideal: { hysteresis: 0, delay: 0, edge: 0, output: 'push-pull', rout: 1 },
  /** Bipolar general-purpose class with an open-collector (here open-drain) output: 300 ns, 100 ns edges, 80 Ω on. */
  'general-purpose': { hysteresis: 0, delay: 300e-9, edge: 100e-9, output: 'open-drain', rout: 80 },
  /** High-speed push-pull class: 8 ns delay, 2 ns edges, 30 Ω. */
  fast: { hysteresis: 0, delay: 8e-9, edge: 2e-9, output: 'push-pull', rout: 30 },
  /** Micropower push-pull class for battery sensors: 5 µs delay, 500 ns edges, 150 Ω. */
  micropower: { hysteresis: 0, delay: 5e-6, edge: 500e-9, output: 'push-pull', rout: 150 },
} as const satisfies Record<string, ComparatorParameters>;

export type ComparatorPresetName = keyof typeof comparatorPresets;
export const comparatorPresetNames = Object.keys(comparatorPresets) as ComparatorPresetName[];
