import { examineWindow, type EventCluster } from './examine-window.ts';
import { SlidingRows } from './sliding-rows.ts';
import { SpectralPeak } from './spectral-peak.ts';
import type { ReportWarning, RingingEvent, RingingFinding, RingingOptions } from './types.ts';

/** Rows examined after each event, at most: about 650 cycles at 50 rows per period. */
export const WINDOW_ROWS = 32_768;
/** Repeats of a finding: same node, frequency within this fraction. */
const SAME_FREQUENCY = 0.05;

/** What the ringing search found. */
export interface RingingResult {
  ringing: RingingFinding[];
  warnings: ReportWarning[];
  /** Event clusters after which ringing was looked for. */
  events: number;
}

/** The cluster whose window is being filled. */
interface OpenCluster {
  first: number;
  last: number;
  readonly causes: string[];
  /** First row of the window (the row at or after `last`), once that row has come; else -1. */
  from: number;
}

/**
 * The ringing analysis as rows arrive, in memory that does not grow with the run. Events
 * (stimulus corners, rail exits) less than `eventGap` apart fold into one cluster; after the
 * cluster's last event, a window of at most `windowRows` rows (or fewer, up to the row at the
 * next cluster's first event) is examined on every node, then let go. Only the rows a window
 * may still need are held.
 *
 * Events may be told in any order, but each before the search passes its time: `row` takes
 * the `frontier` before which every event has been told (rail exits are known for sure only
 * a little after they happen; `lagRows` says how many rows at most).
 */
export class RingingSearch {
  private readonly rows: SlidingRows;
  private readonly before: Float64Array;
  /** Told, not yet folded into a cluster; sorted by time. */
  private readonly pending: RingingEvent[] = [];
  private open: OpenCluster | null = null;
  /** Per node: index in `ringing` of its latest finding, -1 for none. */
  private readonly latest: Int32Array;
  private readonly ringing: RingingFinding[] = [];
  private readonly warnings: ReportWarning[] = [];
  private readonly spectrum = new SpectralPeak();
  private clusters = 0;
  /** Every event before this time has been told. */
  private frontier = -Infinity;
  private readonly gap: number;
  private readonly window: number;
  private readonly margin: number;
  /** Times closer than this to a row are at that row. */
  private readonly eps: number;
  /** Wall time spent examining windows, seconds. */
  examineSeconds = 0;

  constructor(
    private readonly nodes: readonly string[],
    private readonly outputStep: number,
    private readonly options: RingingOptions = {},
    lagRows = 0,
  ) {
    this.gap = options.eventGap ?? 4 * outputStep;
    this.window = options.windowRows ?? WINDOW_ROWS;
    this.eps = outputStep * 1e-6;
    this.margin = lagRows + 8;
    // A window, the rows until no event can still join its cluster, and the lag; twice that,
    // so that making room moves each row about once.
    this.rows = new SlidingRows(nodes.length, 2 * (this.window + Math.ceil(this.gap / outputStep) + this.margin + 8));
    this.before = new Float64Array(nodes.length);
    this.latest = new Int32Array(nodes.length).fill(-1);
  }

  /** An instant after which to look for ringing; told before the search's frontier passes it. */
  event(e: RingingEvent): void {
    if (e.time < this.frontier) throw new Error(`RingingSearch: the event at ${e.time} s (${e.cause}) was told after the frontier passed it (${this.frontier} s)`);
    let at = this.pending.length;
    while (at > 0 && this.pending[at - 1].time > e.time) at--;
    this.pending.splice(at, 0, e);
  }

  /** The next output row (values in `nodes` order); every event before `frontier` has been told. */
  row(time: number, values: ArrayLike<number>, frontier: number): void {
    this.frontier = Math.max(this.frontier, frontier);
    if (this.rows.full) {
      const open = this.open === null ? Infinity : this.windowStart(this.open);
      this.rows.dropBefore(Math.min(open, this.rows.end - this.margin));
    }
    this.rows.push(time, values);
    // Most rows settle nothing: no window open, no event due.
    if (this.open !== null || (this.pending.length > 0 && this.pending[0].time < frontier)) this.advance(this.frontier, false);
  }

  /** After the last row and the last event: examine what is still open. */
  finish(): RingingResult {
    this.advance(Infinity, true);
    const ringing = [...this.ringing].sort((a, b) => a.start - b.start || a.node.localeCompare(b.node));
    return { ringing, warnings: this.warnings, events: this.clusters };
  }

  /** Fold the events and close the windows that the rows and events so far settle. */
  private advance(frontier: number, done: boolean): void {
    const rows = this.rows;
    for (;;) {
      const next = this.pending.length > 0 && this.pending[0].time < frontier ? this.pending[0] : undefined;
      const open = this.open;
      if (open !== null) {
        if (next !== undefined && next.time - open.last < this.gap) {
          open.last = next.time;
          open.from = -1;
          if (!open.causes.includes(next.cause)) open.causes.push(next.cause);
          this.pending.shift();
          continue;
        }
        const from = this.windowStart(open);
        const full = from + this.window;
        // The window ends at the row of the next cluster's first event, or full; it is not
        // full before no event can join the cluster any more.
        let to: number;
        if (next !== undefined && rows.lastTime >= next.time - this.eps) to = Math.min(rows.rowAtOrAfter(next.time, this.eps) + 1, full);
        else if (rows.end >= full && (next !== undefined || done || frontier >= open.last + this.gap)) to = full;
        else if (done) to = rows.end;
        else return;
        this.examine(open, from, to);
        this.open = null;
        continue;
      }
      if (next === undefined || (rows.lastTime < next.time - this.eps && !done)) return;
      // The value before the event: the row at its time, or else the row before it.
      const at = Math.min(rows.rowAtOrAfter(next.time, this.eps), rows.end - 1);
      const i = rows.at(at);
      const beforeRow = rows.time[i] > next.time + this.eps ? Math.max(0, at - 1) : at;
      const held = rows.at(beforeRow);
      for (let p = 0; p < this.nodes.length; p++) this.before[p] = rows.columns[p][held];
      this.open = { first: next.time, last: next.time, causes: [next.cause], from: -1 };
      this.pending.shift();
      this.clusters++;
    }
  }

  /** The window's first row: the row at or after the cluster's last event (`end` until it comes). */
  private windowStart(open: OpenCluster): number {
    if (open.from >= 0) return open.from;
    const from = this.rows.rowAtOrAfter(open.last, this.eps);
    if (from < this.rows.end) open.from = from;
    return from;
  }

  private examine(open: OpenCluster, from: number, to: number): void {
    // Date.now: core has no timer of finer grain in every host; over many windows the rounding averages out.
    const started = Date.now();
    const cluster: EventCluster = { first: open.first, last: open.last, cause: open.causes.join(', ') };
    const a = this.rows.at(from);
    const b = a + Math.max(0, to - from);
    this.nodes.forEach((node, p) => {
      const { finding, warning } = examineWindow(node, this.rows.time, this.rows.columns[p], a, b, this.before[p], cluster, this.outputStep, this.options, this.spectrum);
      if (finding !== undefined) {
        const latest = this.latest[p] >= 0 ? this.ringing[this.latest[p]] : undefined;
        if (latest !== undefined && Math.abs(latest.frequency - finding.frequency) <= SAME_FREQUENCY * latest.frequency && latest.sustained === finding.sustained) {
          this.ringing[this.latest[p]] = { ...latest, repeats: latest.repeats + 1 };
          return;
        }
        this.latest[p] = this.ringing.length;
        this.ringing.push(finding);
      }
      if (warning !== undefined) this.warnings.push(warning);
    });
    this.examineSeconds += (Date.now() - started) / 1000;
  }
}
