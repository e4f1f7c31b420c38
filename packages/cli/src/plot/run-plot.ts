import type { AdcReadout, Circuit, TransientResult } from '@voltcast/core';
import { colour } from './palette.ts';
import type { Figure, Panel } from './series.ts';

/** `voltcast run --plot`: every probe's waveform in one panel, then per ADC its codes as steps. */
export function runFigure(circuit: Circuit, fileName: string, result: TransientResult, adcs: readonly AdcReadout[] = []): Figure {
  const series = result.probes.map((probe) => ({ kind: 'line' as const, name: probe, time: result.time, values: result.columns.get(probe)! }));
  const panels: Panel[] = [{ title: 'probes', unit: 'V', series, colours: series.map((_, i) => colour(i)) }];
  for (const adc of adcs) {
    panels.push({
      title: `ADC ${adc.spec.name} codes (${adc.spec.bits} bits)`,
      unit: '',
      series: [{ kind: 'steps', name: adc.spec.name, time: adc.time, values: adc.code }],
      colours: [colour(series.length + panels.length - 1)],
    });
  }
  return { title: circuit.name, subtitle: `${fileName}: node voltages${adcs.length > 0 ? ' and ADC codes' : ''}`, panels };
}
