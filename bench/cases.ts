/** Circuits for `pnpm bench`, written as circuit-file text so the parser is exercised too. */

/** About six nodes: a sine through two RC sections, an LC section and a loaded tail. */
export function linearNetwork(steps: number, step: number): string {
  return `
circuit: bench-linear-network
parts:
  SRC: { voltage: { sine: { amplitude: 1, frequency: 1k } }, between: [in, gnd] }
  R1: { resistor: 1k, between: [in, n1] }
  C1: { capacitor: 100n, between: [n1, gnd] }
  R2: { resistor: 2.2k, between: [n1, n2] }
  C2: { capacitor: 47n, between: [n2, gnd] }
  L1: { inductor: 10m, between: [n2, n3] }
  C3: { capacitor: 100n, between: [n3, gnd] }
  R3: { resistor: 1k, between: [n3, gnd] }
  R4: { resistor: 4.7k, between: [n3, n4] }
  C4: { capacitor: 22n, between: [n4, gnd] }
  R5: { resistor: 10k, between: [n4, n5] }
  C5: { capacitor: 10n, between: [n5, gnd] }
simulate: { duration: ${steps * step}, output-step: ${(steps * step) / 100}, fixed-step: ${step} }
record: [n5]
`;
}

/**
 * An RC ladder of `sections` sections driven by a square wave: `sections` + 2 unknowns.
 * `step` fixes the step; without it the step control chooses, and every square-wave edge
 * costs new factorizations.
 */
export function rcLadder(sections: number, duration: number, step?: number): string {
  const lines = [`circuit: bench-rc-ladder-${sections}`, 'parts:', '  SRC: { voltage: { square: { low: 0, high: 1, frequency: 1k } }, between: [n0, gnd] }'];
  for (let i = 1; i <= sections; i++) {
    lines.push(`  R${i}: { resistor: 100, between: [n${i - 1}, n${i}] }`);
    lines.push(`  C${i}: { capacitor: 10n, between: [n${i}, gnd] }`);
  }
  const steps = step === undefined ? 'max-step: 10u' : `fixed-step: ${step}`;
  lines.push(`simulate: { duration: ${duration}, output-step: ${duration / 100}, ${steps} }`);
  lines.push(`record: [n${sections}]`);
  return lines.join('\n');
}

/** The plain differentiator driven by a square wave into its rails, for `periods` periods. */
export function differentiatorIntoRails(periods: number): string {
  return `
circuit: bench-differentiator-rails
parts:
  SQ: { voltage: { square: { low: -1, high: 1, frequency: 1k } }, between: [in, gnd] }
  CIN: { capacitor: 10n, between: [in, sum] }
  RF: { resistor: 10k, between: [sum, out] }
  AMP: { opamp: general-purpose, plus: gnd, minus: sum, out: out, supply: [-12, 12] }
simulate: { duration: ${periods}m, output-step: 1u }
record: [out]
`;
}

/**
 * The plain differentiator (10 kΩ, 100 nF, an amplifier of 100 dB and 1 MHz) driven by a
 * 5 Hz triangle, one row per microsecond: after each corner (every 100 ms) it rings at about
 * 12.6 kHz with a damping ratio near 0.007, for some 9 ms. `rows` sets the duration.
 */
export function differentiatorTriangle(rows: number): string {
  return `
circuit: bench-differentiator-triangle
parts:
  TRI: { voltage: { triangle: { low: 0, high: 1, frequency: 5 } }, between: [in, gnd] }
  CIN: { capacitor: 100n, between: [in, sum] }
  RF: { resistor: 10k, between: [sum, out] }
  AMP: { opamp: { preset: general-purpose, gain: 100dB, gbw: 1MHz }, plus: gnd, minus: sum, out: out, supply: [-12, 12] }
simulate: { duration: ${rows * 1e-6}, output-step: 1u }
record: [in, out]
`;
}
