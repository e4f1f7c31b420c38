import { writeFileSync } from 'node:fs';
import { basename, extname, join } from 'node:path';
import { formatSI, noiseAnalysis, type NoiseAnalysis } from '@voltcast/core';
import { readCircuitFile } from '../read-circuit-file.ts';
import { writeOutputDir } from '../output/output-dir.ts';
import { writeNoiseCsv } from '../noise/noise-csv.ts';
import { buildNoiseReport, shownNodes, writeNoiseReport } from '../noise/noise-report.ts';
import { renderFigure } from '../plot/render-figure.ts';
import { noiseFigure } from '../plot/noise-plot.ts';

export interface NoiseCommandOptions {
  /** Output folder; default `out/<circuit file base name>-noise`. */
  out?: string;
  /** Also write `plot.svg`. */
  plot?: boolean;
  /** No summary on stdout. */
  quiet?: boolean;
  /** Write into a folder that holds other files, beside them (voltcast's own files are replaced). */
  force?: boolean;
}

/**
 * `voltcast noise FILE`: the noise of every recorded node and converter over the file's
 * `noise:` band (or its defaults); writes `noise.csv`, `noise.json`, `noise.txt` and with
 * `--plot` `plot.svg`.
 */
export async function noiseCommand(file: string, options: NoiseCommandOptions): Promise<void> {
  const { circuit, fileName, warnings } = readCircuitFile(file);
  for (const warning of warnings) console.error(warning);
  const noise = noiseAnalysis(circuit);
  const report = buildNoiseReport(circuit.name, fileName, noise);
  const outDir = options.out ?? join('out', `${basename(fileName, extname(fileName))}-noise`);
  const files = await writeOutputDir(outDir, { force: options.force }, (staging) => {
    writeNoiseCsv(join(staging, 'noise.csv'), noise);
    const written = ['noise.csv', ...writeNoiseReport(staging, report)];
    if (options.plot) {
      writeFileSync(join(staging, 'plot.svg'), renderFigure(noiseFigure(circuit.name, fileName, noise, shownNodes(report))));
      written.push('plot.svg');
    }
    return written;
  });
  if (!options.quiet) console.log(summary(noise, fileName, files.map((f) => join(outDir, f))));
}

function summary(noise: NoiseAnalysis, fileName: string, files: readonly string[]): string {
  const adcs = noise.adc.map((a) => `  ${a.name}: ${a.lsbRms.toFixed(2)} LSB rms, ${a.peakToPeakLsb.toFixed(1)} LSB peak-to-peak, ${a.noiseFreeBits.toFixed(1)} noise-free bits${a.averagingFor1Lsb !== null && a.averagingFor1Lsb > 1 ? `; average ${a.averagingFor1Lsb} samples for ±1 LSB` : ''}`);
  const nodes = noise.nodes.map((n) => (n.rms > 0 ? `  ${n.node}: ${formatSI(n.rms, 'V', 3)} rms, mostly ${n.contributions[0].part} (${n.contributions[0].source}, ${Math.round(n.contributions[0].share * 100)}%)` : `  ${n.node}: no noise (a source holds it)`));
  return [
    `${fileName}: noise from ${formatSI(noise.band.from, 'Hz')} to ${formatSI(noise.band.to, 'Hz')} at ${noise.temperature} °C`,
    ...(adcs.length > 0 ? ['converters', ...adcs] : []),
    'nodes',
    ...nodes,
    'files',
    ...files.map((f) => `  ${f}`),
  ].join('\n');
}
