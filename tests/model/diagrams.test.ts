import { fc, test } from "@fast-check/vitest";
import { describe, expect } from "vitest";
import { attempt } from "../../src/errors/index.js";
import { evaluatePiecewise, piecewisePolynomial } from "../../src/math/index.js";
import { evaluateDiagram } from "../../src/model/index.js";
import { diagramInModelUnits } from "../../src/model/diagrams.js";
import { diagramValueAt } from "../../src/report/index.js";

// A random piecewise polynomial (the law needs no published value: the math layer's reading is the reference).
const piecewise = fc
  .record({
    widths: fc.array(fc.double({ min: 0.05, max: 5, noNaN: true }), { minLength: 1, maxLength: 5 }),
    start: fc.double({ min: -10, max: 10, noNaN: true }),
    degree: fc.integer({ min: 0, max: 3 }),
    seed: fc.array(fc.double({ min: -100, max: 100, noNaN: true }), { minLength: 24, maxLength: 24 }),
  })
  .map(({ widths, start, degree, seed }) => {
    const breaks = [start];
    for (const w of widths) breaks.push((breaks[breaks.length - 1] as number) + w);
    const coefficients = Array.from({ length: widths.length * (degree + 1) }, (_, i) => seed[i % seed.length] as number);
    return piecewisePolynomial(breaks, coefficients, degree);
  });

describe("evaluateDiagram and diagramValueAt read as evaluatePiecewise does", () => {
  test.prop([piecewise, fc.double({ min: -0.2, max: 1.2, noNaN: true }), fc.constantFrom(undefined, "left" as const, "right" as const), fc.integer({ min: 0, max: 4 })], { numRuns: 200, seed: 13 })(
    "evaluateDiagram(x, side) equals evaluatePiecewise(x, side) or both refuse with outside-domain",
    (pp, u, side, snap) => {
      const x0 = pp.breaks[0] as number;
      const x1 = pp.breaks[pp.breaks.length - 1] as number;
      // sometimes exactly on an end, a breakpoint, or a hair past an end
      const x = snap === 0 ? x0 : snap === 1 ? x1 : snap === 2 ? x1 + 1e-10 * (x1 - x0) : snap === 3 ? (pp.breaks[1] as number) : x0 + u * (x1 - x0);
      const d = diagramInModelUnits(pp, 1, 1, "kN");
      const expected = attempt(() => evaluatePiecewise(pp, x, side));
      for (const read of [() => evaluateDiagram(d, x, side), () => diagramValueAt(d, x, side)]) {
        const got = attempt(read);
        expect(got.ok).toBe(expected.ok);
        if (expected.ok && got.ok) expect(got.value).toBeCloseTo(expected.value, 9);
        if (!expected.ok && !got.ok) expect(got.error.issues[0]?.code).toBe(expected.error.issues[0]?.code);
      }
    },
  );
});
