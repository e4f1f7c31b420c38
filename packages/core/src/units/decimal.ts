/**
 * `value` rounded to 15 significant digits: for a time computed as k·step or start + k/rate,
 * the double nearest the decimal a person would write (3 × 0.1 ms reads 0.0003, not
 * 0.00030000000000000003), so that `time.indexOf(0.0003)` finds it. The change is below one
 * part in 10¹⁵.
 */
export function decimalRounded(value: number): number {
  return Number(value.toPrecision(15));
}
