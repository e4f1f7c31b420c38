// `pnpm bench accuracy`: error against a reference and time, for the accuracy knob's settings
// on the differentiator (with odex as the peer at equal error) and for the other cases.
import { readFileSync } from 'node:fs';
import { parseCircuit, simulate, type Circuit } from '@voltcast/core';
import { otherCases, plainDifferentiator, type AccuracyCase } from '../test/support/accuracy-cases.ts';
import { odexRows } from '../test/support/odex-rows.ts';

/**
 * CPU seconds (user and system) of the fastest of up to five runs (one when a run takes over
 * a second). CPU time rather than wall time: on a shared machine the wall clock also counts
 * the time other processes held the cores.
 */
function timed<T>(run: () => T): { value: T; seconds: number } {
  let best = Infinity;
  let value: T | undefined;
  for (let i = 0; i < 5 && (i === 0 || best < 1); i++) {
    const start = process.cpuUsage();
    value = run();
    const used = process.cpuUsage(start);
    best = Math.min(best, (used.user + used.system) / 1e6);
  }
  return { value: value as T, seconds: best };
}

function circuitOf(c: AccuracyCase): Circuit {
  const text = c.text ?? readFileSync(new URL(`../fixtures/${c.fixture}`, import.meta.url), 'utf8');
  return parseCircuit(text, { fileName: c.fixture ?? `${c.name}.yaml` });
}

/** The circuit with the accuracy knob (and, for a self-converged reference, the floors) changed. */
function withAccuracy(circuit: Circuit, relative: number | undefined, floors?: { volts: number; amps: number }): Circuit {
  if (relative === undefined) return circuit;
  const simulate = { ...circuit.simulate, accuracy: { ...circuit.simulate.accuracy, relative, ...floors } };
  return { ...circuit, simulate };
}

function largestDifference(a: Float64Array, b: Float64Array): number {
  let worst = 0;
  for (let i = 0; i < a.length; i++) worst = Math.max(worst, Math.abs(a[i] - b[i]));
  return worst;
}

function runNode(circuit: Circuit, node: string): Float64Array {
  return simulate(circuit).columns.get(node)!;
}

function reference(c: AccuracyCase, circuit: Circuit): { values: Float64Array; how: string; spread: number } {
  const rows = Math.round(circuit.simulate.duration / circuit.simulate.outputStep) + 1;
  if (c.ode) {
    const tight = odexRows(c.ode, circuit.simulate.outputStep, rows, 1e-13, 1e-15).values;
    const check = odexRows(c.ode, circuit.simulate.outputStep, rows, 1e-12, 1e-14).values;
    return { values: tight, how: 'odex 1e-13', spread: largestDifference(tight, check) };
  }
  const tight = runNode(withAccuracy(circuit, 1e-8, { volts: 1e-11, amps: 1e-14 }), c.node);
  const check = runNode(withAccuracy(circuit, 1e-7, { volts: 1e-10, amps: 1e-13 }), c.node);
  return { values: tight, how: 'self 1e-8', spread: largestDifference(tight, check) };
}

const mv = (v: number): string => (v * 1e3).toPrecision(3);
const ms = (s: number): string => (s * 1e3).toFixed(1);
const row = (cells: (string | number)[], widths: number[]): string => cells.map((c, i) => String(c)[i === 0 ? 'padEnd' : 'padStart'](widths[i])).join('  ');

export function accuracyBench(): void {
  const c = plainDifferentiator();
  const circuit = circuitOf(c);
  const step = circuit.simulate.outputStep;
  const rows = Math.round(circuit.simulate.duration / step) + 1;
  const ref = reference(c, circuit);
  console.log(`${c.name}: reference ${ref.how} (differs from odex 1e-12 by ${mv(ref.spread)} mV)`);

  // The peer: odex on the hand-reduced ODEs over a range of tolerances.
  const peer = [1e-3, 1e-4, 1e-5, 1e-6, 1e-7, 1e-8, 1e-9, 1e-10, 1e-11].map((rtol) => {
    const run = timed(() => odexRows(c.ode!, step, rows, rtol, rtol * 1e-2));
    return { rtol, error: largestDifference(run.value.values, ref.values), seconds: run.seconds };
  });
  const widths = [22, 12, 9, 16, 11];
  console.log(row(['odex rtol', 'error mV', 'CPU ms'], widths));
  for (const p of peer) console.log(row([p.rtol.toExponential(0), mv(p.error), ms(p.seconds)], widths));
  /**
   * The peer's time at a given error: the cheapest odex run at least that accurate,
   * interpolated log-log between neighbours; its tightest run (marked) when none is.
   */
  const tightest = peer[peer.length - 1];
  const peerSeconds = (error: number): number => {
    const sorted = [...peer].sort((a, b) => b.error - a.error);
    for (let i = 0; i < sorted.length; i++) {
      if (sorted[i].error > error) continue;
      if (i === 0) return sorted[0].seconds;
      const [a, b] = [sorted[i - 1], sorted[i]];
      const f = Math.log(a.error / error) / Math.log(a.error / b.error);
      return a.seconds * Math.pow(b.seconds / a.seconds, f);
    }
    return tightest.seconds;
  };

  simulate(circuit);
  // The knob with exact steps over linear stretches (the default), then on trapezoidal steps alone.
  for (const exactSteps of [true, false]) {
    console.log();
    console.log(row([exactSteps ? 'voltcast accuracy' : 'trapezoidal only', 'error mV', 'CPU ms', 'steps', 'vs odex time'], widths));
    for (const relative of [undefined, 1e-3, 1e-4, 1e-5, 1e-6, 1e-7]) {
      const run = timed(() => simulate(withAccuracy(circuit, relative), { exactSteps }));
      const error = largestDifference(run.value.columns.get(c.node)!, ref.values);
      const ratio = run.seconds / peerSeconds(error);
      const label = relative === undefined ? `default (${circuit.simulate.accuracy.relative.toExponential(0)})` : `relative ${relative.toExponential(0)}`;
      const beyond = error < tightest.error ? ` (odex ${tightest.rtol.toExponential(0)}, ${mv(tightest.error)} mV)` : '';
      console.log(row([label, mv(error), ms(run.seconds), run.value.stats.acceptedSteps, `${ratio.toFixed(3)}x${beyond}`], widths));
    }
  }

  console.log();
  console.log(row(['case (default settings)', 'error mV', 'CPU ms', 'steps', 'reference', 'ref. spread mV'], [32, 10, 9, 9, 12, 15]));
  for (const other of otherCases) {
    const oc = circuitOf(other);
    const r = reference(other, oc);
    const run = timed(() => simulate(oc));
    const error = largestDifference(run.value.columns.get(other.node)!, r.values);
    console.log(row([other.name, mv(error), ms(run.seconds), run.value.stats.acceptedSteps, r.how, mv(r.spread)], [32, 10, 9, 9, 12, 15]));
  }
}
