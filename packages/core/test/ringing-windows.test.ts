import { describe, expect, it } from 'vitest';
import { parseCircuit, runCircuit, type RingingFinding } from '../src/index.ts';
import { StimulusCorners } from '../src/analysis/ringing/events.ts';
import { findRinging } from '../src/analysis/ringing/find-ringing.ts';
import type { RingingEvent } from '../src/analysis/ringing/types.ts';
import { RingingSearch } from '../src/analysis/ringing/ringing-search.ts';
import { SpectralPeak } from '../src/analysis/ringing/spectral-peak.ts';

// The plain differentiator of 10 kΩ and 100 nF around an amplifier of A0 = 100 dB and
// GBW = 1 MHz (open-loop pole ωp = GBW/A0 · 2π), driven by a triangle: after every corner
// it rings for some 9 ms, far longer than the short windows asked for below.
const differentiator = (outputStep: string, duration: string): string => `
circuit: windowed-differentiator
parts:
  TRI: { voltage: { triangle: { low: 0, high: 1, frequency: 50 } }, between: [in, gnd] }
  CIN: { capacitor: 100n, between: [in, sum] }
  RF: { resistor: 10k, between: [sum, out] }
  AMP: { opamp: { preset: general-purpose, gain: 100dB, gbw: 1MHz }, plus: gnd, minus: sum, out: out, supply: [-12, 12] }
simulate: { duration: ${duration}, output-step: ${outputStep} }
record: [in, out]
`;
// Loop gain A0/(1 + s/ωp) · 1/(1 + sRC): the closed loop's poles solve
// (RC/ωp) s² + (1/ωp + RC) s + 1 + A0 = 0, so ω0² = (1 + A0) ωp / RC and
// ζ = (1 + RC ωp) / (2 RC ω0) (second-order characteristic equation, control textbooks).
const [rc, a0, wp] = [10e3 * 100e-9, 1e5, (2 * Math.PI * 1e6) / 1e5];
const w0 = Math.sqrt(((1 + a0) * wp) / rc);
const zeta = (1 + rc * wp) / (2 * rc * w0);
// Zero crossings come at the damped frequency ωd = ω0 √(1 - ζ²) (control textbooks).
const fd = (w0 * Math.sqrt(1 - zeta * zeta)) / (2 * Math.PI);

const withoutHints = (found: readonly RingingFinding[]): RingingFinding[] => found.map(({ hint: _, ...rest }: RingingFinding & { hint?: unknown }) => rest);

describe('ringing measured in bounded windows after events', () => {
  const circuit = parseCircuit(differentiator('2u', '60m'), { fileName: 'inline.yaml' });

  it('a window of 2,000 rows (4 ms, half the ringing) still gives the frequency within 1% and ζ within 10%', () => {
    expect(zeta).toBeCloseTo(0.0067, 4);
    const out = runCircuit(circuit, { keepColumns: false, findings: { windowRows: 2000 } }).findings.ringing.filter((r) => r.node === 'out');
    expect(out).toHaveLength(1);
    expect(Math.abs(out[0].frequency - fd) / fd).toBeLessThan(0.01);
    expect(Math.abs(out[0].dampingRatio - zeta) / zeta).toBeLessThan(0.1);
    // The ring outlasts the window, so it does not settle within it.
    expect(out[0].settlingTime).toBeNull();
    // Corners every 10 ms: five within 60 ms, the first one found and four repeats.
    expect(out[0].repeats).toBe(4);
  });

  it('the default window holds the whole ring between corners: it settles, after about ln(100)/(ζω0)', () => {
    const out = runCircuit(circuit, { keepColumns: false }).findings.ringing.filter((r) => r.node === 'out');
    expect(out).toHaveLength(1);
    expect(Math.abs(out[0].frequency - fd) / fd).toBeLessThan(0.01);
    // The envelope e^(-ζω0 t) falls to 1% after ln(100)/(ζω0) (control textbooks); the ring is
    // inside its envelope, so it settles a little before that.
    const envelope = Math.log(100) / (zeta * w0);
    expect(out[0].settlingTime!).toBeLessThan(envelope * 1.05);
    expect(out[0].settlingTime!).toBeGreaterThan(envelope * 0.7);
  });
});

describe('the search as a run streams its rows', () => {
  // Invented stage: the same differentiator clipping at ±5 V rails on a square wave, so that
  // rail exits (told by the saturation tracker a merge gap late) are events too.
  const circuit = parseCircuit(
    `
circuit: clipping-differentiator
parts:
  SQ: { voltage: { square: { low: -1, high: 1, frequency: 1k } }, between: [in, gnd] }
  CIN: { capacitor: 10n, between: [in, sum] }
  RF: { resistor: 10k, between: [sum, out] }
  AMP: { opamp: { preset: general-purpose, gain: 100dB, gbw: 1MHz, slew: 100V/us }, plus: gnd, minus: sum, out: out, supply: [-5, 5] }
simulate: { duration: 3m, output-step: 0.5u }
record: [in, out]
`,
    { fileName: 'inline.yaml' },
  );

  it('finds what the same search finds on kept columns with every event known beforehand, windows cut short included', () => {
    const options = { windowRows: 150 };
    const run = runCircuit(circuit, { findings: options });
    const { duration, outputStep } = circuit.simulate;
    const exits = run.findings.saturation.filter((s) => s.end < duration).map((s) => ({ time: s.end, cause: `${s.part} left a rail` }));
    // The premise: the amplifier leaves its rails, and rings after doing so.
    expect(exits.length).toBeGreaterThanOrEqual(4);
    expect(run.findings.ringing.some((r) => r.cause.includes('left a rail'))).toBe(true);
    const corners: RingingEvent[] = [];
    new StimulusCorners(circuit.parts, duration).take(Infinity, (e) => corners.push(e));
    const offline = findRinging(run.transient, [...corners, ...exits], outputStep, options);
    expect(withoutHints(run.findings.ringing)).toEqual(offline.ringing);
    expect(run.findings.stats.events).toBe(offline.events);
  });
});

describe('the search told of events late, as a run tells rail exits', () => {
  // Synthetic rows: after each event a ring of 40 rows per period (ζ = 0.02, from the
  // envelope e^(-ζωt)), on two nodes. Pairs of events 2 rows apart fold into one cluster.
  const dt = 1e-6;
  const times = [300, 302, 1500, 2600, 2603, 4100].map((row) => row * dt);
  const rows = 6000;
  const w = (2 * Math.PI) / (40 * dt);
  const value = (t: number, scale: number): number => {
    const since = times.filter((e) => e <= t + 1e-12).pop();
    return since === undefined ? 0 : scale * (1 - Math.exp(-0.02 * w * (t - since)) * Math.cos(w * (t - since)));
  };
  const time = Float64Array.from({ length: rows }, (_, i) => i * dt);
  const columns = new Map([['a', time.map((t) => value(t, 1))], ['b', time.map((t) => value(t, -3))]]);
  const events = times.map((t, k) => ({ time: t, cause: `event ${k}` }));

  it('finds what it finds when every event is known beforehand, windows cut short included', () => {
    const lagRows = 7;
    const options = { windowRows: 500 };
    const search = new RingingSearch(['a', 'b'], dt, options, lagRows);
    // Each event is told at a row up to `lagRows` after its time, the later of a pair first.
    const toldAt = (k: number): number => Math.round(times[k] / dt) + (k % 2 === 0 ? lagRows : 1);
    const row = new Float64Array(2);
    for (let i = 0; i < rows; i++) {
      events.forEach((e, k) => toldAt(k) === i && search.event(e));
      row[0] = columns.get('a')![i];
      row[1] = columns.get('b')![i];
      search.row(time[i], row, time[i] - lagRows * dt);
    }
    const streamed = search.finish();
    const known = findRinging({ time, columns }, events, dt, options);
    expect(streamed).toEqual(known);
    // Four clusters; both nodes ring after each, at 25 kHz within 1% (the synthetic signal's own frequency).
    expect(known.events).toBe(4);
    expect(known.ringing.map((r) => r.node)).toEqual(['a', 'b']);
    for (const r of known.ringing) {
      expect(Math.abs(r.frequency - 25e3) / 25e3).toBeLessThan(0.01);
      expect(r.repeats).toBe(3);
    }
  });

  it('refuses an event told after it was passed: that would change the clusters silently', () => {
    const search = new RingingSearch(['a'], dt);
    search.row(0, [0], 10 * dt);
    expect(() => search.event({ time: 5 * dt, cause: 'late' })).toThrow(/after the frontier passed it/);
  });
});

describe('the spectral confirmation of a long stretch', () => {
  it('thins 200,000 rows to a few thousand and still finds a 12.6 kHz peak within 0.1%', () => {
    // A damped cosine of known frequency, 79 rows per period.
    const dt = 1e-6;
    const f = 12.6e3;
    const values = Float64Array.from({ length: 200_000 }, (_, i) => Math.exp(-2e2 * i * dt) * Math.cos(2 * Math.PI * f * i * dt));
    const found = new SpectralPeak().frequency(values, 0, values.length, 0, dt, 1 / (f * dt));
    expect(Math.abs(found - f) / f).toBeLessThan(1e-3);
  });
});
