/** True when every entry is a finite number: a solve or a propagated step that overflowed is not. */
export function allFinite(x: Float64Array): boolean {
  for (let i = 0; i < x.length; i++) if (!Number.isFinite(x[i])) return false;
  return true;
}
