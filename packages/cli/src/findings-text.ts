import { formatSI, type AdcReport, type CodeError, type Findings, type ReportWarning } from '@voltcast/core';

/** One line of the timeline: when, what kind, on which part or node, the figures, and a hint. */
interface Entry {
  readonly time: number;
  readonly cells: readonly [start: string, end: string, kind: string, where: string, what: string];
  readonly hint?: string;
}

const percent = (fraction: number): string => `${(fraction * 100).toFixed(1)}%`;
const seconds = (t: number): string => formatSI(t, 's');

/**
 * The findings section of report.txt: every finding in one table sorted by time, with SI
 * prefixes; each textbook hint printed under the first finding it applies to (the same hint is
 * not repeated for every period of a clipped sine). Warnings follow.
 */
export function findingsText(findings: Findings): string[] {
  const entries = timeline(findings);
  const lines = ['findings (sorted by time)'];
  if (entries.length === 0) lines.push('  none: no rail, slew or current limiting, no ringing, no ADC clipping');
  else {
    const table = align([['start', 'end', 'kind', 'where', 'what'], ...entries.map((e) => e.cells)]);
    lines.push(table[0]);
    const printed = new Set<string>();
    entries.forEach((entry, i) => {
      lines.push(table[i + 1]);
      if (entry.hint !== undefined && !printed.has(entry.hint)) {
        printed.add(entry.hint);
        lines.push(...wrap(`hint: ${entry.hint}`, 100, '      '));
      }
    });
  }
  if (findings.warnings.length > 0) {
    lines.push('', 'warnings');
    for (const w of findings.warnings) lines.push(`  ${w.kind}: ${w.message}`);
  }
  return lines;
}

/** The few findings worth a line on screen after a run. */
export function topFindings(findings: Findings, count = 5): string[] {
  const lines: string[] = [];
  for (const r of [...findings.ringing].sort((a, b) => a.dampingRatio - b.dampingRatio)) {
    const again = r.repeats > 0 ? ` (and after ${r.repeats} later event${r.repeats > 1 ? 's' : ''})` : '';
    lines.push(`${r.node} ${r.sustained ? 'oscillates' : 'rings'} at ${formatSI(r.frequency, 'Hz')}, damping ratio ${r.dampingRatio.toFixed(3)}, from ${seconds(r.start)}${again}`);
  }
  const groups = new Map<string, { count: number; total: number; first: number }>();
  const add = (key: string, start: number, duration: number): void => {
    const g = groups.get(key) ?? { count: 0, total: 0, first: start };
    groups.set(key, { count: g.count + 1, total: g.total + duration, first: Math.min(g.first, start) });
  };
  for (const s of findings.saturation) add(`${s.part} at the ${s.rail} rail`, s.start, s.duration);
  for (const s of findings.slew) add(`${s.part} slew-limited (${s.direction})`, s.start, s.duration);
  for (const c of findings.currentLimit) add(`${c.part} at its output current limit`, c.start, c.duration);
  for (const [what, g] of groups) lines.push(`${what} ${g.count} time${g.count > 1 ? 's' : ''}, ${seconds(g.total)} in all, first at ${seconds(g.first)}`);
  for (const a of findings.adc) {
    const starved = acquisitionShortfall(a);
    if (starved !== undefined) lines.push(`ADC ${a.name} reads up to ${Math.abs(starved.codes)} codes off the input: acquisition too short for the source`);
    const clipped = a.clippedLow.count + a.clippedHigh.count;
    if (clipped > 0) lines.push(`ADC ${a.name}: ${clipped} clipped sample${clipped > 1 ? 's' : ''} (${a.clippedLow.count} low, ${a.clippedHigh.count} high)`);
  }
  const more = lines.length - count;
  if (lines.length === 0) lines.push('none (details in report.txt)');
  const shown = lines.slice(0, count);
  if (more > 0) shown.push(`${more} more in report.txt`);
  if (findings.warnings.length > 0) shown.push(`${findings.warnings.length} warning${findings.warnings.length > 1 ? 's' : ''} in report.txt`);
  return shown;
}

/**
 * A converter whose sampling capacitor has not settled to within 1/2 LSB of its input at the
 * sample instant (common practice settling criterion), with its worst error against the
 * input as it stood before the window. A moving signal alone does not count: the held value
 * then still matches the input at the instant.
 */
function acquisitionShortfall(a: AdcReport): CodeError | undefined {
  return a.largestHeldError > a.lsb / 2 ? a.largestErrorBeforeWindow : undefined;
}

function timeline(findings: Findings): Entry[] {
  const entries: Entry[] = [];
  for (const s of findings.saturation) {
    const asked = s.overdrive !== undefined ? `, asked for ~${formatSI(Math.sign(s.limit) * (Math.abs(s.limit) + s.overdrive), 'V')}` : '';
    entries.push({
      time: s.start,
      cells: [seconds(s.start), seconds(s.end), `${s.rail} rail`, s.part, `held at ${formatSI(s.limit, 'V')} for ${seconds(s.duration)}, input error up to ${formatSI(s.worstInputError, 'V')}${asked}`],
      hint: s.hint?.text,
    });
  }
  for (const s of findings.slew) {
    entries.push({ time: s.start, cells: [seconds(s.start), seconds(s.end), `slew ${s.direction}`, s.part, `${seconds(s.duration)} at ${formatSI(s.averageRate, 'V/s')} on average`] });
  }
  for (const c of findings.currentLimit) {
    entries.push({ time: c.start, cells: [seconds(c.start), seconds(c.end), 'current limit', c.part, `${seconds(c.duration)}, output up to ${formatSI(c.worstOutput, 'V')}`] });
  }
  for (const r of findings.ringing) {
    const settles = r.settlingTime === null ? 'does not settle before the next event' : `settles in ${seconds(r.settlingTime)}`;
    const figures = r.sustained
      ? `sustained oscillation at ${formatSI(r.frequency, 'Hz')}, ${r.cycles} cycles seen`
      : `${formatSI(r.frequency, 'Hz')}, damping ratio ${r.dampingRatio.toFixed(3)}, overshoot ${percent(r.overshoot)}, ${settles}, ${r.cycles} cycles`;
    const again = r.repeats > 0 ? `; again after ${r.repeats} later event${r.repeats > 1 ? 's' : ''}` : '';
    entries.push({ time: r.start, cells: [seconds(r.start), '', 'ringing', r.node, `${figures} (after ${r.cause}${again})`], hint: r.hint?.text });
  }
  for (const a of findings.adc) {
    const starved = acquisitionShortfall(a);
    if (starved !== undefined) {
      entries.push({
        time: starved.time,
        cells: [seconds(starved.time), '', 'ADC acquisition', a.name, `held value ${(a.largestHeldError / a.lsb).toFixed(1)} LSB short of the input at the instant; read ${starved.read} where the input stood at ${starved.ideal} before the window (${starved.codes > 0 ? '+' : ''}${starved.codes} codes)`],
        hint: `${a.name}'s sampling capacitor does not settle from the source within the acquisition window. Lengthen the window to at least R·C·ln(2^(N+1)) of the source and switch resistance, buffer the input with a follower, or put a reservoir capacitor at the pin much larger than the sampling capacitor (common practice).`,
      });
    }
    for (const [side, clipped] of [['low', a.clippedLow], ['high', a.clippedHigh]] as const) {
      for (const i of clipped.intervals) entries.push({ time: i.from, cells: [seconds(i.from), seconds(i.to), `ADC clipped ${side}`, a.name, `input beyond the ${side} end of the range`] });
    }
  }
  return entries.sort((a, b) => a.time - b.time);
}

/** Columns two spaces apart: the times right-aligned so that they line up, the text left-aligned. */
function align(rows: readonly (readonly string[])[]): string[] {
  const widths: number[] = [];
  for (const row of rows) row.forEach((cell, i) => (widths[i] = Math.max(widths[i] ?? 0, cell.length)));
  return rows.map((row) => ('  ' + row.map((cell, i) => (i < 2 ? cell.padStart(widths[i]) : cell.padEnd(widths[i]))).join('  ')).trimEnd());
}

/** Break `text` at spaces into lines of at most `width` characters, each after `indent`. */
export function wrap(text: string, width: number, indent: string): string[] {
  const lines: string[] = [];
  let line = '';
  for (const word of text.split(' ')) {
    if (line !== '' && indent.length + line.length + 1 + word.length > width) {
      lines.push(indent + line);
      line = word;
    } else line = line === '' ? word : `${line} ${word}`;
  }
  if (line !== '') lines.push(indent + line);
  return lines;
}

/** A warning found before the run starts, shown on stderr as the circuit file's own warnings are. */
export function startWarningText(fileName: string, warning: ReportWarning): string {
  return `${fileName}: warning: ${warning.message}`;
}
