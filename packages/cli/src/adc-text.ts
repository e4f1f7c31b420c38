import { formatSI, type AdcReport } from '@voltcast/core';
import { textTable } from './text-table.ts';

/**
 * The converters section of report.txt: per ADC what it read and how far the codes are from
 * an error-free converter looking at the true input, so acquisition errors stand out.
 */
export function adcText(adcs: readonly AdcReport[]): string[] {
  if (adcs.length === 0) return [];
  const rows = adcs.map((a) => [
    a.name,
    String(a.codes),
    a.codeRange ? `${a.codeRange[0]}..${a.codeRange[1]}` : '-',
    `${a.clippedLow.count} / ${a.clippedHigh.count}`,
    codeError(a.largestError),
    a.largestErrorBeforeWindow === undefined ? '-' : a.largestHeldError > a.lsb / 2 ? codeError(a.largestErrorBeforeWindow) : 'settled',
    a.largestHeldError > 0 ? `${formatSI(a.largestHeldError, 'V')} (${(a.largestHeldError / a.lsb).toFixed(1)} LSB)` : '-',
  ]);
  return [
    '',
    'converters (codes read against an error-free converter on the true input)',
    ...textTable([['adc', 'codes', 'range', 'clipped low/high', 'largest error', 'vs input as the window opened', 'held - input'], ...rows]),
    ...(adcs.some((a) => a.largestErrorBeforeWindow !== undefined)
      ? [
          '  vs input as the window opened: the code against the input just before the sampling capacitor connected; shown where the held',
          '  voltage missed the input by more than 1/2 LSB (an acquisition error), "settled" elsewhere (a moving input adds its own motion).',
        ]
      : []),
  ];
}

function codeError(e: AdcReport['largestError']): string {
  if (e === undefined) return '-';
  const sign = e.codes > 0 ? '+' : '';
  return `${sign}${e.codes} codes at ${formatSI(e.time, 's')} (${e.read} vs ${e.ideal})`;
}
