import type { Circuit } from '../circuit/circuit.ts';
import type { Device, GainStage } from '../parts/device.ts';
import { stampCurrent, stampTransconductance } from '../parts/stamps.ts';
import type { Topology } from '../solver/topology.ts';
import { circuitEquations, newRunStats } from '../transient/circuit-equations.ts';
import { solveOperatingPoint } from '../transient/operating-point.ts';
import { SimulationError } from '../transient/simulation-error.ts';
import { formatSI } from '../units/format.ts';
import { SPARSE_FROM, type MatrixStorage } from '../transient/equations.ts';
import type { ComplexSystem } from './complex-system.ts';
import { DenseComplexSystem } from './dense-complex-system.ts';
import { SparseComplexSystem } from './sparse-complex-system.ts';

/** Work counters of a small-signal analysis. */
export interface SmallSignalStats {
  /** Complex LU factorizations (one per frequency, plus one per frequency and broken loop). */
  factorizations: number;
  solves: number;
}

/**
 * A circuit linearized at its t = 0 operating point: the devices stamp their small-signal
 * models (Device contract items 7 to 9) into a complex system per angular frequency, which is
 * factored and solved for one excitation at a time. The operating point is the transient's,
 * found by the same equations and strategies. Per frequency nothing is allocated.
 *
 * Two excitations are built in: the input source's test signal (the response), and a gain
 * stage's loop broken at its controlled source (the return ratio). Another analysis (noise)
 * assembles with `factorAt` and solves right-hand sides of its own with `solve`.
 */
export class LinearizedCircuit {
  readonly devices: readonly Device[];
  readonly topology: Topology;
  /** Every unknown at the operating point. */
  readonly operatingPoint: Float64Array;
  readonly stats: SmallSignalStats = { factorizations: 0, solves: 0 };
  private readonly system: ComplexSystem;

  /** `storage`: the complex system's, chosen by size as the transient's matrix unless forced. */
  constructor(circuit: Circuit, storage: MatrixStorage = 'auto') {
    const { devices, topology, equations } = circuitEquations(circuit, newRunStats());
    this.devices = devices;
    this.topology = topology;
    this.operatingPoint = new Float64Array(equations.size);
    solveOperatingPoint(equations, this.operatingPoint, { t: 0, h: 0, method: 'dc', sourceScale: 1 });
    const unmodelled = devices.filter((d) => d.stampSmallSignal === undefined);
    if (unmodelled.length > 0) {
      const names = unmodelled.map((d) => `${d.name} (${d.kind})`).join(', ');
      throw new SimulationError(`${names} ha${unmodelled.length === 1 ? 's' : 've'} no small-signal model yet, so the circuit cannot be linearized there`, NaN, [], 'leave those parts out of a copy of the circuit for its frequency response', unmodelled.map((d) => d.name));
    }
    const sparse = storage === 'auto' ? equations.size >= SPARSE_FROM : storage === 'sparse';
    this.system = sparse ? new SparseComplexSystem(equations.size) : new DenseComplexSystem(equations.size);
  }

  get size(): number {
    return this.system.size;
  }

  /** The device named `name`, if any. */
  device(name: string): Device | undefined {
    return this.devices.find((d) => d.name === name);
  }

  /**
   * Assemble the small-signal system at `frequency` (Hz) with an empty right-hand side; with
   * `broken`, that stage's controlled source is taken out and driven instead by a 1 V test
   * voltage in place of its controlling voltage. Then factor it. Throws SimulationError when
   * the system is singular.
   */
  factorAt(frequency: number, broken?: GainStage): ComplexSystem {
    const omega = 2 * Math.PI * frequency;
    const x = this.operatingPoint;
    const system = this.system;
    system.clear();
    for (const d of this.devices) d.stampSmallSignal!(system, x, omega);
    if (broken !== undefined) {
      stampTransconductance(system, broken.into, broken.from, broken.p, broken.n, -broken.transconductance);
      stampCurrent(system, broken.from, broken.into, broken.transconductance);
    }
    const singular = system.factor();
    this.stats.factorizations++;
    if (singular >= 0) {
      const label = this.topology.labels[singular];
      throw new SimulationError(
        `the small-signal equations have no unique solution at ${label} at ${formatSI(frequency, 'Hz')}`,
        NaN,
        [label],
        'check that every node has a path to gnd through resistors, sources or amplifier outputs',
        [],
        frequency,
      );
    }
    return system;
  }

  /** Solve the last factored system for its right-hand side into `xRe + j·xIm`. */
  solve(xRe: Float64Array, xIm: Float64Array): void {
    this.system.solve(xRe, xIm);
    this.stats.solves++;
  }

  /**
   * Solve the last factored system transposed for `b` (the adjoint solve): with `b` picking
   * an output, `x[k]` is that output per unit current injected into unknown `k`.
   */
  solveTransposed(bRe: Float64Array, bIm: Float64Array, xRe: Float64Array, xIm: Float64Array): void {
    this.system.solveTransposed(bRe, bIm, xRe, xIm);
    this.stats.solves++;
  }

  /** Node voltages at `frequency` per 1 V (1 A) of the input source's test signal. */
  respond(frequency: number, input: Device, xRe: Float64Array, xIm: Float64Array): void {
    input.stampTestSignal!(this.factorAt(frequency));
    this.solve(xRe, xIm);
  }

  /** Node voltages at `frequency` with `stage`'s loop broken and driven by a 1 V test voltage. */
  openLoop(frequency: number, stage: GainStage, xRe: Float64Array, xIm: Float64Array): void {
    this.factorAt(frequency, stage);
    this.solve(xRe, xIm);
  }
}
