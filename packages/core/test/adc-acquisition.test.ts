import { describe, expect, it } from 'vitest';
import { parseCircuit } from '../src/circuit/parse-circuit.ts';
import { runCircuit } from '../src/analysis/run-circuit.ts';

/**
 * A stiff source behind `rs` into an ADC whose sampling capacitor is set to 0 V between
 * samples and connects for `window` before the one instant at 1 µs.
 */
function heldAfterWindow(volts: number, rs: string, sampling: string, bits = 12, range = '[0, 3.3]') {
  const circuit = parseCircuit(`
circuit: adc-acquisition
parts:
  SRC: { voltage: ${volts}, between: [src, gnd] }
  RS: { resistor: ${rs}, between: [src, in] }
simulate: { duration: 2u }
adc:
  A: { input: in, bits: ${bits}, range: ${range}, times: [1u], sampling: ${sampling} }
`);
  return runCircuit(circuit).adcs[0];
}

describe('acquisition through a series resistance', () => {
  it('the held voltage after a window t is the RC charge V·(1 - exp(-t / RC))', () => {
    // 9 kΩ outside plus 1 kΩ of switch into 10 pF: RC = 100 ns. Windows of 50, 150 and 400 ns.
    for (const window of [50e-9, 150e-9, 400e-9]) {
      const adc = heldAfterWindow(1, '9k', `{ capacitance: 10p, resistance: 1k, acquisition: ${window}, precharge: 0 }`);
      const expected = 1 - Math.exp(-window / 100e-9); // first-order RC step response (any circuits handbook)
      expect(Math.abs(adc.volts[0] - expected)).toBeLessThan(2e-4);
    }
  });

  it('a window shorter than R·C·ln(2^(N+1)) leaves more than 1/2 LSB of error; a longer one less', () => {
    // Common practice rule for settling to 1/2 LSB after a full-scale step: t >= R·C·ln(2^(N+1)).
    const bits = 12;
    const tau = 2e3 * 10e-12; // 1 kΩ source + 1 kΩ switch, 10 pF
    const rule = tau * Math.log(2 ** (bits + 1));
    const halfLsb = 3.3 / 2 ** (bits + 1);
    const error = (factor: number) => {
      const adc = heldAfterWindow(3.3, '1k', `{ capacitance: 10p, resistance: 1k, acquisition: ${factor * rule}, precharge: 0 }`, bits);
      return 3.3 - adc.volts[0];
    };
    expect(error(0.8)).toBeGreaterThan(halfLsb);
    expect(error(1.2)).toBeLessThan(halfLsb);
    // At the rule itself the error is 1/2 LSB within the stepper's accuracy.
    expect(error(1) / halfLsb).toBeCloseTo(1, 1);
  });

  it('the report shows the acquisition error against the input before the window opened', () => {
    // 100 kΩ into 10 pF for 1 µs (one time constant): the capacitor reaches 63% of 1 V.
    const adc = heldAfterWindow(1, '100k', '{ capacitance: 10p, resistance: 100, acquisition: 1u, precharge: 0 }');
    const held = 1 - Math.exp(-1e-6 / (100.1e3 * 10e-12));
    expect(adc.volts[0]).toBeCloseTo(held, 3);
    const lsb = 3.3 / 4096;
    // Before the window the node sits at 1 V: ideal code 1241; the code read is that of the held voltage.
    expect(adc.report.largestErrorBeforeWindow?.ideal).toBe(Math.floor(1 / lsb + 0.5));
    expect(adc.report.largestErrorBeforeWindow?.read).toBe(Math.floor(held / lsb + 0.5));
    // At the instant the node itself is loaded down to the capacitor: within 100 Ω / 100 kΩ of the step.
    expect(Math.abs(adc.report.largestError!.codes)).toBeLessThanOrEqual(1);
  });
});

describe('charge sharing', () => {
  it('a charged source capacitor and an empty sampling capacitor end at the charge-weighted voltage', () => {
    // Charge conservation: V = (Cs·Vs + Ch·0) / (Cs + Ch) = 30p·1 / 40p = 0.75 V. The window
    // (10 ns) is long against 10 Ω·7.5 pF, short against everything else: no source drives it.
    const circuit = parseCircuit(`
circuit: adc-charge-sharing
parts:
  CS: { capacitor: 30p, initial: 1, between: [in, gnd] }
simulate: { duration: 2u }
adc:
  A: { input: in, bits: 16, range: [0, 2], times: [1u], sampling: { capacitance: 10p, resistance: 10, acquisition: 10n, precharge: 0 } }
`);
    const adc = runCircuit(circuit).adcs[0];
    // 1 GΩ open-switch leakage over 1 µs moves 30 pF by ~3e-5 of its voltage.
    expect(adc.volts[0]).toBeCloseTo(0.75, 4);
  });

  it('without precharge the capacitor keeps the previous sample, and a held constant input converges', () => {
    const circuit = parseCircuit(`
circuit: adc-hold
parts:
  SRC: { voltage: 2, between: [src, gnd] }
  RS: { resistor: 100k, between: [src, in] }
simulate: { duration: 100u }
adc:
  A: { input: in, bits: 12, range: [0, 3.3], rate: 100k, start: 5u, sampling: { capacitance: 10p, resistance: 100, acquisition: 500n } }
`);
    const adc = runCircuit(circuit).adcs[0];
    // With no precharge the capacitor charged to 2 V at the operating point already.
    for (const v of adc.volts) expect(v).toBeCloseTo(2, 4);
  });
});

describe('time-controlled switch in a circuit file', () => {
  it('charges a capacitor only while closed, repeating with its period', () => {
    // Closed for 1 µs of every 10 µs through 1 kΩ into 1 nF (RC = 1 µs): each closing adds
    // (1 - e^-1) of the remaining distance to 1 V; open, it holds (1 GΩ leak is negligible). It starts empty:
    // at the operating point the open switch alone would charge it to 1 V.
    const circuit = parseCircuit(`
circuit: switch-steps
parts:
  SRC: { voltage: 1, between: [src, gnd] }
  SW: { switch: { on: 1k, off: 1G }, between: [src, c], closed: [[2u, 3u]], every: 10u }
  C1: { capacitor: 1n, initial: 0, between: [c, gnd] }
simulate: { duration: 30u, output-step: 1u }
record: [c]
`);
    const run = runCircuit(circuit);
    const c = run.transient.columns.get('c')!;
    const at = (t: number) => c[Math.round(t / 1e-6)];
    const step = 1 - Math.exp(-1); // first-order RC step response
    expect(at(2e-6)).toBeCloseTo(0, 5); // 1 V through 1 GΩ for 2 µs into 1 nF: 2 µV
    expect(at(3e-6)).toBeCloseTo(step, 3);
    expect(at(11e-6)).toBeCloseTo(step, 3);
    expect(at(13e-6)).toBeCloseTo(1 - (1 - step) ** 2, 3);
    expect(at(23e-6)).toBeCloseTo(1 - (1 - step) ** 3, 3);
  });
});
