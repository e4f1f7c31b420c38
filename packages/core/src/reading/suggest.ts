/**
 * Edit distance between two words: insertions, deletions, substitutions and swaps of two
 * neighbouring characters each count 1 (optimal string alignment distance).
 */
export function editDistance(a: string, b: string): number {
  const rows = a.length + 1;
  const cols = b.length + 1;
  const d: number[] = new Array<number>(rows * cols);
  for (let i = 0; i < rows; i++) d[i * cols] = i;
  for (let j = 0; j < cols; j++) d[j] = j;
  for (let i = 1; i < rows; i++) {
    for (let j = 1; j < cols; j++) {
      const cost = a[i - 1] === b[j - 1] ? 0 : 1;
      let best = Math.min(d[(i - 1) * cols + j] + 1, d[i * cols + j - 1] + 1, d[(i - 1) * cols + j - 1] + cost);
      if (i > 1 && j > 1 && a[i - 1] === b[j - 2] && a[i - 2] === b[j - 1]) {
        best = Math.min(best, d[(i - 2) * cols + j - 2] + 1);
      }
      d[i * cols + j] = best;
    }
  }
  return d[rows * cols - 1];
}

/**
 * Whether `b` is a likely misspelling of `a` or the other way round: a different case, or at
 * most 2 edits and at most one edit per two characters (so `n1` and `n2` are close, `a` and `b`
 * are not).
 */
export function isClose(a: string, b: string): boolean {
  if (a === b) return false;
  if (a.toLowerCase() === b.toLowerCase()) return true;
  const distance = editDistance(a, b);
  return distance <= 2 && distance <= Math.floor(Math.max(a.length, b.length) / 2);
}

/** The candidate closest to `word`, when one is close enough to be a likely intent. */
export function closest(word: string, candidates: Iterable<string>): string | undefined {
  let best: string | undefined;
  let bestDistance = Infinity;
  for (const candidate of candidates) {
    if (!isClose(word, candidate)) continue;
    const distance = word.toLowerCase() === candidate.toLowerCase() ? 0 : editDistance(word, candidate);
    if (distance < bestDistance) {
      best = candidate;
      bestDistance = distance;
    }
  }
  return best;
}

/** `did you mean 'x'?` when a candidate is close, else a list of the valid words. */
export function suggestion(word: string, candidates: readonly string[], listing = 'valid here'): string {
  const near = closest(word, candidates);
  if (near !== undefined) return `did you mean '${near}'?`;
  return candidates.length > 0 ? `${listing}: ${candidates.join(', ')}` : '';
}
