import { describe, expect, it } from "vitest";
import { fc, test } from "@fast-check/vitest";
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
import { budgeted, issuesOf } from "./helpers.js";

const line = piecewisePolynomial([0, 1, 3], [0, 2, 2, -1], 1);
const any = (v: unknown) => v as never;

describe("missing, null and wrongly typed arguments give typed errors", () => {
  it("extremesOf, rootsOf and the other functions of a piecewise polynomial refuse null and undefined", () => {
    for (const bad of [null, undefined, 5, "pp", {}, { kind: "piecewise-polynomial" }]) {
      for (const f of [extremesOf, rootsOf, pieceCount, piecesOf, derivativeOf, integralOf]) expect(issuesOf(() => f(any(bad)))[0]).toMatch(/^piecewise-invalid pp/);
      expect(issuesOf(() => evaluatePiecewise(any(bad), 0))[0]).toMatch(/^piecewise-invalid pp/);
      expect(issuesOf(() => evaluatePiecewiseMany(any(bad), [0]))[0]).toMatch(/^piecewise-invalid pp/);
      expect(issuesOf(() => findPiece(any(bad), 0))[0]).toMatch(/^piecewise-invalid pp/);
      expect(issuesOf(() => scalePiecewise(any(bad), 1))[0]).toMatch(/^piecewise-invalid pp/);
      expect(issuesOf(() => addPiecewise(any(bad), line))[0]).toMatch(/^piecewise-invalid a/);
      expect(issuesOf(() => addPiecewise(line, any(bad)))[0]).toMatch(/^piecewise-invalid b/);
    }
  });

  it("piecewisePolynomial refuses breaks or coefficients that are not lists", () => {
    expect(issuesOf(() => piecewisePolynomial(any(null), any(null), 1))).toEqual(["piecewise-invalid breaks", "piecewise-invalid coefficients"]);
    expect(issuesOf(() => piecewisePolynomial([0, 1], any(undefined), 1))).toEqual(["piecewise-invalid coefficients"]);
    expect(issuesOf(() => piecewisePolynomial(any("01"), [1], 0))).toEqual(["piecewise-invalid breaks"]);
    expect(issuesOf(() => piecewisePolynomial(any([0, "1"]), [1], 0))).toEqual(["piecewise-invalid breaks.1"]);
    expect(issuesOf(() => piecewisePolynomial([0, 1], any(["1"]), 0))).toEqual(["piecewise-invalid coefficients.0"]);
    expect(issuesOf(() => piecewisePolynomial([0, 1], [1], any("0")))).toEqual(["piecewise-invalid degree"]);
  });

  it("points, sides, intervals and outputs are checked", () => {
    expect(issuesOf(() => evaluatePiecewise(line, any("0.5")))).toEqual(["not-a-number x"]);
    expect(issuesOf(() => evaluatePiecewise(line, 1, any("middle")))).toEqual(["unknown-side side"]);
    expect(issuesOf(() => findPiece(line, 1, any("up")))).toEqual(["unknown-side side"]);
    expect(issuesOf(() => findPiece(line, any(undefined)))).toEqual(["not-a-number x"]);
    expect(issuesOf(() => evaluatePiecewiseMany(line, any(null)))).toEqual(["not-an-array xs"]);
    expect(issuesOf(() => evaluatePiecewiseMany(line, any("12")))).toEqual(["not-an-array xs"]);
    expect(issuesOf(() => evaluatePiecewiseMany(line, any([0, "1"])))).toEqual(["not-a-number xs.1"]);
    expect(issuesOf(() => evaluatePiecewiseMany(line, [0, 1], new Float64Array(1)))).toEqual(["output-invalid out"]);
    expect(issuesOf(() => evaluatePiecewiseMany(line, [0, 1], any([0, 0])))).toEqual(["output-invalid out"]);
    expect(issuesOf(() => extremesOf(line, any("0"), 1))).toEqual(["not-a-number lo"]);
    expect(issuesOf(() => rootsOf(line, 0, any(null)))).toEqual(["not-a-number hi"]);
    expect(issuesOf(() => extremesOf(line, 2, 1))).toEqual(["interval-reversed hi"]);
    expect(issuesOf(() => rootsOf(line, 2, 1))).toEqual(["interval-reversed hi"]);
    expect(issuesOf(() => scalePiecewise(line, any("2")))).toEqual(["not-a-number factor"]);
    expect(issuesOf(() => integralOf(line, any("1")))).toEqual(["not-a-number constant"]);
    expect(issuesOf(() => evaluatePolynomial(any(null), 0, 1, 1))).toEqual(["polynomial-invalid coefficients"]);
    expect(issuesOf(() => evaluatePolynomial([1, 2], 0, 1, any("1")))).toEqual(["not-a-number t"]);
    expect(issuesOf(() => polynomialRootsIn([1, 2], 0, 1, 1, 0, []))).toEqual(["interval-reversed hi"]);
    expect(issuesOf(() => polynomialRootsIn([1, 2], 0, 1, 0, 1, any(null)))).toEqual(["output-invalid out"]);
    expect(issuesOf(() => polynomialRootsIn([1, Number.NaN], 0, 1, 0, 1, []))).toEqual(["polynomial-invalid coefficients.1"]);
  });

  it("the good paths still answer", () => {
    expect(findPiece(line, 1, "left")).toBe(0);
    expect(evaluatePolynomial([1, 0, 2], 0, 2, 3)).toBe(19);
    const roots: number[] = [];
    expect(polynomialRootsIn([-2, 0, 1], 0, 2, 0, 5, roots)).toBe(1);
    expect(roots[0]).toBeCloseTo(Math.SQRT2, 15); // sqrt(2), common practice
    expect(Array.from(evaluatePiecewiseMany(line, [0.5, 2], new Float64Array(3)))).toEqual([1, 1, 0]);
  });

  // Fuzz: whatever is passed, only FlexuraErrors come out (never a raw TypeError or RangeError).
  const junk = fc.oneof(
    fc.constantFrom(null, undefined, NaN, Infinity, -Infinity, 1e308, -1e-300, "", "x", "1", [], {}, { kind: "piecewise-polynomial" }),
    fc.anything(),
    fc.constant(line),
  );
  test.prop([junk, junk, junk], { numRuns: 300 })("any arguments give a value or a FlexuraError", (a, b, c) => {
    const calls: (() => unknown)[] = [
      () => evaluatePiecewise(any(a), any(b), any(c)),
      () => evaluatePiecewiseMany(any(a), any(b), any(c)),
      () => extremesOf(any(a), any(b), any(c)),
      () => rootsOf(any(a), any(b), any(c)),
      () => addPiecewise(any(a), any(b)),
      () => scalePiecewise(any(a), any(b)),
      () => integralOf(any(a), any(b)),
      () => derivativeOf(any(a)),
      () => piecesOf(any(a)),
      () => findPiece(any(a), any(b), any(c)),
      () => piecewisePolynomial(any(a), any(b), any(c)),
      () => evaluatePolynomial(any(a), any(b), any(c), 0.5),
      () => polynomialRootsIn(any(a), 0, any(b), 0, 1, any(c)),
    ];
    for (const f of calls) {
      const found = issuesOf(f);
      expect(found.filter((s) => s.startsWith("raw "))).toEqual([]);
    }
  });

  it("a hand-made copy with a getter cannot change its degree between the check and the loop", () => {
    let reads = 0;
    const sly = {
      kind: "piecewise-polynomial",
      get degree() {
        return reads++ === 0 ? 0 : Infinity;
      },
      breaks: Float64Array.of(0, 1),
      coefficients: budgeted([3]),
    } as unknown as PiecewisePolynomial;
    expect(evaluatePiecewise(sly, 0.5)).toBe(3);
    expect(extremesOf(sly).max.value).toBe(3);
  });
});
