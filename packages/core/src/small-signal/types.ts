import type { ResponseSettings } from '../circuit/circuit.ts';
import type { SmallSignalStats } from './linearized-circuit.ts';

/** Where an amplifier sits at the operating point; only `linear` has a loop gain worth the name. */
export type AmplifierState = 'linear' | 'high rail' | 'low rail' | 'slewing' | 'current limit';

/** A local maximum of a node's gain: the closed loop's peaking. */
export interface ResponsePeak {
  readonly node: string;
  /** Hz, refined between the sweep's points. */
  readonly frequency: number;
  readonly dB: number;
}

/** One recorded node's response to the input's test signal. */
export interface NodeResponse {
  readonly node: string;
  /** Gain relative to the input per frequency, dB (re 1 V/V; re 1 V/A for a current input); -Infinity where the node does not move. */
  readonly dB: Float64Array;
  /** Phase relative to the input per frequency, degrees, unwrapped (continuous across the sweep). */
  readonly degrees: Float64Array;
  /** Gain at the sweep's lowest frequency, dB. */
  readonly lowFrequencyGain: number;
  /**
   * Where the gain has fallen to half power (3.01 dB) below `lowFrequencyGain`, Hz; null when the response does
   * not start flat (it rises or falls by more than 1 dB per decade at the low end: a
   * differentiator, a high-pass) or stays within 3 dB up to the sweep's end.
   */
  readonly bandwidth: number | null;
  /** Local maxima standing at least 0.1 dB above their surroundings, lowest frequency first. */
  readonly peaks: readonly ResponsePeak[];
}

/**
 * One amplifier's loop: the return ratio T of its gain stage (the loop broken at the
 * controlled source, its controlling voltage replaced by a test signal, T = -returned / test),
 * and the margins read from it.
 */
export interface LoopResponse {
  readonly part: string;
  /** The amplifier's output node. */
  readonly output: string;
  readonly state: AmplifierState;
  /** |T| per frequency, dB. */
  readonly dB: Float64Array;
  /** Phase of T per frequency, degrees, unwrapped; near 0 at low frequency for negative feedback. */
  readonly degrees: Float64Array;
  /** The amplifier's open-loop gain A as the circuit loads it, dB: output over test voltage with the loop broken. */
  readonly openLoopDb: Float64Array;
  /** 1/β = A/T, dB: the gain the loop closes to, which |A| meets where |T| = 1 (the noise gain). */
  readonly noiseGainDb: Float64Array;
  /** Highest frequency where |T| falls through 1, Hz; null when |T| stays below 1, is still above 1 at the sweep's end, or the amplifier is not linear. */
  readonly crossover: number | null;
  /** 180° + phase of T at the crossover, degrees. */
  readonly phaseMargin: number | null;
  /** Lowest frequency where the phase of T falls through -180°, Hz; null when it does not within the sweep. */
  readonly phaseCrossover: number | null;
  /** -|T| in dB at the phase crossover: how much more loop gain would make the loop oscillate. */
  readonly gainMargin: number | null;
}

/** The frequency analysis of a circuit linearized at its t = 0 operating point. */
export interface FrequencySweep {
  readonly settings: ResponseSettings;
  /** Hz, log-spaced. */
  readonly frequency: Float64Array;
  /** Per recorded node, in `record:` order. */
  readonly nodes: readonly NodeResponse[];
  /** Per amplifier, in part order. */
  readonly loops: readonly LoopResponse[];
  /** Voltage of every named node at the operating point the circuit is linearized at. */
  readonly operatingPoint: ReadonlyMap<string, number>;
  readonly stats: SmallSignalStats;
}
