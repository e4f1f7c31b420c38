import type { AdcCoding } from '../../circuit/adc-spec.ts';

/**
 * A code 0 .. 2^N - 1 as the converter writes it. Unsigned and offset binary are the same
 * numbers (offset binary reads 0 V at mid-scale, 2^(N-1), on a bipolar range); two's
 * complement is the offset-binary word with its top bit inverted, read as signed:
 * code - 2^(N-1).
 */
export function encode(code: number, bits: number, coding: AdcCoding): number {
  return coding === 'twos-complement' ? code - 2 ** (bits - 1) : code;
}

/** Smallest and largest written code of a coding. */
export function codeLimits(bits: number, coding: AdcCoding): readonly [number, number] {
  return [encode(0, bits, coding), encode(2 ** bits - 1, bits, coding)];
}
