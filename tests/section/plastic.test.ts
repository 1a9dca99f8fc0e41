import { describe, expect, it } from "vitest";
import { fc, test } from "@fast-check/vitest";
import { isFlexuraError } from "../../src/errors/index.js";
import {
  circle,
  firstMomentAbove,
  iSection,
  pipe,
  plasticProperties,
  rectangle,
  section,
  sectionProperties,
  tee,
  tryPlasticProperties,
} from "../../src/section/index.js";

const close = (a: number, b: number, rel = 1e-12): void => {
  expect(Math.abs(a - b)).toBeLessThanOrEqual(rel * Math.max(1, Math.abs(b)));
};

describe("plasticProperties(closed forms)", () => {
  it("plasticProperties(rectangle) gives Z = b d^2 / 4 and a shape factor of 1.5", () => {
    // common practice: plastic modulus of a rectangle b d^2 / 4, shape factor 1.5
    const p = plasticProperties(rectangle({ width: 100, depth: 200 }));
    close(p.plasticModulusZ, (100 * 200 ** 2) / 4);
    close(p.plasticModulusY, (200 * 100 ** 2) / 4);
    close(p.shapeFactorZ, 1.5);
    close(p.shapeFactorY, 1.5);
    expect(p.neutralAxisY).toBe(0);
    expect(p.plasticMoment).toBeNull();
  });

  it("plasticProperties(circle) gives Z = d^3 / 6 and a shape factor of 16 / (3 pi)", () => {
    // common practice: plastic modulus of a solid circle d^3 / 6, shape factor 16 / (3 pi) = 1.70
    const d = 60;
    const p = plasticProperties(circle({ diameter: d }));
    close(p.plasticModulusZ, d ** 3 / 6);
    close(p.shapeFactorZ, 16 / (3 * Math.PI));
    close(p.shapeFactorY, 16 / (3 * Math.PI));
  });

  it("plasticProperties(pipe) gives Z = (D^3 - d^3) / 6", () => {
    // common practice: plastic modulus of a round tube (D^3 - d^3) / 6
    const p = plasticProperties(pipe({ outsideDiameter: 100, wallThickness: 6 }));
    close(p.plasticModulusZ, (100 ** 3 - 88 ** 3) / 6);
  });

  it("plasticProperties(tee) puts the neutral axis where the areas balance", () => {
    // common practice: the plastic neutral axis halves the area (here it lies in the flange)
    const p = plasticProperties(tee({ depth: 150, flangeWidth: 150, flangeThickness: 12, webThickness: 8 }));
    const A = 150 * 12 + 8 * 138;
    const depthInFlange = A / 2 / 150;
    close(p.neutralAxisY, 75 - depthInFlange);
    // Z = sum of first moments about the axis: flange part above, flange part below, stem
    const below = 12 - depthInFlange;
    close(p.plasticModulusZ, 150 * depthInFlange ** 2 / 2 + 150 * below ** 2 / 2 + 8 * 138 * (below + 69));
  });

  it("plasticProperties(right triangle) puts the neutral axis at h (1 - 1/sqrt 2) above the base", () => {
    // common practice: a line parallel to the base halving a triangle's area cuts its height at 1 - 1/sqrt(2)
    const p = plasticProperties(section([{ kind: "polygon", points: [{ y: 0, z: 0 }, { y: 0, z: 3 }, { y: 2, z: 0 }] }]));
    close(p.neutralAxisY, 2 * (1 - Math.SQRT1_2));
  });

  it("plasticProperties gives plastic moments when the material has a yield strength", () => {
    // common practice: M_p = f_y Z
    const steel = { elasticModulus: 200e3, yieldStrength: 355 };
    const p = plasticProperties(rectangle({ width: 10, depth: 20 }, { material: steel }));
    expect(p.yieldStrength).toBe(355);
    close(p.plasticMoment!.z, 355 * 1000);
  });

  it("plasticProperties(two materials) is plastic-needs-one-material", () => {
    const s = section([
      { kind: "polygon", points: [{ y: 0, z: 0 }, { y: 0, z: 1 }, { y: 1, z: 1 }, { y: 1, z: 0 }], material: { elasticModulus: 1 } },
      { kind: "polygon", points: [{ y: 1, z: 0 }, { y: 1, z: 1 }, { y: 2, z: 1 }, { y: 2, z: 0 }], material: { elasticModulus: 2 } },
    ]);
    const r = tryPlasticProperties(s);
    expect(r.ok).toBe(false);
    if (!r.ok) expect(isFlexuraError(r.error) && r.error.issues.map((i) => [i.code, i.path])).toEqual([["plastic-needs-one-material", ["parts", 1, "material"]]]);
  });
});

const doublySymmetric = fc.oneof(
  fc.record({ width: fc.double({ min: 1, max: 500, noNaN: true }), depth: fc.double({ min: 1, max: 500, noNaN: true }) }).map((d) => rectangle(d)),
  fc
    .record({
      depth: fc.double({ min: 50, max: 1000, noNaN: true }),
      flangeWidth: fc.double({ min: 20, max: 400, noNaN: true }),
      tf: fc.double({ min: 0.01, max: 0.45, noNaN: true }),
      tw: fc.double({ min: 0.01, max: 1, noNaN: true }),
      r: fc.double({ min: 0, max: 0.99, noNaN: true }),
    })
    .map(({ depth, flangeWidth, tf, tw, r }) => {
      const flangeThickness = tf * depth;
      const webThickness = tw * flangeWidth;
      const room = Math.min((flangeWidth - webThickness) / 2, (depth - 2 * flangeThickness) / 2);
      return iSection({ depth, flangeWidth, flangeThickness, webThickness, rootRadius: r * room });
    }),
  fc
    .record({ d: fc.double({ min: 1, max: 500, noNaN: true }), t: fc.double({ min: 0.01, max: 0.49, noNaN: true }) })
    .map(({ d, t }) => pipe({ outsideDiameter: d, wallThickness: t * d })),
);

describe("plasticProperties laws", () => {
  test.prop([doublySymmetric], { numRuns: 100 })("the plastic modulus is at least the elastic modulus for a doubly symmetric section", (s) => {
    const p = plasticProperties(s);
    const e = sectionProperties(s);
    expect(p.plasticModulusZ).toBeGreaterThanOrEqual(e.sectionModulus.top * (1 - 1e-12));
    expect(p.plasticModulusY).toBeGreaterThanOrEqual(e.sectionModulus.right * (1 - 1e-12));
  });

  test.prop([doublySymmetric], { numRuns: 100 })("Q at the neutral axis is half the plastic modulus for a symmetric section", (s) => {
    const p = plasticProperties(s);
    const e = sectionProperties(s);
    const q = firstMomentAbove(s, e.centroid.y).firstMoment;
    expect(Math.abs(q - p.plasticModulusZ / 2)).toBeLessThanOrEqual(1e-9 * p.plasticModulusZ);
    expect(Math.abs(p.neutralAxisY - e.centroid.y)).toBeLessThanOrEqual(1e-9 * (e.boundingBox.yMax - e.boundingBox.yMin));
  });
});
