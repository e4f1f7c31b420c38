import type { AdcReadout, Circuit, SaturationInterval, TransientResult } from '@voltcast/core';
import { colour, violationColour } from './palette.ts';
import type { Figure, Panel, Series } from './series.ts';

/**
 * `voltcast run --plot`: every recorded node's waveform in one panel, with the intervals where an
 * amplifier sat at a rail shaded, then per ADC its codes as steps.
 */
export function runFigure(circuit: Circuit, fileName: string, result: TransientResult, adcs: readonly AdcReadout[] = [], saturation: readonly SaturationInterval[] = []): Figure {
  const lines: Series[] = result.recorded.map((node) => ({ kind: 'line' as const, name: node, x: result.time, values: result.columns.get(node)! }));
  const parts = [...new Set(saturation.map((s) => s.part))];
  const spans: Series[] = parts.map((part) => {
    const own = saturation.filter((s) => s.part === part);
    return { kind: 'spans', name: `${part} at a rail`, starts: own.map((s) => s.start), ends: own.map((s) => s.end) };
  });
  const series = [...spans, ...lines];
  const panels: Panel[] = [{ title: 'recorded nodes', unit: 'V', series, colours: [...spans.map(() => violationColour), ...lines.map((_, i) => colour(i))] }];
  for (const adc of adcs) {
    panels.push({
      title: `ADC ${adc.spec.name} codes (${adc.spec.bits} bits)`,
      unit: '',
      series: [{ kind: 'steps', name: adc.spec.name, x: adc.time, values: adc.code }],
      colours: [colour(lines.length + panels.length - 1)],
    });
  }
  return { title: circuit.name, subtitle: `${fileName}: node voltages${adcs.length > 0 ? ' and ADC codes' : ''}`, panels };
}
