import { format } from 'd3-format';

const siPrefix = format('~s');

/**
 * A tick label with an SI prefix and unit: 0.0025 s is "2.5 ms", 1500 V "1.5 kV". Unitless
 * values (ADC codes) print as plain numbers, decibels and degrees without a prefix.
 */
export function siLabel(value: number, unit: string): string {
  if (unit === '') return format('~d')(value);
  // Logarithmic and angular units take no prefix: -40 dB, -180°.
  if (unit === 'dB') return `${format('~r')(value).replace('−', '-')} dB`;
  if (unit === '°') return `${format('~r')(value).replace('−', '-')}°`;
  if (value === 0) return `0 ${unit}`;
  // d3 writes micro as µ and leaves no prefix for units: split number and prefix.
  const written = siPrefix(value).replace('−', '-');
  const match = /^(-?[\d.]+(?:e[-+]?\d+)?)([yzafpnµmkMGTPEZY]?)$/.exec(written);
  return match ? `${match[1]} ${match[2]}${unit}` : `${written} ${unit}`;
}
