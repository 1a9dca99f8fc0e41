import { describe, expect, it } from "vitest";
import { circle, iSection, pipe, rectangle, section, sectionProperties, tee, type Section } from "../../src/section/index.js";
import {
  extremeBendingStresses,
  neutralAxis,
  sectionCornerStresses,
  sectionPartStresses,
  sectionPeakShearStress,
  sectionShearStressAt,
  sectionShearStressProfile,
  trySectionCornerStresses,
  trySectionPartStresses,
  trySectionPeakShearStress,
  trySectionShearStressAt,
  trySectionShearStressProfile,
} from "../../src/stress/index.js";
import { stackProperties } from "./helpers.js";

describe("stress on sections from the section module", () => {
  it("sectionPeakShearStress(rectangle) = 1.5 V / A and (circle) = 4 V / (3 A)", () => {
    // Roark's Formulas for Stress and Strain, 8th ed., Sec. 8.1 (from memory).
    const r = sectionPeakShearStress(36e3, rectangle({ width: 80, depth: 240 }));
    expect(r.stress).toBeCloseTo((1.5 * 36e3) / (80 * 240), 10);
    expect(r.y).toBeCloseTo(0, 8);
    const c = sectionPeakShearStress(1e4, circle({ diameter: 60 }));
    expect(c.stress).toBeCloseTo((4 * 1e4) / (3 * Math.PI * 900), 9);
  });

  it("sectionShearStressAt(pipe) at the neutral axis matches V (2/3)(R^3 - r^3) / (I 2 (R - r))", () => {
    // Closed form from tau = V Q / (I b) with Q of a semicircle (2/3) r^3 (Roark's 8th ed., Table A.1, from memory).
    const [R, t, v] = [60, 15, 1e4];
    const r = R - t;
    const inertia = (Math.PI * (R ** 4 - r ** 4)) / 4;
    const at = sectionShearStressAt(v, pipe({ outsideDiameter: 2 * R, wallThickness: t }), 0);
    expect(at.stress).toBeCloseTo((v * (2 / 3) * (R ** 3 - r ** 3)) / (inertia * 2 * (R - r)), 9);
  });

  it("sectionPeakShearStress(I section with root fillets) is in the web at the neutral axis", () => {
    const s = iSection({ depth: 360, flangeWidth: 180, flangeThickness: 12, webThickness: 8, rootRadius: 10 });
    const p = sectionProperties(s);
    const peak = sectionPeakShearStress(1.5e5, s);
    expect(peak.width).toBeCloseTo(8, 9);
    expect(Math.abs(peak.y)).toBeLessThan(1e-6 * 360);
    expect(peak.stress).toBeCloseTo((1.5e5 * peak.firstMoment) / (p.secondMomentZ * 8), 9);
    const profile = sectionShearStressProfile(1.5e5, s, { pointsPerBand: 2 });
    expect(profile.points.length).toBeGreaterThan(4);
  });

  it("extremeBendingStresses(tee from the section module) matches the parallel-axis closed form", () => {
    // Centroid and I by the parallel-axis theorem (closed form), flange 150 x 20 on a 20 x 180 stem.
    const t = stackProperties([
      { b: 20, h: 180, y0: 0 },
      { b: 150, h: 20, y0: 180 },
    ]);
    const p = sectionProperties(tee({ depth: 200, flangeWidth: 150, flangeThickness: 20, webThickness: 20 }));
    const s = extremeBendingStresses(20e6, p);
    expect(s.bottom.stress).toBeCloseTo((20e6 * t.centroid) / t.inertia, 9);
    expect(s.top.stress).toBeCloseTo((-20e6 * (200 - t.centroid)) / t.inertia, 9);
  });

  it("sectionCornerStresses(angle) finds the extreme corners; (circle) gives sqrt(M_z^2 + M_y^2) r / I", () => {
    const angle: Section = section([
      {
        kind: "polygon",
        points: [
          { z: 0, y: 0 },
          { z: 100, y: 0 },
          { z: 100, y: 10 },
          { z: 10, y: 10 },
          { z: 10, y: 150 },
          { z: 0, y: 150 },
        ],
      },
    ]);
    const p = sectionProperties(angle);
    const m = { momentZ: 8e6, momentY: 0 };
    const na = neutralAxis(m, p)!;
    expect(Math.tan(na.angle)).toBeCloseTo(p.productMoment / p.secondMomentY, 12); // Boresi and Schmidt, 6th ed., Sec. 7.2 (from memory)
    const r = sectionCornerStresses(m, angle);
    expect(r.points).toHaveLength(6);
    // Any axis of a circle is principal: sigma_max = M r / I with M the resultant moment (Roark's 8th ed., Table A.1, from memory).
    const c = sectionCornerStresses({ momentZ: 3e6, momentY: -4e6 }, circle({ diameter: 100 }));
    const expected = (5e6 * 50) / ((Math.PI * 50 ** 4) / 4);
    expect(c.tension.stress).toBeCloseTo(expected, 8);
    expect(c.compression.stress).toBeCloseTo(-expected, 8);
  });

  it("sectionCornerStresses(I section with fillets, semicircular sector) reach the extreme fibres", () => {
    const i = iSection({ depth: 300, flangeWidth: 150, flangeThickness: 10, webThickness: 7, rootRadius: 12 });
    const pi = sectionProperties(i);
    const r = sectionCornerStresses({ momentZ: 5e7, momentY: 0 }, i);
    expect(r.tension.stress).toBeCloseTo((5e7 * 150) / pi.secondMomentZ, 9);
    // Semicircle: centroid 4 r / (3 pi) above the diameter, I_z = (pi / 8 - 8 / (9 pi)) r^4 (Roark's 8th ed., Table A.1, from memory).
    const rad = 40;
    const half = section([{ kind: "sector", centre: { y: 0, z: 0 }, radius: rad, startAngle: 0, sweep: Math.PI }]);
    const ybar = (4 * rad) / (3 * Math.PI);
    const iz = (Math.PI / 8 - 8 / (9 * Math.PI)) * rad ** 4;
    const h = sectionCornerStresses({ momentZ: 1e6, momentY: 0 }, half);
    expect(h.compression.stress).toBeCloseTo((-1e6 * (rad - ybar)) / iz, 9);
    expect(h.tension.stress).toBeCloseTo((1e6 * ybar) / iz, 9);
    const tilted = sectionCornerStresses({ momentZ: 1e6, momentY: 5e5 }, half);
    expect(tilted.points.length).toBeGreaterThanOrEqual(3);
  });

  it("sectionPartStresses(timber with a steel plate) jumps by n at the interface", () => {
    // Transformed section (Gere and Goodno, Mechanics of Materials, Sec. 6.3, from memory); parallel-axis closed form.
    const timber = { name: "timber", elasticModulus: 10_000 };
    const steel = { name: "steel", elasticModulus: 200_000 };
    const s = section([
      { kind: "polygon", points: [{ z: 0, y: 10 }, { z: 150, y: 10 }, { z: 150, y: 310 }, { z: 0, y: 310 }], material: timber },
      { kind: "polygon", points: [{ z: 0, y: 0 }, { z: 150, y: 0 }, { z: 150, y: 10 }, { z: 0, y: 10 }], material: steel },
    ]);
    const t = stackProperties([
      { b: 150, h: 300, y0: 10 },
      { b: 150, h: 10, y0: 0, n: 20 },
    ]);
    const r = sectionPartStresses(30e6, s);
    const [wood, plate] = r.parts;
    expect(plate!.modularRatio).toBeCloseTo(20, 12);
    expect(plate!.stressBottom).toBeCloseTo((20 * 30e6 * t.centroid) / t.inertia, 8);
    expect(wood!.stressTop).toBeCloseTo((-30e6 * (310 - t.centroid)) / t.inertia, 8);
    expect(plate!.stressTop / wood!.stressBottom).toBeCloseTo(20, 9);
    expect(r.tension.part).toBe(1);
    expect(r.compression.part).toBe(0);
  });

  it("bad input to the section forms is reported", () => {
    const rect = rectangle({ width: 10, depth: 10 });
    expect(trySectionShearStressProfile(1, rect, { pointsPerBand: 0 }).ok).toBe(false);
    expect(trySectionPeakShearStress(Number.NaN, rect).ok).toBe(false);
    expect(trySectionCornerStresses({ momentZ: Number.NaN, momentY: 0 }, rect).ok).toBe(false);
    expect(trySectionPartStresses(Number.NaN, rect).ok).toBe(false);
    const r = trySectionShearStressAt(1, rect, 50);
    expect(r.ok || r.error.code).toBe("fibre-outside-section");
  });
});
