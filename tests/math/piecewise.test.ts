import { describe, expect, it } from "vitest";
import { fc, test } from "@fast-check/vitest";
import {
  addPiecewise,
  derivativeOf,
  evaluatePiecewise,
  evaluatePiecewiseMany,
  extremesOf,
  findPiece,
  integralOf,
  pieceCount,
  piecesOf,
  piecewisePolynomial,
  rootsOf,
  scalePiecewise,
} from "../../src/math/index.js";
import { isFlexuraError } from "../../src/errors/index.js";

const step = piecewisePolynomial([0, 1, 2], [1, 3], 0);

/** A random piecewise polynomial with sorted breaks on [0, span]. */
const arbPiecewise = (maxDegree: number) =>
  fc
    .record({
      cuts: fc.uniqueArray(fc.integer({ min: 1, max: 99 }), { maxLength: 5 }),
      degree: fc.integer({ min: 0, max: maxDegree }),
      seed: fc.array(fc.double({ min: -10, max: 10, noNaN: true }), { minLength: 60, maxLength: 60 }),
    })
    .map(({ cuts, degree, seed }) => {
      const breaks = [0, ...cuts.sort((a, b) => a - b).map((c) => c / 10), 10];
      const n = (breaks.length - 1) * (degree + 1);
      return piecewisePolynomial(breaks, seed.slice(0, n), degree);
    });

describe("piecewisePolynomial", () => {
  it("evaluatePiecewise(step, breakpoint) takes the left or right limit", () => {
    expect(evaluatePiecewise(step, 1, "left")).toBe(1);
    expect(evaluatePiecewise(step, 1, "right")).toBe(3);
    expect(evaluatePiecewise(step, 1)).toBe(3);
    expect(evaluatePiecewise(step, 2)).toBe(3);
    // a side pointing off the domain at an end: the function is zero off its domain
    expect(evaluatePiecewise(step, 0, "left")).toBe(0);
    expect(evaluatePiecewise(step, 2, "right")).toBe(0);
    expect(evaluatePiecewise(step, 0)).toBe(1);
    expect(findPiece(step, 2, "right")).toBe(1);
    expect(pieceCount(step)).toBe(2);
  });

  it("uses a local basis on each piece", () => {
    const pp = piecewisePolynomial([0, 1, 3], [0, 2, 2, -1], 1);
    expect(evaluatePiecewise(pp, 2)).toBe(1);
    expect(piecesOf(pp)).toEqual([
      { from: 0, to: 1, coefficients: [0, 2] },
      { from: 1, to: 3, coefficients: [2, -1] },
    ]);
  });

  it("rejects bad breakpoints, degrees and coefficient counts, and points off the domain", () => {
    const codes = (f: () => unknown) => {
      try {
        f();
      } catch (e) {
        return isFlexuraError(e) ? e.issues.map((i) => `${i.code} ${i.path.join(".")}`) : ["other"];
      }
      return [];
    };
    expect(codes(() => piecewisePolynomial([0, 0], [1], 0))).toEqual(["piecewise-invalid breaks.1"]);
    expect(codes(() => piecewisePolynomial([0], [], 0))).toEqual(["piecewise-invalid breaks"]);
    expect(codes(() => piecewisePolynomial([0, 1], [1], 1.5))).toEqual(["piecewise-invalid degree"]);
    expect(codes(() => piecewisePolynomial([0, 1], [1, 2, 3], 1))).toEqual(["piecewise-invalid coefficients"]);
    expect(codes(() => piecewisePolynomial([0, 1], [Number.NaN], 0))).toEqual(["piecewise-invalid coefficients.0"]);
    expect(codes(() => evaluatePiecewise(step, 2.5))).toEqual(["outside-domain x"]);
    expect(codes(() => evaluatePiecewise(step, Number.NaN))).toEqual(["outside-domain x"]);
    expect(codes(() => evaluatePiecewiseMany(step, [0, 5]))).toEqual(["outside-domain xs.1"]);
    expect(codes(() => extremesOf(step, 1, 3))).toEqual(["outside-domain lo"]);
    expect(codes(() => rootsOf(step, -1, 1))).toEqual(["outside-domain lo"]);
    expect(codes(() => addPiecewise(step, piecewisePolynomial([0, 3], [1], 0)))).toEqual(["domain-mismatch "]);
    expect(codes(() => scalePiecewise(step, Number.NaN))).toEqual(["not-finite factor"]);
    expect(codes(() => integralOf(step, Infinity))).toEqual(["not-finite constant"]);
  });

  test.prop([arbPiecewise(5), fc.array(fc.double({ min: 0, max: 10, noNaN: true }), { maxLength: 20 })])(
    "evaluatePiecewiseMany agrees with evaluatePiecewise at every point, sorted or not",
    (pp, xs) => {
      const many = evaluatePiecewiseMany(pp, xs);
      xs.forEach((x, i) => expect(many[i]).toBe(evaluatePiecewise(pp, x)));
      const sorted = [...xs].sort((a, b) => a - b);
      const out = new Float64Array(sorted.length);
      expect(evaluatePiecewiseMany(pp, sorted, out)).toBe(out);
      sorted.forEach((x, i) => expect(out[i]).toBe(evaluatePiecewise(pp, x)));
    },
  );

  test.prop([arbPiecewise(5), arbPiecewise(5), fc.double({ min: 0, max: 10, noNaN: true }), fc.double({ min: -3, max: 3, noNaN: true })])(
    "addPiecewise and scalePiecewise act pointwise",
    (a, b, x, k) => {
      const sum = addPiecewise(a, b);
      const va = evaluatePiecewise(a, x);
      const vb = evaluatePiecewise(b, x);
      const scale = 1e-9 * (1 + Math.abs(va) + Math.abs(vb));
      expect(Math.abs(evaluatePiecewise(sum, x) - (va + vb))).toBeLessThanOrEqual(scale * 1e3);
      expect(evaluatePiecewise(scalePiecewise(a, k), x)).toBeCloseTo(k * va, 6);
    },
  );

  test.prop([arbPiecewise(5), fc.double({ min: 0.001, max: 9.999, noNaN: true }), fc.double({ min: -5, max: 5, noNaN: true })])(
    "integralOf is continuous and differentiates back; derivativeOf matches a central difference",
    (pp, x, c) => {
      const F = integralOf(pp, c);
      expect(evaluatePiecewise(F, 0) === c).toBe(true);
      for (let i = 1; i < pp.breaks.length - 1; i++) {
        const b = pp.breaks[i]!;
        expect(evaluatePiecewise(F, b, "left")).toBeCloseTo(evaluatePiecewise(F, b, "right"), 9);
      }
      const back = derivativeOf(F);
      expect(evaluatePiecewise(back, x)).toBeCloseTo(evaluatePiecewise(pp, x), 9);
    },
  );

  it("derivativeOf a constant is zero; integralOf a step is a ramp", () => {
    expect(Array.from(derivativeOf(step).coefficients)).toEqual([0, 0]);
    const ramp = integralOf(step);
    expect(evaluatePiecewise(ramp, 1)).toBe(1);
    expect(evaluatePiecewise(ramp, 2)).toBe(4);
  });
});

describe("extremesOf and rootsOf", () => {
  it("extremesOf(2x - x^2) is 1 at x = 1", () => {
    const pp = piecewisePolynomial([0, 2], [0, 2, -1], 2);
    expect(extremesOf(pp)).toEqual({ max: { value: 1, at: 1 }, min: { value: 0, at: 0 } });
    expect(extremesOf(pp, 1.5, 2)).toEqual({ max: { value: 0.75, at: 1.5 }, min: { value: 0, at: 2 } });
  });

  it("extremesOf reports a peak at a piece end at the exact breakpoint", () => {
    // 1.4 + (6.2 - 1.4) is not 6.2 in float64: the location must still be the breakpoint itself
    const pp = piecewisePolynomial([0, 1.4, 6.2, 10], [0, 0, 0, 0, 0, 0, 0, 0, 0, 0, 0, 3.9245856681478355e-13, 0, 0, 0, 0, 0, 0], 5);
    const { max } = extremesOf(pp);
    expect(max.at).toBe(6.2);
    expect(evaluatePiecewise(pp, max.at, "left")).toBe(max.value);
  });

  it("extremesOf counts both limits at a jump", () => {
    expect(extremesOf(step)).toEqual({ max: { value: 3, at: 1 }, min: { value: 1, at: 0 } });
  });

  it("rootsOf finds a root shared by two pieces once and none on a zero piece", () => {
    const pp = piecewisePolynomial([0, 1, 2, 3], [-1, 1, 0, 1, 0, 0], 1);
    expect(rootsOf(pp)).toEqual([1]);
  });

  it("rootsOf a quintic with five known roots finds all five (bracketed, not closed form)", () => {
    // (x-1)(x-2)(x-3)(x-4)(x-5) = x^5 - 15x^4 + 85x^3 - 225x^2 + 274x - 120
    const pp = piecewisePolynomial([0, 6], [-120, 274, -225, 85, -15, 1], 5);
    const roots = rootsOf(pp);
    expect(roots).toHaveLength(5);
    roots.forEach((r, i) => expect(r).toBeCloseTo(i + 1, 12));
  });

  it("rootsOf finds a double root where the polynomial only touches zero", () => {
    const pp = piecewisePolynomial([0, 4], [4, -4, 1], 2); // (x - 2)^2
    expect(rootsOf(pp)).toEqual([2]);
    const quartic = piecewisePolynomial([0, 4], [4, -4, 1, 0, 0.0], 4);
    expect(rootsOf(quartic)).toEqual([2]);
    const cubic = piecewisePolynomial([0, 4], [-4, 8, -5, 1], 3); // (x-1)(x-2)^2
    expect(rootsOf(cubic)[0]).toBeCloseTo(1, 12);
    expect(rootsOf(cubic)[1]).toBeCloseTo(2, 7);
  });

  test.prop([fc.uniqueArray(fc.integer({ min: -20, max: 20 }), { minLength: 1, maxLength: 5 }), fc.double({ min: 0.1, max: 3, noNaN: true })])(
    "rootsOf a polynomial built from its distinct roots finds each of them",
    (quarters, lead) => {
      const wanted = quarters.map((q) => q / 4);
      // p(x) = lead * prod (x - r) on [-6, 6]
      let coeffs = [lead];
      for (const r of wanted) {
        const next = new Array<number>(coeffs.length + 1).fill(0);
        coeffs.forEach((c, k) => {
          next[k + 1]! += c;
          next[k]! -= r * c;
        });
        coeffs = next;
      }
      // local basis at -6: shift by evaluating Taylor coefficients via derivatives
      const shifted = piecewisePolynomial([-6, 6], taylorAt(coeffs, -6), coeffs.length - 1);
      const found = rootsOf(shifted);
      for (const r of wanted) {
        const nearest = Math.min(...found.map((f) => Math.abs(f - r)));
        expect(nearest).toBeLessThan(1e-7);
      }
      expect(found.length).toBe(wanted.length);
    },
  );

  test.prop([arbPiecewise(5)])("extremesOf bounds every sampled value and is attained", (pp) => {
    const { max, min } = extremesOf(pp);
    const scale = 1e-9 * (1 + Math.abs(max.value) + Math.abs(min.value));
    for (let i = 0; i <= 50; i++) {
      const x = (10 * i) / 50;
      const v = evaluatePiecewise(pp, x);
      expect(v).toBeLessThanOrEqual(max.value + scale);
      expect(v).toBeGreaterThanOrEqual(min.value - scale);
    }
    const atMax = Math.max(evaluatePiecewise(pp, max.at, "left"), evaluatePiecewise(pp, max.at, "right"));
    expect(Math.abs(atMax - max.value)).toBeLessThanOrEqual(scale);
  });
});

/** Coefficients of p(x) in powers of (x - s). */
function taylorAt(c: number[], s: number): number[] {
  const out = [...c];
  const d = out.length - 1;
  for (let i = 0; i < d; i++) for (let k = d - 1; k >= i; k--) out[k]! += s * out[k + 1]!;
  return out;
}
