import { writeFileSync } from 'node:fs';
import { join } from 'node:path';
import { formatSI, type AdcNoise, type Hint, type NoiseAnalysis } from '@voltcast/core';
import { textTable } from '../text-table.ts';
import { wrap } from '../findings-text.ts';

/**
 * What `noise.json` holds (docs/cli.md): the temperature and band, per node its rms and each
 * part's contribution, largest first, with the hints; per converter its noise in LSB.
 * Volts, hertz, °C; peak-to-peak as 6.6 σ.
 */
export interface NoiseReport {
  readonly circuit: string;
  readonly file: string;
  readonly temperature: number;
  readonly band: readonly [from: number, to: number];
  readonly perDecade: number;
  readonly peakToPeak: string;
  readonly nodes: Readonly<Record<string, { readonly rms: number; readonly contributions: readonly { readonly part: string; readonly source: string; readonly rms: number; readonly share: number }[]; readonly hints: readonly Hint[] }>>;
  readonly adc: readonly AdcNoise[];
  readonly operatingPoint: Readonly<Record<string, number>>;
  readonly stats: { readonly factorizations: number; readonly solves: number };
}

export function buildNoiseReport(circuit: string, file: string, noise: NoiseAnalysis): NoiseReport {
  return {
    circuit,
    file,
    temperature: noise.temperature,
    band: [noise.band.from, noise.band.to],
    perDecade: noise.band.perDecade,
    peakToPeak: '6.6 sigma (99.9% of samples of Gaussian noise)',
    nodes: Object.fromEntries(
      noise.nodes.map((n) => [n.node, { rms: n.rms, contributions: n.contributions.map((c) => ({ part: c.part, source: c.source, rms: c.rms, share: c.share })), hints: n.hints }]),
    ),
    adc: noise.adc.map((a) => ({ ...a })),
    operatingPoint: Object.fromEntries(noise.operatingPoint),
    stats: { ...noise.stats },
  };
}

/** Write `noise.json` and `noise.txt` into `folder`; returns their names. */
export function writeNoiseReport(folder: string, report: NoiseReport): string[] {
  writeFileSync(join(folder, 'noise.json'), JSON.stringify(report, null, 2) + '\n');
  writeFileSync(join(folder, 'noise.txt'), noiseText(report));
  return ['noise.json', 'noise.txt'];
}

/** Contributors listed per node in the text; the rest are summed in one line. */
const LISTED = 5;
const volts = (v: number): string => `${formatSI(v, 'V', 3)} rms`;

/** One screen: each converter in LSB, then each node's largest contributors with the hints. */
export function noiseText(report: NoiseReport): string {
  const [from, to] = report.band;
  const lines = [
    `voltcast noise: ${report.circuit}`,
    `file: ${report.file}`,
    `${formatSI(from, 'Hz')} to ${formatSI(to, 'Hz')} at ${report.temperature} °C; linearized at the t = 0 operating point; peak-to-peak = 6.6 σ`,
  ];
  if (report.adc.length > 0) {
    lines.push('', 'converters');
    lines.push(
      ...textTable([
        ['adc', 'node', 'noise', 'LSB rms', 'peak-to-peak', 'noise-free bits', 'average for ±1 LSB'],
        ...report.adc.map((a) => [a.name, a.node, volts(a.rmsVolts), a.lsbRms.toFixed(2), `${a.peakToPeakLsb.toFixed(1)} LSB`, a.noiseFreeBits.toFixed(1), averaging(a.averagingFor1Lsb)]),
      ], 2),
    );
    for (const a of report.adc) {
      if (a.beyondBand === null || a.beyondBand > 0.05) {
        const how = a.beyondBand === null ? 'the density is not falling at the band\'s end' : `about ${Math.round(a.beyondBand * 100)}% more noise power lies above it`;
        lines.push(...wrap(`${a.name}: ${how}, and the converter folds it into its samples: raise \`noise: to\` until this note goes.`, 100, '  '));
      }
      if (a.converterLsbRms > 0) lines.push(`  ${a.name} adds its own ${a.converterLsbRms} LSB rms (its noise: key); in a run the two add as √(a² + b²).`);
    }
  }
  const shown = shownNodes(report);
  for (const node of shown) {
    const figures = report.nodes[node];
    if (!(figures.rms > 0)) {
      lines.push('', `${node}: no noise (a source holds it)`);
      continue;
    }
    lines.push('', `${node}: ${volts(figures.rms)}`);
    const heard = figures.contributions.filter((c) => c.rms > 0);
    const listed = heard.slice(0, LISTED);
    const rest = heard.slice(LISTED);
    const rows = listed.map((c) => [c.part, c.source, volts(c.rms), `${(c.share * 100).toFixed(1)}%`]);
    if (rest.length > 0) rows.push([`${rest.length} more`, '', volts(Math.sqrt(rest.reduce((s, c) => s + c.rms ** 2, 0))), `${(rest.reduce((s, c) => s + c.share, 0) * 100).toFixed(1)}%`]);
    lines.push(...textTable([['part', 'source', 'at the node', 'share'], ...rows], 2, '    '));
    for (const hint of figures.hints) lines.push(...wrap(`hint: ${hint.text}`, 100, '      '));
  }
  const hidden = Object.keys(report.nodes).length - shown.length;
  if (hidden > 0) lines.push('', `${hidden} more node${hidden === 1 ? '' : 's'} in noise.json (list the ones you want under record:)`);
  return lines.join('\n') + '\n';
}

/** Nodes given in full on the screen: the converters' first, then the others. */
const SHOWN_NODES = 4;

/** The nodes the text and the plot show: those the converters read first, then the recorded ones, at most four. */
export function shownNodes(report: { readonly nodes: Readonly<Record<string, unknown>>; readonly adc: readonly { readonly node: string }[] }): string[] {
  const converters = [...new Set(report.adc.map((a) => a.node))];
  const others = Object.keys(report.nodes).filter((n) => !converters.includes(n));
  return [...converters, ...others].slice(0, SHOWN_NODES);
}

function averaging(count: number | null): string {
  if (count === null) return 'not reached';
  return count === 1 ? 'none needed' : `${count} samples`;
}
