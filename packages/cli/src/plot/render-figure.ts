import { scaleLinear, scaleLog, type ScaleContinuousNumeric } from 'd3-scale';
import { abscissaAxis, valueAxis } from './axes.ts';
import { drawSeries } from './draw-series.ts';
import { layoutLegend, legend, legendRowHeight, titleCharWidth, type LegendLayout } from './legend.ts';
import type { Figure, Panel, Series } from './series.ts';
import { element, text } from './svg.ts';

const width = 960;
const panelHeight = 240;
const margin = { left: 78, right: 24, top: 72, between: 44, bottom: 48 };

/**
 * A figure as a standalone SVG document: title, then panels stacked on one abscissa (time,
 * linear; or frequency, log), each with its value axis, grid, series and legend. Fonts are generic families, so the file looks
 * the same in a browser, an editor preview or a report.
 */
export function renderFigure(figure: Figure): string {
  const panels = figure.panels;
  const axis = figure.axis ?? 'time';
  const [start, end] = abscissaSpan(panels);
  const x = (axis === 'frequency' ? scaleLog() : scaleLinear()).domain([start, end]).range([margin.left, width - margin.right]);
  // Each panel's key sits above it: extra rows of key push the panel down.
  let cursor = margin.top;
  const body = panels.map((panel, i) => {
    const key = layoutLegend(panel.series, margin.left, width - margin.right, titleCharWidth * panel.title.length);
    const top = cursor + (key.rows - 1) * legendRowHeight;
    cursor = top + panelHeight + margin.between;
    return drawPanel(panel, key, x, axis, top, i === panels.length - 1);
  });
  const height = cursor - margin.between + margin.bottom;
  const header = [
    text(margin.left, 22, figure.title, { 'font-size': 15, 'font-weight': 'bold', fill: '#222' }),
    ...(figure.subtitle ? [text(margin.left, 40, figure.subtitle, { 'font-size': 11, fill: '#555' })] : []),
  ];
  return `<?xml version="1.0" encoding="UTF-8"?>\n${element(
    'svg',
    { xmlns: 'http://www.w3.org/2000/svg', width, height, viewBox: `0 0 ${width} ${height}`, 'font-family': 'system-ui, sans-serif' },
    element('rect', { width, height, fill: 'white' }),
    ...header,
    ...body,
  )}\n`;
}

function drawPanel(panel: Panel, key: LegendLayout, x: ScaleContinuousNumeric<number, number>, axis: 'time' | 'frequency', top: number, last: boolean): string {
  const bottom = top + panelHeight;
  const [low, high] = valueSpan(panel.series);
  const pad = (high - low) * 0.06 || Math.abs(high) * 0.1 || 1;
  const y = scaleLinear().domain([panel.floor ?? low - pad, high + pad]).range([bottom, top]).nice();
  const [left, right] = x.range();
  const clipId = `clip-${top}`;
  const titleBaseline = top - 8 - (key.rows - 1) * legendRowHeight;
  return element(
    'g',
    { class: 'panel' },
    element('defs', {}, element('clipPath', { id: clipId }, element('rect', { x: left, y: top, width: right - left, height: panelHeight }))),
    abscissaAxis(x, axis, top, bottom, last),
    valueAxis(y, left, right, panel.unit),
    element('g', { 'clip-path': `url(#${clipId})` }, ...panel.series.map((s, i) => drawSeries(s, panel.colours[i], x, y))),
    element('rect', { class: 'frame', x: left, y: top, width: right - left, height: panelHeight, fill: 'none', stroke: '#999' }),
    text(left, titleBaseline, panel.title, { 'font-size': 12, 'font-weight': 'bold', fill: '#333' }),
    legend(panel.series, panel.colours, key, titleBaseline),
  );
}

function abscissaSpan(panels: readonly Panel[]): [number, number] {
  let start = Infinity;
  let end = -Infinity;
  for (const s of panels.flatMap((p) => p.series)) {
    if (s.kind === 'spans' || s.kind === 'rules' || s.x.length === 0) continue;
    start = Math.min(start, s.x[0]);
    end = Math.max(end, s.x[s.x.length - 1]);
  }
  return start < end ? [start, end] : [0, 1];
}

function valueSpan(series: readonly Series[]): [number, number] {
  let low = Infinity;
  let high = -Infinity;
  const take = (values: ArrayLike<number>) => {
    for (let i = 0; i < values.length; i++) {
      if (Number.isFinite(values[i])) (low = Math.min(low, values[i])), (high = Math.max(high, values[i]));
    }
  };
  for (const s of series) {
    if (s.kind === 'band') take(s.low), take(s.high);
    else if (s.kind !== 'spans' && s.kind !== 'rules') take(s.values);
  }
  return low <= high ? [low, high] : [0, 1];
}
