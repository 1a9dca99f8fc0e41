/**
 * Symmetric banded matrices in row storage: `band[i * (w + 1) + j]` holds `A[i][i + j]` for
 * `j = 0..w`, where `w` is the half-bandwidth. Factor and solve in O(n w^2) time and no extra
 * memory.
 */

/** What {@link factorBandedSymmetric} found about the pivots. */
export interface BandedFactorReport {
  /** Index of the first pivot that is not clearly positive (relative to the original diagonal), or -1. */
  readonly singularAt: number;
  /** The smallest ratio of pivot to original diagonal entry (1 for a diagonal matrix; near 0 when ill-conditioned). */
  readonly smallestPivotRatio: number;
  /** Index of the pivot with that smallest ratio (the singular one when the factorisation stopped; 0 for a diagonal matrix). */
  readonly smallestPivotAt: number;
}

/**
 * Factors a symmetric positive definite banded matrix in place as L D L^T (unit lower L stored
 * transposed in the band, D on the diagonal). Stops at the first pivot that is not greater than
 * `tolerance` times the original diagonal entry and reports its index: for a stiffness matrix
 * that is a mechanism.
 *
 * @param band - the matrix in row band storage; overwritten by the factors.
 * @param n - the order of the matrix.
 * @param w - the half-bandwidth.
 * @param tolerance - relative pivot threshold (default 1e-12).
 * @returns where the factorisation stopped (-1 when it did not) and the smallest pivot ratio.
 * @example
 * ```ts
 * const band = Float64Array.of(4, 2, 3, 0); // [[4, 2], [2, 3]], w = 1
 * factorBandedSymmetric(band, 2, 1); // { singularAt: -1, smallestPivotRatio: 0.666..., smallestPivotAt: 1 }
 * ```
 */
export function factorBandedSymmetric(band: Float64Array, n: number, w: number, tolerance = 1e-12): BandedFactorReport {
  const s = w + 1;
  if (diagonal.length < n) diagonal = new Float64Array(Math.max(n, 2 * diagonal.length));
  for (let i = 0; i < n; i++) diagonal[i] = band[i * s] as number;
  let smallest = 1;
  let at = 0;
  for (let i = 0; i < n; i++) {
    const row = i * s;
    const pivot = band[row] as number;
    const original = diagonal[i] as number;
    const ratio = original > 0 ? pivot / original : 0;
    if (!(ratio > tolerance)) return { singularAt: i, smallestPivotRatio: Math.min(smallest, ratio > 0 ? ratio : 0), smallestPivotAt: i };
    if (ratio < smallest) {
      smallest = ratio;
      at = i;
    }
    const last = Math.min(n - 1, i + w);
    for (let j = i + 1; j <= last; j++) {
      const aij = band[row + j - i] as number;
      if (aij === 0) continue;
      const l = aij / pivot;
      const rowJ = j * s;
      for (let k = j; k <= last; k++) band[rowJ + k - j] = (band[rowJ + k - j] as number) - l * (band[row + k - i] as number);
      band[row + j - i] = l;
    }
  }
  return { singularAt: -1, smallestPivotRatio: smallest, smallestPivotAt: at };
}

/** Scratch copy of the original diagonal (grown as needed; the factorisation is synchronous). */
let diagonal = new Float64Array(64);

/**
 * Solves `A x = b` in place in `rhs`, given the factors from {@link factorBandedSymmetric}.
 *
 * @example
 * ```ts
 * const band = Float64Array.of(4, 2, 3, 0);
 * factorBandedSymmetric(band, 2, 1);
 * solveBandedSymmetric(band, 2, 1, Float64Array.of(6, 5)); // Float64Array [1, 1]
 * ```
 */
export function solveBandedSymmetric(band: Float64Array, n: number, w: number, rhs: Float64Array): Float64Array {
  const s = w + 1;
  for (let i = 0; i < n; i++) {
    const bi = rhs[i] as number;
    if (bi === 0) continue;
    const last = Math.min(n - 1, i + w);
    const row = i * s;
    for (let j = i + 1; j <= last; j++) rhs[j] = (rhs[j] as number) - (band[row + j - i] as number) * bi;
  }
  for (let i = 0; i < n; i++) rhs[i] = (rhs[i] as number) / (band[i * s] as number);
  for (let i = n - 1; i >= 0; i--) {
    const last = Math.min(n - 1, i + w);
    const row = i * s;
    let v = rhs[i] as number;
    for (let j = i + 1; j <= last; j++) v -= (band[row + j - i] as number) * (rhs[j] as number);
    rhs[i] = v;
  }
  return rhs;
}
