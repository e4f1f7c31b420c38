/**
 * Series colours: distinct in hue and lightness, so that they stay apart for the common
 * forms of colour blindness and in greyscale print (a qualitative scheme of our own).
 */
const colours = ['#1f5fa8', '#c4501b', '#2e8540', '#8a3fa0', '#b8860b', '#1b8a8a', '#a33a5a', '#555555'];

export function colour(index: number): string {
  return colours[index % colours.length];
}

/** Violations are always this red, whatever the series colours. */
export const violationColour = '#d11a1a';
