import { readFileSync } from 'node:fs';
import { describe, expect, it } from 'vitest';
import { noiseAnalysis, parseCircuit, runCircuit } from '../src/index.ts';
import { averagedVariance, samplesToAverage } from '../src/analysis/noise/averaging.ts';
import { frequencyGrid } from '../src/small-signal/frequency-grid.ts';

const fixture = new URL('../../../fixtures/noise-leaf-thermopile.yaml', import.meta.url);

describe('noise at a converter', () => {
  it('the spread of the codes of a run with noise agrees with the analysis\'s lsbRms within 10%', () => {
    const circuit = parseCircuit(readFileSync(fixture, 'utf8'));
    const [adc] = noiseAnalysis(circuit, { hints: false }).adc;
    // 2000 samples; the run's noise is flat to the band's end (50 kHz), as the analysis integrates.
    const short = { ...circuit, simulate: { ...circuit.simulate, duration: 0.2 } };
    const codes = runCircuit(short, { noise: { seed: 1 } }).adcs[0].code;
    let sum = 0;
    let squares = 0;
    for (const code of codes) {
      sum += code;
      squares += code * code;
    }
    const mean = sum / codes.length;
    const spread = Math.sqrt(squares / codes.length - mean * mean);
    expect(adc.lsbRms).toBeGreaterThan(3);
    expect(Math.abs(spread / adc.lsbRms - 1)).toBeLessThan(0.1);
  });

  it('says which part dominates and how many samples to average', () => {
    const result = noiseAnalysis(parseCircuit(readFileSync(fixture, 'utf8')));
    const adc = result.nodes.find((n) => n.node === 'adc')!;
    expect(adc.contributions[0]).toMatchObject({ part: 'RPILE', source: 'thermal' });
    expect(adc.hints[0].text).toMatch(/^RPILE \(47 kΩ\) makes 39% of the noise power at adc/);
    expect(result.adc[0].averagingFor1Lsb).toBeGreaterThan(1);
  });
});

describe('averaging N samples (moving-average response, a textbook identity)', () => {
  // Flat density S from near 0 to the Nyquist rate: the mean of N samples has variance S·(rate/2)/N,
  // since the moving average's squared response integrates to 1/N over a Nyquist band.
  const rate = 1000;
  const f = frequencyGrid(1e-3, rate / 2, 200);
  const s = new Float64Array(f.length).fill(1e-12);

  it.each([1, 4, 16, 100])('white noise: the mean of %i samples has 1/N of the variance, within 1%', (count) => {
    expect(averagedVariance(f, s, rate, count) / ((1e-12 * rate) / 2 / count)).toBeCloseTo(1, 2);
  });

  it('finds the fewest samples whose mean spans at most ±1 LSB in 6.6 σ', () => {
    // σ² = 5e-10 V², LSB 10 µV: N ≥ (6.6·σ / 2 LSB)² = 5e-10·(3.3/1e-5)² = 54.45, so 55.
    expect(samplesToAverage(f, s, rate, 1e-5, 1e6)).toBe(55);
  });
});
