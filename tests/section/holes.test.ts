import { describe, expect, it } from "vitest";
import { fc, test } from "@fast-check/vitest";
import { pipe, rectangularHollow, section, sectionProperties, trySection, type SectionPart } from "../../src/section/index.js";

const box = (z0: number, y0: number, z1: number, y1: number, hole = false): SectionPart => ({
  kind: "polygon",
  points: [{ y: y0, z: z0 }, { y: y0, z: z1 }, { y: y1, z: z1 }, { y: y1, z: z0 }],
  ...(hole ? { hole: true } : {}),
});

/** A U: 30 wide, 20 tall, with a slot from z = nz0 to nz1 down to y = 5 (invented). */
const u = (nz0: number, nz1: number): SectionPart => ({
  kind: "polygon",
  points: [{ y: 0, z: 0 }, { y: 0, z: 30 }, { y: 20, z: 30 }, { y: 20, z: nz1 }, { y: 5, z: nz1 }, { y: 5, z: nz0 }, { y: 20, z: nz0 }, { y: 20, z: 0 }],
});

function codes(parts: SectionPart[]): string[] {
  const r = trySection(parts);
  return r.ok ? [] : r.error.issues.map((i) => `${i.code} ${i.path.join(".")}`);
}

describe("holes lie inside the solids, tested exactly", () => {
  it("a hole whose edge crosses a slot is refused, though its corners and edge midpoints are all in the solid", () => {
    // corners (2, 12), (28, 12), (28, 14), (2, 14) and edge midpoints (15, 12), (28, 13), (15, 14), (2, 13) are all in the U;
    // the long edges cross the slot from z = 20 to 22 (once accepted)
    expect(codes([u(20, 22), box(2, 12, 28, 14, true)])).toEqual(["hole-outside-solid parts.1"]);
    const r = trySection([u(20, 22), box(2, 12, 28, 14, true)]);
    if (r.ok) throw new Error("accepted");
    expect(r.error.issues[0]?.["at"]).toEqual({ y: 12, z: 21 });
    // the same hole below the slot is inside
    expect(codes([u(20, 22), box(2, 1, 28, 4, true)])).toEqual([]);
  });

  it("a hole over the gap in the middle of a frame of plates is refused, though its whole boundary is in the plates", () => {
    const frame = [box(0, 0, 30, 5), box(0, 25, 30, 30), box(0, 5, 5, 25), box(25, 5, 30, 25)];
    expect(codes([...frame, box(2, 2, 28, 28, true)])).toEqual(["hole-outside-solid parts.4"]);
    expect(codes([...frame, box(1, 1, 4, 29, true)])).toEqual([]); // inside the plates, across two joints
  });

  it("a round hole cutting a corner off the solid between the sample points is refused", () => {
    const tri: SectionPart = { kind: "polygon", points: [{ y: 0, z: 0 }, { y: 0, z: 100 }, { y: 100, z: 0 }] };
    // centre (30, 30): its nearest point to the hypotenuse z + y = 100 is 40 / sqrt 2 = 28.3 away; radius 29 crosses it
    expect(codes([tri, { kind: "circle", centre: { y: 30, z: 30 }, radius: 29, hole: true }])).toEqual(["hole-outside-solid parts.1"]);
    expect(codes([tri, { kind: "circle", centre: { y: 30, z: 30 }, radius: 28, hole: true }])).toEqual([]);
  });

  it("holes that overlap each other are refused (holes-overlap); holes that only touch are accepted", () => {
    const plate = box(0, 0, 100, 20);
    const hole = (z: number, r: number): SectionPart => ({ kind: "circle", centre: { y: 10, z }, radius: r, hole: true });
    expect(codes([plate, hole(30, 5), hole(38, 5)])).toEqual(["holes-overlap parts.2"]);
    expect(codes([plate, hole(30, 5), hole(40, 5)])).toEqual([]);
    expect(codes([plate, box(10, 5, 20, 15, true), box(20, 5, 30, 15, true)])).toEqual([]);
  });

  it("holes touching the solid's boundary are still accepted: a thin pipe, a hollow section with rounded corners", () => {
    // thin-walled tube: A = pi (r2^2 - r1^2) (common practice)
    const thin = pipe({ outsideDiameter: 600, wallThickness: 1 });
    expect(sectionProperties(thin).area / (Math.PI * (300 ** 2 - 299 ** 2))).toBeCloseTo(1, 12);
    expect(() => rectangularHollow({ width: 100, depth: 200, wallThickness: 6, cornerRadius: 12 })).not.toThrow();
    expect(codes([{ kind: "circle", centre: { y: 0, z: 0 }, radius: 10 }, { kind: "circle", centre: { y: 0, z: 5 }, radius: 5, hole: true }])).toEqual([]);
  });

  test.prop(
    [fc.integer({ min: 1, max: 27 }), fc.integer({ min: 1, max: 3 }), fc.integer({ min: -2, max: 31 }), fc.integer({ min: 1, max: 30 }), fc.integer({ min: -2, max: 21 }), fc.integer({ min: 1, max: 20 })],
    { numRuns: 150 },
  )("a rectangular hole in a U is accepted exactly when it misses the slot and stays in the outline", (slotAt, slotWidth, z0, w, y0, h) => {
    const [nz0, nz1] = [slotAt, Math.min(29, slotAt + slotWidth)];
    const [z1, y1] = [z0 + w, y0 + h];
    const inOutline = z0 >= 0 && z1 <= 30 && y0 >= 0 && y1 <= 20;
    // the slot's open interior: nz0 < z < nz1, 5 < y < 20 (edges shared with the slot only touch)
    const hitsSlot = z0 < nz1 && z1 > nz0 && y1 > 5;
    const r = trySection([u(nz0, nz1), box(z0, y0, z1, y1, true)]);
    expect(r.ok).toBe(inOutline && !hitsSlot);
    if (!r.ok) expect(r.error.issues.map((i) => i.code)).toEqual(["hole-outside-solid"]);
  });
});

describe("a hole's material", () => {
  it("a hole without a material takes the solid's it lies in", () => {
    const steel = { elasticModulus: 200e3 };
    const timber = { elasticModulus: 10e3 };
    const s = section([{ ...box(0, 0, 10, 10), material: timber }, { ...box(10, 0, 20, 10), material: steel }, { kind: "circle", centre: { y: 5, z: 15 }, radius: 2, hole: true }]);
    expect(sectionProperties(s).parts[2]?.modularRatio).toBeCloseTo(20, 12);
  });
});
