import { formatPrefixes } from './prefixes.ts';

/**
 * A value with an SI prefix and unit for people to read: `formatSI(4700, 'Ω')` is `4.7 kΩ`,
 * `formatSI(12.5e-6, 's')` is `12.5 µs`. `digits` significant digits, trailing zeros dropped.
 * Values beyond the prefix range keep the nearest prefix and an exponent (`1e+3 GΩ`), which
 * `parseQuantity` still reads back.
 */
export function formatSI(value: number, unit: string, digits = 4): string {
  if (!Number.isFinite(value)) return `${value}${unit === '' ? '' : ` ${unit}`}`;
  let exponent = value === 0 ? 0 : 3 * Math.floor(Math.log10(Math.abs(value)) / 3);
  exponent = Math.min(9, Math.max(-15, exponent));
  let mantissa = scaled(value, exponent).toPrecision(digits);
  // log10 can land a hair on either side of a power of ten, and rounding can reach 1000.
  if (exponent < 9 && Math.abs(Number(mantissa)) >= 1000) {
    exponent += 3;
    mantissa = scaled(value, exponent).toPrecision(digits);
  } else if (exponent > -15 && value !== 0 && Math.abs(Number(mantissa)) < 1) {
    exponent -= 3;
    mantissa = scaled(value, exponent).toPrecision(digits);
  }
  const prefix = formatPrefixes[exponent / 3 + 5];
  const suffix = `${prefix}${unit}`;
  return suffix === '' ? trimZeros(mantissa) : `${trimZeros(mantissa)} ${suffix}`;
}

/** value / 10^exponent, dividing by a power of ten that is exact for positive exponents. */
function scaled(value: number, exponent: number): number {
  return exponent >= 0 ? value / Math.pow(10, exponent) : value * Math.pow(10, -exponent);
}

/** `4.700` → `4.7`, `1.000e+6` → `1e+6`, `100` stays. */
function trimZeros(text: string): string {
  const [mantissa, exponent] = text.split('e');
  const trimmed = mantissa.includes('.') ? mantissa.replace(/0+$/, '').replace(/\.$/, '') : mantissa;
  return exponent === undefined ? trimmed : `${trimmed}e${exponent}`;
}
