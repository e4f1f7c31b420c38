import { formatSI, type FrequencyResponse } from '@voltcast/core';
import { colour } from './palette.ts';
import type { Figure, Series } from './series.ts';

const ruleColour = '#555555';

/**
 * `voltcast response --plot`: on a log frequency axis, the gain of every recorded node with,
 * per amplifier, its open-loop gain and the stage's ideal gain 1/β (the two meet where the
 * loop gain is 1) and its crossover marked; then the phases, with the phase of each loop gain
 * T beside the -180° line it keeps its margin from.
 */
export function responseFigure(circuitName: string, fileName: string, response: FrequencyResponse): Figure {
  const f = response.frequency;
  const gain: Series[] = response.nodes.map((n) => ({ kind: 'line', name: n.node, x: f, values: n.dB }));
  const phase: Series[] = response.nodes.map((n) => ({ kind: 'line', name: n.node, x: f, values: n.degrees }));
  const gainColours = response.nodes.map((_, i) => colour(i));
  const phaseColours = [...gainColours];
  response.loops.forEach((loop, i) => {
    const [open, ideal, loopPhase] = [0, 1, 2].map((k) => colour(response.nodes.length + 3 * i + k));
    gain.push({ kind: 'line', name: `${loop.part} open-loop gain`, x: f, values: loop.openLoopDb });
    gain.push({ kind: 'line', name: `${loop.part} ideal gain 1/β`, x: f, values: loop.noiseGainDb, dashed: true });
    phase.push({ kind: 'line', name: `${loop.part} loop gain phase ∠T`, x: f, values: loop.degrees });
    gainColours.push(open, ideal);
    phaseColours.push(loopPhase);
    if (loop.crossover !== null) {
      const rule: Series = { kind: 'rules', name: `${loop.part} crossover ${formatSI(loop.crossover, 'Hz')}, margin ${loop.phaseMargin!.toFixed(1)}°`, x: [loop.crossover] };
      gain.push(rule);
      phase.push(rule);
      gainColours.push(ruleColour);
      phaseColours.push(ruleColour);
    }
  });
  if (response.loops.length > 0) {
    phase.push({ kind: 'line', name: '-180° (no margin left)', x: [f[0], f[f.length - 1]], values: [-180, -180], dashed: true });
    phaseColours.push(ruleColour);
  }
  const input = response.settings.input;
  return {
    axis: 'frequency',
    title: `${circuitName}: frequency response`,
    subtitle: `${fileName}: per 1 V (1 A) at ${input}, linearized at the t = 0 operating point`,
    panels: [
      { title: 'gain', unit: 'dB', series: gain, colours: gainColours },
      { title: 'phase', unit: '°', series: phase, colours: phaseColours },
    ],
  };
}
