import { describe, expect } from "vitest";
import { fc, test } from "@fast-check/vitest";
import { evaluatePiecewise, evaluatePiecewiseMany, extremesOf, piecewisePolynomial, rootsOf } from "../../src/math/index.js";

/** A random piecewise polynomial of degree 0 to 8 on [0, 10], with breakpoints that include the points' favourites. */
const arbPiecewise = fc
  .record({
    cuts: fc.uniqueArray(fc.integer({ min: 1, max: 99 }), { maxLength: 6 }),
    degree: fc.integer({ min: 0, max: 8 }),
    // coefficients of engineering size (subnormal ones test float64, not the algorithms)
    seed: fc.array(fc.integer({ min: -1000, max: 1000 }).map((k) => k / 100), { minLength: 63, maxLength: 63 }),
  })
  .map(({ cuts, degree, seed }) => {
    const breaks = [0, ...cuts.sort((a, b) => a - b).map((c) => c / 10), 10];
    return piecewisePolynomial(breaks, seed.slice(0, (breaks.length - 1) * (degree + 1)), degree);
  });

/** Points on [0, 10], breakpoints and ends among them, sorted or shuffled. */
const arbPoints = fc.array(fc.oneof(fc.double({ min: 0, max: 10, noNaN: true }), fc.integer({ min: 0, max: 100 }).map((k) => k / 10)), { maxLength: 40 });

describe("evaluatePiecewiseMany (run-by-run evaluation)", () => {
  test.prop([arbPiecewise, arbPoints, fc.boolean()], { numRuns: 150 })(
    "evaluatePiecewiseMany(any degree, sorted or unsorted points) equals evaluatePiecewise bit for bit",
    (pp, xs, sort) => {
      const points = sort ? [...xs].sort((a, b) => a - b) : xs;
      const many = evaluatePiecewiseMany(pp, Float64Array.from(points));
      points.forEach((x, i) => expect(Object.is(many[i], evaluatePiecewise(pp, x))).toBe(true));
    },
  );

  test.prop([arbPiecewise, arbPoints], { numRuns: 100 })("evaluatePiecewiseMany(a point off the domain) throws outside-domain at its index", (pp, xs) => {
    const points = [...xs, 10.5];
    expect(() => evaluatePiecewiseMany(pp, points)).toThrow(/10\.5/);
  });
});

describe("extremesOf and rootsOf with the one-sign shortcut", () => {
  // A piece that keeps one sign needs no root finding; the answers must equal those found by
  // sampling densely (common practice: a bound attained at a sampled point, within rounding).
  test.prop([arbPiecewise], { numRuns: 100 })("extremesOf bounds dense samples of any degree", (pp) => {
    const { max, min } = extremesOf(pp);
    const scale = 1 + Math.abs(max.value) + Math.abs(min.value);
    let worst = 0;
    for (let k = 0; k <= 400; k++) {
      const v = evaluatePiecewise(pp, k / 40);
      worst = Math.max(worst, v - max.value, min.value - v);
    }
    expect(worst).toBeLessThanOrEqual(1e-9 * scale);
  });

  test.prop([arbPiecewise], { numRuns: 100 })("rootsOf finds a root wherever dense samples change sign inside a piece", (pp) => {
    const roots = rootsOf(pp);
    const b = pp.breaks;
    for (let i = 0; i + 1 < b.length; i++) {
      const x0 = b[i] as number;
      const x1 = b[i + 1] as number;
      let previous = evaluatePiecewise(pp, x0);
      for (let k = 1; k <= 50; k++) {
        const x = k === 50 ? x1 : Math.min(x0 + ((x1 - x0) * k) / 50, x1);
        const v = evaluatePiecewise(pp, x, "left");
        if ((previous < 0 && v > 0) || (previous > 0 && v < 0)) {
          const lo = Math.min(x0 + ((x1 - x0) * (k - 1)) / 50, x1);
          expect(roots.some((r) => r >= lo - 1e-9 && r <= x + 1e-9)).toBe(true);
        }
        previous = v;
      }
    }
  });
});
