import type { Envelope } from '@voltcast/core';
import { colour } from './palette.ts';
import type { Figure, Panel } from './series.ts';

/** `voltcast envelope --plot`: per recorded node its band (min to max) with the nominal in it; per ADC its codes, held between conversions. */
export function envelopeFigure(result: Envelope, circuitName: string, fileName: string): Figure {
  const panels: Panel[] = result.recorded.map((node, i) => ({
    title: node,
    unit: 'V',
    series: [
      { kind: 'band', name: `${node} min..max`, x: result.time, low: result.min.get(node)!, high: result.max.get(node)! },
      { kind: 'line', name: `${node} nominal`, x: result.time, values: result.nominal.get(node)! },
    ],
    colours: [colour(i), colour(i)],
  }));
  for (const adc of result.adcs) {
    panels.push({
      title: `ADC ${adc.name} codes`,
      unit: '',
      series: [
        { kind: 'band', name: `${adc.name} min..max`, x: adc.time, low: adc.min, high: adc.max, stepped: true },
        { kind: 'steps', name: `${adc.name} nominal`, x: adc.time, values: adc.nominal },
      ],
      colours: [colour(panels.length), colour(panels.length)],
    });
  }
  const what = [result.runs > 0 ? `${result.runs} Monte Carlo runs (seed ${result.seed})` : '', result.corners > 0 ? `${result.corners} corners` : ''].filter((s) => s !== '');
  return { title: `${circuitName}: tolerance envelope`, subtitle: `${fileName}: ${what.join(' and ')}`, panels };
}
