import { copyFileSync, mkdirSync, mkdtempSync, readdirSync, readFileSync, rmSync, statSync, writeFileSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { describe, expect, test, type TestContext } from 'vitest';
import { repoRoot, runCli } from './support/run-cli.ts';
import { snapshot } from './support/folder-snapshot.ts';

// voltcast never deletes a file it did not write: a user's project folder survives every
// command, with or without --out, and with --force too.

const fixture = join(repoRoot, 'fixtures', 'envelope-rc-filter.yaml');
const marker = '.voltcast-output';

/** A project folder as a user keeps it: the circuit, a C source, notes and a sub-folder with a capture. */
function projectFolder({ onTestFinished }: TestContext): string {
  const scratch = mkdtempSync(join(tmpdir(), 'voltcast-safety-'));
  onTestFinished(() => rmSync(scratch, { recursive: true, force: true }));
  const project = join(scratch, 'project');
  mkdirSync(join(project, 'captures'), { recursive: true });
  copyFileSync(fixture, join(project, 'board.yaml'));
  writeFileSync(join(project, 'filter.c'), '/* invented firmware filter */\nint filter(int x) { return x / 2; }\n');
  writeFileSync(join(project, 'notes.txt'), 'bench notes: invented board, nothing measured\n');
  copyFileSync(join(repoRoot, 'fixtures', 'data', 'moisture-capture-good.csv'), join(project, 'captures', 'scope.csv'));
  return project;
}

describe('a folder of the user survives every command', () => {
  test('run and envelope refuse it (exit 2) and change nothing, whether named or the current folder', async (context) => {
    const project = projectFolder(context);
    const before = snapshot(project);
    for (const args of [
      ['run', 'board.yaml', '--out', project, '--plot'],
      ['envelope', 'board.yaml', '--runs', '2', '--workers', '1', '--out', '.'],
    ]) {
      const { code, stdout, stderr } = await runCli(args, project);
      expect(code, args.join(' ')).toBe(2);
      expect(stdout).toBe('');
      expect(stderr).toMatch(/holds files voltcast did not write \(board\.yaml, captures, filter\.c, notes\.txt\); nothing was written\n {2}give --out a new or empty folder, or add --force/);
      expect(snapshot(project)).toEqual(before);
      expect(readdirSync(project).sort()).toEqual(['board.yaml', 'captures', 'filter.c', 'notes.txt']);
    }
  });

  test('with --force every command writes beside the files and they stay byte for byte', async (context) => {
    const project = projectFolder(context);
    const before = snapshot(project);
    const commands = [
      ['run', 'board.yaml', '--out', '.', '--force', '--quiet', '--plot', '--codes-as', 'c-header,json'],
      ['run', 'board.yaml', '--out', '.', '--quiet'], // the marker now names voltcast's files: no --force needed
      ['envelope', 'board.yaml', '--runs', '2', '--workers', '1', '--out', '.', '--quiet', '--plot'],
      ['compare', join('captures', 'scope.csv'), 'envelope.csv', '--signal', 'adc', '--shift', 'auto', '--margin', '50m', '--plot', 'compare.svg'],
    ];
    for (const args of commands) {
      const { code, stderr } = await runCli(args, project);
      expect(code, `${args.join(' ')}\n${stderr}`).toBe(0);
      expect(snapshot(project)).toMatchObject(before);
    }
    // The envelope replaced the run's files (they were voltcast's); the user's are all there.
    const listed = readFileSync(join(project, marker), 'utf8').split('\n').filter((line) => line !== '' && !line.startsWith('#') && !line.startsWith('folder:'));
    expect(listed.sort()).toEqual(['envelope-adc-MCU.csv', 'envelope.csv', 'plot.svg']);
    expect(readdirSync(project).sort()).toEqual([marker, 'board.yaml', 'captures', 'compare.svg', 'envelope-adc-MCU.csv', 'envelope.csv', 'filter.c', 'notes.txt', 'plot.svg']);
  });

  test("a run from inside voltcast's own folder writes into it without replacing the folder itself", async (context) => {
    const project = projectFolder(context);
    const out = join(project, 'out', 'board');
    expect((await runCli(['run', 'board.yaml', '--quiet'], project)).code).toBe(0);
    const folder = statSync(out).ino;
    const { code, stderr } = await runCli(['run', join('..', '..', 'board.yaml'), '--out', '.', '--quiet'], out);
    expect(stderr).toBe('');
    expect(code).toBe(0);
    // The same folder (a shell standing in it keeps working), now holding this run.
    expect(statSync(out).ino).toBe(folder);
    expect(readdirSync(out).sort()).toEqual([marker, 'adc-MCU.csv', 'report.json', 'report.txt', 'waveforms.csv']);
  });
});

describe('bad output folders are input errors', () => {
  test('a path through a file exits 2 with what to do, not an internal error', async (context) => {
    const project = projectFolder(context);
    const before = snapshot(project);
    const { code, stderr } = await runCli(['run', 'board.yaml', '--out', join('notes.txt', 'run')], project);
    expect(code).toBe(2);
    expect(stderr).toBe('voltcast: cannot write the output folder notes.txt/run: a part of the path is a file, not a folder (' + join(project, 'notes.txt', 'run') + ')\n  give --out a folder you can write to, such as out/results\n');
    expect(snapshot(project)).toEqual(before);
  });
});

describe('two runs into one folder at once', () => {
  test('both finish, and the folder holds one complete run', async (context) => {
    const project = projectFolder(context);
    // A second, different circuit: the same board with other record names would do; the demo is at hand.
    copyFileSync(join(repoRoot, 'fixtures', 'demo-strain-front-end.yaml'), join(project, 'demo.yaml'));
    const [a, b] = await Promise.all([runCli(['run', 'board.yaml', '--out', 'shared', '--quiet'], project), runCli(['run', 'demo.yaml', '--out', 'shared', '--quiet'], project)]);
    expect([a.code, b.code, a.stderr, b.stderr]).toEqual([0, 0, '', '']);
    const shared = join(project, 'shared');
    const report = JSON.parse(readFileSync(join(shared, 'report.json'), 'utf8'));
    const header = readFileSync(join(shared, 'waveforms.csv'), 'utf8').split('\n')[0];
    // Whichever finished last, its files are together: the table's columns are its report's.
    expect(header).toBe(['time', ...Object.keys(report.recorded)].join(','));
    const listed = readFileSync(join(shared, marker), 'utf8').split('\n').filter((line) => line !== '' && !line.startsWith('#') && !line.startsWith('folder:'));
    expect([marker, ...listed].sort()).toEqual(readdirSync(shared).sort());
    expect(readdirSync(project).filter((name) => name.startsWith('.'))).toEqual([]);
  });
});
