import { describe, expect, it } from 'vitest';
import { buildCircuit, parseCircuit, readCircuit } from '../src/circuit/parse-circuit.ts';
import { CircuitError, formatIssue, type CircuitIssue } from '../src/reading/issue.ts';
import { editDistance } from '../src/reading/suggest.ts';

// All circuits here are invented for the tests.
const filter = `circuit: invented-test-filter
parts:
  SRC: { voltage: { points: [[0, 0], [1m, 0], [1.01m, 2]] }, between: [in, gnd] }
  R1:  { resistor: 10k, between: [in, out] }
  C1:  { capacitor: 100n, between: [out, gnd], initial: 0 }
simulate:
  duration: 10m
`;

/** The file with one line replaced (1-based), to put a single mistake at a known place. */
function withLine(text: string, line: number, replacement: string): string {
  const lines = text.split('\n');
  lines[line - 1] = replacement;
  return lines.join('\n');
}

function errors(text: string): CircuitIssue[] {
  return readCircuit(text).issues.filter((issue) => issue.severity === 'error');
}

function only(text: string): CircuitIssue {
  const found = errors(text);
  expect(found.map((issue) => formatIssue(issue))).toHaveLength(1);
  return found[0];
}

describe('a valid circuit', () => {
  it('reads parts, nodes in order of appearance, and simulate defaults', () => {
    const { circuit, issues } = readCircuit(filter);
    expect(issues).toEqual([]);
    expect(circuit?.name).toBe('invented-test-filter');
    expect(circuit?.parts.map((part) => `${part.name}:${part.kind}`)).toEqual(['SRC:voltage', 'R1:resistor', 'C1:capacitor']);
    expect(circuit?.nodes).toEqual(['in', 'out']);
    expect(circuit?.recorded).toEqual(['in', 'out']);
    expect(circuit?.simulate).toEqual({
      duration: 10e-3,
      outputStep: 10e-6,
      maxStep: 10e-6,
      fixedStep: undefined,
      accuracy: { relative: 1e-4, volts: 1e-6, amps: 1e-9 },
      temperature: 25,
    });
  });

  it('takes every simulate key and explicit record', () => {
    const text = `${filter}  output-step: 20u\n  max-step: 1u\n  fixed-step: 100n\n  accuracy: { relative: 0.1%, amps: 1p }\n  temperature: 85°C\nrecord: [out]\n`;
    const circuit = parseCircuit(text);
    expect(circuit.simulate).toEqual({
      duration: 10e-3,
      outputStep: 20e-6,
      maxStep: 1e-6,
      fixedStep: 100e-9,
      accuracy: { relative: 1e-3, volts: 1e-6, amps: 1e-12 },
      temperature: 85,
    });
    expect(circuit.recorded).toEqual(['out']);
  });

  it('passes readFile on to file waves', () => {
    const text = withLine(filter, 3, '  SRC: { voltage: { file: edge.csv }, between: [in, gnd] }');
    const circuit = parseCircuit(text, { readFile: (path) => (path === 'edge.csv' ? '0,0\n1m,1\n' : '') });
    expect(circuit.parts[0].name).toBe('SRC');
  });
});

describe('errors say what, where and what to do', () => {
  it('YAML syntax errors carry line and column', () => {
    const [first] = errors(withLine(filter, 4, '  R1:  { resistor: 10k, between: [in, out }'));
    expect(first.message).toBe('YAML: Flow sequence in block collection must be sufficiently indented and end with a ]');
    expect(first.position).toEqual({ line: 4, column: 43 });
  });

  it('an unknown top-level key suggests the near one', () => {
    const issue = only(`${filter}recrod: [out]\n`);
    expect(formatIssue(issue, 'f.yaml')).toBe("f.yaml:8:1: error: unknown key 'recrod' at recrod\n  did you mean 'record'?");
  });

  it('an unknown key with nothing near lists the known keys', () => {
    const issue = only(`${filter}zzz: {}\n`);
    expect(issue.message).toBe("unknown key 'zzz'");
    expect(issue.hint).toBe('keys known here: circuit, parts, simulate, record, adc, response, noise');
  });

  it('a duplicate part name points at the second one and names the first', () => {
    const issue = only(withLine(filter, 5, '  R1:  { capacitor: 100n, between: [out, gnd] }'));
    expect(issue.message).toBe("part name 'R1' is used twice (first at line 4, column 3)");
    expect(issue.position).toEqual({ line: 5, column: 3 });
    expect(issue.part).toBe('R1');
  });

  it('a misspelt part kind suggests the kind', () => {
    const text = withLine(filter, 4, '  R1:  { resitor: 10k, between: [in, out] }');
    // Only the one error: the unread part's nodes must not look unconnected.
    expect(readCircuit(text).issues).toHaveLength(1);
    const issue = only(text);
    expect(issue.message).toMatch(/^a part needs one kind key, one of: resistor, capacitor, inductor, voltage, current, vcvs/);
    expect(issue.hint).toBe("did you mean 'resistor' instead of 'resitor'?");
    expect(issue.part).toBe('R1');
    expect(issue.position).toEqual({ line: 4, column: 8 });
  });

  it('two kind keys in one part is an error', () => {
    const issue = only(withLine(filter, 4, '  R1:  { resistor: 10k, capacitor: 1n, between: [in, out] }'));
    expect(issue.message).toBe('a part has 2 kind keys (resistor, capacitor); it needs exactly one');
  });

  it('an unknown option of a part suggests the near one', () => {
    const issue = only(withLine(filter, 5, '  C1:  { capacitor: 100n, between: [out, gnd], intial: 0 }'));
    expect(issue).toMatchObject({ message: "unknown key 'intial'", hint: "did you mean 'initial'?", part: 'C1', path: ['parts', 'C1', 'intial'], position: { line: 5, column: 48 } });
  });

  it('a value that is not a number of the right quantity shows what is valid', () => {
    const issue = only(withLine(filter, 4, '  R1:  { resistor: 10kilo, between: [in, out] }'));
    expect(issue.message).toBe("'10kilo' is not a resistance");
    expect(issue.hint).toMatch(/like 10M or 4\.7kΩ$/);
    expect(issue.position).toEqual({ line: 4, column: 20 });
  });

  it('zero or negative values where they make no sense', () => {
    expect(only(withLine(filter, 4, '  R1:  { resistor: 0, between: [in, out] }')).message).toBe('resistor must be greater than 0 Ω, found 0');
    expect(only(withLine(filter, 7, '  duration: -1m')).message).toBe("duration must be greater than 0 s, found '-1m'");
  });

  it('a missing simulate.duration', () => {
    const issue = only(withLine(filter, 7, '  output-step: 1u'));
    expect(issue).toMatchObject({ message: "missing key 'duration'", path: ['simulate', 'duration'], position: { line: 7, column: 3 } });
    expect(issue.hint).toMatch(/duration: 10m/);
  });

  it('an output step longer than the run', () => {
    expect(only(`${filter}  output-step: 20m\n`).message).toBe('output-step 20 ms is longer than the duration 10 ms');
  });

  it('brackets nested thousands deep are "nested too deeply", at the place they pass 100 levels', () => {
    // Before: "YAML: Maximum call stack size exceeded", from the second parser's recursion.
    const issue = only(`${filter}extra: ${'['.repeat(20_000)}${']'.repeat(20_000)}\n`);
    expect(issue).toMatchObject({ message: 'YAML: nested too deeply (more than 100 levels of brackets)', position: { line: 8, column: 108 } });
    expect(issue.hint).toMatch(/run of \[ or \{/);
  });

  it('values beyond any physical size are refused where written', () => {
    // Before: a -9e303 V point ran, and a slew finding's average rate came out as Infinity.
    expect(only(withLine(filter, 3, '  SRC: { voltage: { points: [[0, -9e303], [1m, 0]] }, between: [in, gnd] }'))).toMatchObject({
      message: 'voltage -9e303 is beyond any physical value',
      hint: 'check the exponent: values lie between 1e-100 and 1e+100 in size',
      position: { line: 3, column: 34 },
    });
    expect(only(withLine(filter, 5, '  C1:  { capacitor: 1e-264, between: [out, gnd], initial: 0 }')).message).toBe('capacitor 1e-264 is closer to zero than any physical value');
  });

  it('a node name of a million characters is refused, and the message quotes only its start', () => {
    const issue = only(`${filter}record: [${'x'.repeat(1_000_000)}]\n`);
    expect(issue.message).toBe(`node name '${'x'.repeat(40)}…' is 1000000 characters long`);
    expect(issue.hint).toBe('node names become CSV column names: keep them to 200 characters');
  });

  it('a value of the wrong shape says what to write', () => {
    // Before, these four had no hint.
    const hints = [
      withLine(filter, 4, '  R1:  { resistor: [1, 2], between: [in, out] }'),
      withLine(filter, 4, '  R1:  { resistor: 10k, between: in }'),
      `${filter}  accuracy: 5\n`,
      `${filter}  accuracy: { relative: 1e-4 }\nadc: { A: { input: out, bits: 12, range: [0, 1], rate: 1k, coding: [a] } }\n`,
    ].map((text) => errors(text).find((issue) => issue.message.startsWith('expected'))?.hint);
    expect(hints[0]).toMatch(/^write a number with an optional SI prefix .* like /);
    expect(hints[1]).toBe('write the items in brackets, separated by commas: [a, b]');
    expect(hints[2]).toMatch(/^write the keys in braces/);
    expect(hints[3]).toBe('write one word or name here, without brackets or braces');
  });

  it('rows or steps too many for any run to finish are refused; a very fast stimulus is a warning', () => {
    // 10 ms / 1 fs = 1e13 rows: past the 1e9 rows a run can write or keep.
    expect(only(`${filter}  output-step: 1f\n`)).toMatchObject({ message: 'output-step 1 fs makes 1.0e+13 rows, more than a run can write or keep (1e+9)', position: { line: 8, column: 16 } });
    expect(only(`${filter}  max-step: 1e-18\n`).message).toBe('max-step 0.001 fs makes 1.0e+16 steps, more than a run can finish (1e+10)');
    expect(only(`${filter}  fixed-step: 1e-18\n`).message).toBe('fixed-step 0.001 fs makes 1.0e+16 steps, more than a run can finish (1e+10)');
    // A 1 GHz sine over 10 ms: 1e7 periods, each several steps.
    const fast = readCircuit(withLine(filter, 3, '  SRC: { voltage: { sine: { amplitude: 1, frequency: 1G } }, between: [in, gnd] }'));
    expect(fast.circuit).toBeDefined();
    expect(fast.issues.map((issue) => issue.message)).toContain("the duration 10 ms is 10 M times SRC's 1 ns (its shortest period, level or segment), and each needs several steps: expect a long run");
    // A switch every picosecond for a day: 8.6e16 periods, past the steps a run can take (and past 2^53, where period arithmetic loses whole periods).
    const endless = only(withLine(filter, 3, '  SRC: { voltage: 1, between: [in, gnd] }\n  S1: { switch: 50, closed: [[0, 0.5p]], every: 1p, between: [in, gnd] }').replace('duration: 10m', 'duration: 86400'));
    expect(endless.message).toBe("the duration 86.4 ks is 1.7e+17 times S1's 500 fs (its shortest period, level or segment): more steps than a run can finish (1e+10)");
  });

  it('a pin node touched once whose name is near another node is a misspelling', () => {
    // `out` is now lone too; the pair is one misspelling, reported once, at the later name.
    const issue = only(withLine(filter, 5, '  C1:  { capacitor: 100n, between: [ouut, gnd] }'));
    expect(formatIssue(issue, 'f.yaml')).toBe("f.yaml:5:37: error: node 'ouut' is only connected to C1 (part C1) at parts.C1.between.0\n  did you mean 'out'?");
  });

  it('a lone node with no near name is a warning, and silent when recorded', () => {
    const text = `${filter.replace('simulate:', '  R2: { resistor: 1k, between: [out, sense] }\nsimulate:')}`;
    const { circuit, issues } = readCircuit(text);
    expect(circuit).toBeDefined();
    expect(issues).toMatchObject([{ severity: 'warning', message: "node 'sense' is only connected to R2", part: 'R2', position: { line: 6, column: 38 } }]);
    // The hint names the file's own key (`record:`), as the fix below writes it.
    expect(issues[0].hint).toBe('nothing else connects to it: check the spelling, or add it to record: if it is a test point (record: [..., sense])');
    expect(readCircuit(`${text}record: [out, sense]\n`).issues).toEqual([]);
  });

  it('record entries that name no node suggest one; gnd and repeats are caught', () => {
    const issue = only(`${filter}record: [in, ot]\n`);
    expect(issue).toMatchObject({ message: "record: 'ot' names no node of this circuit", hint: "did you mean 'out'?", path: ['record', 1], position: { line: 8, column: 14 } });
    expect(only(`${filter}record: [gnd]\n`).message).toMatch(/gnd is ground/);
    const repeated = readCircuit(`${filter}record: [out, out]\n`);
    expect(repeated.circuit?.recorded).toEqual(['out']);
    expect(repeated.issues).toMatchObject([{ severity: 'warning', message: "record: 'out' is listed twice" }]);
  });

  it('a circuit with no part on gnd is an error, with a hint for a capitalised ground', () => {
    const noGround = filter.replace(/gnd/g, 'GND');
    const issue = only(noGround);
    expect(issue).toMatchObject({ message: 'no part connects to ground (gnd)', hint: "ground is written 'gnd' in lowercase; found 'GND'", position: { line: 3, column: 3 } });
  });

  it('points that go back in time name the part and the point', () => {
    const issue = only(withLine(filter, 3, '  SRC: { voltage: { points: [[0, 0], [2m, 0], [1m, 2]] }, between: [in, gnd] }'));
    expect(issue).toMatchObject({ part: 'SRC', path: ['parts', 'SRC', 'voltage', 'points', 2, 0], position: { line: 3, column: 48 } });
    expect(issue.message).toBe('time of point 3 (1 ms) is not after the time of point 2 (2 ms)');
  });

  it('collects every problem in one pass, top to bottom', () => {
    let text = withLine(filter, 4, '  R1:  { resistor: 10K, between: [in, out] }');
    text = withLine(text, 5, '  C1:  { capacitor: 100n, between: [out, gnd], initail: 0 }');
    text = withLine(text, 7, '  duraton: 10m');
    const found = errors(text);
    expect(found.map((issue) => issue.position?.line)).toEqual([4, 5, 7, 7]);
    expect(found.map((issue) => issue.message)).toEqual([
      "'10K' is not a resistance: the SI prefix for kilo is a lowercase k",
      "unknown key 'initail'",
      "missing key 'duration'",
      "unknown key 'duraton'",
    ]);
  });

  it('empty and non-map files', () => {
    expect(only('')).toMatchObject({ message: 'the circuit is empty', position: { line: 1, column: 1 } });
    expect(only('# nothing but a comment\n').message).toBe('the circuit is empty');
    expect(only('- a list\n').message).toBe('a circuit must be a map of keys');
  });

  it('a part that is not a map', () => {
    expect(only(withLine(filter, 4, '  R1: 10k')).message).toBe("part 'R1' must be a map with one kind key");
  });
});

describe('parseCircuit and buildCircuit', () => {
  it('parseCircuit throws a CircuitError carrying every issue and the file name', () => {
    try {
      parseCircuit(withLine(filter, 4, '  R1:  { resistor: 10kilo, between: [in, out] }'), { fileName: 'filter.yaml' });
      expect.unreachable();
    } catch (error) {
      expect(error).toBeInstanceOf(CircuitError);
      expect((error as CircuitError).issues).toHaveLength(1);
      expect((error as CircuitError).message).toMatch(/^filter\.yaml:4:20: error: '10kilo' is not a resistance \(part R1\) at parts\.R1\.resistor/);
    }
  });

  it('buildCircuit validates a plain object through the same checks', () => {
    const circuit = buildCircuit({
      circuit: 'invented-divider',
      parts: {
        V1: { voltage: 5, between: ['top', 'gnd'] },
        RA: { resistor: '10k', between: ['top', 'mid'] },
        RB: { resistor: 4700, between: ['mid', 'gnd'] },
      },
      simulate: { duration: '1m' },
      record: ['mid'],
    });
    expect(circuit.nodes).toEqual(['top', 'mid']);
    expect(circuit.recorded).toEqual(['mid']);
    expect(circuit.simulate.outputStep).toBe(1e-6);
  });

  it('buildCircuit errors carry key paths and part names, without positions', () => {
    try {
      buildCircuit({ circuit: 'x', parts: { RA: { resistor: '10kilo', between: ['a', 'gnd'] } }, simulate: { duration: 1 } });
      expect.unreachable();
    } catch (error) {
      const issues = (error as CircuitError).issues.filter((issue) => issue.severity === 'error');
      expect(issues).toMatchObject([{ path: ['parts', 'RA', 'resistor'], part: 'RA', message: "'10kilo' is not a resistance" }]);
      expect(issues[0].position).toBeUndefined();
    }
  });
});

describe('did you mean', () => {
  // Optimal string alignment distance; worked values from the definition (each edit or swap counts 1).
  it.each([
    ['out', 'ouut', 1],
    ['gnd', 'gdn', 1],
    ['kitten', 'sitting', 3],
    ['', 'abc', 3],
    ['record', 'recrod', 1],
  ])('distance(%s, %s) = %d', (a, b, d) => {
    expect(editDistance(a, b)).toBe(d);
    expect(editDistance(b, a)).toBe(d);
  });
});
