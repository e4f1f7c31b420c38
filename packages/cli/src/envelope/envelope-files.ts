import { writeFileSync } from 'node:fs';
import { join } from 'node:path';
import type { Envelope } from '@voltcast/core';
import { envelopeFigure } from '../plot/envelope-plot.ts';
import { renderFigure } from '../plot/render-figure.ts';
import { writeAdcEnvelopeCsv, writeEnvelopeCsv } from './envelope-csv.ts';

/** Write `envelope.csv`, per ADC `envelope-adc-NAME.csv`, and with `plot` `plot.svg` into `folder`; returns the file names. */
export function writeEnvelopeFiles(folder: string, result: Envelope, plot?: { circuitName: string; fileName: string }): string[] {
  writeEnvelopeCsv(join(folder, 'envelope.csv'), result);
  const files = ['envelope.csv'];
  for (const adc of result.adcs) {
    files.push(`envelope-adc-${adc.name}.csv`);
    writeAdcEnvelopeCsv(join(folder, files.at(-1)!), adc);
  }
  if (plot !== undefined) {
    files.push('plot.svg');
    writeFileSync(join(folder, 'plot.svg'), renderFigure(envelopeFigure(result, plot.circuitName, plot.fileName)));
  }
  return files;
}
