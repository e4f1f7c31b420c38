/**
 * Lay out rows as aligned columns separated by two spaces, each row one line with `indent` in
 * front. The first `leftColumns` columns are left-aligned (labels), the rest right-aligned so
 * that numbers line up.
 */
export function textTable(rows: readonly (readonly string[])[], leftColumns = 1, indent = '  '): string[] {
  const widths: number[] = [];
  for (const row of rows) row.forEach((cell, i) => (widths[i] = Math.max(widths[i] ?? 0, cell.length)));
  const pad = (cell: string, i: number): string => (i < leftColumns ? cell.padEnd(widths[i]) : cell.padStart(widths[i]));
  return rows.map((row) => (indent + row.map(pad).join('  ')).trimEnd());
}
