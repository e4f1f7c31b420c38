import type { ObserverContext, StepObserver } from '../../transient/observer.ts';
import type { AdcSpec } from '../../circuit/adc-spec.ts';
import type { AdcReadout } from './adc-readout.ts';
import type { CodeError } from './adc-report.ts';
import { ClippedRuns } from './clipped-runs.ts';
import { SampleSchedule } from './sample-schedule.ts';
import { Transfer } from './transfer.ts';
import { SeededNoise } from './noise.ts';
import { encode } from './coding.ts';
import { across, valueAt } from '../../parts/solution.ts';

/**
 * One converter watching the run. Its sample instants are landing points of the stepper, so
 * the value it converts is the solver's own solution at each instant, never an interpolation.
 * Every `average` consecutive samples make one reported code. The codes are its output, sized
 * before the run (nothing is allocated per sample); the report's figures (clipped runs, the
 * largest code errors) are gathered as the codes come, keeping nothing else per sample.
 */
export class AdcSampler implements StepObserver {
  private readonly schedule: SampleSchedule;
  private readonly transfer: Transfer;
  private readonly noise: SeededNoise;
  private readonly tolerance: number;
  private readonly rows: number;
  private readonly time: Float64Array;
  private readonly volts: Float64Array;
  private readonly code: Int32Array;
  /** Samples at or before the end of the run. */
  private readonly samples: number;
  /** Acquisition window length; 0 without sampling. */
  private readonly acquisition: number;
  /** Input volts when the window of sample `next` opened (NaN until then). */
  private inputBefore = NaN;
  private readonly clippedLow = new ClippedRuns();
  private readonly clippedHigh = new ClippedRuns();
  /** The code furthest from the ideal code of the input at its instant, and from the input before the window. */
  private largestError: CodeError | undefined;
  private largestErrorBeforeWindow: CodeError | undefined;
  private heldPlus = -1;
  private heldMinus = -1;
  private inputPlus = -1;
  private inputMinus = -1;
  /** Unknowns of the range's ends when they are nodes (-1: a number, or ground). */
  private lowNode = -1;
  private highNode = -1;
  /** Range at the instant being converted, volts. */
  private low = 0;
  private high = 0;
  /** Sum of the LSB of every conversion, for the report's mean LSB. */
  private sumLsb = 0;
  private next = 0;
  private sumVolts = 0;
  private sumCode = 0;
  private sumIdeal = 0;
  private sumIdealBefore = 0;
  private largestHeldError = 0;

  constructor(
    readonly spec: AdcSpec,
    duration: number,
  ) {
    this.schedule = new SampleSchedule(spec.times, duration);
    this.transfer = new Transfer(spec);
    this.noise = new SeededNoise(spec.seed, spec.noise);
    this.tolerance = duration * 1e-12;
    this.rows = Math.floor(this.schedule.count / spec.average);
    this.time = new Float64Array(this.rows);
    this.volts = new Float64Array(this.rows);
    this.code = new Int32Array(this.rows);
    this.acquisition = spec.sampling?.acquisition ?? 0;
    this.samples = this.rows * spec.average;
  }

  bind(context: ObserverContext): void {
    this.heldPlus = context.node(this.spec.held[0]);
    this.heldMinus = context.node(this.spec.held[1]);
    this.inputPlus = context.node(this.spec.input[0]);
    this.inputMinus = context.node(this.spec.input[1]);
    if (typeof this.spec.low === 'string') this.lowNode = context.node(this.spec.low);
    if (typeof this.spec.high === 'string') this.highNode = context.node(this.spec.high);
  }

  /** The range's ends at solution x: numbers, or the reference nodes' voltages. */
  private range(x: Float64Array): void {
    this.low = typeof this.spec.low === 'number' ? this.spec.low : valueAt(x, this.lowNode);
    this.high = typeof this.spec.high === 'number' ? this.spec.high : valueAt(x, this.highNode);
  }

  /** The next sample instant, or with sampling the opening of its window when still ahead. */
  nextInstant(t: number): number {
    for (let k = this.next; k < this.samples; k++) {
      const instant = this.schedule.instant(k);
      const opens = instant - this.acquisition;
      if (k === this.next && this.acquisition > 0 && Number.isNaN(this.inputBefore) && opens > t) return opens;
      if (instant > t) return instant;
    }
    return Infinity;
  }

  accepted(t: number, x: Float64Array): void {
    const count = this.samples;
    if (this.acquisition > 0 && this.next < count && Number.isNaN(this.inputBefore) && t >= this.schedule.instant(this.next) - this.acquisition - this.tolerance) {
      this.inputBefore = this.input(x);
    }
    this.range(x);
    while (this.next < count && this.schedule.instant(this.next) <= t + this.tolerance) this.convert(this.next++, x);
  }

  private input(x: Float64Array): number {
    return across(x, this.inputPlus, this.inputMinus);
  }

  private convert(k: number, x: Float64Array): void {
    const held = across(x, this.heldPlus, this.heldMinus);
    const input = this.input(x);
    const t = this.transfer;
    const { low, high } = this;
    const raw = t.unbounded(held, low, high, this.noise.next());
    const instant = this.schedule.instant(k);
    this.clippedLow.add(instant, raw < 0);
    this.clippedHigh.add(instant, raw > t.top);
    this.sumCode += t.clip(raw);
    this.sumIdeal += t.clip(t.ideal(input, low, high));
    this.sumLsb += t.lsb(low, high);
    // A window that opened before the run (first sample at 0) starts from the operating point.
    if (this.acquisition > 0) this.sumIdealBefore += t.clip(t.ideal(Number.isNaN(this.inputBefore) ? input : this.inputBefore, low, high));
    this.inputBefore = NaN;
    this.sumVolts += held;
    const heldError = Math.abs(held - input);
    if (heldError > this.largestHeldError) this.largestHeldError = heldError;
    const average = this.spec.average;
    if ((k + 1) % average !== 0) return;
    const row = (k + 1) / average - 1;
    const code = encode(Math.round(this.sumCode / average), this.spec.bits, this.spec.coding);
    this.time[row] = instant;
    this.volts[row] = this.sumVolts / average;
    this.code[row] = code;
    this.largestError = furthest(this.largestError, row, instant, code, encode(Math.round(this.sumIdeal / average), this.spec.bits, this.spec.coding));
    if (this.acquisition > 0) this.largestErrorBeforeWindow = furthest(this.largestErrorBeforeWindow, row, instant, code, encode(Math.round(this.sumIdealBefore / average), this.spec.bits, this.spec.coding));
    this.sumVolts = this.sumCode = this.sumIdeal = this.sumIdealBefore = 0;
  }

  /** The codes read, with the report; call after the run. */
  readout(): AdcReadout {
    const { spec, rows, code, time } = this;
    let low = Infinity;
    let high = -Infinity;
    for (let r = 0; r < rows; r++) {
      low = Math.min(low, code[r]);
      high = Math.max(high, code[r]);
    }
    const { largestError, largestErrorBeforeWindow } = this;
    return {
      spec,
      index: Int32Array.from({ length: rows }, (_, r) => r),
      time,
      volts: this.volts,
      code,
      report: {
        name: spec.name,
        lsb: this.reportedLsb(),
        samples: this.samples,
        codes: rows,
        ...(rows > 0 ? { codeRange: [low, high] as const } : {}),
        clippedLow: this.clippedLow.result(),
        clippedHigh: this.clippedHigh.result(),
        ...(largestError !== undefined ? { largestError } : {}),
        ...(largestErrorBeforeWindow !== undefined ? { largestErrorBeforeWindow } : {}),
        largestHeldError: this.largestHeldError,
      },
    };
  }

  /** The LSB of a fixed range; with a ratiometric one, the mean over the conversions (at the last solution seen when there were none). */
  private reportedLsb(): number {
    const samples = this.samples;
    return samples > 0 && (typeof this.spec.low === 'string' || typeof this.spec.high === 'string') ? this.sumLsb / samples : this.transfer.lsb(this.low, this.high);
  }
}

/** `worst`, or reported code `code` at `row` if it is further from `ideal` (the first of equals stays). */
function furthest(worst: CodeError | undefined, row: number, time: number, code: number, ideal: number): CodeError | undefined {
  if (worst !== undefined && Math.abs(code - ideal) <= Math.abs(worst.codes)) return worst;
  return { codes: code - ideal, index: row, time, read: code, ideal };
}
