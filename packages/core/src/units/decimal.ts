/** Exact powers of ten as doubles: 10^0 … 10^22. */
const POWERS = Array.from({ length: 23 }, (_, k) => 10 ** k);

/**
 * `value` rounded to 15 significant digits: for a time computed as k·step or start + k/rate,
 * the double nearest the decimal a person would write (3 × 0.1 ms reads 0.0003, not
 * 0.00030000000000000003), so that `time.indexOf(0.0003)` finds it. The change is below one
 * part in 10¹⁵. Output rows call this once each, so it avoids a string where it can: an
 * integer divided by an exact power of ten is that same nearest double.
 */
export function decimalRounded(value: number): number {
  if (value === 0 || !Number.isFinite(value)) return value;
  const k = 14 - Math.floor(Math.log10(Math.abs(value)));
  if (k < 0 || k >= POWERS.length) return Number(value.toPrecision(15));
  return Math.round(value * POWERS[k]) / POWERS[k];
}
