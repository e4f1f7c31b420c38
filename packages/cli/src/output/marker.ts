import { readFileSync } from 'node:fs';
import { join } from 'node:path';

/** The file that marks a folder voltcast wrote and lists the files that are voltcast's there. */
export const markerName = '.voltcast-output';

const signature = '# voltcast output folder';

/**
 * What a marker says. `own`: voltcast created the folder, so once it holds nothing but the
 * listed files the next run may replace it whole. `shared`: the folder existed before (empty,
 * or written into with --force); voltcast replaces only its listed files there.
 */
export interface Marker {
  readonly folder: 'own' | 'shared';
  readonly files: readonly string[];
}

/** The marker's text: a line saying what it is, the folder's kind, then one file name a line. */
export function markerText(marker: Marker): string {
  return [
    signature,
    '# voltcast wrote the files listed below and replaces them on its next run into this folder;',
    '# it never deletes any other file here. Delete this file to keep the files as they are.',
    `folder: ${marker.folder}`,
    ...marker.files,
    '',
  ].join('\n');
}

/**
 * The marker in `folder`, or undefined when there is none (or the file is not ours). Names
 * that are not plain file names are dropped, so an edited marker cannot point outside.
 */
export function readMarker(folder: string): Marker | undefined {
  let text: string;
  try {
    text = readFileSync(join(folder, markerName), 'utf8');
  } catch {
    return undefined;
  }
  const lines = text.split(/\r?\n/);
  if (lines[0] !== signature) return undefined;
  const body = lines.filter((line) => line !== '' && !line.startsWith('#'));
  const kind = body.find((line) => line.startsWith('folder: '));
  return {
    folder: kind === 'folder: own' ? 'own' : 'shared',
    files: body.filter((line) => line !== kind && isPlainFileName(line)),
  };
}

/** A name inside the folder itself: no separators, not `.` or `..`, not one of voltcast's own. */
export function isPlainFileName(name: string): boolean {
  return !/[/\\\0]/.test(name) && name !== '.' && name !== '..' && !name.startsWith('.voltcast-');
}
