import { formatSI, type Comparison } from '@voltcast/core';
import type { EnvelopeSignal } from './read-inputs.ts';

type Kind = EnvelopeSignal['kind'];

/** The verdict for people: PASS or FAIL, the share inside and the first violation. */
export function textVerdict(signal: string, kind: Kind, v: Comparison): string {
  const share = `${(v.fractionInside * 100).toFixed(2)}% of ${v.compared} samples inside`;
  const skipped = v.skipped > 0 ? `, ${v.skipped} outside the envelope's time span not checked` : '';
  const head = `${v.pass ? 'PASS' : 'FAIL'} ${signal}: ${share} (shift ${formatSI(v.shift, 's')}${skipped})`;
  if (v.pass) return head;
  const f = v.firstViolation!;
  const [value, min, max] = distinctly(kind, f.value, f.min, f.max);
  return `${head}\n  first violation at t = ${formatSI(f.time, 's')}: ${value} outside [${min}, ${max}]`;
}

/** The verdict as JSON for a test framework; the violations as a count. */
export function jsonVerdict(signal: string, kind: Kind, measured: string, envelope: string, v: Comparison): object {
  const { violations, ...rest } = v;
  return { signal, unit: kind === 'code' ? 'code' : 'V', measured, envelope, ...rest, violations: violations.length };
}

/**
 * A value and its limits written with as many digits as it takes for the value to read
 * differently from both limits (4 at least), so the printed line shows the violation.
 */
export function distinctly(kind: Kind, value: number, min: number, max: number): [string, string, string] {
  const write = (x: number, digits: number) => (kind === 'code' ? String(x) : formatSI(x, 'V', digits));
  let digits = 4;
  while (digits < 17 && (write(value, digits) === write(min, digits) || write(value, digits) === write(max, digits))) digits++;
  return [write(value, digits), write(min, digits), write(max, digits)];
}
