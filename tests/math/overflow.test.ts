import { describe, expect, it } from "vitest";
import { addPiecewise, derivativeOf, evaluatePiecewise, evaluatePiecewiseMany, extremesOf, integralOf, piecewisePolynomial, rootsOf, scalePiecewise } from "../../src/math/index.js";
import { issuesOf } from "./helpers.js";

// Values near 1e308 (Number.MAX_VALUE is about 1.798e308, IEEE 754-2019 binary64): arithmetic that
// would overflow to Infinity, or to NaN as Infinity - Infinity, is refused with piecewise-overflow.
const huge = piecewisePolynomial([0, 1, 2], [1e308, 1e308, -1e308, 1e308], 1);

describe("overflow near the largest double is refused, never returned as Infinity or NaN", () => {
  it("addPiecewise, scalePiecewise, derivativeOf and integralOf refuse results beyond a double", () => {
    expect(issuesOf(() => addPiecewise(huge, huge))).toEqual(["piecewise-overflow "]);
    expect(issuesOf(() => scalePiecewise(huge, 10))).toEqual(["piecewise-overflow "]);
    expect(issuesOf(() => derivativeOf(piecewisePolynomial([0, 1], [0, 0, 0, 0, 0, 0, 0, 0, 1e308], 8)))).toEqual(["piecewise-overflow "]);
    expect(issuesOf(() => integralOf(piecewisePolynomial([0, 10], [1e308], 0)))).toEqual(["piecewise-overflow "]);
    // the sum of +1e308 and -1e308 pieces stays finite and is kept
    expect(addPiecewise(huge, scalePiecewise(huge, -1)).coefficients.every((c) => c === 0)).toBe(true);
  });

  it("evaluation that overflows is refused", () => {
    const steep = piecewisePolynomial([0, 10], [0, 0, 0, 0, 0, 0, 0, 0, 1e308], 8);
    expect(issuesOf(() => evaluatePiecewise(steep, 10))).toEqual(["piecewise-overflow x"]);
    expect(evaluatePiecewise(steep, 1)).toBe(1e308);
    expect(issuesOf(() => evaluatePiecewiseMany(steep, [1, 10]))).toEqual(["piecewise-overflow xs.1"]);
    expect(issuesOf(() => extremesOf(steep))).toEqual(["piecewise-overflow pp"]);
    // Infinity - Infinity inside Horner's rule would give NaN
    const cancel = piecewisePolynomial([0, 10], [0, 1e308, -1e308], 2);
    expect(issuesOf(() => evaluatePiecewise(cancel, 10))).toEqual(["piecewise-overflow x"]);
  });

  it("roots of polynomials with huge coefficients are found (roots do not change when a polynomial is scaled)", () => {
    // 1e308 (t - 1)(t - 2)(t - 3) = 1e308 (t^3 - 6 t^2 + 11 t - 6): roots 1, 2, 3 (common practice)
    const big = piecewisePolynomial([0, 4], [-6e307, 11e307, -6e307, 1e307], 3);
    const r = rootsOf(big);
    expect(r.length).toBe(3);
    [1, 2, 3].forEach((x, i) => expect(r[i]).toBeCloseTo(x, 12));
    // the quadratic closed form: 1e200 t^2 - 1e200 = 0 at t = 1 (its discriminant overflows unscaled)
    expect(rootsOf(piecewisePolynomial([0, 2], [-1e200, 0, 1e200], 2))).toEqual([1]);
    // 1e300 (t^2 + t - 3) with t = x + 2: t = (-1 + sqrt(13)) / 2, x = t - 2 (the quadratic formula, common practice)
    expect(rootsOf(piecewisePolynomial([-2, 2], [-3e300, 1e300, 1e300], 2))[0]).toBeCloseTo((Math.sqrt(13) - 1) / 2 - 2, 14);
    // subnormal coefficients: 5e-324 (t^2 - 4) has roots at t = 2 (squares of these underflow to zero unscaled)
    expect(rootsOf(piecewisePolynomial([0, 3], [-4 * 5e-324, 0, 5e-324], 2))).toEqual([2]);
  });
});
