import { readFileSync, readdirSync } from 'node:fs';
import { describe, expect, it } from 'vitest';
import { isMap, isScalar, isSeq, parseDocument } from 'yaml';
import { parseYamlTree, type YamlNode } from '../src/reading/yaml-tree.ts';

const fixtures = new URL('../../../fixtures/', import.meta.url);

/** Pairs of (our node, the yaml package's node) in document order, walking both trees together. */
function walk(ours: YamlNode, theirs: unknown, visit: (ours: YamlNode, theirs: unknown) => void): void {
  visit(ours, theirs);
  if (ours.kind === 'map' && isMap(theirs)) {
    expect(ours.entries.length).toBe(theirs.items.length);
    ours.entries.forEach((entry, i) => {
      walk(entry.key, theirs.items[i].key, visit);
      if (theirs.items[i].value !== null) walk(entry.value, theirs.items[i].value, visit);
    });
  } else if (ours.kind === 'list' && isSeq(theirs)) {
    expect(ours.items.length).toBe(theirs.items.length);
    ours.items.forEach((item, i) => walk(item, theirs.items[i], visit));
  }
}

describe('YAML tree from the event stream, against the yaml package (reference library from the npm registry)', () => {
  const files = readdirSync(fixtures).filter((f) => f.endsWith('.yaml'));

  it.each(files)('%s: same shape, values and start offsets', (file) => {
    const text = readFileSync(new URL(file, fixtures), 'utf8');
    const reference = parseDocument(text, { uniqueKeys: false });
    let scalars = 0;
    walk(parseYamlTree(text), reference.contents, (ours, theirs) => {
      const kind = isMap(theirs) ? 'map' : isSeq(theirs) ? 'list' : 'scalar';
      expect(ours.kind).toBe(kind);
      if (ours.kind === 'scalar' && isScalar(theirs)) {
        expect(ours.value).toEqual(theirs.value);
        expect(ours.offset).toBe(theirs.range![0]);
        scalars++;
      }
    });
    expect(scalars).toBeGreaterThan(10);
  });

  it('reads scalars by the YAML 1.2 core schema, as written, and aliases as their anchors', () => {
    const tree = parseYamlTree("a: 1e-4\nb: 10n\nc: '5'\nd: ~\ne: 007\nf: &x { g: true }\nh: *x\n");
    if (tree.kind !== 'map') throw new Error('expected a map');
    const values = tree.entries.map((e) => (e.value.kind === 'scalar' ? [e.value.value, e.value.source] : e.value.kind));
    expect(values).toEqual([[1e-4, '1e-4'], ['10n', '10n'], ['5', '5'], [null, '~'], [7, '007'], 'map', 'map']);
    expect(tree.entries[6].value).toBe(tree.entries[5].value);
  });

  it('refuses a second document', () => {
    expect(() => parseYamlTree('a: 1\n---\nb: 2\n')).toThrow('one YAML document');
  });
});
