import type { Circuit, ResponseSettings } from '../circuit/circuit.ts';
import type { Device, GainStage } from '../parts/device.ts';
import { across, valueAt } from '../parts/solution.ts';
import { decibels, degrees, unwrapDegrees } from './complex-figures.ts';
import { frequencyGrid } from './frequency-grid.ts';
import { LinearizedCircuit } from './linearized-circuit.ts';
import { amplifierState } from './amplifier-state.ts';
import { loopMargins, type LoopMargins, type LoopProbe } from './loop-margins.ts';
import { bandwidth, peaks } from './node-figures.ts';
import type { FrequencySweep, LoopResponse, NodeResponse } from './types.ts';

/**
 * Frequency response and loop gains of `circuit` linearized at its t = 0 operating point:
 * per recorded node its gain and phase relative to the input source's 1 V (1 A) test signal,
 * and per amplifier the return ratio of its gain stage with its margins. One factorization
 * per frequency for the response and one per frequency and amplifier for the loops; the
 * figures (crossovers, peaks, bandwidths) are refined between sweep points by further solves.
 */
export function frequencySweep(circuit: Circuit, settings: ResponseSettings): FrequencySweep {
  const linear = new LinearizedCircuit(circuit);
  const input = linear.device(settings.input);
  if (input?.stampTestSignal === undefined) {
    throw new Error(`frequency response: the input '${settings.input}' is not a voltage or current source of circuit ${circuit.name}`);
  }
  const frequency = frequencyGrid(settings.from, settings.to, settings.perDecade);
  const unknowns = Int32Array.from(circuit.recorded, (node) => linear.topology.node(node));
  const n = frequency.length;
  const dB = circuit.recorded.map(() => new Float64Array(n));
  const phase = circuit.recorded.map(() => new Float64Array(n));
  const re = new Float64Array(linear.size);
  const im = new Float64Array(linear.size);
  for (let i = 0; i < n; i++) {
    linear.respond(frequency[i], input, re, im);
    for (let j = 0; j < unknowns.length; j++) {
      dB[j][i] = decibels(valueAt(re, unknowns[j]), valueAt(im, unknowns[j]));
      phase[j][i] = degrees(valueAt(re, unknowns[j]), valueAt(im, unknowns[j]));
    }
  }
  const nodes: NodeResponse[] = circuit.recorded.map((node, j) => {
    unwrapDegrees(phase[j]);
    const gain = (f: number): number => {
      linear.respond(f, input, re, im);
      return decibels(valueAt(re, unknowns[j]), valueAt(im, unknowns[j]));
    };
    return { node, dB: dB[j], degrees: phase[j], lowFrequencyGain: dB[j][0], bandwidth: bandwidth(frequency, dB[j], gain), peaks: peaks(node, frequency, dB[j], gain) };
  });
  const loops = linear.devices.filter((d) => d.gainStage !== undefined).map((d) => loopResponse(linear, d, frequency));
  const x = linear.operatingPoint;
  const operatingPoint = new Map(circuit.nodes.map((node) => [node, valueAt(x, linear.topology.node(node))] as const));
  return { settings, frequency, nodes, loops, operatingPoint, stats: linear.stats };
}

/**
 * The loop of the amplifier `part` alone, with the sweep of `settings` (its input unused):
 * for trying a change to a circuit by its margins.
 */
export function loopOf(circuit: Circuit, part: string, settings: ResponseSettings): LoopResponse {
  const linear = new LinearizedCircuit(circuit);
  const device = linear.device(part);
  if (device?.gainStage === undefined) throw new Error(`frequency response: '${part}' is not an amplifier of circuit ${circuit.name}`);
  return loopResponse(linear, device, frequencyGrid(settings.from, settings.to, settings.perDecade));
}

/** The return ratio of `device`'s gain stage over `frequency`, with its margins when the amplifier is linear. */
function loopResponse(linear: LinearizedCircuit, device: Device, frequency: Float64Array): LoopResponse {
  const x = linear.operatingPoint;
  const stage = device.gainStage!(x);
  const state = amplifierState(device, x);
  const n = frequency.length;
  const dB = new Float64Array(n);
  const phase = new Float64Array(n);
  const openLoopDb = new Float64Array(n);
  const noiseGainDb = new Float64Array(n);
  const re = new Float64Array(linear.size);
  const im = new Float64Array(linear.size);
  for (let i = 0; i < n; i++) {
    linear.openLoop(frequency[i], stage, re, im);
    // T = -(returned controlling voltage) / (1 V test voltage); A = output / test voltage.
    const tRe = -across(re, stage.p, stage.n);
    const tIm = -across(im, stage.p, stage.n);
    dB[i] = decibels(tRe, tIm);
    phase[i] = degrees(tRe, tIm);
    openLoopDb[i] = decibels(valueAt(re, stage.output), valueAt(im, stage.output));
    noiseGainDb[i] = openLoopDb[i] - dB[i];
  }
  unwrapDegrees(phase);
  const margins = state === 'linear' ? loopMargins(frequency, dB, phase, returnRatioProbe(linear, stage, re, im)) : noMargins;
  const output = linear.topology.labels[stage.output] ?? 'gnd';
  return { part: device.name, output, state, dB, degrees: phase, openLoopDb, noiseGainDb, ...margins };
}

const noMargins: LoopMargins = { crossover: null, phaseMargin: null, phaseCrossover: null, gainMargin: null };

/** The return ratio of `stage` at any frequency, for refining its crossings. */
function returnRatioProbe(linear: LinearizedCircuit, stage: GainStage, re: Float64Array, im: Float64Array): LoopProbe {
  const at = (f: number): void => linear.openLoop(f, stage, re, im);
  return {
    dB: (f) => (at(f), decibels(across(re, stage.p, stage.n), across(im, stage.p, stage.n))),
    principalDegrees: (f) => (at(f), degrees(-across(re, stage.p, stage.n), -across(im, stage.p, stage.n))),
  };
}
