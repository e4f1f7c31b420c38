import { readFileSync } from 'node:fs';
import { join } from 'node:path';
import { describe, expect, it } from 'vitest';
import { parseCircuit, runCircuit } from '../src/index.ts';
import { IntervalBuilder } from '../src/analysis/saturation/interval-builder.ts';

describe('interval building', () => {
  it('merges fragments closer than the gap and drops intervals shorter than the minimum', () => {
    const b = new IntervalBuilder(2);
    // On 0..10, off 10..11 (gap 1 < 2: merged), on 11..20, off 20..30 (gap 10: new), on 30..31.
    const states: [number, boolean][] = [[0, true], [5, true], [10, false], [11, true], [20, false], [30, true], [31, false]];
    for (const [t, on] of states) (on ? b.on(t, t, 0) : b.off(t, 0));
    const kept = b.finish(40, 0, 5);
    expect(kept.map((i) => [i.start, i.end, i.fragments, i.worst])).toEqual([[0, 20, 2, 11]]);
  });
});

describe('saturation options through runCircuit', () => {
  const file = join(import.meta.dirname, '..', '..', '..', 'fixtures', 'noninverting-clipping.yaml');
  const circuit = parseCircuit(readFileSync(file, 'utf8'), { fileName: file });

  it('a minimum duration longer than every interval leaves none', () => {
    // Each interval lasts about 0.74 ms (arcsine of 8/20 at 500 Hz, see saturation-clipping.test.ts).
    expect(runCircuit(circuit, { findings: { minDuration: 0.8e-3 } }).findings.saturation).toEqual([]);
    expect(runCircuit(circuit, { findings: { minDuration: 0.7e-3 } }).findings.saturation).toHaveLength(6);
  });

  it('a merge gap longer than the time between two high-rail intervals joins them', () => {
    // High-rail intervals repeat every 2 ms and last 0.74 ms: gaps of 1.26 ms.
    const high = runCircuit(circuit, { findings: { mergeGap: 1.3e-3 } }).findings.saturation.filter((s) => s.rail === 'high');
    expect(high).toHaveLength(1);
    expect(high[0].fragments).toBe(3);
  });
});
