import { formatSI } from '../units/format.ts';

/**
 * The value of column `name` at time `t`, interpolated linearly between the two rows around it
 * (exact at a row time). Throws when `name` is not a kept column or `t` lies outside the run.
 */
export function interpolatedValue(time: Float64Array, columns: ReadonlyMap<string, Float64Array>, name: string, t: number): number {
  if (time.length === 0) throw new RangeError(`valueAt('${name}'): the run kept no rows; run it without keepColumns: false`);
  const column = columns.get(name);
  if (column === undefined) throw new RangeError(`valueAt('${name}'): no recorded node of that name; the recorded nodes are ${[...columns.keys()].join(', ')}`);
  const last = time.length - 1;
  if (!(t >= time[0] && t <= time[last])) throw new RangeError(`valueAt('${name}', ${t}): the time lies outside the run, ${formatSI(time[0], 's')} to ${formatSI(time[last], 's')}`);
  // Binary search for the rows time[lo] <= t <= time[lo + 1].
  let lo = 0;
  let hi = last;
  while (hi - lo > 1) {
    const mid = (lo + hi) >> 1;
    if (time[mid] <= t) lo = mid;
    else hi = mid;
  }
  if (t === time[lo] || lo === last) return column[lo];
  return column[lo] + ((column[lo + 1] - column[lo]) * (t - time[lo])) / (time[lo + 1] - time[lo]);
}
