import { describe, expect, it } from 'vitest';
import FFT from 'fft.js';
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

  it('repeats with a period, going back to the first value on an edge of a millionth of the period', () => {
    const saw = good('{ points: [[0, 0], [1m, 1]], every: 2m }');
    expect(saw.value(0.5e-3)).toBeCloseTo(0.5, 12);
    expect(saw.value(1.5e-3)).toBe(1);
    expect(saw.value(2e-3 - 2e-9)).toBeCloseTo(1, 6);
    expect(saw.value(2e-3 - 1e-9)).toBeCloseTo(0.5, 6);
    expect(saw.value(2e-3)).toBe(0);
    expect(saw.value(2.5e-3)).toBeCloseTo(0.5, 12);
    const expected = [1e-3, 2e-3 - 2e-9, 2e-3, 3e-3, 4e-3 - 2e-9, 4e-3];
    corners(saw, 6).forEach((corner, i) => expect(corner).toBeCloseTo(expected[i], 15));
    // A pattern that ends where it starts needs no edge.
    const tri = good('{ points: [[0, 0], [1m, 1], [2m, 0]], every: 2m }');
    expect(corners(tri, 3)).toEqual([1e-3, 2e-3, 3e-3]);
  });

  it('does not drift over many periods: corner k·period is computed, not accumulated', () => {
    const saw = good('{ points: [[0, 0], [1m, 1]], every: 2m }');
    const visited = corners(saw, 30000);
    expect(visited).toHaveLength(30000);
    for (let i = 1; i < visited.length; i++) expect(visited[i]).toBeGreaterThan(visited[i - 1]);
    expect(visited[29999]).toBe(10000 * 2e-3);
    expect(Math.abs(visited[29999] - 20)).toBeLessThan(1e-12);
    expect(saw.value(visited[29999])).toBe(0);
    expect(saw.value(visited[29998])).toBe(1);
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

/**
 * Rising zero crossings of wave − offset on [0, until], each located by bisection between
 * samples `dt` apart.
 */
function risingZeros(wave: { value(t: number): number }, offset: number, until: number, dt: number): number[] {
  const f = (t: number) => wave.value(t) - offset;
  const zeros: number[] = [];
  for (let t = 0; t + dt <= until; t += dt) {
    if (!(f(t) < 0 && f(t + dt) >= 0)) continue;
    let lo = t;
    let hi = t + dt;
    for (let i = 0; i < 60; i++) {
      const mid = (lo + hi) / 2;
      if (f(mid) < 0) lo = mid;
      else hi = mid;
    }
    zeros.push((lo + hi) / 2);
  }
  return zeros;
}

/** Largest relative difference between 1/period of consecutive rising zeros and `frequency` at the period's middle. */
function worstFrequencyError(zeros: readonly number[], frequency: (t: number) => number): number {
  let worst = 0;
  for (let i = 1; i < zeros.length; i++) {
    const measured = 1 / (zeros[i] - zeros[i - 1]);
    const expected = frequency((zeros[i] + zeros[i - 1]) / 2);
    worst = Math.max(worst, Math.abs(measured / expected - 1));
  }
  return worst;
}

describe('fm', () => {
  const wave = good('{ fm: { carrier: 10k, deviation: 2k, rate: 200, amplitude: 2, offset: 1 } }');

  it('has the instantaneous frequency carrier + deviation·sin(2π·rate·t), from its zero crossings, within 1%', () => {
    // Instantaneous frequency as the phase's derivative over 2π (communications textbooks).
    const zeros = risingZeros(wave, 1, 10e-3, 2e-6);
    expect(zeros.length).toBeGreaterThan(95);
    expect(worstFrequencyError(zeros, (t) => 10e3 + 2e3 * Math.sin(2 * Math.PI * 200 * t))).toBeLessThan(0.01);
  });

  it('swings between offset ± amplitude, starts at offset + amplitude·sin(phase), and has no corners', () => {
    expect(wave.value(0)).toBe(1);
    expect(good('{ fm: { carrier: 10k, deviation: 2k, rate: 200, amplitude: 2, phase: 90 } }').value(0)).toBeCloseTo(2, 12);
    let low = Infinity;
    let high = -Infinity;
    for (let t = 0; t < 5e-3; t += 1e-7) {
      low = Math.min(low, wave.value(t));
      high = Math.max(high, wave.value(t));
    }
    expect(low).toBeCloseTo(-1, 3);
    expect(high).toBeCloseTo(3, 3);
    expect(wave.nextCorner(0)).toBe(Infinity);
  });

  it('requires its keys and a deviation below the carrier', () => {
    expect(read('{ fm: { carrier: 1k, deviation: 1k, rate: 10, amplitude: 1 } }').messages).toEqual(['w.yaml:1:33: error: the deviation (1 kHz) must be below the carrier (1 kHz) at voltage.fm.deviation\n  the instantaneous frequency, carrier ± deviation, must stay above 0']);
    expect(read('{ fm: { carrier: 1k, amplitude: 1 } }').messages.map((m) => m.split('\n')[0])).toEqual([
      "w.yaml:1:7: error: missing key 'deviation' at voltage.fm.deviation",
      "w.yaml:1:7: error: missing key 'rate' at voltage.fm.rate",
    ]);
  });
});

describe('chirp', () => {
  it('sweeps linearly: f(t) = from + (to − from)·t/duration, from its zero crossings, within 1%', () => {
    const wave = good('{ chirp: { from: 1k, to: 5k, duration: 20m, amplitude: 1 } }');
    // Linear chirp: the phase 2π·(f0·t + k·t²/2) has the instantaneous frequency f0 + k·t (signal-processing textbooks).
    const zeros = risingZeros(wave, 0, 20e-3, 2e-6);
    expect(worstFrequencyError(zeros, (t) => 1e3 + (4e3 * t) / 20e-3)).toBeLessThan(0.01);
  });

  it('sweeps exponentially with shape log: f(t) = from·(to/from)^(t/duration), within 1%', () => {
    const wave = good('{ chirp: { from: 100, to: 10k, duration: 50m, amplitude: 1, shape: log } }');
    // Exponential chirp: phase 2π·f0·T·(k^(t/T) − 1)/ln k, instantaneous frequency f0·k^(t/T) (signal-processing textbooks).
    const zeros = risingZeros(wave, 0, 50e-3, 1e-6);
    expect(worstFrequencyError(zeros, (t) => 100 * Math.pow(100, t / 50e-3))).toBeLessThan(0.01);
  });

  it('keeps the final frequency after the sweep, with its phase continuous', () => {
    const wave = good('{ chirp: { from: 1k, to: 2k, duration: 10m, amplitude: 1, offset: 0.5 } }');
    const zeros = risingZeros(wave, 0.5, 30e-3, 2e-6).filter((t) => t > 11e-3);
    expect(worstFrequencyError(zeros, () => 2e3)).toBeLessThan(1e-6);
    // Continuous across the end of the sweep: the value moves by at most its slope over 2 ns.
    expect(Math.abs(wave.value(10e-3 + 1e-9) - wave.value(10e-3 - 1e-9))).toBeLessThan(2 * Math.PI * 2e3 * 2e-9 * 1.01);
    expect(wave.nextCorner(0)).toBe(Infinity);
  });
});

describe('sum', () => {
  const wave = good('{ sum: [1.5, { sine: { amplitude: 1, frequency: 1k } }, { square: { high: 2, frequency: 250, edge: 10u } }, { points: [[0, 0], [3m, 1]] }] }');

  it('adds its members at every instant', () => {
    for (const t of [0, 0.1e-3, 0.37e-3, 1.9e-3, 2.5e-3, 4e-3]) {
      const square = good('{ square: { high: 2, frequency: 250, edge: 10u } }').value(t);
      expect(wave.value(t)).toBeCloseTo(1.5 + Math.sin(2 * Math.PI * 1e3 * t) + square + Math.min(t / 3e-3, 1), 12);
    }
  });

  it('has the union of its members’ corners, exactly', () => {
    // Square at 250 Hz: edges at 0, 10 µs, 2 ms, 2.01 ms per 4 ms period; points: 3 ms.
    expect(corners(wave, 7)).toEqual([10e-6, 2e-3, 2e-3 + 10e-6, 3e-3, 4e-3, 4e-3 + 10e-6, 6e-3]);
  });

  it('needs at least one member, and reads each member where it is written', () => {
    expect(read('{ sum: [] }').messages[0]).toMatch(/a sum needs at least one member/);
    expect(read('{ sum: [1, { sine: { amplitude: 1 } }] }').messages[0]).toBe("w.yaml:1:20: error: missing key 'frequency' at voltage.sum.1.sine.frequency\n  write sine: { amplitude: 1, frequency: 1k }");
  });
});

describe('noise', () => {
  const text = '{ noise: { rms: 50m, bandwidth: 10k, seed: 7 } }';

  it('is a pure function of time: the same seed gives the same values in any order of evaluation', () => {
    const a = good(text);
    const b = good(text);
    const times = [3e-3, 1e-6, 0.5, 2e-3, 1e-6];
    const forward = times.map((t) => a.value(t));
    const backward = [...times].reverse().map((t) => b.value(t)).reverse();
    expect(forward).toEqual(backward);
    expect(forward[1]).toBe(forward[4]);
    expect(good('{ noise: { rms: 50m, bandwidth: 10k, seed: 8 } }').value(3e-3)).not.toBe(forward[0]);
  });

  /** Power per frequency bin (Hann-windowed periodograms by fft.js averaged over `segments` of `size` samples at `dt`). */
  function averagedSpectrum(wave: { value(t: number): number }, dt: number, size: number, segments: number): Float64Array {
    const fft = new FFT(size);
    const spectrum = fft.createComplexArray();
    const power = new Float64Array(size / 2);
    const windowed = new Array<number>(size);
    for (let s = 0; s < segments; s++) {
      for (let i = 0; i < size; i++) windowed[i] = wave.value((s * size + i) * dt) * (0.5 - 0.5 * Math.cos((2 * Math.PI * i) / size));
      fft.realTransform(spectrum, windowed);
      for (let k = 1; k < size / 2; k++) power[k] += spectrum[2 * k] ** 2 + spectrum[2 * k + 1] ** 2;
    }
    return power;
  }

  it('has the stated rms, a Gaussian spread, and no power from 1.25 × its bandwidth on', () => {
    const wave = good(text);
    const n = 1 << 16;
    const dt = 1 / 80e3; // 40 kHz Nyquist: room to see anything above 10 kHz
    let sumSquares = 0;
    let sumFourth = 0;
    for (let i = 0; i < n; i++) {
      const v = wave.value(i * dt);
      sumSquares += v * v;
      sumFourth += v ** 4;
    }
    const rms = Math.sqrt(sumSquares / n);
    expect(rms).toBeGreaterThan(0.05 * 0.95);
    expect(rms).toBeLessThan(0.05 * 1.05);
    // A Gaussian's kurtosis is 3 (any statistics textbook).
    expect(sumFourth / n / rms ** 4).toBeCloseTo(3, 0);
    const size = 1 << 12;
    const power = averagedSpectrum(wave, dt, size, n / size);
    let inside = 0;
    let above = 0;
    for (let k = 1; k < size / 2; k++) {
      const f = k / (size * dt);
      if (f <= 10e3) inside += power[k];
      // Beyond the Hann window's main lobe (2 bins, 39 Hz) past the stopband edge.
      else if (f > 12.5e3 + 40) above += power[k];
    }
    // The kernel's stopband is about 60 dB down (Kaiser's design formula).
    expect(above / inside).toBeLessThan(1e-6);
  });

  it('has a continuous spectrum: every 25 Hz band below the bandwidth carries its share, within 25%', () => {
    // A spectrum of lines (a sum of sinusoids) leaves narrow bands empty; a narrow filter would then see no noise at all.
    const wave = good(text);
    const dt = 1 / 40e3;
    const size = 1 << 12; // bins of 9.77 Hz
    const power = averagedSpectrum(wave, dt, size, 256);
    const bins = Math.floor(10e3 * size * dt);
    const bands: number[] = [];
    for (let k = 1; k + 2 < bins; k += 3) bands.push(power[k] + power[k + 1] + power[k + 2]);
    const mean = bands.reduce((a, b) => a + b, 0) / bands.length;
    // 256 segments × 3 bins: each band's relative spread is about 1/√768 = 3.6% (chi-squared statistics).
    for (const band of bands.slice(0, -3)) expect(Math.abs(band / mean - 1)).toBeLessThan(0.25);
  });

  it('has no corners and checks its keys', () => {
    expect(good(text).nextCorner(0)).toBe(Infinity);
    expect(read('{ noise: { rms: 1m } }').messages[0]).toMatch(/missing key 'bandwidth'/);
    expect(read('{ noise: { rms: 1m, bandwidth: 1k, seed: 1.5 } }').messages[0]).toMatch(/seed/);
  });
});
