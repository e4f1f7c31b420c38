/**
 * What a plot draws, one SVG path per series. `x` is the abscissa: seconds on a time figure,
 * hertz on a frequency figure; values are in the panel's `unit`.
 */
export type Series =
  /** A waveform. */
  | { readonly kind: 'line'; readonly name: string; readonly x: ArrayLike<number>; readonly values: ArrayLike<number>; readonly dashed?: boolean }
  /** A shaded band between two curves (a tolerance envelope); `stepped` holds values until the next time (codes). */
  | { readonly kind: 'band'; readonly name: string; readonly x: ArrayLike<number>; readonly low: ArrayLike<number>; readonly high: ArrayLike<number>; readonly stepped?: boolean }
  /** Values held until the next sample (ADC codes). */
  | { readonly kind: 'steps'; readonly name: string; readonly x: ArrayLike<number>; readonly values: ArrayLike<number>; readonly dashed?: boolean }
  /** Marked points (violations). */
  | { readonly kind: 'marks'; readonly name: string; readonly x: ArrayLike<number>; readonly values: ArrayLike<number> }
  /** Vertical lines across the whole panel at given abscissae (a loop's crossover). */
  | { readonly kind: 'rules'; readonly name: string; readonly x: ArrayLike<number> }
  /** Time intervals shaded across the whole panel (an amplifier held at a rail). */
  | { readonly kind: 'spans'; readonly name: string; readonly starts: ArrayLike<number>; readonly ends: ArrayLike<number> };

/** One stacked panel: its own y axis, the shared abscissa. */
export interface Panel {
  readonly title: string;
  /** Unit of the y axis (`V`, `dB`, `°`, or '' for codes, which are labelled as whole numbers). */
  readonly unit: string;
  readonly series: readonly Series[];
  /** Colour per series, by index in `series`; a band and its nominal line may share one. */
  readonly colours: readonly string[];
  /** Where the y axis starts when the values cannot go below it (a density starts at 0); default: below the lowest value. */
  readonly floor?: number;
}

export interface Figure {
  /** What the shared abscissa is: time on a linear axis (the default), or frequency on a log axis. */
  readonly axis?: 'time' | 'frequency';
  readonly title: string;
  /** A second line under the title (file, seed, verdict). */
  readonly subtitle?: string;
  readonly panels: readonly Panel[];
}
