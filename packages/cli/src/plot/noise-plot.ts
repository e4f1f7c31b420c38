import { formatSI, type NoiseAnalysis } from '@voltcast/core';
import { colour } from './palette.ts';
import type { Figure, Panel, Series } from './series.ts';

/** Contributors drawn apart per node; the rest share one band on top. */
const DRAWN = 5;

/**
 * `voltcast noise --plot`: per node (those the text shows) its output noise density against
 * log frequency, stacked by contributor: the largest at the bottom, each band as tall as its
 * share of the power (the bands' edges are √ of the summed powers, so the top edge is the
 * node's density).
 */
export function noiseFigure(circuitName: string, fileName: string, noise: NoiseAnalysis, nodes: readonly string[]): Figure {
  const f = noise.frequency;
  const panels: Panel[] = nodes.map((name) => {
    const node = noise.nodes.find((n) => n.node === name)!;
    const drawn = node.contributions.slice(0, DRAWN);
    const rest = node.contributions.slice(DRAWN);
    const layers = drawn.map((c) => ({ name: `${c.part} ${c.source} (${formatSI(c.rms, 'V', 3)} rms)`, density: c.density }));
    if (rest.length > 0) layers.push({ name: `${rest.length} more`, density: f.map((_, i) => Math.sqrt(rest.reduce((s, c) => s + c.density[i] ** 2, 0))) });
    const below = new Float64Array(f.length);
    const series: Series[] = layers.map((layer) => {
      const low = below.map(Math.sqrt);
      for (let i = 0; i < f.length; i++) below[i] += layer.density[i] ** 2;
      return { kind: 'band', name: layer.name, x: f, low, high: below.map(Math.sqrt) };
    });
    series.push({ kind: 'line', name: `${name} total (${formatSI(node.rms, 'V', 3)} rms)`, x: f, values: node.density });
    return { title: `${name}: noise density`, unit: 'V/√Hz', series, colours: [...layers.map((_, i) => colour(i)), '#333333'], floor: 0 };
  });
  return {
    axis: 'frequency',
    title: `${circuitName}: noise`,
    subtitle: `${fileName}: ${formatSI(noise.band.from, 'Hz')} to ${formatSI(noise.band.to, 'Hz')} at ${noise.temperature} °C, stacked by contributor`,
    panels,
  };
}
