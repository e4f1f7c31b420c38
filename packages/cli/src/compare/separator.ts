/** Field separators that bench instruments and spreadsheets write, in order of preference. */
const candidates = ['\t', ';', ','] as const;

export type Separator = (typeof candidates)[number];

/** How a separator is named in messages. */
export const separatorName: Readonly<Record<Separator, string>> = { '\t': 'tabs', ';': 'semicolons', ',': 'commas' };

/**
 * The separator of a CSV-like text: the first of tab, semicolon and comma that appears the
 * same number of times (at least once) on each of the first lines that are not comments.
 * Tab and semicolon come first because files separated by them may use a decimal comma, whose
 * count varies from line to line. Comma when none is consistent (a file of one column).
 */
export function detectSeparator(text: string): Separator {
  const lines = text
    .split(/\r?\n/)
    .filter((line) => line.trim() !== '' && !line.startsWith('#'))
    .slice(0, 20);
  for (const separator of candidates) {
    const counts = lines.map((line) => line.split(separator).length - 1);
    if (counts.length > 0 && counts[0] > 0 && counts.every((count) => count === counts[0])) return separator;
  }
  return ',';
}
