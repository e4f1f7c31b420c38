import { existsSync, mkdtempSync, readdirSync, rmSync, writeFileSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { describe, expect, test, type TestContext } from 'vitest';
import { runCli } from './support/run-cli.ts';

// Exit codes and message shapes are the command-line contract of docs/cli.md: 2 for bad input with
// file:line:column, 1 for a failed simulation with time and nodes, and never a finished-looking
// output folder after a failure.

const good = `circuit: error-cases
parts:
  SRC: { voltage: 1, between: [in, gnd] }
  R1: { resistor: 1k, between: [in, out] }
  C1: { capacitor: 1u, between: [out, gnd] }
simulate: { duration: 1m, output-step: 10u }
record: [out]
`;

/** A fresh folder for one test, removed when it ends (safe for concurrent tests). */
function scratchFor({ onTestFinished }: TestContext): string {
  const folder = mkdtempSync(join(tmpdir(), 'voltcast-errors-'));
  onTestFinished(() => rmSync(folder, { recursive: true, force: true }));
  return folder;
}

/** 1-based line and column of the `occurrence`-th appearance of `needle` in `text`. */
function positionOf(text: string, needle: string, occurrence = 1): { line: number; column: number } {
  let index = -1;
  for (let i = 0; i < occurrence; i++) index = text.indexOf(needle, index + 1);
  if (index < 0) throw new Error(`test setup: ${needle} not in the circuit text`);
  const before = text.slice(0, index).split('\n');
  return { line: before.length, column: before.at(-1)!.length + 1 };
}

/** Write `text` as a circuit file, run it, and check the exit-2 contract; returns stderr. */
async function runBad(scratch: string, text: string): Promise<{ stderr: string; file: string }> {
  const file = join(scratch, 'bad.yaml');
  writeFileSync(file, text);
  const out = join(scratch, 'result');
  const { code, stdout, stderr } = await runCli(['run', file, '--out', out]);
  expect(code).toBe(2);
  expect(stdout).toBe('');
  expect(existsSync(out)).toBe(false);
  expect(readdirSync(scratch)).toEqual(['bad.yaml']);
  expect(stderr).toMatch(/^ {2}\S/m); // a hint line, indented under its error
  return { stderr, file };
}

describe('bad circuit files exit 2 with file:line:column, a hint, and no output', () => {
  // `at` is the text where the bad value (or the map missing a key) starts.
  const cases: { name: string; text: string; at: string; occurrence?: number; says: RegExp }[] = [
    {
      name: 'unknown key, with a did-you-mean',
      text: good.replace('output-step: 10u', 'outptu-step: 10u'),
      at: 'outptu-step',
      says: /did you mean.*output-step/i,
    },
    { name: 'a multiplier word that is not an SI prefix', text: good.replace('1k', '10kilo'), at: '10kilo', says: /10kilo/ },
    {
      name: 'points whose times do not increase',
      text: good.replace('voltage: 1,', 'voltage: { points: [[0, 0], [2m, 1], [1m, 2]] },'),
      at: '1m, 2]',
      says: /increas/i,
    },
    {
      name: 'a duplicate part name',
      text: good.replace('  C1:', '  R1: { resistor: 2k, between: [in, out] }\n  C1:'),
      at: 'R1:',
      occurrence: 2,
      says: /R1/,
    },
    {
      name: 'a missing simulate.duration',
      text: good.replace('duration: 1m, ', ''),
      at: '{ output-step',
      says: /duration/,
    },
    {
      name: 'a pin naming a misspelt node',
      text: good.replace('between: [out, gnd]', 'between: [otu, gnd]'),
      at: 'otu',
      says: /otu[\s\S]*\bout\b/,
    },
    {
      name: 'a record entry naming a misspelt node',
      text: good.replace('record: [out]', 'record: [otu]'),
      at: 'otu',
      says: /otu[\s\S]*\bout\b/,
    },
    {
      name: 'a file wave whose data file is missing',
      text: good.replace('voltage: 1,', 'voltage: { file: data/absent.csv },'),
      at: 'data/absent.csv',
      says: /absent\.csv/,
    },
  ];

  test.concurrent.for(cases)('$name', async ({ text, at, occurrence, says }, context) => {
    const { stderr, file } = await runBad(scratchFor(context), text);
    const { line, column } = positionOf(text, at, occurrence);
    expect(stderr).toContain(`${file}:${line}:${column}: error: `);
    expect(stderr).toMatch(says);
  });
});

describe('usage errors exit 2', () => {
  test('a circuit file that does not exist is named in the message', async (context) => {
    const scratch = scratchFor(context);
    const missing = join(scratch, 'no-such-board.yaml');
    const { code, stderr } = await runCli(['run', missing, '--out', join(scratch, 'result')]);
    expect(code).toBe(2);
    expect(stderr).toContain(missing);
    expect(stderr).toMatch(/no such file/);
    expect(readdirSync(scratch)).toEqual([]);
  });

  test('a circuit file past 10 MB is refused before it is read (before: minutes and gigabytes)', async (context) => {
    const scratch = scratchFor(context);
    const file = join(scratch, 'huge.yaml');
    writeFileSync(file, `${good}${'# padding\n'.repeat(1_100_000)}`);
    const { code, stderr } = await runCli(['check', file]);
    expect(code).toBe(2);
    expect(stderr).toContain(`circuit file ${file} is 11 MB, more than the 10 MB voltcast reads as a circuit file\n  check that this is the file you meant`);
  });

  test('an unknown option', async (context) => {
    const scratch = scratchFor(context);
    writeFileSync(join(scratch, 'good.yaml'), good);
    const { code, stderr } = await runCli(['run', join(scratch, 'good.yaml'), '--frobnicate']);
    expect(code).toBe(2);
    expect(stderr).toMatch(/unknown option '--frobnicate'/);
  });

  test('no command at all shows the usage', async () => {
    const { code, stderr } = await runCli([]);
    expect(code).toBe(2);
    expect(stderr).toMatch(/Usage: voltcast/);
  });
});

describe('a circuit that fails in simulation', () => {
  test('a floating node exits 1, names the node, and writes nothing', async (context) => {
    const scratch = scratchFor(context);
    // Two capacitors in series leave nothing conducting between `mid` and ground at DC: the operating point's
    // matrix is singular there (common practice: every node needs a conducting path to ground at DC).
    const text = `circuit: floating-middle
parts:
  SRC: { voltage: { sine: { amplitude: 1, frequency: 1k } }, between: [in, gnd] }
  C1: { capacitor: 1u, between: [in, mid] }
  C2: { capacitor: 1u, between: [mid, gnd] }
simulate: { duration: 1m, output-step: 10u }
record: [mid]
`;
    const file = join(scratch, 'floating.yaml');
    writeFileSync(file, text);
    const out = join(scratch, 'result');
    const { code, stdout, stderr } = await runCli(['run', file, '--out', out]);
    expect(code).toBe(1);
    expect(stdout).toBe('');
    expect(stderr).toMatch(/simulation failed/);
    expect(stderr).toMatch(/\bmid\b/);
    expect(readdirSync(scratch)).toEqual(['floating.yaml']);
  });

  test('a failed run leaves the folder of an earlier successful run untouched', async (context) => {
    const scratch = scratchFor(context);
    const goodFile = join(scratch, 'good.yaml');
    writeFileSync(goodFile, good);
    const out = join(scratch, 'result');
    expect((await runCli(['run', goodFile, '--out', out, '--quiet'])).code).toBe(0);
    // The same circuit with a floating node `mid` between two capacitors.
    const floating = good.replace('between: [out, gnd] }', 'between: [out, mid] }\n  C2: { capacitor: 1u, between: [mid, gnd] }');
    writeFileSync(goodFile, floating);
    expect((await runCli(['run', goodFile, '--out', out, '--quiet'])).code).toBe(1);
    expect(readdirSync(out).sort()).toEqual(['.voltcast-output', 'report.json', 'report.txt', 'waveforms.csv']);
    expect(readdirSync(scratch).sort()).toEqual(['good.yaml', 'result']);
  });
});

describe('voltcast check', () => {
  test('a good file exits 0 and says so', async (context) => {
    const scratch = scratchFor(context);
    const file = join(scratch, 'good.yaml');
    writeFileSync(file, good);
    const { code, stdout, stderr } = await runCli(['check', file]);
    expect(stderr).toBe('');
    expect(code).toBe(0);
    expect(stdout).toContain(`${file}: ok`);
    expect(readdirSync(scratch)).toEqual(['good.yaml']);
  });

  test('a bad file exits 2 with the position', async (context) => {
    const scratch = scratchFor(context);
    const file = join(scratch, 'bad.yaml');
    const text = good.replace('1k', '10kilo');
    writeFileSync(file, text);
    const { line, column } = positionOf(text, '10kilo');
    const { code, stderr } = await runCli(['check', file]);
    expect(code).toBe(2);
    expect(stderr).toContain(`${file}:${line}:${column}: error: `);
  });
});
