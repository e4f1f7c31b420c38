import { describe, expect, it } from 'vitest';
import { buildCircuit, runCircuit, type ReportWarning } from '../src/index.ts';
import { startWarnings } from '../src/analysis/report/start-warnings.ts';

/** The invented sensor rail: 5 V connected at 20 µs through 10 µH onto 10 µF, loaded by 100 Ω. */
function rail(duration: string | number, feed: object) {
  return buildCircuit({
    circuit: 'invented-rail',
    parts: {
      FEED: { voltage: feed, between: ['feed', 'gnd'] },
      RFEED: { resistor: '200m', between: ['feed', 'mid'] },
      LF: { inductor: '10uH', between: ['mid', 'rail'] },
      CBULK: { capacitor: '10uF', between: ['rail', 'gnd'] },
      RLOAD: { resistor: 100, between: ['rail', 'gnd'] },
    },
    simulate: { duration, 'output-step': '500n' },
  });
}
const connect = { points: [[0, 0], ['20u', 0], ['20.1u', 5]] };

describe('a duration far beyond the circuit settling', () => {
  it('`duration: 500` where 500u was meant is a warning naming the duration, the slowest time constant and its node', () => {
    // Handbook (series RLC): 1/|Re s| = 2/(R/L + 1/(RLOAD·C)) = 95.24 µs; the ring at √(ω0² − α²)/2π = 15.84 kHz.
    const warnings = startWarnings(rail(500, connect), false);
    expect(warnings).toHaveLength(1);
    expect(warnings[0]).toMatchObject({ kind: 'duration', node: 'rail' });
    expect(warnings[0].message).toBe(
      "the duration 500 s is 5.25 M times the circuit's slowest time constant, 95.24 µs, a ring at 15.84 kHz decaying with it, at node rail, and its drive holds from 20.1 µs: the circuit has settled long before the end. Check the duration's prefix (m is milli, u is micro, n is nano), or end the run near 972.5 µs, the last change and 10 time constants",
    );
  });

  it('the intended 500 µs, a periodic drive, or the parts\' noise added give no such warning', () => {
    expect(startWarnings(rail('500u', connect), false)).toEqual([]);
    expect(startWarnings(rail(500, { square: { high: 5, frequency: '1k' } }), false)).toEqual([]);
    expect(startWarnings(rail(500, connect), true)).toEqual([]);
  });

  it('a run reports it before its first row, and lists it in the findings', () => {
    // RC = 1 ms stepped at 0: 2 s is 2,000 time constants (1,000 is the limit), 0.5 s is not.
    const rc = (duration: string) =>
      buildCircuit({
        circuit: 'invented-rc',
        parts: { VIN: { voltage: 1, between: ['in', 'gnd'] }, R1: { resistor: '1k', between: ['in', 'out'] }, C1: { capacitor: '1u', between: ['out', 'gnd'] } },
        simulate: { duration },
      });
    const seen: string[] = [];
    const run = runCircuit(rc('2'), { onWarning: (w: ReportWarning) => seen.push(`warning ${w.kind}`), onRow: () => seen.length < 3 && seen.push('row') });
    expect(seen).toEqual(['warning duration', 'row', 'row']);
    expect(run.findings.warnings.map((w) => [w.kind, w.node])).toEqual([['duration', 'out']]);
    expect(run.findings.warnings[0].message).toMatch(/^the duration 2 s is 2 k times the circuit's slowest time constant, 1 ms at node out, and its drive never changes/);
    expect(runCircuit(rc('500m')).findings.warnings).toEqual([]);
  });
});
