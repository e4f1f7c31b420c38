/** Complex numbers as [re, im] pairs, for the closed forms the small-signal tests compare against. */
export type Complex = readonly [number, number];

export const complex = (re: number, im = 0): Complex => [re, im];
export const add = (a: Complex, b: Complex): Complex => [a[0] + b[0], a[1] + b[1]];
export const mul = (a: Complex, b: Complex): Complex => [a[0] * b[0] - a[1] * b[1], a[0] * b[1] + a[1] * b[0]];
export const div = (a: Complex, b: Complex): Complex => {
  const d = b[0] * b[0] + b[1] * b[1];
  return [(a[0] * b[0] + a[1] * b[1]) / d, (a[1] * b[0] - a[0] * b[1]) / d];
};
export const neg = (a: Complex): Complex => [-a[0], -a[1]];
/** 1 / (1/a + 1/b): two impedances in parallel. */
export const parallel = (a: Complex, b: Complex): Complex => div(mul(a, b), add(a, b));
export const dB = (a: Complex): number => 10 * Math.log10(a[0] * a[0] + a[1] * a[1]);
export const degrees = (a: Complex): number => (Math.atan2(a[1], a[0]) * 180) / Math.PI;
/** Difference of two angles in degrees, folded into (-180, 180]. */
export const angleBetween = (a: number, b: number): number => {
  const d = a - b;
  return d - 360 * Math.round(d / 360);
};
/** Impedance of a capacitor at frequency f: 1/(j·2πf·C). */
export const capacitorImpedance = (c: number, f: number): Complex => div(complex(1), complex(0, 2 * Math.PI * f * c));
