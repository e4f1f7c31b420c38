import { formatSI, type SimulateSettings } from '@voltcast/core';

/** The output rows' spacing, and what chose it when the file left it out. */
export function rowsText(settings: SimulateSettings): string {
  const every = formatSI(settings.outputStep, 's');
  const by = settings.rowsSetBy;
  if (by === undefined) return every;
  const feature = `${by.part}'s ${formatSI(by.timescale, 's')}`;
  if (by.capped) return `${every}, the finest chosen by default, too coarse for ${feature}: write output-step to see it in the rows`;
  return `${every}, chosen to show ${feature}`;
}
