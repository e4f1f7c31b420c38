import type { MapReader, ValueReader } from '../reading/reader.ts';
import { quantities } from '../units/quantity.ts';
import { formatSI } from '../units/format.ts';
import { stampConductance } from './stamps.ts';
import { periodIndex } from '../waves/periodic.ts';
import type { Binder, ComplexMna, Device, Link, Mna, StepInfo } from './device.ts';
import type { PartKind, PartSpecBase } from './part-kind.ts';
import { nodeOf, readBetween } from './pins.ts';

/** Resistance of an open switch when the file does not say: high, yet well conditioned. */
export const defaultOffResistance = 1e9;

/**
 * When a switch conducts. Each interval `(on, off]` is a time span in which it is closed
 * (with `inverted`, open); the intervals repeat every `period` from `origin` when the period
 * is finite. The state is evaluated inside a step, never at its end, so that a step ending
 * exactly on an edge sees the state of the span it covers.
 */
export interface SwitchSchedule {
  /** Ascending edge offsets from `origin`, pairs [on, off, on, off, ...], all below `period`. */
  readonly edges: readonly number[];
  readonly origin: number;
  /** Infinity when the intervals do not repeat. */
  readonly period: number;
  /** True when the intervals are the open ones (`open:` in a file). */
  readonly inverted: boolean;
}

export interface SwitchSpec extends PartSpecBase {
  readonly kind: 'switch';
  /** Ohms when closed, > 0. */
  readonly onResistance: number;
  /** Ohms when open, > on resistance. */
  readonly offResistance: number;
  readonly schedule: SwitchSchedule;
}

/**
 * `switch: 50` (on resistance) or `switch: { on: 50, off: 1G }`, `between: [a, b]`, and
 * when it conducts: `closed: [[on, off], ...]` or `open: [[from, to], ...]`, optional
 * `every: period`. Every edge is a corner the stepper lands on and damps after.
 */
export const timedSwitch: PartKind<SwitchSpec> = {
  key: 'switch',
  summary: 'time-controlled switch: `switch: 50` or `{ on: 50, off: 1G }`, `between: [a, b]`, `closed:` or `open:` [[from, to], ...], optional `every: period`',
  read: (name, main, options) => {
    const { onResistance, offResistance } = readResistances(main);
    return { kind: 'switch', name, onResistance, offResistance, schedule: readSchedule(options), pins: readBetween(options) };
  },
  create: (spec) => new SwitchDevice(spec),
  timescale: (spec) => shortestInterval(spec.schedule),
  holdsFrom: ({ schedule: { edges, origin, period } }) => (period < Infinity ? Infinity : edges.length > 0 ? origin + edges[edges.length - 1] : 0),
};

/** The shortest time the switch stays in one state. */
function shortestInterval({ edges, period }: SwitchSchedule): number {
  let shortest = period < Infinity && edges.length > 0 ? period - edges[edges.length - 1] + edges[0] : Infinity;
  for (let i = 1; i < edges.length; i++) shortest = Math.min(shortest, edges[i] - edges[i - 1]);
  return shortest;
}

function readResistances(main: ValueReader): { onResistance: number; offResistance: number } {
  const positive = { above: 0 };
  if (main.kind() !== 'map') return { onResistance: main.number(quantities.resistance, positive), offResistance: defaultOffResistance };
  const m = main.map();
  const onResistance = m.need('on', 'write `on: 50`, the resistance when closed')?.number(quantities.resistance, positive) ?? NaN;
  const offResistance = m.numberOr('off', quantities.resistance, defaultOffResistance, positive);
  if (offResistance <= onResistance) (m.get('off') ?? main).fail(`the off resistance (${formatSI(offResistance, 'Ω')}) must be above the on resistance (${formatSI(onResistance, 'Ω')})`, 'an open switch conducts less than a closed one');
  m.finish();
  return { onResistance, offResistance };
}

function readSchedule(options: MapReader): SwitchSchedule {
  const closed = options.get('closed');
  const open = options.get('open');
  const every = options.get('every');
  const period = every?.number(quantities.time, { above: 0 }) ?? Infinity;
  const list = closed ?? open;
  if (closed !== undefined && open !== undefined) open.fail('a switch takes `closed:` or `open:`, not both', 'keep one: the switch is in the other state outside the listed intervals');
  if (list === undefined) {
    options.fail('a switch needs `closed:` or `open:`, a list of [from, to] intervals', 'write e.g. `closed: [[1m, 2m]]`');
    return { edges: [], origin: 0, period: Infinity, inverted: false };
  }
  const edges: number[] = [];
  const intervals = list.list();
  if (intervals.length === 0 && list.kind() === 'list') list.fail('the interval list is empty', 'write e.g. [[1m, 2m]]');
  for (const [i, item] of intervals.entries()) {
    const pair = item.list();
    if (pair.length !== 2) {
      if (item.kind() === 'list') item.fail(`interval ${i + 1} needs two times, [from, to], found ${pair.length}`, 'write each interval as [from, to], e.g. [1m, 2m]');
      continue;
    }
    const [from, to] = pair.map((v) => v.number(quantities.time, { min: 0 }));
    const previous = edges.length > 0 ? edges[edges.length - 1] : -Infinity;
    if (!(to > from)) item.fail(`interval ${i + 1} ends (${formatSI(to, 's')}) before it starts (${formatSI(from, 's')})`, 'write [from, to] with to after from');
    else if (!(from > previous)) item.fail(`interval ${i + 1} starts before the previous one ends (${formatSI(previous, 's')})`, 'list the intervals in time order, apart from each other');
    else if (!(to < period)) item.fail(`interval ${i + 1} ends at or after the period every: ${formatSI(period, 's')}`, 'every interval must end inside one period');
    else edges.push(from, to);
  }
  return { edges, origin: 0, period, inverted: open !== undefined && closed === undefined };
}

/** Whether the switch conducts at time `t` (inside a span, not on an edge). */
export function isClosed(schedule: SwitchSchedule, t: number): boolean {
  const { edges, origin, period } = schedule;
  let u = t - origin;
  if (period < Infinity && t >= origin) u = t - (origin + periodIndex(t, origin, period) * period);
  // The last edge at or before u: an odd count of edges up to u (the `on` of a pair) means inside.
  let lo = 0;
  let hi = edges.length;
  while (lo < hi) {
    const mid = (lo + hi) >> 1;
    if (edges[mid] < u) lo = mid + 1;
    else hi = mid;
  }
  const inside = lo % 2 === 1;
  return inside !== schedule.inverted;
}

/** The first edge strictly after `t`, or Infinity. */
export function nextEdge(schedule: SwitchSchedule, t: number): number {
  const { edges, origin, period } = schedule;
  if (edges.length === 0) return Infinity;
  if (period === Infinity) {
    // Binary search: a converter's listed instants can make thousands of edges.
    let lo = 0;
    let hi = edges.length;
    while (lo < hi) {
      const mid = (lo + hi) >> 1;
      if (origin + edges[mid] > t) hi = mid;
      else lo = mid + 1;
    }
    return lo < edges.length ? origin + edges[lo] : Infinity;
  }
  const k = t < origin ? 0 : periodIndex(t, origin, period);
  for (let j = k; j <= k + 1; j++) {
    const start = origin + j * period;
    for (let i = 0; i < edges.length; i++) if (start + edges[i] > t) return start + edges[i];
  }
  return Infinity;
}

/**
 * A resistance that steps between two values on a schedule. Its conductance changes only at
 * its edges, which are corners: the stepper lands on them and rebuilds the step layer of the
 * matrix after each, so the switch stamps there, evaluated in the middle of the step. The
 * circuit stays linear: one solve per step, one factorization per state and step size.
 */
class SwitchDevice implements Device {
  readonly kind = 'switch';
  readonly name: string;
  private a = -1;
  private b = -1;
  /** Where to look at the operating point: just before 0, the state the run starts from. */
  private readonly beforeStart: number;
  constructor(private readonly spec: SwitchSpec) {
    this.name = spec.name;
    const edges = spec.schedule.edges;
    let shortest = spec.schedule.period;
    for (let i = 1; i < edges.length; i++) shortest = Math.min(shortest, edges[i] - edges[i - 1]);
    this.beforeStart = -1e-6 * (Number.isFinite(shortest) ? shortest : 1);
  }
  bind(binder: Binder): void {
    this.a = binder.node(nodeOf(this.spec.pins, 'a'));
    this.b = binder.node(nodeOf(this.spec.pins, 'b'));
  }
  stampStep(m: Mna, step: StepInfo): void {
    this.stampState(m, step.method === 'dc' ? this.beforeStart : step.t - step.h / 2);
  }
  /** The state the operating point was found in, the one the run starts from. */
  stampSmallSignal(m: ComplexMna): void {
    this.stampState(m, this.beforeStart);
  }
  private stampState(m: Mna, when: number): void {
    const closed = isClosed(this.spec.schedule, when);
    stampConductance(m, this.a, this.b, 1 / (closed ? this.spec.onResistance : this.spec.offResistance));
  }
  nextCorner(t: number): number {
    return nextEdge(this.spec.schedule, t);
  }
  links(): readonly Link[] {
    return [{ a: this.a, b: this.b, kind: 'conductive' }];
  }
}
