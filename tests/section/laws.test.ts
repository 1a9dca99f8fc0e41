import { describe, expect } from "vitest";
import { fc, test } from "@fast-check/vitest";
import {
  firstMomentAbove,
  secondMomentAbout,
  rotatePart,
  section,
  sectionProperties,
  translatePart,
  mirrorPart,
  type SectionPart,
  type SectionPoint,
} from "../../src/section/index.js";
import { anyPart, near, starPolygon } from "./arbitraries.js";

const scalePart = (part: SectionPart, s: number): SectionPart => {
  const p = (q: SectionPoint): SectionPoint => ({ y: q.y * s, z: q.z * s });
  switch (part.kind) {
    case "polygon":
      return { ...part, points: part.points.map(p) };
    case "circle":
      return { ...part, centre: p(part.centre), radius: part.radius * s };
    case "sector":
      return { ...part, centre: p(part.centre), radius: part.radius * s };
    case "fillet":
      return { ...part, corner: p(part.corner), radius: part.radius * s };
  }
};

const opts = { numRuns: 150 };
const shift = fc.record({ y: fc.double({ min: -1e3, max: 1e3, noNaN: true }), z: fc.double({ min: -1e3, max: 1e3, noNaN: true }) });

describe("sectionProperties laws", () => {
  test.prop([anyPart(), shift], opts)("centroidal properties do not change when the section moves", (part, by) => {
    const a = sectionProperties(section([part]));
    const b = sectionProperties(section([translatePart(part, by)]));
    const I = a.secondMomentZ + a.secondMomentY;
    expect(near(b.area, a.area, a.area)).toBe(true);
    expect(near(b.centroid.y, a.centroid.y + by.y, 1e3, 1e-9)).toBe(true);
    expect(near(b.centroid.z, a.centroid.z + by.z, 1e3, 1e-9)).toBe(true);
    expect(near(b.secondMomentZ, a.secondMomentZ, I, 1e-7)).toBe(true);
    expect(near(b.secondMomentY, a.secondMomentY, I, 1e-7)).toBe(true);
    expect(near(b.productMoment, a.productMoment, I, 1e-7)).toBe(true);
  });

  test.prop([anyPart(), fc.double({ min: -7, max: 7, noNaN: true })], opts)(
    "rotation keeps the area, I_y + I_z and the principal values",
    (part, angle) => {
      const a = sectionProperties(section([part]));
      const b = sectionProperties(section([rotatePart(part, angle, { y: 3, z: -2 })]));
      const I = a.secondMomentZ + a.secondMomentY;
      expect(near(b.area, a.area, a.area)).toBe(true);
      expect(near(b.secondMomentZ + b.secondMomentY, I, I, 1e-8)).toBe(true);
      expect(near(b.principal.major, a.principal.major, I, 1e-7)).toBe(true);
      expect(near(b.principal.minor, a.principal.minor, I, 1e-7)).toBe(true);
    },
  );

  test.prop([anyPart(), fc.constantFrom<"y" | "z">("y", "z")], opts)("mirroring keeps I_y and I_z and flips the sign of I_yz", (part, axis) => {
    const a = sectionProperties(section([part]));
    const b = sectionProperties(section([mirrorPart(part, axis)]));
    const I = a.secondMomentZ + a.secondMomentY;
    expect(near(b.area, a.area, a.area)).toBe(true);
    expect(near(b.secondMomentZ, a.secondMomentZ, I, 1e-8)).toBe(true);
    expect(near(b.secondMomentY, a.secondMomentY, I, 1e-8)).toBe(true);
    expect(near(b.productMoment, -a.productMoment, I, 1e-8)).toBe(true);
    if (axis === "y") expect(near(b.centroid.z, -a.centroid.z, 100)).toBe(true);
    else expect(near(b.centroid.y, -a.centroid.y, 100)).toBe(true);
  });

  test.prop([anyPart(), fc.double({ min: 0.01, max: 100, noNaN: true })], opts)("scaling by s scales A by s^2, I by s^4 and S by s^3", (part, s) => {
    const a = sectionProperties(section([part]));
    const b = sectionProperties(section([scalePart(part, s)]));
    const I = a.secondMomentZ + a.secondMomentY;
    expect(near(b.area, a.area * s ** 2, a.area * s ** 2)).toBe(true);
    expect(near(b.secondMomentZ, a.secondMomentZ * s ** 4, I * s ** 4, 1e-8)).toBe(true);
    expect(near(b.productMoment, a.productMoment * s ** 4, I * s ** 4, 1e-8)).toBe(true);
    expect(near(b.sectionModulus.top, a.sectionModulus.top * s ** 3, a.sectionModulus.top * s ** 3, 1e-8)).toBe(true);
  });

  test.prop([anyPart()], opts)("the principal values bound I_y and I_z", (part) => {
    const p = sectionProperties(section([part]));
    const tol = 1e-9 * p.principal.major;
    expect(p.principal.minor).toBeLessThanOrEqual(Math.min(p.secondMomentY, p.secondMomentZ) + tol);
    expect(p.principal.major).toBeGreaterThanOrEqual(Math.max(p.secondMomentY, p.secondMomentZ) - tol);
    expect(p.principal.minor).toBeGreaterThan(0);
    expect(p.principal.angle).toBeGreaterThan(-Math.PI / 2);
    expect(p.principal.angle).toBeLessThanOrEqual(Math.PI / 2);
  });

  test.prop([starPolygon(), fc.double({ min: -60, max: 60, noNaN: true })], opts)(
    "a section cut in two by a horizontal line has the sum of the halves' moments (additivity)",
    (part, cut) => {
      const whole = section([part]);
      const p = sectionProperties(whole);
      const above = firstMomentAbove(whole, p.centroid.y + cut);
      const below = { area: p.area - above.areaAbove };
      // Q above + Q below = 0 about the centroid, and the areas add up
      expect(above.areaAbove + below.area).toBeCloseTo(p.area, 6);
      expect(above.firstMoment).toBeGreaterThanOrEqual(-1e-9 * p.area * 100);
    },
  );
});

describe("secondMomentAbout laws", () => {
  const point = fc.record({ y: fc.double({ min: -200, max: 200, noNaN: true }), z: fc.double({ min: -200, max: 200, noNaN: true }) });

  test.prop([starPolygon(40), fc.tuple(fc.double({ min: 300, max: 600, noNaN: true }), fc.double({ min: -300, max: 300, noNaN: true })), point], opts)(
    "two separate parts have the sum of their moments about a common point (additivity)",
    (part, [dz, dy], at) => {
      const other = translatePart(part, { y: dy, z: dz });
      const both = secondMomentAbout(section([part, other]), at);
      const a = secondMomentAbout(section([part]), at);
      const b = secondMomentAbout(section([other]), at);
      const scale = Math.abs(a.secondMomentY) + Math.abs(b.secondMomentY) + a.secondMomentZ + b.secondMomentZ;
      expect(near(both.secondMomentZ, a.secondMomentZ + b.secondMomentZ, scale, 1e-9)).toBe(true);
      expect(near(both.secondMomentY, a.secondMomentY + b.secondMomentY, scale, 1e-9)).toBe(true);
      expect(near(both.productMoment, a.productMoment + b.productMoment, scale, 1e-9)).toBe(true);
    },
  );

  test.prop(
    [
      fc.record({
        y: fc.double({ min: -40, max: 40, noNaN: true }),
        z: fc.double({ min: -40, max: 40, noNaN: true }),
        r: fc.double({ min: 0.5, max: 9, noNaN: true }),
      }),
      point,
    ],
    opts,
  )("a hole equals subtracting its solid", ({ y, z, r }, at) => {
    const plate: SectionPart = { kind: "polygon", points: [{ y: -50, z: -50 }, { y: -50, z: 50 }, { y: 50, z: 50 }, { y: 50, z: -50 }] };
    const disc: SectionPart = { kind: "circle", centre: { y, z }, radius: r };
    const holed = secondMomentAbout(section([plate, { ...disc, hole: true }]), at);
    const full = secondMomentAbout(section([plate]), at);
    const cut = secondMomentAbout(section([disc]), at);
    const scale = full.secondMomentZ + full.secondMomentY;
    expect(near(holed.secondMomentZ, full.secondMomentZ - cut.secondMomentZ, scale)).toBe(true);
    expect(near(holed.secondMomentY, full.secondMomentY - cut.secondMomentY, scale)).toBe(true);
    expect(near(holed.productMoment, full.productMoment - cut.productMoment, scale)).toBe(true);
  });
});
