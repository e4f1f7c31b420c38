import type { Circuit } from '../../circuit/circuit.ts';
import type { AdcSpec } from '../../circuit/adc-spec.ts';
import { noiseBandOf } from '../../circuit/noise-band.ts';
import { noiseSweep, type NoiseOutput, type NoiseSweep } from '../../small-signal/noise-sweep.ts';
import { PEAK_TO_PEAK_SIGMAS, samplesToAverage } from './averaging.ts';
import { bandPower } from './band-power.ts';
import { noiseHints } from './noise-hints.ts';
import type { AdcNoise, NoiseAnalysis, NoiseBandUsed, NoiseContribution, NoiseOptions, OutputNoiseFigures } from './types.ts';

export function noiseAnalysis(circuit: Circuit, options: NoiseOptions = {}): NoiseAnalysis {
  const band = noiseBandOf(circuit, options);
  const temperature = options.temperature ?? circuit.simulate.temperature;
  const outputs = noiseOutputs(circuit);
  const sweep = noiseSweep(circuit, outputs, { ...band, temperature });
  const nodes = sweep.outputs.map((output, k): OutputNoiseFigures => {
    const figures = outputFigures(sweep, k);
    if (options.hints === false) return figures;
    const reanalyse = (changed: Circuit): number => Math.sqrt(sumOfPowers(noiseSweep(changed, [outputs[k]], { ...band, temperature }), 0));
    const hints = noiseHints(circuit, { node: figures.node, rms: figures.rms, largest: figures.contributions[0], frequency: sweep.frequency, power: totalPower(sweep, k) }, reanalyse);
    return { ...figures, hints };
  });
  const adc = circuit.adcs.map((spec) => adcNoise(spec, nodes[outputs.findIndex((o) => o.name === outputName(spec))], sweep.frequency, band, sweep.operatingPoint));
  return { temperature, band, frequency: sweep.frequency, nodes, adc, operatingPoint: sweep.operatingPoint, stats: sweep.stats };
}

function outputName(spec: AdcSpec): string {
  return spec.input[1] === 'gnd' ? spec.input[0] : `${spec.input[0]} - ${spec.input[1]}`;
}

/** Every recorded node, then each converter input that is not one of them. */
function noiseOutputs(circuit: Circuit): NoiseOutput[] {
  const outputs: NoiseOutput[] = circuit.recorded.map((node) => ({ name: node, plus: node, minus: 'gnd' }));
  for (const spec of circuit.adcs) {
    const name = outputName(spec);
    if (!outputs.some((o) => o.name === name)) outputs.push({ name, plus: spec.input[0], minus: spec.input[1] });
  }
  return outputs;
}

function totalPower(sweep: NoiseSweep, k: number): Float64Array {
  const total = new Float64Array(sweep.frequency.length);
  for (const power of sweep.outputs[k].power) for (let i = 0; i < total.length; i++) total[i] += power[i];
  return total;
}

/** Noise power at output `k` over the band: the sum of each generator's, so that the shares add up. */
function sumOfPowers(sweep: NoiseSweep, k: number): number {
  return sweep.outputs[k].power.reduce((sum, power) => sum + bandPower(sweep.frequency, power), 0);
}

function outputFigures(sweep: NoiseSweep, k: number): OutputNoiseFigures {
  const output = sweep.outputs[k];
  const total = sumOfPowers(sweep, k);
  const contributions: NoiseContribution[] = sweep.generators
    .map((g, j) => {
      const power = bandPower(sweep.frequency, output.power[j]);
      return { part: g.part, source: g.source, rms: Math.sqrt(power), share: total > 0 ? power / total : 0, density: output.power[j].map(Math.sqrt) };
    })
    .sort((a, b) => b.rms - a.rms);
  return { node: output.output.name, density: totalPower(sweep, k).map(Math.sqrt), rms: Math.sqrt(total), contributions, hints: [] };
}

/** A range end in volts: a number, or a reference node's voltage at the operating point. */
function rangeEnd(end: number | string, operatingPoint: ReadonlyMap<string, number>): number {
  return typeof end === 'number' ? end : (operatingPoint.get(end) ?? 0);
}

function adcNoise(spec: AdcSpec, output: OutputNoiseFigures, frequency: Float64Array, band: NoiseBandUsed, operatingPoint: ReadonlyMap<string, number>): AdcNoise {
  const fullScale = rangeEnd(spec.high, operatingPoint) - rangeEnd(spec.low, operatingPoint);
  const lsb = fullScale / 2 ** spec.bits;
  const rmsVolts = output.rms;
  const power = output.density.map((d) => d * d);
  // An average longer than the band's slowest period would rest on noise the band leaves out.
  const averagingFor1Lsb = 'rate' in spec.times ? samplesToAverage(frequency, power, spec.times.rate, lsb, Math.max(1, Math.floor(spec.times.rate / band.from))) : null;
  return {
    name: spec.name,
    node: output.node,
    rmsVolts,
    lsb,
    lsbRms: rmsVolts / lsb,
    peakToPeakLsb: (PEAK_TO_PEAK_SIGMAS * rmsVolts) / lsb,
    // A converter resolves no more than its own bits, however quiet its input (and a noiseless input stays finite).
    noiseFreeBits: Math.min(spec.bits, Math.log2(fullScale / (PEAK_TO_PEAK_SIGMAS * rmsVolts))),
    averagingFor1Lsb,
    beyondBand: beyondBand(frequency, power, rmsVolts ** 2),
    converterLsbRms: spec.noise,
  };
}

/** ∫ from the band's end to infinity of the density's last power law, over `inBand`; null when it does not converge. */
function beyondBand(f: Float64Array, power: Float64Array, inBand: number): number | null {
  const n = f.length - 1;
  const [s0, s1] = [power[n - 1], power[n]];
  if (!(s1 > 0) || !(inBand > 0)) return 0;
  const slope = Math.log(s1 / s0) / Math.log(f[n] / f[n - 1]);
  return slope < -1.05 ? (s1 * f[n]) / (-slope - 1) / inBand : null;
}
