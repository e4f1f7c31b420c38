/** A wall time in the largest unit that keeps it readable: 850 ms, 42 s, 12 min, 3.5 h, 69 days. */
export function wallTimeText(seconds: number): string {
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
