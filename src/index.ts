/**
 * flexura: beams and cross-sections for the engineers who size them.
 *
 * Sign conventions: x runs from the left end; loads positive downward; reactions positive
 * upward; bending moment positive when sagging; deflection positive upward.
 *
 * @packageDocumentation
 */
export * from "./errors/index.js";
// The beam engine, its input and result types, and the evaluators a caller needs to read a
// solution. The rest of the piecewise-polynomial toolkit and the load builders are served from
// `flexura/beam`, to keep the main entry within its size budget (scripts/size-check.mjs).
export * from "./beam/index.js";
export type { PiecewisePolynomial, PiecewiseSide, PolynomialPiece, LocatedValue, Extremes, BandedFactorReport } from "./math/index.js";
export { evaluatePiecewise, evaluatePiecewiseMany, extremesOf } from "./math/index.js";
export type { PointLoad, CoupleLoad, DistributedLoad, Load, LoadResultant } from "./loads/index.js";
export type { Support, SupportKind } from "./supports/index.js";
export * from "./section/index.js";
export * from "./stress/index.js";
// Units (quantities read from text, exact conversion factors, decimal.js) are served from
// `flexura/units` only: the engines work in any consistent units and never need them, and the
// model format (`flexura/model`) brings them along itself.
// The member checks are served from `flexura/check` only: re-exporting them here would put the
// main entry over its size budget (scripts/size-check.mjs).
