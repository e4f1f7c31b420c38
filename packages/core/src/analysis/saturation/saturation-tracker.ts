import type { Circuit } from '../../circuit/circuit.ts';
import { isOpamp, type OpampStatus } from '../../parts/opamp.ts';
import type { ObserverContext, StepObserver } from '../../transient/observer.ts';
import { IntervalBuilder, type RawInterval } from './interval-builder.ts';
import type { CurrentLimitInterval, Interval, SaturationInterval, SaturationOptions, SlewInterval } from './types.ts';

type Watched = {
  readonly name: string;
  readonly status: (x: Float64Array) => OpampStatus;
  readonly high: IntervalBuilder;
  readonly low: IntervalBuilder;
  readonly rising: IntervalBuilder;
  readonly falling: IntervalBuilder;
  readonly current: IntervalBuilder;
  /** Tells a settled rail interval's end as a rail exit. */
  readonly exit: (interval: RawInterval) => void;
  lastOutput: number;
};

/** What the tracker found, per kind. */
export interface SaturationFindings {
  readonly saturation: SaturationInterval[];
  readonly slew: SlewInterval[];
  readonly currentLimit: CurrentLimitInterval[];
}

/** Told of each rail exit (the end of a saturation interval before the run's end), once it is final. */
export type RailExitListener = (part: string, time: number) => void;

/**
 * Watches every op-amp at every accepted step (a StepObserver) and builds intervals at each
 * rail, of slew-rate limiting and of output current limiting. Rail entries and exits are
 * region changes, which the stepper narrows down onto, so their times are exact to the
 * stepper's event resolution; slewing and current limiting are seen at accepted steps.
 * Rail exits, the ringing search's events, are told as soon as they are final: a merge gap
 * after they happen (`exitDelay`), when no return to the rail can merge them away.
 */
export class SaturationTracker implements StepObserver {
  private watched: Watched[] = [];
  private lastT = 0;
  private readonly mergeGap: number;
  private readonly minDuration: number;
  private readonly duration: number;

  constructor(
    circuit: Circuit,
    options: SaturationOptions = {},
    private readonly onRailExit: RailExitListener = () => {},
  ) {
    this.mergeGap = options.mergeGap ?? 2 * circuit.simulate.outputStep;
    this.minDuration = options.minDuration ?? 0;
    this.duration = circuit.simulate.duration;
  }

  /** How long after a rail exit it is told, seconds at most (beyond the step that sees it settle). */
  get exitDelay(): number {
    return this.mergeGap;
  }

  bind(context: ObserverContext): void {
    this.watched = context.devices.filter(isOpamp).map((d) => ({
      name: d.name,
      status: (x: Float64Array) => d.status(x),
      high: new IntervalBuilder(this.mergeGap),
      low: new IntervalBuilder(this.mergeGap),
      rising: new IntervalBuilder(this.mergeGap),
      falling: new IntervalBuilder(this.mergeGap),
      current: new IntervalBuilder(this.mergeGap),
      exit: (i: RawInterval) => {
        if (i.end - i.start >= this.minDuration && i.end < this.duration) this.onRailExit(d.name, i.end);
      },
      lastOutput: 0,
    }));
  }

  accepted(t: number, x: Float64Array): void {
    this.lastT = t;
    for (const w of this.watched) {
      const s = w.status(x);
      const error = Math.abs(s.inputError);
      const out = s.output;
      // Rail intervals watch the clamp level, so that an interval's start value is its limit.
      if (s.rail === 1) w.high.on(t, error, s.limits[1]);
      else w.high.off(t, s.limits[1]);
      if (s.rail === -1) w.low.on(t, error, s.limits[0]);
      else w.low.off(t, s.limits[0]);
      // At a rail the input stage is saturated too, but the output does not move: not slewing.
      const slewing = s.slewing && s.rail === 0;
      if (slewing && s.inputError > 0) w.rising.on(t, error, out);
      else w.rising.off(t, out);
      if (slewing && s.inputError < 0) w.falling.on(t, error, out);
      else w.falling.off(t, out);
      if (s.currentLimited) w.current.on(t, Math.abs(out), out);
      else w.current.off(t, out);
      w.lastOutput = out;
      w.high.settle(t - this.mergeGap, w.exit);
      w.low.settle(t - this.mergeGap, w.exit);
    }
  }

  /** The intervals, sorted by start time; the rail exits not yet told are told first. */
  results(): SaturationFindings {
    const saturation: SaturationInterval[] = [];
    const slew: SlewInterval[] = [];
    const currentLimit: CurrentLimitInterval[] = [];
    const end = this.lastT;
    for (const w of this.watched) {
      // No step follows: every exit is final.
      for (const builder of [w.high, w.low]) builder.settle(end, w.exit);
      const base = (i: RawInterval): Interval => ({ part: w.name, start: i.start, end: i.end, duration: i.end - i.start, fragments: i.fragments });
      for (const [rail, builder] of [['high', w.high], ['low', w.low]] as const) {
        for (const i of builder.finish(end, w.lastOutput, this.minDuration)) {
          saturation.push({ ...base(i), rail, limit: i.startValue, worstInputError: i.worst });
        }
      }
      for (const [direction, builder] of [['rising', w.rising], ['falling', w.falling]] as const) {
        for (const i of builder.finish(end, w.lastOutput, this.minDuration)) {
          const duration = i.end - i.start;
          slew.push({ ...base(i), direction, averageRate: duration > 0 ? (i.endValue - i.startValue) / duration : 0 });
        }
      }
      for (const i of w.current.finish(end, w.lastOutput, this.minDuration)) currentLimit.push({ ...base(i), worstOutput: i.worst });
    }
    const byStart = (a: Interval, b: Interval): number => a.start - b.start || a.part.localeCompare(b.part);
    return { saturation: saturation.sort(byStart), slew: slew.sort(byStart), currentLimit: currentLimit.sort(byStart) };
  }
}
