import { curveStepAfter, line } from 'd3-shape';
import type { ScaleContinuousNumeric, ScaleLinear } from 'd3-scale';
import { decimate, type Points } from './decimate.ts';
import type { Series } from './series.ts';
import { element } from './svg.ts';

const markRadius = 3.5;

/** One `<path>` for one series, tagged with `data-series` (its name). */
export function drawSeries(series: Series, colour: string, x: ScaleContinuousNumeric<number, number>, y: ScaleLinear<number, number>): string {
  const columns = Math.abs(x.range()[1] - x.range()[0]);
  const tag = { 'data-series': series.name, class: `series ${series.kind}` };
  switch (series.kind) {
    case 'line':
    case 'steps': {
      const { x: along, values } = decimate(series.x, series.values, x, columns);
      const path = line<number>()
        .x((i) => x(along[i]))
        .y((i) => y(values[i]))
        .defined((i) => Number.isFinite(values[i]));
      if (series.kind === 'steps') path.curve(curveStepAfter);
      return element('path', { ...tag, d: path(along.map((_, i) => i)) ?? '', fill: 'none', stroke: colour, 'stroke-width': series.kind === 'steps' ? 1.25 : 1.5, 'stroke-dasharray': series.dashed ? '5 3' : undefined, 'stroke-linejoin': 'round' });
    }
    case 'band': {
      // Thinned separately, the two edges may keep different times: walk the lower edge
      // forward and the upper edge back, and close the ring.
      const low = decimate(series.x, series.low, x, columns);
      const high = decimate(series.x, series.high, x, columns);
      const edge = (points: Points) => (series.stepped ? staircase(points) : points.x.map((t, i): [number, number] => [t, points.values[i]]));
      const ring = [...edge(low), ...edge(high).reverse()];
      const outline = line<[number, number]>()
        .x((p) => x(p[0]))
        .y((p) => y(p[1]));
      return element('path', { ...tag, d: `${outline(ring) ?? ''}Z`, fill: colour, 'fill-opacity': 0.22, stroke: colour, 'stroke-opacity': 0.5, 'stroke-width': 0.75 });
    }
    case 'spans': {
      const [bottom, top] = y.range();
      let d = '';
      for (let i = 0; i < series.starts.length; i++) {
        const x0 = x(series.starts[i]).toFixed(2);
        const x1 = Math.max(x(series.ends[i]), x(series.starts[i]) + 1).toFixed(2);
        d += `M${x0},${top.toFixed(2)}H${x1}V${bottom.toFixed(2)}H${x0}Z`;
      }
      return element('path', { ...tag, d, fill: colour, 'fill-opacity': 0.12, stroke: 'none' });
    }
    case 'rules': {
      const [bottom, top] = y.range();
      let d = '';
      for (let i = 0; i < series.x.length; i++) d += `M${x(series.x[i]).toFixed(2)},${bottom.toFixed(2)}V${top.toFixed(2)}`;
      return element('path', { ...tag, d, fill: 'none', stroke: colour, 'stroke-width': 1.25, 'stroke-dasharray': '2 3' });
    }
    case 'marks': {
      let d = '';
      for (let i = 0; i < series.x.length; i++) {
        const cx = x(series.x[i]);
        const cy = y(series.values[i]);
        d += `M${(cx - markRadius).toFixed(2)},${cy.toFixed(2)}a${markRadius},${markRadius} 0 1,0 ${2 * markRadius},0a${markRadius},${markRadius} 0 1,0 ${-2 * markRadius},0`;
      }
      return element('path', { ...tag, d, fill: 'none', stroke: colour, 'stroke-width': 1.5 });
    }
  }
}

/** Corner points of values held from each time to the next (codes between conversions). */
function staircase(points: Points): [number, number][] {
  const { x, values } = points;
  return x.flatMap((t, i): [number, number][] => (i + 1 < x.length ? [[t, values[i]], [x[i + 1], values[i]]] : [[t, values[i]]]));
}
