import { EigenvalueDecomposition, Matrix } from 'ml-matrix';
import type { ComplexMna } from '../parts/device.ts';
import type { LinearizedCircuit } from './linearized-circuit.ts';

/** The slowest decaying natural mode of a linearized circuit. */
export interface SlowestMode {
  /** Seconds for the mode to decay by a factor e: 1/|Re s|. */
  readonly timeConstant: number;
  /** Its ringing frequency in Hz; 0 for a mode that decays without ringing. */
  readonly frequency: number;
  /** The node where the mode shows most. */
  readonly node: string;
}

/** Krylov dimension: the whole space for circuits up to this many unknowns, the slow end of the spectrum beyond. */
const KRYLOV = 30;
/** A Ritz value counts when its residual is below this share of its size (it has converged). */
const CONVERGED = 1e-3;

/**
 * The natural modes are the roots s of det(G + s·C) = 0 at the operating point, i.e. the
 * eigenvalues μ = −1/s of G⁻¹·C. The slow modes are the large μ, the ones Arnoldi's method
 * finds first (Arnoldi 1951; Saad, "Numerical Methods for Large Eigenvalue Problems"): G is
 * factored once, each Krylov vector is one solve, and the small Hessenberg matrix's
 * eigenvalues come from ml-matrix. Undefined when no mode decays (no capacitor or inductor, or
 * only modes that grow or hold, as an integrator's).
 */
export function slowestMode(linear: LinearizedCircuit): SlowestMode | undefined {
  const n = linear.size;
  const c = storageTriplets(linear);
  if (c.rows.length === 0) return undefined;
  const system = linear.factorAt(0);
  const k = Math.min(n, KRYLOV);
  const basis = Array.from({ length: k + 1 }, () => new Float64Array(n));
  const h = new Matrix(k + 1, k);
  const xIm = new Float64Array(n);
  // A fixed start with a share of every unknown: deterministic, and no mode left out by symmetry.
  for (let i = 0; i < n; i++) basis[0][i] = 1 + 0.5 * Math.sin(1.7 * i + 0.3);
  scale(basis[0], 1 / norm(basis[0]));
  let m = k;
  for (let j = 0; j < k; j++) {
    system.bRe.fill(0);
    system.bIm.fill(0);
    for (let e = 0; e < c.rows.length; e++) system.bRe[c.rows[e]] += c.values[e] * basis[j][c.cols[e]];
    const w = basis[j + 1];
    linear.solve(w, xIm);
    const before = norm(w);
    // Modified Gram–Schmidt, twice: the basis stays orthogonal to working precision.
    for (let pass = 0; pass < 2; pass++) {
      for (let i = 0; i <= j; i++) {
        const d = dot(basis[i], w);
        h.set(i, j, h.get(i, j) + d);
        for (let r = 0; r < n; r++) w[r] -= d * basis[i][r];
      }
    }
    const size = norm(w);
    h.set(j + 1, j, size);
    if (!(size > 1e-12 * before)) {
      // An invariant subspace (nothing new past rounding): its eigenvalues are exact.
      m = j + 1;
      break;
    }
    scale(w, 1 / size);
  }
  const square = h.subMatrix(0, m - 1, 0, m - 1);
  const decomposition = new EigenvalueDecomposition(square);
  const re = decomposition.realEigenvalues;
  const im = decomposition.imaginaryEigenvalues;
  const vectors = decomposition.eigenvectorMatrix;
  // The Ritz pair (μ, V·y) leaves a residual of h(m, m−1)·|y_m|.
  const tail = h.get(m, m - 1);
  let best: { timeConstant: number; frequency: number; index: number } | undefined;
  for (let e = 0; e < m; e++) {
    const magnitude2 = re[e] * re[e] + im[e] * im[e];
    // μ = −1/s: a decaying mode has Re μ > 0; its time constant is 1/|Re s| = |μ|²/Re μ.
    if (!(re[e] > 0) || im[e] < 0) continue;
    const [yRe, yIm] = im[e] === 0 ? [vectors.getColumn(e), undefined] : [vectors.getColumn(e), vectors.getColumn(e + 1)];
    const last = Math.hypot(yRe[m - 1], yIm?.[m - 1] ?? 0);
    const length = Math.hypot(...yRe, ...(yIm ?? []));
    if (tail * last > CONVERGED * Math.sqrt(magnitude2) * length) continue;
    const timeConstant = magnitude2 / re[e];
    if (best === undefined || timeConstant > best.timeConstant) best = { timeConstant, frequency: im[e] / magnitude2 / (2 * Math.PI), index: e };
  }
  if (best === undefined) return undefined;
  return { timeConstant: best.timeConstant, frequency: best.frequency, node: strongestNode(linear, basis, m, vectors, best.index, best.frequency > 0) };
}

/** The node voltage with the largest share of the mode's vector V·y. */
function strongestNode(linear: LinearizedCircuit, basis: Float64Array[], m: number, vectors: Matrix, index: number, complex: boolean): string {
  const { labels, isCurrent } = linear.topology;
  let strongest = -1;
  let largest = -1;
  for (let r = 0; r < linear.size; r++) {
    if (isCurrent[r]) continue;
    let a = 0;
    let b = 0;
    for (let i = 0; i < m; i++) {
      a += basis[i][r] * vectors.get(i, index);
      if (complex) b += basis[i][r] * vectors.get(i, index + 1);
    }
    const size = Math.hypot(a, b);
    if (size > largest) {
      largest = size;
      strongest = r;
    }
  }
  return labels[strongest] ?? 'gnd';
}

/** C of G + s·C as triplets: the imaginary parts the devices stamp at ω = 1 rad/s. */
function storageTriplets(linear: LinearizedCircuit): { rows: number[]; cols: number[]; values: number[] } {
  const rows: number[] = [];
  const cols: number[] = [];
  const values: number[] = [];
  const recorder: ComplexMna = {
    size: linear.size,
    add(row, col, _re, im = 0) {
      if (row < 0 || col < 0 || im === 0) return;
      rows.push(row);
      cols.push(col);
      values.push(im);
    },
    rhs() {},
  };
  for (const d of linear.devices) d.stampSmallSignal!(recorder, linear.operatingPoint, 1);
  return { rows, cols, values };
}

function dot(a: Float64Array, b: Float64Array): number {
  let s = 0;
  for (let i = 0; i < a.length; i++) s += a[i] * b[i];
  return s;
}

function norm(a: Float64Array): number {
  return Math.sqrt(dot(a, a));
}

function scale(a: Float64Array, factor: number): void {
  for (let i = 0; i < a.length; i++) a[i] *= factor;
}
