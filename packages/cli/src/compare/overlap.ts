import { formatSI, type Comparison, type EnvelopeTrace, type Trace } from '@voltcast/core';
import { InputError } from '../exit-codes.ts';

/** Fewer samples than this within the envelope's span, while others fall outside it, is no basis for a verdict. */
const fewestCompared = 10;
/** Nor is a capture of which less than this share falls within the span. */
const smallestShare = 0.05;

/**
 * Refuse a verdict when the capture barely meets the envelope in time: a capture in
 * milliseconds read as seconds leaves one sample in the span, and a FAIL (or PASS) from it
 * would be a verdict on misread numbers. A capture lying wholly within the span is always
 * judged, however short.
 */
export function checkOverlap(file: string, measured: Trace, limits: EnvelopeTrace, verdict: Comparison): void {
  const total = measured.time.length;
  const wellCovered = verdict.compared >= fewestCompared && verdict.compared >= smallestShare * total;
  if (verdict.compared === total || (verdict.compared > 0 && wellCovered)) return;
  const t = (value: number) => formatSI(value, 's');
  const shift = verdict.shift;
  throw new InputError(
    `${file}: only ${verdict.compared} of ${total} samples fall within the envelope's time span (${t(limits.time[0])} to ${t(limits.time[limits.time.length - 1])}); ` +
      `the capture runs from ${t(measured.time[0] - shift)} to ${t(measured.time[total - 1] - shift)}${shift !== 0 ? ` after a shift of ${t(shift)}` : ''}: no verdict\n` +
      "  check the time column's unit (give it in the header, such as 'time (ms)', or in a units row), or align the capture with --shift",
  );
}
