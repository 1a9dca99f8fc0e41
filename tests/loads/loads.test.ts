import { describe, expect, it } from "vitest";
import { fc, test } from "@fast-check/vitest";
import { coupleLoad, linearLoad, loadResultant, pointLoad, uniformLoad } from "../../src/loads/index.js";

describe("loads", () => {
  it("builders make plain tagged data, with a case when named", () => {
    expect(pointLoad(2, 10)).toEqual({ kind: "point", at: 2, value: 10 });
    expect(pointLoad(2, 10, "live")).toEqual({ kind: "point", at: 2, value: 10, case: "live" });
    expect(coupleLoad(1, 3, "dead")).toEqual({ kind: "couple", at: 1, value: 3, case: "dead" });
    expect(coupleLoad(1, 3)).toEqual({ kind: "couple", at: 1, value: 3 });
    expect(uniformLoad(0, 6, 2)).toEqual({ kind: "distributed", from: 0, to: 6, start: 2, end: 2 });
    expect(linearLoad(0, 6, 0, 3, "snow")).toEqual({ kind: "distributed", from: 0, to: 6, start: 0, end: 3, case: "snow" });
  });

  it("loadResultant of a triangular load acts at two thirds of its length", () => {
    // Resultant of a triangular load: w L / 2 at 2L/3 from the zero end (common practice)
    const r = loadResultant([linearLoad(3, 9, 0, 4)]);
    expect(r.force).toBeCloseTo(12, 12);
    expect(r.moment).toBeCloseTo(-12 * (3 + 4), 12);
    expect(loadResultant([pointLoad(2, 10), coupleLoad(5, 7)])).toEqual({ force: 10, moment: -13 });
  });

  test.prop([fc.double({ min: 0, max: 10, noNaN: true }), fc.double({ min: 0.1, max: 10, noNaN: true }), fc.double({ min: -5, max: 5, noNaN: true }), fc.double({ min: -5, max: 5, noNaN: true })])(
    "loadResultant of a trapezoid equals the sum of a uniform and a triangular part",
    (from, span, start, end) => {
      const to = from + span;
      const whole = loadResultant([linearLoad(from, to, start, end)]);
      const parts = loadResultant([linearLoad(from, to, start, start), linearLoad(from, to, 0, end - start)]);
      expect(whole.force).toBeCloseTo(parts.force, 8);
      expect(whole.moment).toBeCloseTo(parts.moment, 7);
    },
  );
});
