/**
 * The least work a fixed-step linear simulation can do per step, written as one plain loop:
 * a right-hand side from the previous solution (companion history) and a dense forward and
 * back substitution with a factorization made once. `pnpm bench` compares the engine with it.
 * Returns the seconds taken for `steps` steps with `n` unknowns.
 */
export function bareSolveLoop(n: number, steps: number): number {
  // A diagonally dominant tridiagonal matrix, factored once without pivoting (dense storage).
  const lu = new Float64Array(n * n);
  for (let i = 0; i < n; i++) {
    lu[i * n + i] = 3;
    if (i > 0) lu[i * n + i - 1] = -1;
    if (i + 1 < n) lu[i * n + i + 1] = -1;
  }
  for (let k = 0; k < n; k++) {
    for (let r = k + 1; r < n; r++) {
      const f = (lu[r * n + k] /= lu[k * n + k]);
      for (let c = k + 1; c < n; c++) lu[r * n + c] -= f * lu[k * n + c];
    }
  }
  const history = Float64Array.from({ length: n }, (_, i) => 0.5 + 0.01 * i);
  const b = new Float64Array(n);
  const x = new Float64Array(n);
  const start = performance.now();
  for (let s = 0; s < steps; s++) {
    for (let i = 0; i < n; i++) b[i] = history[i] * x[i];
    b[0] += Math.sin(s * 1e-3);
    for (let r = 0; r < n; r++) {
      let v = b[r];
      for (let c = 0; c < r; c++) v -= lu[r * n + c] * x[c];
      x[r] = v;
    }
    for (let r = n - 1; r >= 0; r--) {
      let v = x[r];
      for (let c = r + 1; c < n; c++) v -= lu[r * n + c] * x[c];
      x[r] = v / lu[r * n + r];
    }
  }
  const seconds = (performance.now() - start) / 1000;
  // Keep the result alive so that the loop cannot be dropped.
  if (!Number.isFinite(x[0])) throw new Error('bare loop diverged');
  return seconds;
}
