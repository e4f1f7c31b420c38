/** SI prefixes accepted in circuit values, with their power of ten. `u` stands in for `µ`; both micro signs are accepted. */
export const siPrefixes: Readonly<Record<string, number>> = {
  f: -15,
  p: -12,
  n: -9,
  u: -6,
  'µ': -6, // U+00B5 MICRO SIGN
  'μ': -6, // U+03BC GREEK SMALL LETTER MU, which some keyboards produce instead
  m: -3,
  k: 3,
  M: 6,
  G: 9,
};

/** Prefixes by power of ten, for formatting: index = exponent / 3 + 5. */
export const formatPrefixes = ['f', 'p', 'n', 'µ', 'm', '', 'k', 'M', 'G'] as const;
