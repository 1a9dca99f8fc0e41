import { describe, expect, it } from "vitest";
import { circle, firstMomentAbove, iSection, pipe, rectangle, section, sectionProperties, tee } from "../../src/section/index.js";

const close = (actual: number, expected: number, rel = 1e-12): void => {
  expect(Math.abs(actual - expected)).toBeLessThanOrEqual(rel * Math.max(1, Math.abs(expected)));
};

describe("sectionProperties(closed forms)", () => {
  it("sectionProperties(rectangle) gives A = b d, I = b d^3 / 12, S = b d^2 / 6, r = d / sqrt(12)", () => {
    // Roark's Formulas for Stress and Strain, 8th ed., Table A.1 (solid rectangle)
    const b = 120, d = 300;
    const p = sectionProperties(rectangle({ width: b, depth: d }));
    close(p.area, b * d);
    close(p.secondMomentZ, (b * d ** 3) / 12);
    close(p.secondMomentY, (d * b ** 3) / 12);
    close(p.productMoment, 0);
    close(p.sectionModulus.top, (b * d ** 2) / 6);
    close(p.sectionModulus.bottom, (b * d ** 2) / 6);
    close(p.sectionModulus.left, (d * b ** 2) / 6);
    close(p.radiusOfGyration.z, d / Math.sqrt(12));
    expect(p.centroid).toEqual({ y: 0, z: 0 });
    expect(p.extremes).toEqual({ top: 150, bottom: -150, left: -60, right: 60 });
    expect(p.boundingBox).toEqual({ zMin: -60, zMax: 60, yMin: -150, yMax: 150 });
    expect(p.principal).toEqual({ major: p.secondMomentZ, minor: p.secondMomentY, angle: 0 });
  });

  it("sectionProperties(right triangle) gives I = b h^3 / 36 about the centroid and I_yz = -b^2 h^2 / 72", () => {
    // Roark's Formulas for Stress and Strain, 8th ed., Table A.1 (triangle: I = b h^3 / 36);
    // Gere & Goodno, Mechanics of Materials, appendix of plane-area properties (right triangle, product of inertia)
    const b = 90, h = 150;
    const p = sectionProperties(section([{ kind: "polygon", points: [{ y: 0, z: 0 }, { y: 0, z: b }, { y: h, z: 0 }] }]));
    close(p.area, (b * h) / 2);
    close(p.centroid.y, h / 3);
    close(p.centroid.z, b / 3);
    close(p.secondMomentZ, (b * h ** 3) / 36);
    close(p.secondMomentY, (h * b ** 3) / 36);
    close(p.productMoment, -(b ** 2 * h ** 2) / 72);
    close(p.extremes.top, (2 * h) / 3);
    close(p.sectionModulus.bottom, (b * h ** 2) / 12);
    close(p.sectionModulus.top, (b * h ** 2) / 24);
  });

  it("sectionProperties(circle) gives A = pi r^2, I = pi r^4 / 4, S = pi r^3 / 4", () => {
    // Roark's Formulas for Stress and Strain, 8th ed., Table A.1 (solid circle)
    const r = 37.5;
    const p = sectionProperties(circle({ diameter: 2 * r }));
    close(p.area, Math.PI * r ** 2);
    close(p.secondMomentZ, (Math.PI * r ** 4) / 4);
    close(p.secondMomentY, (Math.PI * r ** 4) / 4);
    close(p.productMoment, 0);
    close(p.sectionModulus.top, (Math.PI * r ** 3) / 4);
    close(p.radiusOfGyration.y, r / 2);
    expect(p.principal.angle).toBe(0);
  });

  it("sectionProperties(pipe) gives I = pi (D^4 - d^4) / 64", () => {
    // Roark's Formulas for Stress and Strain, 8th ed., Table A.1 (hollow circle)
    const D = 168.3, t = 7.1, d = D - 2 * t;
    const p = sectionProperties(pipe({ outsideDiameter: D, wallThickness: t }));
    close(p.area, (Math.PI * (D ** 2 - d ** 2)) / 4);
    close(p.secondMomentZ, (Math.PI * (D ** 4 - d ** 4)) / 64);
    close(p.sectionModulus.top, (Math.PI * (D ** 4 - d ** 4)) / (32 * D));
  });

  it("sectionProperties(semicircle sector) gives y_c = 4 r / (3 pi) and I = (pi/8 - 8/(9 pi)) r^4", () => {
    // Roark's Formulas for Stress and Strain, 8th ed., Table A.1 (semicircle)
    const r = 40;
    const p = sectionProperties(section([{ kind: "sector", centre: { y: 10, z: -5 }, radius: r, startAngle: 0, sweep: Math.PI }]));
    close(p.area, (Math.PI * r ** 2) / 2);
    close(p.centroid.y, 10 + (4 * r) / (3 * Math.PI));
    close(p.centroid.z, -5);
    close(p.secondMomentZ, (Math.PI / 8 - 8 / (9 * Math.PI)) * r ** 4, 1e-11);
    close(p.secondMomentY, (Math.PI * r ** 4) / 8);
  });

  it("sectionProperties(iSection, no fillets) equals the plate sum (B D^3 - (B - t_w) h_w^3) / 12", () => {
    // composite areas and the parallel-axis theorem: Gere & Goodno, Mechanics of Materials, chapter 12
    const D = 406, B = 178, tf = 12.8, tw = 7.8;
    const p = sectionProperties(iSection({ depth: D, flangeWidth: B, flangeThickness: tf, webThickness: tw }));
    close(p.area, 2 * B * tf + (D - 2 * tf) * tw);
    close(p.secondMomentZ, (B * D ** 3 - (B - tw) * (D - 2 * tf) ** 3) / 12);
    close(p.secondMomentY, (2 * tf * B ** 3 + (D - 2 * tf) * tw ** 3) / 12);
  });

  it("sectionProperties(iSection, unequal flanges) follows the parallel-axis theorem plate by plate", () => {
    // composite areas and the parallel-axis theorem: Gere & Goodno, Mechanics of Materials, chapter 12
    const plates = [
      { b: 200, t: 16, yc: 300 - 8 },
      { b: 8, t: 300 - 16 - 20, yc: 20 + (300 - 36) / 2 },
      { b: 300, t: 20, yc: 10 },
    ];
    const A = plates.reduce((s, q) => s + q.b * q.t, 0);
    const ybar = plates.reduce((s, q) => s + q.b * q.t * q.yc, 0) / A;
    const I = plates.reduce((s, q) => s + (q.b * q.t ** 3) / 12 + q.b * q.t * (q.yc - ybar) ** 2, 0);
    const p = sectionProperties(iSection({ depth: 300, flangeWidth: 200, flangeThickness: 16, webThickness: 8, bottomFlangeWidth: 300, bottomFlangeThickness: 20 }));
    close(p.centroid.y + 150, ybar);
    close(p.secondMomentZ, I);
    close(p.sectionModulus.top, I / (300 - ybar));
    close(p.sectionModulus.bottom, I / ybar);
  });

  it("sectionProperties(tee) follows the parallel-axis theorem plate by plate", () => {
    // composite areas and the parallel-axis theorem: Gere & Goodno, Mechanics of Materials, chapter 12
    const d = 150, b = 150, tf = 12, tw = 8;
    const A1 = b * tf, y1 = d - tf / 2, A2 = tw * (d - tf), y2 = (d - tf) / 2;
    const ybar = (A1 * y1 + A2 * y2) / (A1 + A2);
    const I = (b * tf ** 3) / 12 + A1 * (y1 - ybar) ** 2 + (tw * (d - tf) ** 3) / 12 + A2 * (y2 - ybar) ** 2;
    const p = sectionProperties(tee({ depth: d, flangeWidth: b, flangeThickness: tf, webThickness: tw }));
    close(p.centroid.y + d / 2, ybar);
    close(p.secondMomentZ, I);
    close(p.extremes.bottom, -ybar);
  });

  it("sectionProperties(iSection with root fillets) adds four spandrels of area (1 - pi/4) r^2", () => {
    // quarter-circular spandrel: area (1 - pi/4) r^2, centroid r (10 - 3 pi) / (3 (4 - pi)) from the corner
    // (Gere & Goodno, Mechanics of Materials, appendix of plane-area properties, quarter-circular spandrel)
    const D = 300, B = 150, tf = 10, tw = 6, r = 12;
    const plain = sectionProperties(iSection({ depth: D, flangeWidth: B, flangeThickness: tf, webThickness: tw }));
    const p = sectionProperties(iSection({ depth: D, flangeWidth: B, flangeThickness: tf, webThickness: tw, rootRadius: r }));
    const a = (1 - Math.PI / 4) * r * r;
    close(p.area, plain.area + 4 * a);
    // the fillet's own centroid from the corner along each leg
    const e = (r * (10 - 3 * Math.PI)) / (12 - 3 * Math.PI);
    const s = section([{ kind: "fillet", corner: { y: 0, z: 0 }, radius: r, orientation: 0 }]);
    const f = sectionProperties(s);
    close(f.area, a);
    close(f.centroid.y, e, 1e-11);
    close(f.centroid.z, e, 1e-11);
    expect(p.secondMomentZ).toBeGreaterThan(plain.secondMomentZ);
  });
});

describe("firstMomentAbove(closed forms)", () => {
  it("firstMomentAbove(rectangle, neutral axis) is b d^2 / 8, so tau_max = 1.5 V / A", () => {
    // Gere & Goodno, Mechanics of Materials, shear stresses in beams of rectangular cross section
    const b = 100, d = 200;
    const r = firstMomentAbove(rectangle({ width: b, depth: d }), 0);
    close(r.firstMoment, (b * d ** 2) / 8);
    expect(r.width).toBe(b);
    const p = sectionProperties(rectangle({ width: b, depth: d }));
    close((r.firstMoment / (p.secondMomentZ * r.width)) * p.area, 1.5);
  });

  it("firstMomentAbove(circle, neutral axis) is 2 r^3 / 3, so tau_max = 4 V / (3 A)", () => {
    // Gere & Goodno, Mechanics of Materials, shear stresses in beams of circular cross section
    const rad = 30;
    const r = firstMomentAbove(circle({ diameter: 2 * rad }), 0);
    close(r.firstMoment, (2 * rad ** 3) / 3);
    close(r.width, 2 * rad);
    const p = sectionProperties(circle({ diameter: 2 * rad }));
    close((r.firstMoment / (p.secondMomentZ * r.width)) * p.area, 4 / 3);
  });

  it("firstMomentAbove(rectangle, y) is b/2 (d^2/4 - y^2) at any cut", () => {
    // Gere & Goodno, Mechanics of Materials, shear stresses in beams of rectangular cross section
    const b = 80, d = 240;
    for (const y of [-100, -37.5, 0, 12.25, 119]) {
      close(firstMomentAbove(rectangle({ width: b, depth: d }), y).firstMoment, (b / 2) * (d ** 2 / 4 - y ** 2), 1e-12);
    }
  });

  it("firstMomentAbove(iSection, flange underside) reports the flange width above and the web width below", () => {
    // common practice: at the flange-to-web junction the web width governs the shear stress
    const D = 300, B = 150, tf = 10, tw = 6;
    const r = firstMomentAbove(iSection({ depth: D, flangeWidth: B, flangeThickness: tf, webThickness: tw }), D / 2 - tf);
    close(r.firstMoment, B * tf * (D / 2 - tf / 2));
    expect(r.widthAbove).toBe(B);
    expect(r.widthBelow).toBe(tw);
    expect(r.width).toBe(tw);
  });

  it("firstMomentAbove(pipe, centre) takes the hole's chord out of the width", () => {
    // Q of a half annulus about its diameter: 2 (R^3 - r^3) / 3 (Gere & Goodno, Mechanics of Materials, shear in circular tubes)
    const R = 50, t = 5;
    const r = firstMomentAbove(pipe({ outsideDiameter: 2 * R, wallThickness: t }), 0);
    close(r.firstMoment, (2 * (R ** 3 - (R - t) ** 3)) / 3);
    close(r.width, 2 * t);
  });

  it("firstMomentAbove outside the section is zero", () => {
    // common practice: no area above the top fibre, and the whole section about its own centroid below the bottom
    const s = tee({ depth: 150, flangeWidth: 150, flangeThickness: 12, webThickness: 8 });
    expect(firstMomentAbove(s, 76)).toMatchObject({ firstMoment: 0, width: 0, areaAbove: 0 });
    const below = firstMomentAbove(s, -76);
    expect(Math.abs(below.firstMoment)).toBeLessThan(1e-9);
    expect(below.width).toBe(0);
  });
});
