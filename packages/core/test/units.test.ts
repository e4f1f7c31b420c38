import { describe, expect, it } from 'vitest';
import { formatSI, parseQuantity, quantities as q } from '../src/units/index.ts';
import type { Quantity } from '../src/units/index.ts';
import { decimalRounded } from '../src/units/decimal.ts';

// SI prefix values: the SI Brochure (BIPM, 9th edition), table 7. The prefixes are exact
// powers of ten, so every expected value below is written as the same decimal literal.
const valid: [string | number, Quantity, number][] = [
  ['10k', q.resistance, 10e3],
  ['4.7kΩ', q.resistance, 4.7e3],
  ['4.7 kΩ', q.resistance, 4.7e3],
  ['22kohm', q.resistance, 22e3],
  ['100', q.resistance, 100],
  ['100nF', q.capacitance, 100e-9],
  ['10F', q.capacitance, 10],
  ['470p', q.capacitance, 470e-12],
  ['2f', q.capacitance, 2e-15],
  ['1m', q.time, 1e-3], // m is milli
  ['1M', q.frequency, 1e6], // M is mega
  ['3MHz', q.frequency, 3e6],
  ['1GHz', q.frequency, 1e9],
  ['10uH', q.inductance, 10e-6], // u stands in for micro
  ['10µH', q.inductance, 10e-6], // U+00B5 micro sign
  ['10μH', q.inductance, 10e-6], // U+03BC Greek mu
  ['-12V', q.voltage, -12],
  ['+3.3', q.voltage, 3.3],
  ['.5mA', q.current, 0.5e-3],
  ['1e-3', q.time, 1e-3],
  ['2.5E3s', q.time, 2.5e3],
  ['1e3k', q.resistance, 1e6],
  [0.25, q.time, 0.25],
  ['13V/us', q.slewRate, 13e6],
  ['13V/µs', q.slewRate, 13e6],
  ['0.5V/ns', q.slewRate, 0.5e9],
  ['500kV/s', q.slewRate, 500e3],
  ['20M', q.slewRate, 20e6],
  ['1%', q.fraction, 0.01],
  ['50%', q.fraction, 0.5],
  ['0.25', q.fraction, 0.25],
  ['90°', q.angle, 90],
  ['45deg', q.angle, 45],
  ['12', q.count, 12],
  ['20k', q.count, 20e3],
];

describe('parseQuantity accepts the contract notation', () => {
  it.each(valid)('%s as %o', (text, quantity, expected) => {
    const parsed = parseQuantity(text, quantity);
    expect(parsed).toHaveProperty('value');
    // Relative 1e-15: the parser scales by one exact power of ten.
    expect((parsed as { value: number }).value).toBeCloseTo(expected, 15 - Math.floor(Math.log10(Math.abs(expected))));
  });

  it('gives the same double as the decimal literal for prefixed values', () => {
    expect(parseQuantity('100n', q.capacitance)).toEqual({ value: 1e-7 });
    expect(parseQuantity('4.7k', q.resistance)).toEqual({ value: 4700 });
    expect(parseQuantity('12.5us', q.time)).toEqual({ value: 12.5e-6 });
    expect(parseQuantity('2.1m', q.time)).toEqual({ value: 2.1e-3 });
    expect(parseQuantity('1.5e2k', q.resistance)).toEqual({ value: 1.5e5 });
  });

  // Decibels of a voltage ratio are 20·log10(ratio): IEC 60027-3 (level of a root-power quantity).
  it.each([
    ['100dB', 1e5],
    ['0dB', 1],
    ['-20dB', 0.1],
    ['6dB', 1.9952623149688795],
  ])('%s is a voltage ratio of %d', (text, ratio) => {
    const parsed = parseQuantity(text, q.gain) as { value: number };
    expect(parsed.value / ratio - 1).toBeLessThan(1e-12);
    expect(parsed.value / ratio - 1).toBeGreaterThan(-1e-12);
  });
});

const invalid: [string | number, Quantity, RegExp][] = [
  ['10kilo', q.resistance, /'10kilo' is not a resistance$/],
  ['10F', q.resistance, /F is a unit of capacitance/],
  ['10K', q.resistance, /kilo is a lowercase k/],
  ['5mV', q.time, /V is a unit of voltage/],
  ['1%', q.resistance, /% applies only to fractions/],
  ['3dB', q.voltage, /dB applies only to gains/],
  ['13V/us', q.voltage, /'13V\/us' is not a voltage/],
  ['13V/', q.slewRate, /is not a slew rate/],
  ['', q.time, /is not a time/],
  ['k', q.resistance, /is not a resistance/],
  ['1.2.3', q.voltage, /is not a voltage/],
  ['1x', q.count, /is not a number/],
  ['1 0k', q.resistance, /is not a resistance/],
  ['1e400', q.voltage, /too large/],
  [Infinity, q.voltage, /not a finite number/],
  [NaN, q.voltage, /not a finite number/],
];

describe('parseQuantity rejects everything else and says what is valid', () => {
  it.each(invalid)('%s as %o', (text, quantity, message) => {
    const parsed = parseQuantity(text, quantity) as { error: string; hint: string };
    expect(parsed.error).toMatch(message);
    expect(parsed.hint).toMatch(/SI prefix/);
    expect(parsed.hint).toMatch(/m is milli, M is mega/);
  });

  it('gives an example in the quantity\'s unit', () => {
    expect((parseQuantity('10kilo', q.resistance) as { hint: string }).hint).toMatch(/like 10M or 4\.7kΩ$/);
    expect((parseQuantity('fast', q.slewRate) as { hint: string }).hint).toMatch(/13V\/us/);
  });
});

describe('formatSI', () => {
  it.each([
    [4700, 'Ω', '4.7 kΩ'],
    [12.5e-6, 's', '12.5 µs'],
    [0, 'V', '0 V'],
    [-3.3, 'V', '-3.3 V'],
    [1e-3, 's', '1 ms'],
    [1e6, 'Hz', '1 MHz'],
    [999.96, 'Ω', '1 kΩ'], // rounds up into the next prefix
    [123456, 'Ω', '123.5 kΩ'],
    [470e-12, 'F', '470 pF'],
    [2.5e-15, 'F', '2.5 fF'],
    [1000, '', '1 k'],
    [5, '', '5'],
  ])('%d %s is %s', (value, unit, text) => {
    expect(formatSI(value, unit)).toBe(text);
  });

  it('keeps an exponent beyond the prefix range', () => {
    expect(formatSI(1e15, 'Ω')).toBe('1e+6 GΩ');
    expect(formatSI(Infinity, 's')).toBe('Infinity s');
  });
});

describe('decimalRounded', () => {
  it('gives the double nearest the 15-digit decimal, as the ECMAScript toPrecision(15) and Number() do, on grid times k·step', () => {
    // Reference: ECMAScript Number.prototype.toPrecision and the string-to-number conversion.
    let differing = 0;
    for (const step of [1e-6, 2.5e-6, 500e-9, 1e-4, 1 / 3e5, 3e-9, 0.02]) {
      for (let k = 0; k < 20_000; k++) if (decimalRounded(k * step) !== Number((k * step).toPrecision(15))) differing++;
    }
    expect(differing).toBe(0);
    expect(decimalRounded(3 * 0.1e-3)).toBe(0.0003);
    expect(decimalRounded(-7e300 * 3)).toBe(-2.1e301);
  });
});
