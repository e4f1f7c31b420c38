import type { ComplexMna, Mna } from './device.ts';

/** A conductance `g` between unknowns `a` and `b` (either may be ground, -1). */
export function stampConductance(m: Mna, a: number, b: number, g: number): void {
  m.add(a, a, g);
  m.add(b, b, g);
  m.add(a, b, -g);
  m.add(b, a, -g);
}

/** A current `i` leaving node `a` and entering node `b` (an independent or history source). */
export function stampCurrent(m: Mna, a: number, b: number, i: number): void {
  m.rhs(a, -i);
  m.rhs(b, i);
}

/**
 * Incidence of a branch current `k` flowing from `a` to `b` through the element: it leaves
 * node `a` (KCL row a) and enters node `b`.
 */
export function stampBranchIncidence(m: Mna, a: number, b: number, k: number): void {
  m.add(a, k, 1);
  m.add(b, k, -1);
}

/** Branch row `k` reads `v(a) - v(b)`; the caller adds the rest of the row. */
export function stampBranchVoltage(m: Mna, k: number, a: number, b: number): void {
  m.add(k, a, 1);
  m.add(k, b, -1);
}

/** A complex admittance `re + j·im` between unknowns `a` and `b` (small-signal stamps). */
export function stampAdmittance(m: ComplexMna, a: number, b: number, re: number, im: number): void {
  m.add(a, a, re, im);
  m.add(b, b, re, im);
  m.add(a, b, -re, -im);
  m.add(b, a, -re, -im);
}

/** A current `g·(v(p) - v(n))` entering unknown `into` and leaving `from` (a transconductance). */
export function stampTransconductance(m: Mna, into: number, from: number, p: number, n: number, g: number): void {
  m.add(into, p, -g);
  m.add(into, n, g);
  m.add(from, p, g);
  m.add(from, n, -g);
}
