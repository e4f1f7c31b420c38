import { spawnSync } from 'node:child_process';
import { existsSync, mkdirSync, mkdtempSync, readdirSync, readFileSync, rmSync, writeFileSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { afterEach, beforeEach, describe, expect, test } from 'vitest';
import { InputError } from '../src/exit-codes.ts';
import { markerName, readMarker } from '../src/output/marker.ts';
import { writeOutputDir } from '../src/output/output-dir.ts';
import { snapshot } from '../../../test/support/folder-snapshot.ts';

let scratch: string;
beforeEach(() => {
  scratch = mkdtempSync(join(tmpdir(), 'voltcast-outdir-'));
});
afterEach(() => {
  rmSync(scratch, { recursive: true, force: true });
});

/** A writer that writes `files` (name → text) into the staging folder. */
const writing = (files: Record<string, string>) => (staging: string) => {
  for (const [name, content] of Object.entries(files)) writeFileSync(join(staging, name), content);
};

/** A project folder as a user keeps it: a circuit, a C source, notes and a sub-folder. */
function projectFolder(): string {
  const project = join(scratch, 'project');
  mkdirSync(join(project, 'captures'), { recursive: true });
  writeFileSync(join(project, 'board.yaml'), 'circuit: board\n');
  writeFileSync(join(project, 'filter.c'), 'int filter(int x) { return x; }\n');
  writeFileSync(join(project, 'notes.txt'), 'bench notes\n');
  writeFileSync(join(project, 'captures', 'scope.csv'), 'time,ch1\n0,1\n');
  return project;
}

/** The id of a process that has ended (a child that ran and exited). */
function endedPid(): number {
  return spawnSync(process.execPath, ['-e', '0']).pid!;
}

describe('writeOutputDir into a new folder', () => {
  test('files appear under the final name only once the writer has finished, with a marker listing them', async () => {
    const target = join(scratch, 'run');
    const value = await writeOutputDir(target, {}, (staging) => {
      writeFileSync(join(staging, 'a.csv'), 'time\n0\n');
      expect(existsSync(target)).toBe(false);
      return 42;
    });
    expect(value).toBe(42);
    expect(readdirSync(scratch)).toEqual(['run']);
    expect(readFileSync(join(target, 'a.csv'), 'utf8')).toBe('time\n0\n');
    expect(readMarker(target)).toEqual({ folder: 'own', files: ['a.csv'] });
  });

  test('a failing writer leaves neither files nor the parent folders it created', async () => {
    const target = join(scratch, 'deep/er/run');
    await expect(
      writeOutputDir(target, {}, (staging) => {
        writeFileSync(join(staging, 'half.csv'), 'time\n');
        throw new Error('engine gave up');
      }),
    ).rejects.toThrow('engine gave up');
    expect(readdirSync(scratch)).toEqual([]);
  });

  test('a path through a file, or a file as the folder, is bad input that names what to do', async () => {
    writeFileSync(join(scratch, 'board.yaml'), 'circuit: board\n');
    const through = writeOutputDir(join(scratch, 'board.yaml', 'run'), {}, writing({ 'a.csv': '' }));
    await expect(through).rejects.toBeInstanceOf(InputError);
    await expect(through).rejects.toThrow(/cannot write the output folder .*board\.yaml\/run: a part of the path is a file, not a folder.*\n {2}give --out a folder you can write to/);
    await expect(writeOutputDir(join(scratch, 'board.yaml'), {}, writing({}))).rejects.toThrow(/board\.yaml is a file, not a folder\n {2}give --out a folder/);
    expect(readdirSync(scratch)).toEqual(['board.yaml']);
  });

  // /sys refuses new folders even to root (tests here run as root, where permissions do not bite).
  test.skipIf(!existsSync('/sys/kernel'))('a folder that cannot be made is bad input, not an internal error', async () => {
    await expect(writeOutputDir('/sys/voltcast-test/run', {}, writing({}))).rejects.toThrow(/cannot write the output folder \/sys\/voltcast-test\/run: (permission denied|the file system is read-only)/);
  });
});

describe('writeOutputDir never deletes a file voltcast did not write', () => {
  test('a folder of other files is refused before any work, and left as it was', async () => {
    const project = projectFolder();
    const before = snapshot(project);
    let wrote = false;
    const refused = writeOutputDir(project, {}, () => void (wrote = true));
    await expect(refused).rejects.toBeInstanceOf(InputError);
    await expect(refused).rejects.toThrow(/holds files voltcast did not write \(board\.yaml, captures, filter\.c, notes\.txt\); nothing was written\n {2}give --out a new or empty folder, or add --force/);
    expect(wrote).toBe(false);
    expect(snapshot(project)).toEqual(before);
    expect(readdirSync(project).sort()).toEqual(['board.yaml', 'captures', 'filter.c', 'notes.txt']);
  });

  test('with force, voltcast writes beside the other files and replaces only its own on the next run', async () => {
    const project = projectFolder();
    const before = snapshot(project);
    await writeOutputDir(project, { force: true }, writing({ 'waveforms.csv': 'first', 'adc-OLD.csv': 'codes' }));
    expect(snapshot(project)).toMatchObject(before);
    expect(readMarker(project)).toEqual({ folder: 'shared', files: ['adc-OLD.csv', 'waveforms.csv'] });
    // The marker now names voltcast's files: the next run needs no --force, and drops adc-OLD.csv.
    await writeOutputDir(project, {}, writing({ 'waveforms.csv': 'second', 'report.txt': 'report' }));
    expect(snapshot(project)).toEqual({ ...before, 'waveforms.csv': 'second', 'report.txt': 'report', [markerName]: readFileSync(join(project, markerName), 'utf8') });
    expect(readMarker(project)?.files).toEqual(['report.txt', 'waveforms.csv']);
    expect(readdirSync(project).filter((name) => name.startsWith('.') && name !== markerName)).toEqual([]);
  });

  test('a new file whose name a file of the user already has is refused, not overwritten', async () => {
    const project = projectFolder();
    writeFileSync(join(project, 'report.txt'), 'my own report');
    const before = snapshot(project);
    await expect(writeOutputDir(project, { force: true }, writing({ 'report.txt': 'voltcast report', 'waveforms.csv': 'rows' }))).rejects.toThrow(/already holds report\.txt, which voltcast did not write; nothing was written there\n {2}move or rename that file/);
    expect(snapshot(project)).toEqual(before);
    expect(readdirSync(project).sort()).toEqual(['board.yaml', 'captures', 'filter.c', 'notes.txt', 'report.txt']);
  });

  test("files added to voltcast's own folder survive its next run", async () => {
    const target = join(scratch, 'run');
    await writeOutputDir(target, {}, writing({ 'waveforms.csv': 'first' }));
    writeFileSync(join(target, 'notes.txt'), 'looked at this run');
    mkdirSync(join(target, 'mine'));
    await writeOutputDir(target, {}, writing({ 'waveforms.csv': 'second' }));
    expect(readFileSync(join(target, 'notes.txt'), 'utf8')).toBe('looked at this run');
    expect(existsSync(join(target, 'mine'))).toBe(true);
    expect(readFileSync(join(target, 'waveforms.csv'), 'utf8')).toBe('second');
  });

  test('a marker listing paths outside its folder is not followed', async () => {
    const target = join(scratch, 'run');
    await writeOutputDir(target, {}, writing({ 'a.csv': 'run' }));
    writeFileSync(join(scratch, 'precious.txt'), 'keep');
    writeFileSync(join(target, markerName), readFileSync(join(target, markerName), 'utf8') + '../precious.txt\n..\n');
    await writeOutputDir(target, {}, writing({ 'b.csv': 'run' }));
    expect(readFileSync(join(scratch, 'precious.txt'), 'utf8')).toBe('keep');
  });
});

describe('replacing an earlier run', () => {
  test("voltcast's own folder survives a failure and is replaced whole on success", async () => {
    const target = join(scratch, 'run');
    await writeOutputDir(target, {}, writing({ 'old.csv': 'earlier run' }));
    await expect(writeOutputDir(target, {}, () => { throw new Error('no'); })).rejects.toThrow('no');
    expect(readdirSync(target).sort()).toEqual([markerName, 'old.csv']);
    await writeOutputDir(target, {}, writing({ 'new.csv': 'this run' }));
    expect(readdirSync(target).sort()).toEqual([markerName, 'new.csv']);
    expect(readdirSync(scratch)).toEqual(['run']);
  });

  test('the staging folder of an interrupted run is swept, that of a live run is not', async () => {
    const dead = join(scratch, `.run.voltcast-partial-${endedPid()}-abcd1234`);
    const live = join(scratch, `.run.voltcast-partial-${process.pid}-abcd1234`);
    mkdirSync(dead);
    mkdirSync(live);
    await writeOutputDir(join(scratch, 'run'), {}, writing({ 'a.csv': '' }));
    expect(readdirSync(scratch).sort()).toEqual([live.slice(scratch.length + 1), 'run'].sort());
  });

  test('an interrupted run into a sibling folder is swept too; names that only look alike stay', async () => {
    // Before: only the staging folders of the same output folder went; an interrupted run into
    // out/a left `.a.voltcast-partial-…` beside every later run into out/b.
    const ended = endedPid();
    const leftovers = [`.other.voltcast-partial-${ended}-abcd1234`, `.voltcast-partial-${ended}-abcd1234`];
    const lookalikes = [`.other.voltcast-partial-${ended}-notes`, `other.voltcast-partial-${ended}-abcd1234`];
    for (const name of [...leftovers, ...lookalikes]) mkdirSync(join(scratch, name));
    await writeOutputDir(join(scratch, 'run'), {}, writing({ 'a.csv': '' }));
    expect(readdirSync(scratch).sort()).toEqual([...lookalikes, 'run'].sort());
  });

  test('two runs into one folder at once both finish; the later one is what the folder holds', async () => {
    const target = join(scratch, 'run');
    let releaseFirst!: () => void;
    const firstMayFinish = new Promise<void>((resolve) => (releaseFirst = resolve));
    const first = writeOutputDir(target, {}, async (staging) => {
      writeFileSync(join(staging, 'waveforms.csv'), 'first');
      await firstMayFinish; // the second run starts, sweeps and commits meanwhile
      writeFileSync(join(staging, 'report.txt'), 'first');
    });
    await writeOutputDir(target, {}, writing({ 'waveforms.csv': 'second', 'report.txt': 'second' }));
    expect(readFileSync(join(target, 'waveforms.csv'), 'utf8')).toBe('second');
    releaseFirst();
    await first;
    expect(snapshot(target)).toEqual({ 'waveforms.csv': 'first', 'report.txt': 'first', [markerName]: readFileSync(join(target, markerName), 'utf8') });
    expect(readdirSync(scratch)).toEqual(['run']);
  });
});
