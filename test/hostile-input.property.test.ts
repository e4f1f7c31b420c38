import { readFileSync, readdirSync } from 'node:fs';
import { join } from 'node:path';
import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import { CircuitError, readCircuit, runCircuit, SimulationError, type CircuitRun } from '@voltcast/core';
import { repoRoot } from './support/run-cli.ts';

// A seeded fuzz of the fixtures, as the hostile-input review did it: values replaced by
// extremes, strings blown up, nesting made deep, lists and maps swapped. Every outcome must be
// one of ours: a clean read error (with position), a clean simulation error (with time), or a
// result whose numbers are all finite, and no case may run on and on.

const folder = join(repoRoot, 'fixtures');
const fixtures = readdirSync(folder).filter((f) => f.endsWith('.yaml')).map((f) => ({ name: f, text: readFileSync(join(folder, f), 'utf8') }));
const readFile = (path: string) => readFileSync(join(folder, path), 'utf8');

const extremes = ['1e300', '-1e300', '0', '-1', '5e-324', '1e-300', '1e15', '1e-15', '1e12', '.nan', '.inf', '-.inf', '""', "''", 'null', '[]', '{}', '[1, 2]', '{ a: 1 }', 'x'.repeat(5000), '9'.repeat(400), '1e308G', '2^53', '0x10', '1k1k', '[[0, 0], [1e-300, 1]]', '{ sine: { amplitude: 1, frequency: 1e15 } }', '{ points: [[0, 0], [1e-12, 1e300]] }', '{ square: { low: 0, high: 1, frequency: 1e12 } }'];

/** Places a value can be replaced: after a key's colon, or an item in a flow list; never in a comment. */
function slots(text: string): number[][] {
  return [...text.matchAll(/(?<=[:[,][ \t]*)[^\s,\]{}[#:][^,\]}#\n:[{]*/g)]
    .filter((m) => !/^\s*#/.test(text.slice(text.lastIndexOf('\n', m.index!) + 1, m.index!)))
    .map((m) => [m.index!, m.index! + m[0].length]);
}

const mutation = fc.record({
  fixture: fc.nat({ max: fixtures.length - 1 }),
  edits: fc.array(fc.record({ slot: fc.nat(), value: fc.oneof(fc.constantFrom(...extremes), fc.double({ noNaN: false }).map(String), fc.integer().map(String)) }), { minLength: 1, maxLength: 3 }),
  // Deep nesting in one case of eight: the rest reach the simulator.
  nesting: fc.oneof({ weight: 7, arbitrary: fc.constant(null) }, { weight: 1, arbitrary: fc.integer({ min: 1, max: 20_000 }) }),
});

interface Mutation {
  fixture: number;
  edits: { slot: number; value: string }[];
  nesting: number | null;
}

function mutate({ fixture, edits, nesting }: Mutation): string {
  let text = fixtures[fixture].text;
  for (const edit of edits) {
    const places = slots(text);
    if (places.length === 0) break;
    const [from, to] = places[edit.slot % places.length];
    text = text.slice(0, from) + edit.value + text.slice(to);
  }
  if (nesting !== null) text += `\nextra: ${'['.repeat(nesting)}${']'.repeat(nesting)}\n`;
  return text;
}

class Stopped extends Error {}

/** Every number a run reports, so that none is Infinity or NaN. */
function numbers(run: CircuitRun): number[] {
  const all: number[] = [...run.transient.minimum, ...run.transient.maximum];
  for (const column of run.transient.columns.values()) all.push(...column);
  const findings = JSON.parse(JSON.stringify(run.findings, (_k, v) => (typeof v === 'number' && !Number.isFinite(v) ? `non-finite ${v}` : v)));
  const text = JSON.stringify(findings);
  if (text.includes('non-finite')) all.push(NaN);
  return all;
}

type Outcome = 'read error' | 'simulation error' | 'result' | 'long, still moving' | 'stuck';

function attempt(text: string, fileName: string): Outcome {
  let read;
  try {
    read = readCircuit(text, { fileName, readFile });
  } catch (error) {
    if (error instanceof CircuitError) return 'read error';
    throw error;
  }
  if (read.circuit === undefined) {
    for (const issue of read.issues) expect(issue.message.length).toBeGreaterThan(0);
    return 'read error';
  }
  // A run may be long (a stimulus far faster than the duration, which the read warns about) but
  // must keep moving: stopped after 3 s, it counts as stuck if simulated time stood still for 2 s.
  const start = performance.now();
  let moved = start;
  let fraction = -1;
  try {
    const run = runCircuit(read.circuit, { keepColumns: true, onProgress: (f) => {
      const now = performance.now();
      if (f > fraction) [fraction, moved] = [f, now];
      if (now - moved > 2000) throw new Stopped('stuck');
      if (now - start > 3000) throw new Stopped('long, still moving');
    } });
    const bad = numbers(run).filter((v) => !Number.isFinite(v));
    expect(bad.length, `non-finite numbers in the result of\n${text}`).toBe(0);
    return 'result';
  } catch (error) {
    if (error instanceof SimulationError) return 'simulation error';
    if (error instanceof Stopped) return error.message as Outcome;
    throw error;
  }
}

describe('hostile and extreme input (seeded fuzz of the fixtures)', () => {
  const runs = Number(process.env.VOLTCAST_FUZZ_RUNS ?? 2000);
  it('ends every case in a clean error or a finite result, in bounded time', { timeout: 300_000 }, () => {
    const tally = new Map<Outcome, number>();
    const stuck: string[] = [];
    fc.assert(
      fc.property(mutation, (m) => {
        const text = mutate(m);
        const outcome = attempt(text, fixtures[m.fixture].name);
        tally.set(outcome, (tally.get(outcome) ?? 0) + 1);
        if (outcome === 'stuck') stuck.push(text);
      }),
      { seed: 20261202, numRuns: runs },
    );
    console.log(Object.fromEntries(tally));
    // The fuzz must reach the simulator, not only the reader.
    expect(tally.get('result') ?? 0).toBeGreaterThan(runs / 20);
    expect(stuck, `cases whose simulated time stood still:\n${stuck.slice(0, 3).join('\n----\n')}`).toEqual([]);
  });

  // Cases the fuzz found, kept as they were found: each once ran on with simulated time standing still.
  const found = [
    // A step onto an output row was rejected, and stretched back onto the row each retry.
    { fixture: 'interrupt-comparator.yaml', from: '[12m, 2]', to: '[12m, 1e12]' },
    // A repeating point list that jumps back at the period: no step could cross the jump.
    { fixture: 'demo-strain-front-end.yaml', from: '[[0, 20m], [2m, 20m]', to: '[[0, -9.25e-264], [2m, 20m]' },
  ];
  it.each(found)('$fixture with $to ends in bounded time', { timeout: 60_000 }, ({ fixture, from, to }) => {
    const text = fixtures.find((f) => f.name === fixture)!.text;
    expect(text).toContain(from);
    expect(attempt(text.replace(from, to), fixture)).not.toBe('stuck');
  });
});
