/**
 * Dense complex LU factorization with partial pivoting (Doolittle, row interchanges, the
 * pivot of largest modulus), in place on flat typed arrays holding real and imaginary parts
 * apart. Factoring and solving allocate nothing, so a sweep over frequencies allocates only
 * its results. The real solver's `LuSolver` is the same algorithm over real numbers; the
 * tests check this one against ml-matrix on the equivalent real system of twice the size.
 */
export class ComplexLu {
  private readonly re: Float64Array;
  private readonly im: Float64Array;
  private readonly perm: Int32Array;
  private readonly yRe: Float64Array;
  private readonly yIm: Float64Array;

  constructor(readonly size: number) {
    this.re = new Float64Array(size * size);
    this.im = new Float64Array(size * size);
    this.perm = new Int32Array(size);
    this.yRe = new Float64Array(size);
    this.yIm = new Float64Array(size);
  }

  /**
   * Factor the row-major matrix `aRe + j·aIm` (left unchanged). Returns -1 on success, or the
   * first column whose pivot is negligible against the matrix's largest entry: the unknown
   * the equations do not determine.
   */
  factor(aRe: Float64Array, aIm: Float64Array): number {
    const n = this.size;
    const re = this.re;
    const im = this.im;
    re.set(aRe);
    im.set(aIm);
    let largest = 0;
    for (let i = 0; i < re.length; i++) largest = Math.max(largest, re[i] * re[i] + im[i] * im[i]);
    // Compared as squared moduli: the floor is largest modulus · n · 1e-15, squared.
    const floor = largest * (n * 1e-15) ** 2;
    for (let r = 0; r < n; r++) this.perm[r] = r;
    for (let k = 0; k < n; k++) {
      let p = k;
      let best = re[k * n + k] ** 2 + im[k * n + k] ** 2;
      for (let r = k + 1; r < n; r++) {
        const v = re[r * n + k] ** 2 + im[r * n + k] ** 2;
        if (v > best) {
          best = v;
          p = r;
        }
      }
      if (!(best > floor)) return k;
      if (p !== k) {
        swapRows(re, n, k, p);
        swapRows(im, n, k, p);
        const t = this.perm[k];
        this.perm[k] = this.perm[p];
        this.perm[p] = t;
      }
      const pivotRow = k * n;
      // 1 / pivot, once per column.
      const inverseRe = re[pivotRow + k] / best;
      const inverseIm = -im[pivotRow + k] / best;
      for (let r = k + 1; r < n; r++) {
        const row = r * n;
        const lRe = re[row + k] * inverseRe - im[row + k] * inverseIm;
        const lIm = re[row + k] * inverseIm + im[row + k] * inverseRe;
        re[row + k] = lRe;
        im[row + k] = lIm;
        if (lRe === 0 && lIm === 0) continue;
        for (let c = k + 1; c < n; c++) {
          const uRe = re[pivotRow + c];
          const uIm = im[pivotRow + c];
          re[row + c] -= lRe * uRe - lIm * uIm;
          im[row + c] -= lRe * uIm + lIm * uRe;
        }
      }
    }
    return -1;
  }

  /** Solve with the last factorization: `x = A⁻¹·b`. `b` is left unchanged; `x` may not be `b`. */
  solve(bRe: Float64Array, bIm: Float64Array, xRe: Float64Array, xIm: Float64Array): void {
    const n = this.size;
    const re = this.re;
    const im = this.im;
    const yRe = this.yRe;
    const yIm = this.yIm;
    for (let r = 0; r < n; r++) {
      let sRe = bRe[this.perm[r]];
      let sIm = bIm[this.perm[r]];
      const row = r * n;
      for (let c = 0; c < r; c++) {
        sRe -= re[row + c] * yRe[c] - im[row + c] * yIm[c];
        sIm -= re[row + c] * yIm[c] + im[row + c] * yRe[c];
      }
      yRe[r] = sRe;
      yIm[r] = sIm;
    }
    for (let r = n - 1; r >= 0; r--) {
      let sRe = yRe[r];
      let sIm = yIm[r];
      const row = r * n;
      for (let c = r + 1; c < n; c++) {
        sRe -= re[row + c] * xRe[c] - im[row + c] * xIm[c];
        sIm -= re[row + c] * xIm[c] + im[row + c] * xRe[c];
      }
      this.divideByPivot(r, sRe, sIm, xRe, xIm);
    }
  }

  /**
   * Solve the transposed system with the last factorization: `x = (Aᵀ)⁻¹·b` (the plain
   * transpose, not the conjugate). With `b` a unit vector at an output, `x` holds that
   * output's response to a unit current injected at every unknown: the adjoint solve, one
   * per output instead of one per source. `b` is left unchanged; `x` may not be `b`.
   */
  solveTransposed(bRe: Float64Array, bIm: Float64Array, xRe: Float64Array, xIm: Float64Array): void {
    const n = this.size;
    const re = this.re;
    const im = this.im;
    const yRe = this.yRe;
    const yIm = this.yIm;
    // PA = LU, so Aᵀ = Uᵀ·Lᵀ·P: solve Uᵀ·w = b forward, then Lᵀ·v = w backward, then x = Pᵀ·v.
    for (let r = 0; r < n; r++) {
      let sRe = bRe[r];
      let sIm = bIm[r];
      for (let c = 0; c < r; c++) {
        const uRe = re[c * n + r];
        const uIm = im[c * n + r];
        sRe -= uRe * yRe[c] - uIm * yIm[c];
        sIm -= uRe * yIm[c] + uIm * yRe[c];
      }
      this.divideByPivot(r, sRe, sIm, yRe, yIm);
    }
    for (let r = n - 1; r >= 0; r--) {
      let sRe = yRe[r];
      let sIm = yIm[r];
      for (let c = r + 1; c < n; c++) {
        const lRe = re[c * n + r];
        const lIm = im[c * n + r];
        sRe -= lRe * yRe[c] - lIm * yIm[c];
        sIm -= lRe * yIm[c] + lIm * yRe[c];
      }
      yRe[r] = sRe;
      yIm[r] = sIm;
    }
    for (let r = 0; r < n; r++) {
      xRe[this.perm[r]] = yRe[r];
      xIm[this.perm[r]] = yIm[r];
    }
  }

  /** (sRe + j·sIm) / U[r][r] into entry `r` of `outRe + j·outIm`. */
  private divideByPivot(r: number, sRe: number, sIm: number, outRe: Float64Array, outIm: Float64Array): void {
    const k = r * this.size + r;
    const dRe = this.re[k];
    const dIm = this.im[k];
    const d = dRe * dRe + dIm * dIm;
    outRe[r] = (sRe * dRe + sIm * dIm) / d;
    outIm[r] = (sIm * dRe - sRe * dIm) / d;
  }
}

function swapRows(a: Float64Array, n: number, i: number, j: number): void {
  for (let c = 0; c < n; c++) {
    const t = a[i * n + c];
    a[i * n + c] = a[j * n + c];
    a[j * n + c] = t;
  }
}
