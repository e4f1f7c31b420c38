import { describe, expect, it } from 'vitest';
import { frequencyResponse, noiseAnalysis } from '../src/index.ts';
import { LinearizedCircuit } from '../src/small-signal/linearized-circuit.ts';
import { LADDER_C, LADDER_R, rcLadder as ladder } from './support/rc-ladder.ts';
import { add, complex, dB, degrees, angleBetween, div, mul, type Complex } from './support/complex.ts';

const [R, C] = [LADDER_R, LADDER_C];
// CODATA 2018: the Boltzmann constant is exact in the SI since 2019.
const K = 1.380649e-23;
const T = 298.15;


/**
 * The ladder's transfer to its far end by the chain (ABCD) matrices of its two-ports, a
 * series impedance [[1, Z], [0, 1]] then a shunt admittance [[1, 0], [Y, 1]] per section;
 * open at the far end, Vout/Vin = 1/A (textbook two-port theory).
 */
function chainTransfer(sections: number, f: number): Complex {
  const y = complex(0, 2 * Math.PI * f * C);
  let [a, b, c, d]: Complex[] = [complex(1), complex(0), complex(0), complex(1)];
  for (let k = 0; k < sections; k++) {
    // [a b; c d]·[1 R; 0 1] = [a, aR + b; c, cR + d], then ·[1 0; Y 1] = [a + bY, b; c + dY, d].
    [b, d] = [add(mul(a, complex(R)), b), add(mul(c, complex(R)), d)];
    [a, c] = [add(a, mul(b, y)), add(c, mul(d, y))];
  }
  return div(complex(1), a);
}

describe('large circuits in the frequency domain: the sparse complex system', () => {
  it('a 400-section RC ladder (801 unknowns) answers as its chain-matrix product, within 1e-6 dB and 1e-4°', () => {
    const sections = 400;
    const circuit = ladder(sections, { response: { input: 'VIN', from: '10m', to: '1k', 'per-decade': 10 } });
    const response = frequencyResponse(circuit);
    const far = response.nodes[0];
    let worstDb = 0;
    let worstDeg = 0;
    let compared = 0;
    response.frequency.forEach((f, i) => {
      const h = chainTransfer(sections, f);
      // Higher up the far end is hundreds of dB down (and the chain product overflows): compare where it is still a signal.
      if (!(dB(h) > -200)) return;
      compared++;
      worstDb = Math.max(worstDb, Math.abs(far.dB[i] - dB(h)));
      worstDeg = Math.max(worstDeg, Math.abs(angleBetween(far.degrees[i], degrees(h))));
    });
    // 10 mHz up to where the far end falls 200 dB, 10 points per decade.
    expect(compared).toBeGreaterThan(30);
    expect(worstDb).toBeLessThan(1e-6);
    expect(worstDeg).toBeLessThan(1e-4);
  });

  it('sparse and dense storage give the same response and adjoint solves, within 1e-10 relative', () => {
    const circuit = ladder(12);
    const dense = new LinearizedCircuit(circuit, 'dense');
    const sparse = new LinearizedCircuit(circuit, 'sparse');
    const input = dense.device('VIN')!;
    const n = dense.size;
    const [aRe, aIm, bRe, bIm] = [0, 0, 0, 0].map(() => new Float64Array(n));
    for (const f of [1, 3e3, 1e6]) {
      dense.respond(f, input, aRe, aIm);
      sparse.respond(f, sparse.device('VIN')!, bRe, bIm);
      for (let i = 0; i < n; i++) expect(Math.hypot(aRe[i] - bRe[i], aIm[i] - bIm[i])).toBeLessThanOrEqual(1e-10 * Math.hypot(aRe[i], aIm[i]) + 1e-300);
      const pick = new Float64Array(n);
      pick[n - 2] = 1;
      const zero = new Float64Array(n);
      dense.factorAt(f);
      dense.solveTransposed(pick, zero, aRe, aIm);
      sparse.factorAt(f);
      sparse.solveTransposed(pick, zero, bRe, bIm);
      for (let i = 0; i < n; i++) expect(Math.hypot(aRe[i] - bRe[i], aIm[i] - bIm[i])).toBeLessThanOrEqual(1e-10 * Math.hypot(aRe[i], aIm[i]) + 1e-300);
    }
  });

  it('a 100-section ladder holds kT/C of noise on each capacitor (equipartition), within 1%', () => {
    // Equipartition (statistical mechanics textbook): each capacitor to ground is an
    // independent degree of freedom holding kT/2 of energy, so its mean-square voltage is kT/C
    // whatever the resistors; the band spans every mode of the ladder.
    const result = noiseAnalysis(ladder(100, { noise: { from: '10m', to: '10G', 'per-decade': 20 } }));
    const expected = Math.sqrt((K * T) / C);
    for (const node of result.nodes) expect(Math.abs(node.rms / expected - 1)).toBeLessThan(0.01);
  });
});
