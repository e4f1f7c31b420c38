import type { Circuit, TransientResult } from '@voltcast/core';
import { colour } from './palette.ts';
import type { Figure } from './series.ts';

/** `voltcast run --plot`: every probe's waveform in one panel. */
export function runFigure(circuit: Circuit, fileName: string, result: TransientResult): Figure {
  const series = result.probes.map((probe) => ({ kind: 'line' as const, name: probe, time: result.time, values: result.columns.get(probe)! }));
  return {
    title: circuit.name,
    subtitle: `${fileName}: node voltages`,
    panels: [{ title: 'probes', unit: 'V', series, colours: series.map((_, i) => colour(i)) }],
  };
}
