import type { Circuit } from '../circuit/circuit.ts';
import type { NoiseSource } from '../parts/device.ts';
import { across, valueAt } from '../parts/solution.ts';
import { kelvin } from '../units/constants.ts';
import { frequencyGrid } from './frequency-grid.ts';
import { LinearizedCircuit, type SmallSignalStats } from './linearized-circuit.ts';

/** Where noise is read: the voltage between two nodes (`minus` is `gnd` for a node alone). */
export interface NoiseOutput {
  readonly name: string;
  readonly plus: string;
  readonly minus: string;
}

/** One noise generator of one part. */
export interface NoiseGenerator {
  readonly part: string;
  /** `thermal`, `voltage`, `current at plus`, ... */
  readonly source: string;
  /** One-sided density above the 1/f corner, A²/Hz, as a current between two unknowns. */
  readonly white: number;
  /** 1/f corner, Hz; 0 for none. */
  readonly corner: number;
}

/** The noise at one output: per generator its share of the density, V²/Hz per frequency. */
export interface OutputNoise {
  readonly output: NoiseOutput;
  /** Per generator (in `generators` order), V²/Hz at each frequency. */
  readonly power: readonly Float64Array[];
}

/** Noise densities of a circuit linearized at its t = 0 operating point. */
export interface NoiseSweep {
  /** Hz, log-spaced. */
  readonly frequency: Float64Array;
  readonly generators: readonly NoiseGenerator[];
  readonly outputs: readonly OutputNoise[];
  /** Voltage of every named node at the operating point. */
  readonly operatingPoint: ReadonlyMap<string, number>;
  readonly stats: SmallSignalStats;
}

/** The band of a noise sweep, and the temperature of every part in it. */
export interface NoiseSweepSettings {
  readonly from: number;
  readonly to: number;
  readonly perDecade: number;
  /** °C. */
  readonly temperature: number;
}

/**
 * Output noise density of `circuit` linearized at its t = 0 operating point. Every device's
 * noise generators (Device contract item 10) are uncorrelated currents; each one's way to an
 * output is read from one adjoint solve per output and frequency on the frequency's single
 * factorization: the transposed system with a unit excitation at the output gives, at every
 * unknown, the output voltage per unit current injected there (the reciprocity the adjoint
 * network method of noise analysis rests on). Per frequency nothing is allocated.
 */
export function noiseSweep(circuit: Circuit, outputs: readonly NoiseOutput[], settings: NoiseSweepSettings): NoiseSweep {
  const linear = new LinearizedCircuit(circuit);
  const x = linear.operatingPoint;
  const absolute = kelvin(settings.temperature);
  const found: { part: string; source: NoiseSource }[] = linear.devices.flatMap((d) => (d.noiseSources?.(x, absolute) ?? []).map((source) => ({ part: d.name, source })));
  const generators: NoiseGenerator[] = found.map(({ part, source }) => ({ part, source: source.source, white: source.white, corner: source.corner }));
  const into = Int32Array.from(found, (g) => g.source.into);
  const from = Int32Array.from(found, (g) => g.source.from);
  const frequency = frequencyGrid(settings.from, settings.to, settings.perDecade);
  const picks = outputs.map((o) => [linear.topology.node(o.plus), linear.topology.node(o.minus)] as const);
  const power = outputs.map(() => generators.map(() => new Float64Array(frequency.length)));
  const size = linear.size;
  const bRe = new Float64Array(size);
  const bIm = new Float64Array(size);
  const zRe = new Float64Array(size);
  const zIm = new Float64Array(size);
  for (let i = 0; i < frequency.length; i++) {
    const f = frequency[i];
    linear.factorAt(f);
    for (let k = 0; k < outputs.length; k++) {
      const [p, n] = picks[k];
      bRe.fill(0);
      bIm.fill(0);
      if (p >= 0) bRe[p] = 1;
      if (n >= 0) bRe[n] = -1;
      linear.solveTransposed(bRe, bIm, zRe, zIm);
      for (let g = 0; g < generators.length; g++) {
        // A current entering `into` and leaving `from`: output per ampere z(into) - z(from).
        const hRe = across(zRe, into[g], from[g]);
        const hIm = across(zIm, into[g], from[g]);
        power[k][g][i] = (hRe * hRe + hIm * hIm) * generators[g].white * (1 + generators[g].corner / f);
      }
    }
  }
  const operatingPoint = new Map(circuit.nodes.map((node) => [node, valueAt(x, linear.topology.node(node))] as const));
  return { frequency, generators, outputs: outputs.map((output, k) => ({ output, power: power[k] })), operatingPoint, stats: linear.stats };
}
