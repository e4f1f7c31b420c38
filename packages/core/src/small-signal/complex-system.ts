import type { ComplexMna } from '../parts/device.ts';

/**
 * The complex system `Y·x = b` that devices stamp into at one frequency, with its
 * factorization: dense for small circuits, sparse for large ones, chosen as the transient's
 * matrix is.
 */
export interface ComplexSystem extends ComplexMna {
  readonly size: number;
  /** The right-hand side that `rhs` stamps into. */
  readonly bRe: Float64Array;
  readonly bIm: Float64Array;
  /** Zero the matrix and the right-hand side before the next assembly. */
  clear(): void;
  /** Factor the assembled matrix: -1 on success, or the unknown the equations leave undetermined. */
  factor(): number;
  /** `x = Y⁻¹·b` for the stamped right-hand side, with the last factorization. */
  solve(xRe: Float64Array, xIm: Float64Array): void;
  /** `x = (Yᵀ)⁻¹·b` (the plain transpose: the adjoint solve), with the last factorization. */
  solveTransposed(bRe: Float64Array, bIm: Float64Array, xRe: Float64Array, xIm: Float64Array): void;
}
