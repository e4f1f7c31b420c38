import type { Quantity } from './quantity.ts';
import { quantities } from './quantity.ts';
import { siPrefixes } from './prefixes.ts';

export type ParsedQuantity = { value: number } | { error: string; hint: string };

/** A plain decimal number with optional exponent, then the rest (prefix and unit). */
const numberThenSuffix = /^([+-]?(?:\d+\.?\d*|\.\d+))(?:[eE]([+-]?\d+))?\s?(.*)$/s;

/** Examples shown in error messages, per quantity name. */
const examples: Readonly<Record<string, string>> = {
  resistance: '10M or 4.7kΩ',
  capacitance: '100n or 4.7µF',
  inductance: '10m or 220µH',
  voltage: '3.3 or 500mV',
  current: '2m or 150µA',
  frequency: '50 or 3MHz',
  time: '30m or 10µs',
  'slew rate': '13V/us or 500kV/s',
  gain: '1000 or 100dB',
  fraction: '0.5 or 50%',
  angle: '90 or 90°',
  temperature: '25 or 85°C',
  'voltage noise density': '10n or 10nV/√Hz',
  'current noise density': '1p or 1pA/√Hz',
  number: '12 or 20k',
};

/**
 * Read a number written plainly (`0.001`, `1e-3`) or with an SI prefix and an optional unit of
 * `q` (`10k`, `4.7kΩ`, `100nF`, `3MHz`). `m` is milli and `M` is mega. Depending on `q`:
 * `13V/us` (a rate per time, the denominator takes its own prefix), `100dB` (a voltage ratio,
 * 20·log10) and `1%`. One space is allowed between the number and the rest (`4.7 kΩ`), so
 * that formatted values read back.
 */
export function parseQuantity(text: string | number, q: Quantity): ParsedQuantity {
  if (typeof text === 'number') {
    return Number.isFinite(text) ? { value: text } : invalid(String(text), q, 'it is not a finite number');
  }
  const match = numberThenSuffix.exec(text.trim());
  if (match === null) return invalid(text, q);
  const [, digits, exponent = '0', suffix] = match;
  const scale = suffixScale(suffix, q);
  if (typeof scale === 'string') return invalid(text, q, scale);
  // Fold the prefix into the decimal exponent so that `2.1m` is the same double as `2.1e-3`.
  const value = scale === undefined ? Math.pow(10, Number(`${digits}e${exponent}`) / 20) : Number(`${digits}e${Number(exponent) + scale}`);
  return Number.isFinite(value) ? { value } : invalid(text, q, 'it is too large');
}

/**
 * The power of ten a suffix stands for; `undefined` for decibels; a string saying why the
 * suffix is wrong (possibly empty).
 */
function suffixScale(suffix: string, q: Quantity): number | undefined | string {
  if (suffix === '') return 0;
  if (suffix === '%') return q.percent ? -2 : `% applies only to fractions, not to ${q.name}`;
  if (suffix === 'dB') return q.decibels ? undefined : `dB applies only to gains, not to ${q.name}`;
  for (const unit of q.units) {
    const scale = q.perTime && unit.includes('/') ? perTimeScale(suffix, unit) : prefixedScale(suffix, unit);
    if (scale !== undefined) return scale;
  }
  return prefixedScale(suffix, '') ?? whyNot(suffix, q);
}

/** `suffix` as an optional prefix followed by `unit` (or, for an empty unit, a prefix alone). */
function prefixedScale(suffix: string, unit: string): number | undefined {
  if (unit !== '' && suffix === unit) return 0;
  const prefix = [...suffix][0];
  if (prefix === undefined || !(prefix in siPrefixes)) return undefined;
  return suffix.slice(prefix.length) === unit ? siPrefixes[prefix] : undefined;
}

/** `suffix` as `[prefix]V/[prefix]s` for a unit `V/s`. */
function perTimeScale(suffix: string, unit: string): number | undefined {
  const [top, bottom] = unit.split('/');
  const slash = suffix.indexOf('/');
  if (slash < 0) return prefixedScale(suffix, unit);
  const numerator = prefixedScale(suffix.slice(0, slash), top);
  const denominator = prefixedScale(suffix.slice(slash + 1), bottom);
  return numerator !== undefined && denominator !== undefined ? numerator - denominator : undefined;
}

/** A reason for the most common slips: another quantity's unit, or a capital K. */
function whyNot(suffix: string, q: Quantity): string {
  if (suffix.startsWith('K')) return 'the SI prefix for kilo is a lowercase k';
  for (const other of Object.values(quantities) as Quantity[]) {
    if (other.name === q.name) continue;
    for (const unit of other.units) {
      if (prefixedScale(suffix, unit) !== undefined) return `${unit} is a unit of ${other.name}`;
    }
  }
  return '';
}

function invalid(text: string, q: Quantity, reason?: string): { error: string; hint: string } {
  return { error: `'${text}' is not a ${q.name}${reason ? `: ${reason}` : ''}`, hint: quantityHint(q) };
}

/** How to write a value of the quantity, for any message about one. */
export function quantityHint(q: Quantity): string {
  const unit = q.units.length > 0 ? ` and unit (${q.units.join(', ')})` : '';
  const example = examples[q.name] ?? `1.5k${q.units[0] ?? ''}`;
  const extras = [q.decibels ? 'dB' : '', q.percent ? '%' : ''].filter((s) => s !== '');
  const notation = extras.length > 0 ? `, or ${extras.join(' or ')}` : '';
  return `write a number with an optional SI prefix (f p n u µ m k M G; m is milli, M is mega)${unit}${notation}, like ${example}`;
}
