import { afterEach, describe, expect, it, vi } from "vitest";
import {
  addPiecewise,
  derivativeOf,
  evaluatePiecewise,
  evaluatePiecewiseMany,
  evaluatePolynomial,
  extremesOf,
  findPiece,
  integralOf,
  pieceCount,
  piecesOf,
  piecewisePolynomial,
  polynomialRootsIn,
  rootsOf,
  scalePiecewise,
  type PiecewisePolynomial,
} from "../../src/math/index.js";
import { budgeted, budgetedList, issuesOf } from "./helpers.js";

// Bounded work: a hand-made piecewise polynomial with an impossible degree, or a breakpoint that is
// NaN, is refused before any loop runs over it (these calls never returned before).
const endless = (): PiecewisePolynomial =>
  ({ kind: "piecewise-polynomial", degree: Infinity, breaks: Float64Array.of(0, 1), coefficients: budgeted([1, 2]) }) as unknown as PiecewisePolynomial;

afterEach(() => vi.restoreAllMocks());

describe("bounded work on malformed piecewise polynomials", () => {
  it("evaluatePiecewise, evaluatePiecewiseMany, extremesOf and rootsOf refuse a degree of Infinity", () => {
    expect(issuesOf(() => evaluatePiecewise(endless(), 0.5))).toEqual(["piecewise-invalid pp.degree"]);
    expect(issuesOf(() => evaluatePiecewiseMany(endless(), [0.5]))).toEqual(["piecewise-invalid pp.degree"]);
    expect(issuesOf(() => extremesOf(endless()))).toEqual(["piecewise-invalid pp.degree"]);
    expect(issuesOf(() => rootsOf(endless()))).toEqual(["piecewise-invalid pp.degree"]);
  });

  it("every function that takes a piecewise polynomial refuses a degree outside 0 to 8", () => {
    for (const degree of [9, -1, 2.5, Number.NaN, "2"]) {
      const pp = { kind: "piecewise-polynomial", degree, breaks: Float64Array.of(0, 1), coefficients: budgeted([1, 2, 3]) } as unknown as PiecewisePolynomial;
      for (const f of [
        () => findPiece(pp, 0.5),
        () => pieceCount(pp),
        () => piecesOf(pp),
        () => scalePiecewise(pp, 2),
        () => derivativeOf(pp),
        () => integralOf(pp),
      ])
        expect(issuesOf(f)).toEqual(["piecewise-invalid pp.degree"]);
      expect(issuesOf(() => addPiecewise(pp, pp))).toEqual(["piecewise-invalid a.degree"]);
    }
  });

  it("addPiecewise refuses a NaN breakpoint instead of merging forever", () => {
    const spy = vi.spyOn(Math, "min");
    let calls = 0;
    spy.mockImplementation((...v: number[]) => {
      if (++calls > 10_000) throw new Error("work budget exceeded: the merge does not terminate");
      return v.reduce((a, b) => (a < b || Number.isNaN(a) ? a : b), Infinity);
    });
    const a = piecewisePolynomial([0, 1, 2], [1, 2], 0);
    const nan = { kind: "piecewise-polynomial", degree: 0, breaks: Float64Array.of(0, Number.NaN, 2), coefficients: Float64Array.of(1, 2) } as unknown as PiecewisePolynomial;
    expect(issuesOf(() => addPiecewise(a, nan))).toEqual(["piecewise-invalid b.breaks.1"]);
    expect(issuesOf(() => addPiecewise(nan, a))).toEqual(["piecewise-invalid a.breaks.1"]);
  });

  it("breakpoints and coefficients of a hand-made polynomial are checked once, as piecewisePolynomial checks them", () => {
    const make = (breaks: number[], coefficients: number[], degree = 0) =>
      ({ kind: "piecewise-polynomial", degree, breaks: Float64Array.from(breaks), coefficients: Float64Array.from(coefficients) }) as unknown as PiecewisePolynomial;
    expect(issuesOf(() => evaluatePiecewise(make([0, 2, 1], [1, 2]), 0.5))).toEqual(["piecewise-invalid pp.breaks.2"]);
    expect(issuesOf(() => evaluatePiecewiseMany(make([0, Infinity], [1]), [0.5]))).toEqual(["piecewise-invalid pp.breaks.1"]);
    expect(issuesOf(() => extremesOf(make([0, 1], [Number.NaN])))).toEqual(["piecewise-invalid pp.coefficients.0"]);
    expect(issuesOf(() => rootsOf(make([0, 1], [1, 2])))).toEqual(["piecewise-invalid pp.coefficients"]);
    expect(issuesOf(() => rootsOf(make([0], [])))).toEqual(["piecewise-invalid pp.breaks"]);
    // a structured clone of a valid one is accepted (checked on first use)
    const good = structuredClone(piecewisePolynomial([0, 1, 2], [1, 2], 0));
    expect(evaluatePiecewise(good, 1.5)).toBe(2);
  });

  it("evaluatePolynomial and polynomialRootsIn refuse a degree or offset they cannot use", () => {
    const c = budgetedList([1, 2, 3]);
    expect(issuesOf(() => evaluatePolynomial(c, 0, Infinity, 1))).toEqual(["polynomial-invalid degree"]);
    expect(issuesOf(() => evaluatePolynomial(c, 0, 3, 1))).toEqual(["polynomial-invalid degree"]);
    expect(issuesOf(() => evaluatePolynomial(c, -1, 1, 1))).toEqual(["polynomial-invalid offset"]);
    expect(issuesOf(() => polynomialRootsIn(c, 0, Infinity, 0, 1, []))).toEqual(["polynomial-invalid degree"]);
    expect(issuesOf(() => polynomialRootsIn(c, 0, 9, 0, 1, []))).toEqual(["polynomial-invalid degree"]);
    expect(issuesOf(() => polynomialRootsIn(c, 0.5, 1, 0, 1, []))).toEqual(["polynomial-invalid offset"]);
  });
});
