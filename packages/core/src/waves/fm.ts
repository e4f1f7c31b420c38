import { quantities } from '../units/quantity.ts';
import { formatSI } from '../units/format.ts';
import type { Wave, WaveKind } from './wave.ts';

/**
 * A frequency-modulated sine: offset + amplitude·sin(θ(t)), whose instantaneous frequency
 * θ'(t)/2π is carrier + deviation·sin(2π·rate·t). The phase is that frequency integrated in
 * closed form, θ(t) = 2π·carrier·t + (deviation/rate)·(1 − cos(2π·rate·t)) + phase, so it
 * never drifts however the stepper visits t. Smooth: no corners.
 */
export class FmWave implements Wave {
  private readonly carrierOmega: number;
  private readonly rateOmega: number;
  /** Peak phase deviation, deviation/rate (the modulation index), radians. */
  private readonly index: number;
  private readonly phaseRadians: number;
  constructor(
    carrier: number,
    deviation: number,
    rate: number,
    readonly amplitude: number,
    readonly offset: number,
    /** Degrees. */
    phase: number,
  ) {
    this.carrierOmega = 2 * Math.PI * carrier;
    this.rateOmega = 2 * Math.PI * rate;
    this.index = deviation / rate;
    this.phaseRadians = (phase * Math.PI) / 180;
  }

  value(t: number): number {
    const theta = this.carrierOmega * t + this.index * (1 - Math.cos(this.rateOmega * t)) + this.phaseRadians;
    return this.offset + this.amplitude * Math.sin(theta);
  }

  nextCorner(): number {
    return Infinity;
  }

  /** The period at the highest instantaneous frequency. */
  timescale(): number {
    return (2 * Math.PI) / (this.carrierOmega + this.index * this.rateOmega);
  }

  holdsFrom(): number {
    return Infinity;
  }
}

/** `fm: { carrier: 10k, deviation: 2k, rate: 200, amplitude: 1, offset: 0, phase: 0 }`. */
export const fm: WaveKind = {
  key: 'fm',
  summary: 'frequency-modulated sine: `carrier`, `deviation`, `rate` (the modulating tone), `amplitude`, optional `offset`, `phase` (degrees)',
  read(main, _options, _context, quantity): Wave {
    const keys = main.map();
    const example = 'write fm: { carrier: 10k, deviation: 2k, rate: 200, amplitude: 1 }';
    const carrier = keys.need('carrier', example)?.number(quantities.frequency, { above: 0 }) ?? NaN;
    const deviationValue = keys.need('deviation', example);
    const deviation = deviationValue?.number(quantities.frequency, { min: 0 }) ?? NaN;
    const rate = keys.need('rate', example)?.number(quantities.frequency, { above: 0 }) ?? NaN;
    const amplitude = keys.need('amplitude', example)?.number(quantity) ?? NaN;
    const offset = keys.numberOr('offset', quantity, 0);
    const phase = keys.numberOr('phase', quantities.angle, 0);
    if (deviation >= carrier) deviationValue?.fail(`the deviation (${formatSI(deviation, 'Hz')}) must be below the carrier (${formatSI(carrier, 'Hz')})`, 'the instantaneous frequency, carrier ± deviation, must stay above 0');
    keys.finish();
    return new FmWave(carrier, deviation, rate, amplitude, offset, phase);
  },
};
