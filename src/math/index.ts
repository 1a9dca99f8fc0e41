export type { PiecewisePolynomial, PiecewiseSide, PolynomialPiece } from "./piecewise.js";
export { piecewisePolynomial, pieceCount, findPiece, evaluatePiecewise, evaluatePiecewiseMany, piecesOf } from "./piecewise.js";
export { scalePiecewise, addPiecewise, derivativeOf, integralOf } from "./piecewise-ops.js";
export type { LocatedValue, Extremes } from "./piecewise-extremes.js";
export { extremesOf, rootsOf } from "./piecewise-extremes.js";
export { evaluatePolynomial, polynomialRootsIn } from "./polynomial-api.js";
export { COINCIDENCE, ROUNDING, coincidenceTolerance } from "./tolerance.js";
export type { BandedFactorReport } from "./banded.js";
export { factorBandedSymmetric, solveBandedSymmetric } from "./banded.js";
