import { describe, expect, it } from 'vitest';
import { readStimulus } from '../src/waves/index.ts';
import { IssueSink, YamlValue } from '../src/reading/yaml-reader.ts';
import { LineIndex, parseYamlTree } from '../src/reading/yaml-tree.ts';
import type { ReadContext } from '../src/reading/reader.ts';
import { quantities } from '../src/units/quantity.ts';
import { formatIssue } from '../src/reading/issue.ts';

/** Read a source value written as YAML, as a voltage source's `voltage:` would be. */
function read(text: string, context: ReadContext = {}) {
  const sink = new IssueSink(new LineIndex(text));
  const wave = readStimulus(new YamlValue(sink, parseYamlTree(text), ['voltage']), quantities.voltage, context);
  return { wave, issues: sink.issues, messages: sink.issues.map((issue) => formatIssue(issue, 'w.yaml')) };
}

function good(text: string, context: ReadContext = {}) {
  const { wave, messages } = read(text, context);
  expect(messages).toEqual([]);
  return wave;
}

/** Corners from t = 0 on, as the stepper visits them (it lands exactly on each). */
function corners(wave: { nextCorner(t: number): number }, count: number): number[] {
  const found: number[] = [];
  let t = 0;
  for (let i = 0; i < count; i++) {
    t = wave.nextCorner(t);
    if (t === Infinity) break;
    found.push(t);
  }
  return found;
}

describe('constant', () => {
  it('a plain number is a level with no corners', () => {
    const wave = good('3.3V');
    expect(wave.value(0)).toBe(3.3);
    expect(wave.value(5)).toBe(3.3);
    expect(wave.nextCorner(0)).toBe(Infinity);
  });
});

describe('points', () => {
  // Linear interpolation between given points: definition of a piecewise-linear function, common practice.
  const wave = good('{ points: [[1m, 0], [2m, 4], [4m, 4], [5m, -1]] }');

  it('interpolates on straight lines and holds before the first and after the last point', () => {
    expect(wave.value(0)).toBe(0);
    expect(wave.value(1e-3)).toBe(0);
    expect(wave.value(1.5e-3)).toBeCloseTo(2, 12);
    expect(wave.value(1.25e-3)).toBeCloseTo(1, 12);
    expect(wave.value(2e-3)).toBe(4);
    expect(wave.value(3e-3)).toBe(4);
    expect(wave.value(4.5e-3)).toBeCloseTo(1.5, 12);
    expect(wave.value(5e-3)).toBe(-1);
    expect(wave.value(1)).toBe(-1);
  });

  it('reports every point time as a corner, strictly after t', () => {
    expect(corners(wave, 10)).toEqual([1e-3, 2e-3, 4e-3, 5e-3]);
    expect(wave.nextCorner(2e-3 - 1e-18)).toBe(2e-3);
    expect(wave.nextCorner(2e-3)).toBe(4e-3);
  });

  it('repeats with a period, jumping back to the first value', () => {
    const saw = good('{ points: [[0, 0], [1m, 1]], every: 2m }');
    expect(saw.value(0.5e-3)).toBeCloseTo(0.5, 12);
    expect(saw.value(1.5e-3)).toBe(1);
    expect(saw.value(2e-3)).toBe(0);
    expect(saw.value(2.5e-3)).toBeCloseTo(0.5, 12);
    expect(corners(saw, 6)).toEqual([1e-3, 2e-3, 3e-3, 4e-3, 5e-3, 6e-3].map((_, i) => (i % 2 === 0 ? Math.floor(i / 2) * 2e-3 + 1e-3 : ((i + 1) / 2) * 2e-3)));
  });

  it('does not drift over many periods: corner k·period is computed, not accumulated', () => {
    const saw = good('{ points: [[0, 0], [1m, 1]], every: 2m }');
    const visited = corners(saw, 20000);
    expect(visited).toHaveLength(20000);
    for (let i = 1; i < visited.length; i++) expect(visited[i]).toBeGreaterThan(visited[i - 1]);
    expect(visited[19999]).toBe(10000 * 2e-3);
    expect(Math.abs(visited[19999] - 20)).toBeLessThan(1e-12);
    expect(saw.value(visited[19999])).toBe(0);
    expect(saw.value(visited[19998])).toBe(1);
  });

  it('a late first point holds the first value in every period', () => {
    const pulse = good('{ points: [[1m, 0], [1.1m, 5], [2m, 5], [2.1m, 0]], every: 5m }');
    expect(pulse.value(5.5e-3)).toBe(0);
    expect(pulse.value(6.5e-3)).toBe(5);
    expect(corners(pulse, 6)).toEqual([1e-3, 1.1e-3, 2e-3, 2.1e-3, 5e-3, 5e-3 + 1e-3]);
  });

  it('names the point whose time does not increase, with its line and column', () => {
    const { messages } = read('points:\n  - [0, 0]\n  - [2m, 1]\n  - [1m, 2]\n');
    expect(messages).toHaveLength(1);
    expect(messages[0]).toMatch(/^w\.yaml:4:6: error: time of point 3 \(1 ms\) is not after the time of point 2 \(2 ms\)/);
    expect(messages[0]).toMatch(/at voltage\.points\.2\.0/);
    expect(messages[0]).toMatch(/a short time apart/);
  });

  it('rejects equal times, a negative start, a short period, and malformed points', () => {
    expect(read('{ points: [[0, 0], [0, 1]] }').messages[0]).toMatch(/point 2 \(0 s\) is not after/);
    expect(read('{ points: [[-1m, 0], [1m, 1]] }').messages[0]).toMatch(/point 1 has a negative time/);
    expect(read('{ points: [[0, 0], [3m, 1]], every: 2m }').messages[0]).toMatch(/every: 2 ms is shorter than the last point's time 3 ms/);
    expect(read('{ points: [[0, 0], [1m]] }').messages[0]).toMatch(/point 2 needs two numbers, \[time, value\], found 1/);
    expect(read('{ points: [] }').messages[0]).toMatch(/at least one point/);
    expect(read('{ points: [[0, 0], [1m, 5A]] }').messages[0]).toMatch(/'5A' is not a voltage: A is a unit of current/);
  });
});

describe('sine', () => {
  // offset + A·sin(2π f (t − delay) + phase): definition of a sine wave, common practice.
  const wave = good('{ sine: { amplitude: 2, frequency: 1k, offset: 1, phase: 90, delay: 1m } }');

  it('holds its starting value before the delay', () => {
    expect(wave.value(0)).toBeCloseTo(3, 12);
    expect(wave.value(0.999e-3)).toBeCloseTo(3, 12);
  });

  it('follows the sine after the delay', () => {
    expect(wave.value(1e-3)).toBeCloseTo(3, 12);
    expect(wave.value(1.25e-3)).toBeCloseTo(1, 12);
    expect(wave.value(1.5e-3)).toBeCloseTo(-1, 12);
    expect(wave.value(1.125e-3)).toBeCloseTo(1 + 2 * Math.SQRT1_2, 12);
  });

  it('has one corner, at the delay', () => {
    expect(corners(wave, 5)).toEqual([1e-3]);
    expect(good('{ sine: { amplitude: 1, frequency: 50 } }').nextCorner(0)).toBe(Infinity);
  });

  it('requires amplitude and a positive frequency, and checks the keys', () => {
    const missing = read('{ sine: { amplitude: 1 } }').messages;
    expect(missing[0]).toMatch(/missing key 'frequency'.*\n  write sine: \{ amplitude: 1, frequency: 1k \}/);
    expect(read('{ sine: { amplitude: 1, frequency: 0 } }').messages[0]).toMatch(/frequency must be greater than 0 Hz, found 0/);
    expect(read('{ sine: { amplitude: 1, frequency: 1k, ofset: 1 } }').messages[0]).toMatch(/unknown key 'ofset'[^]*did you mean 'offset'\?/);
    expect(read('{ sine: 1k }').messages[0]).toMatch(/expected a map of key: value pairs, found '1k'/);
  });
});

describe('square', () => {
  // Trapezoidal pulse train with linear edges: common practice for test stimuli.
  const wave = good('{ square: { low: 0, high: 5, frequency: 1k, duty: 25%, edge: 10u } }');

  it('rises at the start of each period and falls at duty · period', () => {
    expect(wave.value(0)).toBe(0);
    expect(wave.value(5e-6)).toBeCloseTo(2.5, 9);
    expect(wave.value(10e-6)).toBe(5);
    expect(wave.value(100e-6)).toBe(5);
    expect(wave.value(250e-6)).toBeCloseTo(5, 9);
    expect(wave.value(255e-6)).toBeCloseTo(2.5, 9);
    expect(wave.value(260e-6)).toBeCloseTo(0, 9);
    expect(wave.value(900e-6)).toBe(0);
    expect(wave.value(1e-3)).toBeCloseTo(0, 9);
    expect(wave.value(1.005e-3)).toBeCloseTo(2.5, 9);
  });

  it('has corners at the start and end of every edge', () => {
    const expected = [10e-6, 250e-6, 260e-6, 1e-3, 1.01e-3, 1.25e-3, 1.26e-3, 2e-3];
    corners(wave, 8).forEach((corner, i) => expect(corner).toBeCloseTo(expected[i], 15));
  });

  it('is low until the delay, and defaults to a 50% duty and a short edge', () => {
    const delayed = good('{ square: { high: 1, frequency: 1k, delay: 3m } }');
    expect(delayed.value(2.9e-3)).toBe(0);
    expect(corners(delayed, 5)).toEqual([3e-3, 3e-3 + 1e-6, 3e-3 + 0.5e-3, 3e-3 + 0.5e-3 + 1e-6, 3e-3 + 1e-3]);
    expect(delayed.value(3.2e-3)).toBe(1);
    expect(delayed.value(3.7e-3)).toBe(0);
  });

  it('rejects an edge that does not fit and a duty of 100% or more', () => {
    expect(read('{ square: { high: 1, frequency: 1k, duty: 10%, edge: 100u } }').messages[0]).toMatch(/edge 100 µs does not fit: it must be shorter than the shorter part of the period, 100 µs/);
    expect(read('{ square: { high: 1, frequency: 1k, duty: 100% } }').messages[0]).toMatch(/duty must be below 100%/);
    expect(read('{ square: { frequency: 1k } }').messages[0]).toMatch(/missing key 'high'/);
  });
});

describe('triangle', () => {
  // Symmetric triangle: linear rise over half a period, linear fall over the other: common practice.
  const wave = good('{ triangle: { low: -1, high: 1, frequency: 500, delay: 1m } }');

  it('rises from low to high in the first half period and falls back', () => {
    expect(wave.value(0)).toBe(-1);
    expect(wave.value(1e-3)).toBe(-1);
    expect(wave.value(1.5e-3)).toBeCloseTo(0, 12);
    expect(wave.value(2e-3)).toBeCloseTo(1, 12);
    expect(wave.value(2.5e-3)).toBeCloseTo(0, 12);
    expect(wave.value(3e-3)).toBeCloseTo(-1, 12);
    expect(wave.value(3.25e-3)).toBeCloseTo(-0.5, 12);
  });

  it('has corners at the delay, every peak and every valley', () => {
    expect(corners(wave, 4)).toEqual([1e-3, 2e-3, 3e-3, 4e-3]);
  });
});

describe('file', () => {
  const csv = 'time,volts\n# an invented test ramp\n0,0\n1m,2.5 # halfway\n\n2m, 5\n';
  const files: Record<string, string> = { 'ramp.csv': csv, 'bad.csv': '0,0\n1m,2x\n2m,1\n1.5m,1\n3m,1,3\n' };
  const context: ReadContext = {
    readFile: (path) => {
      if (!(path in files)) throw new Error('no such file');
      return files[path];
    },
  };

  it('reads time,value rows with a header, comments and SI prefixes, then behaves like points', () => {
    const wave = good('{ file: ramp.csv }', context);
    expect(wave.value(0.5e-3)).toBeCloseTo(1.25, 12);
    expect(wave.value(3e-3)).toBe(5);
    expect(corners(wave, 5)).toEqual([1e-3, 2e-3]);
    const repeated = good('{ file: ramp.csv, every: 4m }', context);
    expect(repeated.value(4.5e-3)).toBeCloseTo(1.25, 12);
  });

  it('names the CSV file and line of each problem', () => {
    const { messages } = read('{ file: bad.csv }', context);
    expect(messages).toHaveLength(3);
    expect(messages[0]).toMatch(/^w\.yaml:1:9: error: bad\.csv line 2: '2x' is not a voltage/);
    expect(messages[1]).toMatch(/bad\.csv line 5: expected two columns, time,value, found 3/);
    expect(messages[2]).toMatch(/bad\.csv line 4: time of point 3 \(1.5 ms\) is not after the time of point 2 \(2 ms\)/);
  });

  it('needs a host that can read files, and a file that exists', () => {
    expect(read('{ file: ramp.csv }').messages[0]).toMatch(/file waves need a host that can read files/);
    expect(read('{ file: missing.csv }', context).messages[0]).toMatch(/cannot read 'missing\.csv': no such file/);
  });
});

describe('readStimulus', () => {
  it('suggests the nearest wave kind', () => {
    expect(read('{ sin: { amplitude: 1, frequency: 1k } }').messages[0]).toMatch(/a wave needs one kind key, one of: points, sine, square, triangle, file[^]*did you mean 'sine' instead of 'sin'\?/);
  });

  it('rejects two kinds at once and values that are neither a number nor a wave', () => {
    expect(read('{ sine: { amplitude: 1, frequency: 1k }, triangle: { high: 1, frequency: 1k } }').messages[0]).toMatch(/a wave has 2 kind keys \(sine, triangle\)/);
    expect(read('[1, 2]').messages[0]).toMatch(/expected a voltage or a wave, found a list/);
    expect(read('{ points: [[0, 0]], period: 1m }').messages[0]).toMatch(/unknown key 'period'/);
  });
});
