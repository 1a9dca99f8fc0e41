import { describe, expect, it } from "vitest";
import { fc, test } from "@fast-check/vitest";
import { factorBandedSymmetric, solveBandedSymmetric } from "../../src/math/index.js";

describe("factorBandedSymmetric and solveBandedSymmetric", () => {
  it("solve([[4, 2], [2, 3]], [6, 5]) = [1, 1]", () => {
    const band = Float64Array.of(4, 2, 3, 0);
    expect(factorBandedSymmetric(band, 2, 1).singularAt).toBe(-1);
    expect(Array.from(solveBandedSymmetric(band, 2, 1, Float64Array.of(6, 5)))).toEqual([1, 1]);
  });

  it("reports the first vanishing pivot of a singular matrix", () => {
    const band = Float64Array.of(1, -1, 1, 0); // [[1, -1], [-1, 1]]
    expect(factorBandedSymmetric(band, 2, 1)).toEqual({ singularAt: 1, smallestPivotRatio: 0, smallestPivotAt: 1 });
  });

  test.prop([fc.integer({ min: 1, max: 30 }), fc.integer({ min: 0, max: 4 }), fc.array(fc.double({ min: -1, max: 1, noNaN: true }), { minLength: 200, maxLength: 200 })])(
    "solves a random diagonally dominant banded system to rounding",
    (n, w, seed) => {
      const s = w + 1;
      const dense = Array.from({ length: n }, () => new Array<number>(n).fill(0));
      const band = new Float64Array(n * s);
      let r = 0;
      for (let i = 0; i < n; i++)
        for (let j = 1; j <= w && i + j < n; j++) {
          const v = seed[r++ % seed.length]!;
          band[i * s + j] = v;
          dense[i]![i + j] = v;
          dense[i + j]![i] = v;
        }
      for (let i = 0; i < n; i++) {
        band[i * s] = 2 * w + 1;
        dense[i]![i] = 2 * w + 1;
      }
      const x = Array.from({ length: n }, (_, i) => seed[(i * 7) % seed.length]!);
      const b = Float64Array.from(dense.map((row) => row.reduce((acc, v, j) => acc + v * x[j]!, 0)));
      expect(factorBandedSymmetric(band, n, w).singularAt).toBe(-1);
      const got = solveBandedSymmetric(band, n, w, b);
      x.forEach((xi, i) => expect(got[i]).toBeCloseTo(xi, 10));
    },
  );
});
