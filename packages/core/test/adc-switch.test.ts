import { describe, expect, it } from 'vitest';
import { readCircuit } from '../src/circuit/parse-circuit.ts';
import { formatIssue } from '../src/reading/issue.ts';
import { isClosed, nextEdge, type SwitchSchedule } from '../src/parts/switch.ts';

function messages(part: string): string[] {
  const text = `circuit: switch-read
parts:
  SRC: { voltage: 1, between: [a, gnd] }
  SW: ${part}
  RL: { resistor: 1k, between: [b, gnd] }
simulate: { duration: 10m }
`;
  return readCircuit(text).issues.map((issue) => formatIssue(issue, 's.yaml'));
}

describe('switch schedule', () => {
  const repeating: SwitchSchedule = { edges: [1e-3, 2e-3], origin: 0, period: 5e-3, inverted: false };

  it('is closed after `from` up to and including `to`, in every period', () => {
    expect(isClosed(repeating, 0.5e-3)).toBe(false);
    expect(isClosed(repeating, 1e-3)).toBe(false);
    expect(isClosed(repeating, 1.5e-3)).toBe(true);
    expect(isClosed(repeating, 2e-3)).toBe(true);
    expect(isClosed(repeating, 3e-3)).toBe(false);
    expect(isClosed(repeating, 6.5e-3)).toBe(true);
    expect(isClosed({ ...repeating, inverted: true }, 6.5e-3)).toBe(false);
  });

  it('lists its edges as corners, period after period', () => {
    const corners: number[] = [];
    for (let t = 0, i = 0; i < 5; i++) corners.push((t = nextEdge(repeating, t)));
    expect(corners.map((c) => Math.round(c * 1e6))).toEqual([1000, 2000, 6000, 7000, 11000]);
    expect(nextEdge({ edges: [1e-3, 2e-3], origin: 0, period: Infinity, inverted: false }, 2e-3)).toBe(Infinity);
  });

  it('reads from a circuit file and reports bad schedules where they are written', () => {
    expect(messages('{ switch: 50, between: [a, b], closed: [[1m, 2m]], every: 5m }')).toEqual([]);
    expect(messages('{ switch: { on: 50, off: 10 }, between: [a, b], open: [[2m, 1m]] }')).toEqual([
      's.yaml:4:32: error: the off resistance (10 Ω) must be above the on resistance (50 Ω) (part SW) at parts.SW.switch.off\n  an open switch conducts less than a closed one',
      's.yaml:4:62: error: interval 1 ends (1 ms) before it starts (2 ms) (part SW) at parts.SW.open.0\n  write [from, to] with to after from',
    ]);
    expect(messages('{ switch: 50, between: [a, b] }')).toEqual([
      's.yaml:4:7: error: a switch needs `closed:` or `open:`, a list of [from, to] intervals (part SW) at parts.SW\n  write e.g. `closed: [[1m, 2m]]`',
    ]);
  });
});
