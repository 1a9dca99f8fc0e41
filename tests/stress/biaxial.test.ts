import { describe, expect, it } from "vitest";
import { fc, test } from "@fast-check/vitest";
import {
  biaxialBendingStress,
  bendingStressPlane,
  cornerStresses,
  neutralAxis,
  tryBendingStressPlane,
  tryBiaxialBendingStress,
  tryCornerStresses,
  tryNeutralAxis,
  type FibrePoint,
} from "../../src/stress/index.js";
import { simpson } from "./helpers.js";

/** Rectangle by its z and y extents. */
interface Box {
  readonly z0: number;
  readonly z1: number;
  readonly y0: number;
  readonly y1: number;
}

/** Area, centroid, I_z, I_y, I_yz of boxes by the parallel-axis theorem (closed form). */
function boxProperties(boxes: readonly Box[]) {
  let a = 0;
  let sy = 0;
  let sz = 0;
  for (const b of boxes) {
    const ab = (b.z1 - b.z0) * (b.y1 - b.y0);
    a += ab;
    sy += ab * (b.y0 + b.y1) / 2;
    sz += ab * (b.z0 + b.z1) / 2;
  }
  const cy = sy / a;
  const cz = sz / a;
  let iz = 0;
  let iy = 0;
  let iyz = 0;
  for (const b of boxes) {
    const w = b.z1 - b.z0;
    const h = b.y1 - b.y0;
    const dy = (b.y0 + b.y1) / 2 - cy;
    const dz = (b.z0 + b.z1) / 2 - cz;
    iz += (w * h ** 3) / 12 + w * h * dy * dy;
    iy += (h * w ** 3) / 12 + w * h * dz * dz;
    iyz += w * h * dy * dz;
  }
  return { area: a, cy, cz, section: { secondMomentZ: iz, secondMomentY: iy, productMoment: iyz } };
}

/** An angle: vertical leg `v` tall, horizontal leg `hz` wide, thickness t, heel at the origin. */
function angle(v: number, hz: number, t: number): Box[] {
  return [
    { z0: 0, z1: t, y0: 0, y1: v },
    { z0: t, z1: hz, y0: 0, y1: t },
  ];
}

describe("unsymmetric bending: an angle under a vertical load", () => {
  // Invented L 150 x 100 x 10 (long leg vertical) under a sagging moment from a vertical load.
  const boxes = angle(150, 100, 10);
  const p = boxProperties(boxes);
  const m = { momentZ: 8e6, momentY: 0 };
  const corners: FibrePoint[] = [
    { z: 0, y: 0 },
    { z: 100, y: 0 },
    { z: 100, y: 10 },
    { z: 10, y: 10 },
    { z: 10, y: 150 },
    { z: 0, y: 150 },
  ].map((c) => ({ z: c.z - p.cz, y: c.y - p.cy }));

  it("neutralAxis(angle, M_z only) is tilted by tan(beta) = I_yz / I_y", () => {
    // Generalised flexure formula for unsymmetrical bending (Boresi and Schmidt, Advanced Mechanics of Materials, 6th ed., Sec. 7.2, from memory).
    const na = neutralAxis(m, p.section)!;
    expect(p.section.productMoment).toBeLessThan(0); // legs point +y and +z from the heel: I_yz < 0 about the centroid
    expect(Math.tan(na.angle)).toBeCloseTo(p.section.productMoment / p.section.secondMomentY, 12);
    expect(na.angle).not.toBeCloseTo(0, 2);
  });

  it("cornerStresses(angle) agree with the principal-axis method", () => {
    // Principal axes: tan 2 theta = -2 I_yz / (I_z - I_y); resolve M onto them and add sigma = -M_u v / I_u + M_v u / I_v
    // (transformation of second moments and the principal-axis method: Roark's Formulas for Stress and Strain, 8th ed., Sec. 8.1 and Table A.1 notes, from memory).
    const { secondMomentZ: iz, secondMomentY: iy, productMoment: iyz } = p.section;
    const theta = 0.5 * Math.atan2(-2 * iyz, iz - iy);
    const c = Math.cos(theta);
    const s = Math.sin(theta);
    const izp = iz * c * c + iy * s * s - 2 * iyz * s * c;
    const iyp = iy * c * c + iz * s * s + 2 * iyz * s * c;
    expect(iyz * (c * c - s * s) + (iz - iy) * s * c).toBeCloseTo(0, 6); // principal: no product
    const mzp = m.momentZ * c + m.momentY * s;
    const myp = -m.momentZ * s + m.momentY * c;
    const r = cornerStresses(m, p.section, corners);
    for (const q of r.points) {
      const zp = q.point.z * c + q.point.y * s;
      const yp = -q.point.z * s + q.point.y * c;
      const expected = (-mzp * yp) / izp + (myp * zp) / iyp;
      expect(q.stress).toBeCloseTo(expected, 9);
    }
    // Neutral axis in principal axes: y'/z' = M_y' I_z' / (M_z' I_y'), then rotate back by theta.
    const beta = Math.atan((myp * izp) / (mzp * iyp)) + theta;
    const na = neutralAxis(m, p.section)!;
    expect(Math.tan(na.angle)).toBeCloseTo(Math.tan(beta), 10);
    // the most tensile corner is the one furthest below the tilted neutral axis
    expect(r.tension.stress).toBe(Math.max(...r.points.map((q) => q.stress)));
    expect(r.compression.stress).toBe(Math.min(...r.points.map((q) => q.stress)));
  });

  it("biaxialBendingStress(I_yz = 0) reduces to -M_z y / I_z + M_y z / I_y", () => {
    const s = { secondMomentZ: 2e6, secondMomentY: 5e5, productMoment: 0 };
    expect(biaxialBendingStress({ momentZ: 4e6, momentY: 1e6 }, { y: 25, z: -10 }, s)).toBeCloseTo(-50 - 20, 12);
    expect(bendingStressPlane({ momentZ: 0, momentY: 0 }, s)).toEqual({ perY: 0, perZ: 0 });
    expect(neutralAxis({ momentZ: 0, momentY: 0 }, s)).toBeNull();
    expect(neutralAxis({ momentZ: 1, momentY: 0 }, s)).toEqual({ kind: "neutral-axis", angle: 0, direction: { y: 0, z: 1 } });
    expect(neutralAxis({ momentZ: 0, momentY: 1 }, s)?.angle).toBeCloseTo(Math.PI / 2, 14);
    expect(neutralAxis({ momentZ: -1, momentY: 0 }, s)?.direction.z).toBe(1);
  });
});

const dim = fc.double({ min: 1, max: 300, noNaN: true });
const mom = fc.double({ min: -1e8, max: 1e8, noNaN: true });

describe("biaxial bending laws", () => {
  test.prop([dim, dim, fc.double({ min: 0.05, max: 0.5, noNaN: true }), mom, mom], { numRuns: 150 })(
    "the stress over an angle has zero axial force and the applied moments about both axes",
    (v, hz, tf, mz, my) => {
      const t = Math.min(v, hz) * tf;
      const boxes = angle(v, hz + t, t);
      const p = boxProperties(boxes);
      const plane = bendingStressPlane({ momentZ: mz, momentY: my }, p.section);
      let n = 0;
      let gotMz = 0;
      let gotMy = 0;
      for (const b of boxes) {
        const over = (f: (y: number, z: number) => number): number =>
          simpson((z) => simpson((y) => f(y - p.cy, z - p.cz), b.y0, b.y1), b.z0, b.z1);
        const sigma = (y: number, z: number): number => plane.perY * y + plane.perZ * z;
        n += over(sigma);
        gotMz += over((y, z) => -y * sigma(y, z));
        gotMy += over((y, z) => z * sigma(y, z));
      }
      const scale = Math.abs(mz) + Math.abs(my);
      const size = v + hz;
      expect(Math.abs(n) * size).toBeLessThanOrEqual(1e-7 * scale + 1e-300);
      expect(Math.abs(gotMz - mz)).toBeLessThanOrEqual(1e-7 * scale + 1e-300);
      expect(Math.abs(gotMy - my)).toBeLessThanOrEqual(1e-7 * scale + 1e-300);
    },
  );

  test.prop([mom, mom, fc.double({ min: -100, max: 100, noNaN: true }), fc.double({ min: -100, max: 100, noNaN: true })], { numRuns: 100 })(
    "biaxialBendingStress is linear in the moments and zero at the centroid",
    (mz, my, y, z) => {
      const s = { secondMomentZ: 3e6, secondMomentY: 1e6, productMoment: -8e5 };
      const both = biaxialBendingStress({ momentZ: mz, momentY: my }, { y, z }, s);
      const parts = biaxialBendingStress({ momentZ: mz, momentY: 0 }, { y, z }, s) + biaxialBendingStress({ momentZ: 0, momentY: my }, { y, z }, s);
      expect(Math.abs(both - parts)).toBeLessThanOrEqual(1e-9 * (Math.abs(mz) + Math.abs(my)));
      expect(biaxialBendingStress({ momentZ: mz, momentY: my }, { y: 0, z: 0 }, s)).toBe(0);
    },
  );
});

describe("biaxial errors", () => {
  it("a section with I_yz^2 >= I_y I_z reports product-moment-too-large", () => {
    const r = tryBiaxialBendingStress({ momentZ: 1, momentY: 0 }, { y: Number.NaN, z: 0 }, { secondMomentZ: 1, secondMomentY: 1, productMoment: 1 });
    expect(r.ok || r.error.issues.map((i) => `${i.code} ${i.path.join(".")}`)).toMatchInlineSnapshot(`
      [
        "product-moment-too-large section.productMoment",
        "not-finite point.y",
      ]
    `);
  });

  it("every entry point has a non-throwing form", () => {
    expect(tryBendingStressPlane({ momentZ: 1, momentY: 0 }, { secondMomentZ: 0, secondMomentY: 1, productMoment: 0 }).ok).toBe(false);
    expect(tryNeutralAxis({ momentZ: 1, momentY: Number.NaN }, { secondMomentZ: 1, secondMomentY: 1, productMoment: 0 }).ok).toBe(false);
    const r = tryCornerStresses({ momentZ: 1, momentY: 0 }, { secondMomentZ: 1, secondMomentY: 1, productMoment: 0 }, []);
    expect(r.ok || r.error.code).toBe("no-corners");
    const bad = tryCornerStresses({ momentZ: 1, momentY: 0 }, { secondMomentZ: 1, secondMomentY: 1, productMoment: 0 }, [{ y: 1, z: Number.NaN }]);
    expect(bad.ok || bad.error.issues[0]?.path).toEqual(["corners", 0, "z"]);
  });
});
