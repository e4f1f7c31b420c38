import type { Circuit } from '../circuit/circuit.ts';
import type { Device } from '../parts/device.ts';
import { createDevices } from '../circuit/devices.ts';
import { Topology } from '../solver/topology.ts';
import { Equations, type MatrixStorage } from './equations.ts';
import type { RunStats } from './result.ts';
import { NoiseInjection } from './noise-injection.ts';
import { kelvin } from '../units/constants.ts';

/** Newton iterations before a step is cut (or the operating point tries its next strategy). */
const NEWTON_ITERATIONS = 40;

/** A circuit's devices bound to their unknowns, and their equations. */
export interface CircuitEquations {
  readonly devices: readonly Device[];
  readonly topology: Topology;
  readonly equations: Equations;
}

/** Counters at zero, for a new run. */
export function newRunStats(): RunStats {
  return {
    acceptedSteps: 0,
    rejectedSteps: 0,
    factorizations: 0,
    solves: 0,
    newtonIterations: 0,
    newtonFailures: 0,
    dampingSteps: 0,
    exactSteps: 0,
    propagators: 0,
    minStep: Infinity,
    maxStep: 0,
  };
}

/**
 * Make the devices of `circuit`, bind them and set up their equations with the Newton limits
 * its `accuracy` asks for, on the matrix `storage` (by size unless forced), with the parts'
 * `noise` injected when asked (transient only). The transient
 * and the small-signal analyses start here, so both see the same operating point.
 */
export function circuitEquations(circuit: Circuit, stats: RunStats, storage?: MatrixStorage, noise?: { seed: number; bandwidth: number }): CircuitEquations {
  const settings = circuit.simulate;
  const devices = createDevices(circuit.parts, settings);
  if (noise !== undefined) devices.push(new NoiseInjection([...devices], noise.seed, noise.bandwidth, kelvin(settings.temperature)));
  const topology = new Topology(circuit.nodes);
  for (const device of devices) device.bind(topology);
  const equations = new Equations(
    devices,
    topology,
    {
      maxIterations: NEWTON_ITERATIONS,
      relative: settings.accuracy.relative * 1e-2,
      voltage: settings.accuracy.volts,
      current: settings.accuracy.amps,
    },
    stats,
    storage,
  );
  return { devices, topology, equations };
}
