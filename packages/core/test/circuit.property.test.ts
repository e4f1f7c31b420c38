import { describe, expect, it } from 'vitest';
import fc from 'fast-check';
import { buildCircuit, readCircuit } from '../src/circuit/parse-circuit.ts';
import { CircuitError, type CircuitIssue } from '../src/reading/issue.ts';

// An invented circuit to mutate.
const seed = `circuit: invented-mutation-seed
parts:
  SRC: { voltage: { square: { high: 5, frequency: 1k, duty: 25% } }, between: [in, gnd] }
  R1: { resistor: 4.7k, between: [in, mid] }
  C1: { capacitor: 10n, between: [mid, gnd], initial: 0.5 }
  L1: { inductor: 1m, between: [mid, out] }
  RL: { resistor: 50, between: [out, gnd] }
  E1: { vcvs: 20dB, sense: [out, gnd], between: [amp, gnd] }
  I1: { current: { sine: { amplitude: 1m, frequency: 50 } }, between: [amp, gnd] }
simulate:
  duration: 5m
  output-step: 5u
record: [in, out, amp]
`;

/** Every issue of a text has a position inside the text. */
function expectPositioned(text: string, issues: readonly CircuitIssue[]): void {
  const lines = text.split('\n').length;
  for (const issue of issues) {
    expect(issue.position, issue.message).toBeDefined();
    expect(issue.position!.line).toBeGreaterThanOrEqual(1);
    expect(issue.position!.line).toBeLessThanOrEqual(lines);
    expect(issue.position!.column).toBeGreaterThanOrEqual(1);
    expect(issue.message.length).toBeGreaterThan(0);
  }
}

/** The text with `count` random single-character edits (delete, insert or replace). */
const mutated = fc
  .array(fc.tuple(fc.nat(), fc.constantFrom('delete', 'insert', 'replace'), fc.constantFrom(...' \n:,[]{}-#&*!|>"\'0123456789kmMuµgndinoutRCLF%')), { minLength: 1, maxLength: 6 })
  .map((edits) =>
    edits.reduce((text, [at, how, char]) => {
      const i = at % (text.length + 1);
      if (how === 'insert') return text.slice(0, i) + char + text.slice(i);
      return text.slice(0, i) + (how === 'replace' ? char : '') + text.slice(i + 1);
    }, seed),
  );

describe('circuit reader, property based', () => {
  it('the seed itself is a valid circuit', () => {
    const { circuit, issues } = readCircuit(seed);
    expect(issues).toEqual([]);
    expect(circuit?.nodes).toEqual(['in', 'mid', 'out', 'amp']);
  });

  it('random text never throws: it gives a circuit, or issues that each have a position', () => {
    fc.assert(
      fc.property(fc.string({ unit: 'grapheme', maxLength: 200 }), (text) => {
        const { circuit, issues } = readCircuit(text);
        expectPositioned(text, issues);
        if (circuit === undefined) expect(issues.some((issue) => issue.severity === 'error')).toBe(true);
      }),
      { numRuns: 1000 },
    );
  });

  it('randomly edited circuits never throw: a circuit, or positioned errors', () => {
    fc.assert(
      fc.property(mutated, (text) => {
        const { circuit, issues } = readCircuit(text);
        expectPositioned(text, issues);
        if (circuit === undefined) expect(issues.some((issue) => issue.severity === 'error')).toBe(true);
        else expect(issues.every((issue) => issue.severity === 'warning')).toBe(true);
      }),
      { numRuns: 1500 },
    );
  });

  it('random objects given to buildCircuit give a circuit or a CircuitError, nothing else', () => {
    fc.assert(
      fc.property(fc.object({ maxDepth: 4 }), (description) => {
        try {
          buildCircuit(description);
        } catch (error) {
          expect(error).toBeInstanceOf(CircuitError);
          expect((error as CircuitError).issues.length).toBeGreaterThan(0);
        }
      }),
      { numRuns: 500 },
    );
  });
});
