import { describe, expect, it } from "vitest";
import { fc, test } from "@fast-check/vitest";
import { isFlexuraError } from "../../src/errors/index.js";
import { rectangularHollow, section, sectionProperties, trySection, type SectionPart } from "../../src/section/index.js";
import { boxPart } from "./arbitraries.js";

const rect = boxPart;

/** The overlap issue of section(parts), or undefined when the section is accepted. */
function overlapIssue(parts: readonly SectionPart[]): { path: readonly (string | number)[]; parts: unknown; area: number } | undefined {
  const r = trySection(parts);
  if (r.ok) return undefined;
  const found = r.error.issues.find((i) => i.code === "parts-overlap");
  if (!found) throw r.error;
  return { path: found.path, parts: found["parts"], area: found["area"] as number };
}

const opts = { numRuns: 150 };
const size = fc.double({ min: 0.5, max: 500, noNaN: true });
const fraction = fc.double({ min: 0.01, max: 0.99, noNaN: true });

describe("section(overlapping solid parts)", () => {
  // The common area of two axis-aligned rectangles is the product of the overlaps of their
  // ranges in z and in y (common practice).
  test.prop([size, size, size, size, fraction, fraction], opts)(
    "two rectangles that overlap by any amount are rejected, with the common area",
    (w1, h1, w2, h2, fz, fy) => {
      // the second rectangle's lower left corner lies inside the first
      const z0 = w1 * fz;
      const y0 = h1 * fy;
      const issue = overlapIssue([rect(0, 0, w1, h1), rect(z0, y0, z0 + w2, y0 + h2)]);
      expect(issue).toBeDefined();
      expect(issue!.path).toEqual(["parts", 1]);
      expect(issue!.parts).toEqual([0, 1]);
      const common = (Math.min(w1, z0 + w2) - z0) * (Math.min(h1, y0 + h2) - y0);
      expect(Math.abs(issue!.area - common)).toBeLessThan(1e-9 * common);
    },
  );

  test.prop([size, size, size, size, fc.double({ min: -0.99, max: 0.99, noNaN: true })], opts)(
    "two rectangles that touch edge to edge are accepted, and their areas add",
    (w1, h1, w2, h2, fy) => {
      // the second rectangle stands against the right side of the first, shifted up or down
      const y0 = h1 * fy;
      const parts = [rect(0, 0, w1, h1), rect(w1, y0, w1 + w2, y0 + h2)];
      expect(overlapIssue(parts)).toBeUndefined();
      const a = sectionProperties(section(parts)).area;
      expect(Math.abs(a - (w1 * h1 + w2 * h2))).toBeLessThan(1e-12 * a);
    },
  );

  test.prop([size, size, fraction, fraction, fraction, fraction], opts)(
    "a hole inside a solid is accepted, and so is a solid inside that hole",
    (w, h, a, b, c, d) => {
      const [z0, z1] = [w * Math.min(a, b) * 0.9, w * (Math.max(a, b) * 0.9 + 0.05)];
      const [y0, y1] = [h * Math.min(c, d) * 0.9, h * (Math.max(c, d) * 0.9 + 0.05)];
      const zm = (z0 + z1) / 2;
      const ym = (y0 + y1) / 2;
      const parts = [rect(0, 0, w, h), rect(z0, y0, z1, y1, true), rect(z0, y0, zm, ym)];
      expect(overlapIssue(parts)).toBeUndefined();
    },
  );

  it("section(plate and a bar lying across it) names both parts and the common area", () => {
    const r = trySection([rect(0, 0, 100, 10), rect(0, 10, 10, 60), rect(40, -20, 60, 30)]);
    expect(r.ok).toBe(false);
    if (r.ok || !isFlexuraError(r.error)) return;
    // common area 20 x 10 = 200 (common practice)
    expect(r.error.issues).toMatchInlineSnapshot(`
      [
        {
          "area": 199.99999999999994,
          "code": "parts-overlap",
          "message": "Solid parts 0 and 2 overlap (common area 200), so that area would count twice; trim one of them, or make the common area one part.",
          "parts": [
            0,
            2,
          ],
          "path": [
            "parts",
            2,
          ],
        },
      ]
    `);
  });

  it("section(a circle overlapping a plate) is rejected; a circle standing on it is accepted", () => {
    const plate = rect(-50, 0, 50, 10);
    expect(overlapIssue([plate, { kind: "circle", centre: { y: 15, z: 0 }, radius: 10 }])?.path).toEqual(["parts", 1]);
    expect(overlapIssue([plate, { kind: "circle", centre: { y: 20, z: 0 }, radius: 10 }])).toBeUndefined();
  });

  it("section(an L and a block in its notch) is accepted; a block reaching into the L is rejected", () => {
    const ell: SectionPart = {
      kind: "polygon",
      points: [
        { y: 0, z: 0 },
        { y: 0, z: 40 },
        { y: 10, z: 40 },
        { y: 10, z: 10 },
        { y: 40, z: 10 },
        { y: 40, z: 0 },
      ],
    };
    expect(overlapIssue([ell, rect(10, 10, 40, 40)])).toBeUndefined();
    // the block reaches 2 below the notch: common area 30 x 2 = 60 (common practice)
    expect(overlapIssue([ell, rect(10, 8, 40, 40)])?.area).toBeCloseTo(60, 9);
  });

  it("rectangularHollow(rounded corners) is accepted: its inside corners fill back the hole", () => {
    expect(() => rectangularHollow({ width: 100, depth: 150, wallThickness: 8, cornerRadius: 16 })).not.toThrow();
  });
});
