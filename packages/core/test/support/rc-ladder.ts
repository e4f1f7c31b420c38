import { buildCircuit } from '../../src/index.ts';

/** Section values of the test ladders: R = 1 kΩ, C = 10 nF (RC = 10 µs). */
export const [LADDER_R, LADDER_C] = [1e3, 10e-9];

/** An RC ladder of `sections` (series R, shunt C), driven at `n0` by VIN (0 V), open at its far end; `extra` adds top-level keys. */
export function rcLadder(sections: number, extra: object = {}) {
  const parts: Record<string, object> = { VIN: { voltage: 0, between: ['n0', 'gnd'] } };
  for (let k = 1; k <= sections; k++) {
    parts[`R${k}`] = { resistor: LADDER_R, between: [`n${k - 1}`, `n${k}`] };
    parts[`C${k}`] = { capacitor: LADDER_C, between: [`n${k}`, 'gnd'] };
  }
  return buildCircuit({ circuit: 'invented-ladder', parts, simulate: { duration: '1m' }, record: [`n${sections}`, `n${sections >> 1}`], ...extra });
}
