import { wallTimeText } from '../wall-time-text.ts';

/** Envelopes expected to take less than this start without a word: the summary says enough. */
const quietBelowSeconds = 10;

/**
 * What a long envelope will take, said before it starts: the nominal run's wall time times
 * the runs each worker has to do. Undefined for envelopes that will be over in seconds.
 */
export function estimateText(variants: number, workers: number, oneRunSeconds: number): string | undefined {
  const seconds = (oneRunSeconds * variants) / workers;
  if (!(seconds >= quietBelowSeconds)) return undefined;
  return `envelope: ${variants} runs on ${workers} worker${workers === 1 ? '' : 's'}; one run took ${wallTimeText(oneRunSeconds)}, so this takes about ${wallTimeText(seconds)}\n  fewer --runs finish sooner; Ctrl-C stops it`;
}
