import { describe, expect, it } from "vitest";
import { iSection, section, sectionProperties, type SectionPart } from "../../src/section/index.js";
import { sectionCornerStresses } from "../../src/stress/index.js";

const square = (z0: number, y0: number, s: number): SectionPart => ({
  kind: "polygon",
  points: [{ y: y0, z: z0 }, { y: y0, z: z0 + s }, { y: y0 + s, z: z0 + s }, { y: y0 + s, z: z0 }],
});

describe("sectionCornerStresses lists only points on the boundary of the material", () => {
  it("four squares in a block: the corner all four share, in the middle, is not listed", () => {
    const s = section([square(-10, -10, 10), square(0, -10, 10), square(-10, 0, 10), square(0, 0, 10)]);
    const r = sectionCornerStresses({ momentZ: 1e3, momentY: 2e2 }, s);
    expect(r.points.some((p) => Math.abs(p.point.y) < 1e-12 && Math.abs(p.point.z) < 1e-12)).toBe(false);
    expect(r.points).toHaveLength(12);
    // the extremes are the block's corners: sigma = -M y / I_z + M_y z / I_y on a 20 x 20 square (common practice)
    const i = 20 ** 4 / 12;
    expect(r.tension.stress).toBeCloseTo((1e3 * 10) / i + (2e2 * 10) / i, 12);
  });

  it("an I section with root fillets: the web's corners, covered by the fillets, are not listed; without fillets they are", () => {
    const dims = { depth: 300, flangeWidth: 150, flangeThickness: 10, webThickness: 6 };
    const cornerOfWeb = (list: readonly { point: { y: number; z: number } }[], cy: number): number =>
      list.filter((p) => Math.abs(Math.abs(p.point.z) - 3) < 1e-9 && Math.abs(Math.abs(p.point.y + cy) - 140) < 1e-9).length;
    const sharp = iSection(dims);
    const filleted = iSection({ ...dims, rootRadius: 12 });
    const m = { momentZ: 5e7, momentY: 1e6 };
    const rs = sectionCornerStresses(m, sharp);
    const rf = sectionCornerStresses(m, filleted);
    // sharp: the web's top corners touch the flanges' undersides, re-entrant corners of the outline, listed (once per part meeting there)
    expect(cornerOfWeb(rs.points, sectionProperties(sharp).centroid.y)).toBeGreaterThan(0);
    expect(cornerOfWeb(rf.points, sectionProperties(filleted).centroid.y)).toBe(0);
    // extremes still at the flange tips
    expect(Math.abs(rf.tension.point.z)).toBeCloseTo(75, 9);
    expect(Math.abs(rf.tension.point.y)).toBeCloseTo(150, 9);
  });
});
