import { describe, expect, it } from 'vitest';
import { buildCircuit, compare, envelope, noiseAnalysis, runCircuit } from '@voltcast/core';
import { renderFigure } from '../packages/cli/src/plot/render-figure.ts';
import { runFigure } from '../packages/cli/src/plot/run-plot.ts';
import { envelopeFigure } from '../packages/cli/src/plot/envelope-plot.ts';
import { compareFigure } from '../packages/cli/src/plot/compare-plot.ts';
import { noiseFigure } from '../packages/cli/src/plot/noise-plot.ts';
import { siLabel } from '../packages/cli/src/plot/si-format.ts';
import { readCircuitFile } from '../packages/cli/src/read-circuit-file.ts';
import { repoRoot } from './support/run-cli.ts';
import { xmlProblems } from './support/xml-well-formed.ts';

// An invented RC filter with a 5% resistor; the capture below is synthetic.
const circuit = buildCircuit({
  circuit: 'invented-plot-filter',
  parts: {
    VS: { voltage: { square: { low: 0, high: 3.3, frequency: '1k' } }, between: ['in', 'gnd'] },
    R1: { resistor: '1k', tolerance: '5%', between: ['in', 'out'] },
    C1: { capacitor: '47n', between: ['out', 'gnd'] },
  },
  simulate: { duration: '3m', 'output-step': '5u' },
  record: ['in', 'out'],
  adc: { CONV: { input: 'out', bits: 8, range: [0, 3.3], rate: '20k' } },
});

/** Paths per `data-series` name, and every path in the document. */
function paths(svg: string): { all: number; series: string[] } {
  return { all: svg.match(/<path\b/g)?.length ?? 0, series: [...svg.matchAll(/<path\b[^>]*data-series="([^"]*)"/g)].map((m) => m[1]) };
}

describe('SVG plots', () => {
  it('draw a run as well-formed XML with one path per recorded node and per ADC', () => {
    const run = runCircuit(circuit);
    const svg = renderFigure(runFigure(circuit, 'invented <plot> & co.yaml', run.transient, run.adcs));
    // Well-formedness per the XML 1.0 specification (checker in test/support).
    expect(xmlProblems(svg)).toEqual([]);
    expect(paths(svg)).toEqual({ all: 3, series: ['in', 'out', 'CONV'] });
    // Codes are held between conversions: the path moves horizontally then vertically.
    const steps = /data-series="CONV"[^>]* d="([^"]*)"/.exec(svg)![1];
    expect(steps).toMatch(/^M[\d.]+,([\d.]+)L([\d.]+),\1L\2,/);
    // The file name's < and & are escaped, not dropped (XML 1.0 section 2.4).
    expect(svg).toContain('invented &lt;plot&gt; &amp; co.yaml');
  });

  it('shade the intervals where an amplifier sat at a rail, one path per amplifier', () => {
    // An invented gain-of-20 stage driven 1 V peak: it clips at +/-8 V twice per period.
    const clipping = buildCircuit({
      circuit: 'invented-clipping-stage',
      parts: {
        VS: { voltage: { sine: { amplitude: 1, frequency: '500' } }, between: ['in', 'gnd'] },
        RG: { resistor: '10k', between: ['sum', 'gnd'] },
        RF: { resistor: '190k', between: ['sum', 'out'] },
        AMP: { opamp: { preset: 'general-purpose', headroom: 2 }, plus: 'in', minus: 'sum', out: 'out', supply: [-10, 10] },
      },
      simulate: { duration: '4m', 'output-step': '4u' },
      record: ['in', 'out'],
    });
    const run = runCircuit(clipping);
    const svg = renderFigure(runFigure(clipping, 'clipping.yaml', run.transient, run.adcs, run.findings.saturation));
    expect(xmlProblems(svg)).toEqual([]);
    expect(paths(svg).series).toEqual(['AMP at a rail', 'in', 'out']);
    // One closed rectangle per rail interval: 2 periods of a 500 Hz sine, each clipping twice.
    const spans = /data-series="AMP at a rail"[^>]* d="([^"]*)"/.exec(svg)![1];
    expect(spans.match(/Z/g)!.length).toBe(run.findings.saturation.length);
    expect(run.findings.saturation.length).toBe(4);
  });

  it('draw an envelope as a band and a nominal path per recorded node and per ADC', () => {
    const result = envelope(circuit, { corners: true });
    const svg = renderFigure(envelopeFigure(result, circuit.name, 'invented.yaml'));
    expect(xmlProblems(svg)).toEqual([]);
    expect(paths(svg)).toEqual({ all: 6, series: ['in min..max', 'in nominal', 'out min..max', 'out nominal', 'CONV min..max', 'CONV nominal'] });
  });

  it('draw a comparison with its violations as one more path', () => {
    const result = envelope(circuit, { corners: true });
    const limits = { time: result.time, min: result.min.get('out')!, nominal: result.nominal.get('out')!, max: result.max.get('out')! };
    const capture = { time: result.time, values: Float64Array.from(limits.nominal, (v, i) => (i >= 100 && i < 110 ? v + 1 : v)) };
    const verdict = compare(capture, limits);
    expect(verdict.violations.length).toBe(10); // rows 100..109, by construction
    const svg = renderFigure(compareFigure('out', 'voltage', capture, limits, verdict, 'capture.csv against envelope.csv'));
    expect(xmlProblems(svg)).toEqual([]);
    expect(paths(svg).series).toEqual(['expected min..max', 'expected nominal', 'measured', 'violations (10)']);
    // Ten circles, each drawn as two arcs in the one path.
    const marks = /data-series="violations \(10\)"[^>]* d="([^"]*)"/.exec(svg)![1];
    expect(marks.match(/a/g)!.length).toBe(20);
  });

  it('circle the first 20 of many violations and shade the spans of the rest', () => {
    const result = envelope(circuit, { corners: true });
    const limits = { time: result.time, min: result.min.get('out')!, nominal: result.nominal.get('out')!, max: result.max.get('out')! };
    // Rows 100..399 and 450..549 are 1 V high: 400 violations in two runs, by construction.
    const high = (i: number) => (i >= 100 && i < 400) || (i >= 450 && i < 550);
    const capture = { time: result.time, values: Float64Array.from(limits.nominal, (v, i) => (high(i) ? v + 1 : v)) };
    const verdict = compare(capture, limits);
    expect(verdict.violations.length).toBe(400);
    const svg = renderFigure(compareFigure('out', 'voltage', capture, limits, verdict, 'capture.csv against envelope.csv'));
    expect(xmlProblems(svg)).toEqual([]);
    expect(paths(svg).series).toEqual(['expected min..max', 'expected nominal', 'measured', 'first 20 violations', '380 more violations']);
    const marks = /data-series="first 20 violations"[^>]* d="([^"]*)"/.exec(svg)![1];
    expect(marks.match(/a/g)!.length).toBe(40); // 20 circles of two arcs
    // The rest: rows 120..399 and 450..549, two shaded spans.
    const spans = /data-series="380 more violations"[^>]* d="([^"]*)"/.exec(svg)![1];
    expect(spans.match(/Z/g)!.length).toBe(2);
  });

  it('label an axis of ADC codes with whole codes, not volts', () => {
    const result = envelope(circuit, { corners: true });
    const adc = result.adcs[0];
    const limits = { time: adc.time, min: adc.min, nominal: adc.nominal, max: adc.max };
    const verdict = compare({ time: adc.time, values: adc.nominal }, limits);
    const svg = renderFigure(compareFigure('CONV', 'code', { time: adc.time, values: adc.nominal }, limits, verdict, 'codes.csv against envelope-adc-CONV.csv'));
    const labels = [.../<g class="axis value"[^>]*>(.*?)<\/g>/.exec(svg)![1].matchAll(/<text[^>]*>([^<]*)<\/text>/g)].map((m) => m[1]);
    expect(labels.length).toBeGreaterThan(2);
    for (const label of labels) expect(label).toMatch(/^-?\d+$/);
  });

  it('keep every legend above its panel, off the data (the demo)', () => {
    const { circuit: demo, fileName } = readCircuitFile(`${repoRoot}fixtures/demo-strain-front-end.yaml`);
    const run = runCircuit(demo, { keepColumns: true });
    const svg = renderFigure(runFigure(demo, fileName, run.transient, run.adcs, run.findings.saturation));
    expect(xmlProblems(svg)).toEqual([]);
    const panels = svg.split('<g class="panel">').slice(1);
    expect(panels.length).toBe(1 + run.adcs.length);
    for (const panel of panels) {
      const frameTop = Number(/<rect class="frame" x="[\d.]+" y="([\d.]+)"/.exec(panel)![1]);
      const legend = /<g class="legend"[^>]*>(.*)<\/g>/.exec(panel)![1];
      // Lowest point of any key: a swatch's bottom edge (y + height, cy + r, y2) or a name's baseline.
      const bottoms = [...legend.matchAll(/<(rect|circle|line|text)\b([^>]*)>/g)].map(([, tag, attrs]) => {
        const at = (name: string) => Number(new RegExp(` ${name}="([-\\d.]+)"`).exec(attrs)?.[1] ?? NaN);
        return tag === 'rect' ? at('y') + at('height') : tag === 'circle' ? at('cy') + at('r') : tag === 'line' ? Math.max(at('y1'), at('y2')) : at('y');
      });
      expect(bottoms.length).toBeGreaterThan(0);
      expect(Math.max(...bottoms)).toBeLessThan(frameTop);
    }
  });

  it('start a noise density panel at zero, on the frame, with no room below it', () => {
    // A density is never negative (a fact of the trade); the stacked plot's axis starts at 0 V/√Hz.
    const noisy = buildCircuit({
      circuit: 'invented-plot-noise',
      parts: { VS: { voltage: 0, between: ['in', 'gnd'] }, R1: { resistor: '10k', between: ['in', 'out'] }, C1: { capacitor: '10n', between: ['out', 'gnd'] } },
      simulate: { duration: '1m' },
      record: ['out'],
      noise: { from: 10, to: '100k' },
    });
    const svg = renderFigure(noiseFigure('invented-plot-noise', 'noise.yaml', noiseAnalysis(noisy, { hints: false }), ['out']));
    expect(xmlProblems(svg)).toEqual([]);
    // The 0 V/√Hz tick label sits on the frame's bottom edge (labels are drawn 4 px below their tick).
    const frame = /<rect class="frame" x="[\d.]+" y="([\d.]+)" width="[\d.]+" height="([\d.]+)"/.exec(svg)!;
    const zero = /<text x="[\d.]+" y="([\d.]+)"[^>]*>0 V\/√Hz</.exec(svg)!;
    expect(Number(zero[1]) - 4).toBeCloseTo(Number(frame[1]) + Number(frame[2]), 6);
  });

  it('label axes with SI prefixes', () => {
    // SI prefixes (BIPM, The International System of Units, 9th edition, table 7).
    expect(siLabel(0.0025, 's')).toBe('2.5 ms');
    expect(siLabel(5e-6, 's')).toBe('5 µs');
    expect(siLabel(-0.5, 'V')).toBe('-500 mV');
    expect(siLabel(1500, 'V')).toBe('1.5 kV');
    expect(siLabel(0, 'V')).toBe('0 V');
  });

  it('has a checker that catches broken XML', () => {
    // Each of these breaks a rule of XML 1.0 section 2.1 (the checker must not pass them).
    expect(xmlProblems('<svg><g></svg>')).not.toEqual([]);
    expect(xmlProblems('<svg a="1" a="2"/>')).not.toEqual([]);
    expect(xmlProblems('<svg>R & D</svg>')).not.toEqual([]);
    expect(xmlProblems('<svg/><svg/>')).not.toEqual([]);
    expect(xmlProblems('<svg a=1/>')).not.toEqual([]);
  });
});
