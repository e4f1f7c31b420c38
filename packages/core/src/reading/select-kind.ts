import type { MapReader } from './reader.ts';
import { closest } from './suggest.ts';

/**
 * Find the one kind key of a map (a part's `resistor:`, a wave's `sine:`). With none or
 * several, record why and return undefined; the map's other keys are then not checked,
 * since which keys belong depends on the kind.
 */
export function selectKind<Kind extends { readonly key: string }>(
  map: MapReader,
  kinds: readonly Kind[],
  what: string,
  example: string,
): Kind | undefined {
  const keys = map.keys();
  const found = kinds.filter((kind) => keys.includes(kind.key));
  if (found.length === 1) {
    map.allow(found[0].key);
    return found[0];
  }
  const names = kinds.map((kind) => kind.key);
  if (found.length === 0) {
    const typo = keys.find((key) => closest(key, names) !== undefined);
    map.fail(
      `${what} needs one kind key, one of: ${names.join(', ')}`,
      typo !== undefined ? `did you mean '${closest(typo, names)}' instead of '${typo}'?` : `for example ${example}`,
    );
  } else {
    map.fail(`${what} has ${found.length} kind keys (${found.map((kind) => kind.key).join(', ')}); it needs exactly one`, 'keep one of them');
  }
  map.allow(...keys);
  return undefined;
}
