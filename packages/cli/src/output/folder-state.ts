import { lstatSync, readdirSync, statSync } from 'node:fs';
import { isAbsolute, relative } from 'node:path';
import { InputError } from '../exit-codes.ts';
import { markerName, readMarker, type Marker } from './marker.ts';

/** An output folder as found: absent, or present with its entries and voltcast's marker. */
export type FolderState =
  | { readonly kind: 'absent' }
  | {
      readonly kind: 'present';
      /** A symbolic link to a folder: written into, never replaced. */
      readonly link: boolean;
      readonly marker: Marker | undefined;
      /** Every entry but voltcast's own bookkeeping (staging folders, lock, its marker). */
      readonly entries: readonly string[];
      /** The entries that are plain files. */
      readonly files: readonly string[];
    };

/**
 * Look at the output folder `target` (`dir` as the user wrote it, for messages). A folder that
 * holds entries, has no marker and is not `force`d is refused here, before any work is done.
 */
export function inspectFolder(dir: string, target: string, force: boolean): FolderState {
  let link: boolean;
  try {
    link = lstatSync(target).isSymbolicLink();
  } catch (error) {
    if ((error as NodeJS.ErrnoException).code === 'ENOENT') return { kind: 'absent' };
    throw error;
  }
  if (!statSync(target).isDirectory()) throw new InputError(`voltcast: --out ${dir} is a file, not a folder\n  give --out a folder: a new one, an empty one or one voltcast wrote`);
  const marker = readMarker(target);
  // voltcast's staging folders, lock and (when it is really ours) marker are not the user's.
  const ours = (name: string) => name.startsWith('.voltcast-partial-') || name.startsWith('.voltcast-lock') || (name === markerName && marker !== undefined);
  const found = readdirSync(target, { withFileTypes: true }).filter((entry) => !ours(entry.name));
  const entries = found.map((entry) => entry.name);
  if (entries.length > 0 && marker === undefined && !force) {
    const shown = entries.length > 5 ? `${entries.slice(0, 5).join(', ')} and ${entries.length - 5} more` : entries.join(', ');
    throw new InputError(
      `voltcast: --out ${dir} holds files voltcast did not write (${shown}); nothing was written\n` +
        '  give --out a new or empty folder, or add --force to write beside them: voltcast then replaces only its own files and leaves every other file in place',
    );
  }
  return { kind: 'present', link, marker, entries, files: found.filter((entry) => entry.isFile()).map((entry) => entry.name) };
}

/**
 * A folder that may be replaced whole by one holding the new run: voltcast created it, it
 * holds nothing but the files its marker lists, and it is neither a link nor the folder the
 * user works in (or one above it), which must never vanish from under them.
 */
export function replaceableWhole(state: FolderState, target: string): boolean {
  if (state.kind !== 'present' || state.link || state.marker?.folder !== 'own') return false;
  const listed = new Set(state.marker.files);
  const here = relative(target, process.cwd());
  const holdsCwd = here === '' || (!here.startsWith('..') && !isAbsolute(here));
  return !holdsCwd && state.entries.every((name) => listed.has(name) && state.files.includes(name));
}
