import { describe, expect, it } from "vitest";
import { fc, test } from "@fast-check/vitest";
import {
  circle,
  firstMomentAbove,
  rotateSection,
  iSection,
  section,
  sectionProperties,
  tryAngle,
  tryBuiltUp,
  tryChannel,
  tryCircle,
  tryISection,
  tryPipe,
  tryPlateGirder,
  tryRectangle,
  tryRectangularHollow,
  tryTee,
} from "../../src/section/index.js";
import { anyPart } from "./arbitraries.js";

describe("firstMomentAbove(circular segment)", () => {
  it("firstMomentAbove(circle, h) is 2/3 (r^2 - h^2)^(3/2) with chord 2 sqrt(r^2 - h^2)", () => {
    // common practice: the circular segment above a chord at height h, by integration of 2 sqrt(r^2 - y^2) y dy
    const r = 25;
    for (const h of [-24.5, -10, 0, 7.5, 20, 24.99]) {
      const q = firstMomentAbove(circle({ diameter: 2 * r }), h);
      expect(Math.abs(q.firstMoment - (2 / 3) * (r * r - h * h) ** 1.5)).toBeLessThan(1e-10 * r ** 3);
      expect(Math.abs(q.width - 2 * Math.sqrt(r * r - h * h))).toBeLessThan(1e-12 * r);
      expect(Math.abs(q.areaAbove - (r * r * Math.acos(h / r) - h * Math.sqrt(r * r - h * h)))).toBeLessThan(1e-10 * r * r);
    }
  });

  it("rotateSection by a quarter turn is exact: an I on its side has I_z = the upright I_y", () => {
    // common practice: a quarter turn swaps the axes
    const beam = iSection({ depth: 300, flangeWidth: 150, flangeThickness: 10, webThickness: 6, rootRadius: 8 });
    const a = sectionProperties(beam);
    const b = sectionProperties(rotateSection(beam, Math.PI / 2));
    expect(Math.abs(b.secondMomentZ - a.secondMomentY)).toBeLessThan(1e-9 * a.secondMomentY);
    expect(b.boundingBox).toEqual({ zMin: -150, zMax: 150, yMin: -75, yMax: 75 });
  });
});

describe("firstMomentAbove laws", () => {
  test.prop([anyPart(), fc.double({ min: 0.02, max: 0.98, noNaN: true })], { numRuns: 150 })(
    "dQ/dy_cut = -(y_cut - y_c) b: the width is the rate at which area leaves the cut",
    (part, at) => {
      const s = section([part]);
      const p = sectionProperties(s);
      const { yMin, yMax } = p.boundingBox;
      const size = yMax - yMin;
      const c = yMin + at * size;
      const h = 1e-6 * size;
      const q = firstMomentAbove(s, c);
      const slope = (firstMomentAbove(s, c + h).firstMoment - firstMomentAbove(s, c - h).firstMoment) / (2 * h);
      const expected = -(c - p.centroid.y) * ((q.widthAbove + q.widthBelow) / 2);
      const scale = Math.max(q.widthAbove, q.widthBelow, 1e-3 * size) * size;
      expect(Math.abs(slope - expected)).toBeLessThanOrEqual(1e-4 * scale);
      expect(q.firstMoment).toBeGreaterThanOrEqual(-1e-9 * p.area * size);
    },
  );
});

describe("shape functions' non-throwing forms", () => {
  it("each try form returns the error instead of throwing, and the section when valid", () => {
    expect(tryRectangle({ width: -1, depth: 2 }).ok).toBe(false);
    expect(tryCircle({ diameter: 2 }).ok).toBe(true);
    expect(tryPipe({ outsideDiameter: 10, wallThickness: 5 }).ok).toBe(false);
    expect(tryISection({ depth: 20, flangeWidth: 100, flangeThickness: 10, webThickness: 6 }).ok).toBe(false);
    expect(tryTee({ depth: 100, flangeWidth: 100, flangeThickness: 10, webThickness: 6 }).ok).toBe(true);
    expect(tryRectangularHollow({ width: 10, depth: 20, wallThickness: 5 }).ok).toBe(false);
    expect(tryChannel({ depth: 200, flangeWidth: 75, flangeThickness: 11, webThickness: 7 }).ok).toBe(true);
    expect(tryAngle({ verticalLeg: 50, thickness: 60 }).ok).toBe(false);
    expect(tryPlateGirder({ topFlange: { width: 400, thickness: 30 }, web: { width: 1500, thickness: 12 } }).ok).toBe(true);
    const r = tryBuiltUp([]);
    expect(r.ok ? "ok" : r.error.code).toBe("section-empty");
  });
});
