/** Envelopes expected to take less than this start without a word: the summary says enough. */
const quietBelowSeconds = 10;

/**
 * What a long envelope will take, said before it starts: the nominal run's wall time times
 * the runs each worker has to do. Undefined for envelopes that will be over in seconds.
 */
export function estimateText(variants: number, workers: number, oneRunSeconds: number): string | undefined {
  const seconds = (oneRunSeconds * variants) / workers;
  if (!(seconds >= quietBelowSeconds)) return undefined;
  return `envelope: ${variants} runs on ${workers} worker${workers === 1 ? '' : 's'}; one run took ${duration(oneRunSeconds)}, so this takes about ${duration(seconds)}\n  fewer --runs finish sooner; Ctrl-C stops it`;
}

/** A wall time in the largest unit that keeps it readable: 850 ms, 42 s, 12 min, 3.5 h, 69 days. */
export function duration(seconds: number): string {
  const units: [number, string][] = [
    [86_400, 'days'],
    [3_600, 'h'],
    [60, 'min'],
    [1, 's'],
  ];
  for (const [size, name] of units) {
    if (seconds >= size) return `${round(seconds / size)} ${name}`;
  }
  return `${round(seconds * 1000)} ms`;
}

/** Two significant digits, no trailing zeros. */
function round(value: number): string {
  return String(Number(value.toPrecision(2)));
}
