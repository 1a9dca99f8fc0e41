import { describe, expect, it } from "vitest";
import {
  builtUp,
  centreLineModel,
  channel,
  closedSectionTorsion,
  angle,
  fullyPlasticMoments,
  iSection,
  openSectionProperties,
  pipe,
  plasticProperties,
  principalAxisProperties,
  rectangle,
  rotateSection,
  sectionProperties,
  tee,
  torsionConstantExact,
  torsionConstantRolledI,
  torsionConstantRolledTee,
  torsionConstantThinWalled,
  translateSection,
  type WallModel,
  type WallPlate,
} from "../../src/section/index.js";

const within = (actual: number, expected: number, rel: number): void => {
  expect(Math.abs(actual / expected - 1)).toBeLessThan(rel);
};
const wall = (z0: number, y0: number, z1: number, y1: number, thickness: number): WallPlate => ({ start: { y: y0, z: z0 }, end: { y: y1, z: z1 }, thickness });
const model = (...plates: WallPlate[]): WallModel => ({ kind: "wall-model", plates });

// AISC Steel Construction Manual, Table 1-1 (W-shapes), as tabulated in the 14th edition (the 15th
// lists the same values); from memory, no copy of the table at hand. Dimensions d, b_f, t_f, t_w,
// k_des (in); the root radius is taken as k_des - t_f. Tabulated J and C_w: J by the fillet formula
// of El Darwish and Johnston (AISC Design Guide 9), C_w = I_y h_0^2 / 4.
const w18x35 = { d: 17.7, bf: 6.0, tf: 0.425, tw: 0.3, kdes: 0.827, Ix: 510, Sx: 57.6, Zx: 66.5, Iy: 15.3, ry: 1.22, J: 0.506, Cw: 1140 };
const more = [
  { name: "W14x90", d: 14.0, bf: 14.5, tf: 0.71, tw: 0.44, kdes: 1.31, J: 4.06, Cw: 16000 },
  { name: "W18x50", d: 18.0, bf: 7.5, tf: 0.57, tw: 0.355, kdes: 0.972, J: 1.24, Cw: 3040 },
  { name: "W24x68", d: 23.7, bf: 8.97, tf: 0.585, tw: 0.415, kdes: 1.09, J: 1.87, Cw: 9430 },
] as const;
const dimsOf = (w: { d: number; bf: number; tf: number; tw: number; kdes: number }) => ({ depth: w.d, flangeWidth: w.bf, flangeThickness: w.tf, webThickness: w.tw, rootRadius: w.kdes - w.tf });

describe("W-shapes against AISC Manual Table 1-1 (14th ed.; from memory)", () => {
  it("W18x35: I_x 510, S_x 57.6, Z_x 66.5, I_y 15.3, r_y 1.22, J 0.506, C_w 1140 within 1%", () => {
    const dims = dimsOf(w18x35);
    const beam = iSection(dims);
    const p = sectionProperties(beam);
    within(p.secondMomentZ, w18x35.Ix, 0.01);
    within(p.sectionModulus.top, w18x35.Sx, 0.01);
    within(plasticProperties(beam).plasticModulusZ, w18x35.Zx, 0.01);
    within(p.secondMomentY, w18x35.Iy, 0.01);
    within(p.radiusOfGyration.y, w18x35.ry, 0.01);
    within(torsionConstantRolledI(dims), w18x35.J, 0.01);
    within(openSectionProperties(beam).warpingConstant, w18x35.Cw, 0.01);
  });

  for (const w of more) {
    it(`${w.name}: J ${w.J} and C_w ${w.Cw} within 1%`, () => {
      within(torsionConstantRolledI(dimsOf(w)), w.J, 0.01);
      within(openSectionProperties(iSection(dimsOf(w))).warpingConstant, w.Cw, 0.01);
    });
  }

  it("torsionConstantRolledI(W18x35) counts the fillets: sum b t^3 / 3 alone is about 9% low", () => {
    // the same table value (from memory); the thin-walled sum leaves out the junctions
    const thin = torsionConstantThinWalled(iSection(dimsOf(w18x35)));
    expect(thin / w18x35.J).toBeLessThan(0.93);
  });

  it("torsionConstantRolledTee of a split W18x35 is half the I's, less the stem tip's 0.105 t_w^4", () => {
    // AISC Design Guide 9 (Seaburg and Carter, 1997), appendix A: the tee form of El Darwish and
    // Johnston's formula (from memory); WT9x17.5 is tabulated at J = 0.252 in^4 (Manual Table 1-8, from memory)
    const dims = dimsOf(w18x35);
    const teeJ = torsionConstantRolledTee({ ...dims, depth: dims.depth / 2 });
    expect(teeJ).toBeCloseTo(torsionConstantRolledI(dims) / 2 - 0.105 * dims.webThickness ** 4, 12);
    within(teeJ, 0.252, 0.01);
  });
});

describe("torsionConstantExact(solid sections)", () => {
  // Timoshenko and Goodier, Theory of Elasticity, 3rd ed., section 109, table of beta in J = beta b t^3
  // (the same values in Roark's Formulas for Stress and Strain, table of torsion constants); 3 figures
  const table = [
    [1, 0.141],
    [1.5, 0.196],
    [2, 0.229],
    [2.5, 0.249],
    [3, 0.263],
    [4, 0.281],
    [5, 0.291],
    [10, 0.312],
  ] as const;
  for (const [ratio, beta] of table) {
    it(`torsionConstantExact(rectangle ${ratio} x 1) gives beta = ${beta}`, () => {
      const j = torsionConstantExact(rectangle({ width: ratio * 20, depth: 20 })).torsionConstant;
      expect(Math.abs(j / (ratio * 20 * 20 ** 3) - beta)).toBeLessThan(0.0006);
    });
  }

  it("torsionConstantExact(a rotated rectangle) equals the upright one's, and tends to b t^3 / 3 as b / t grows", () => {
    const upright = torsionConstantExact(rectangle({ width: 30, depth: 10 })).torsionConstant;
    expect(torsionConstantExact(rotateSection(rectangle({ width: 30, depth: 10 }), 0.7)).torsionConstant).toBeCloseTo(upright, 6);
    // Timoshenko and Goodier, section 109: J -> b t^3 / 3 (1 - 0.630 t / b) for thin rectangles
    const thin = torsionConstantExact(rectangle({ width: 1000, depth: 10 })).torsionConstant;
    expect(thin / ((1000 * 10 ** 3) / 3) - (1 - 0.63 * 0.01)).toBeLessThan(1e-4);
  });

  it("torsionConstantExact(circle, pipe) gives the polar moments pi r^4 / 2 and pi (r_o^4 - r_i^4) / 2", () => {
    // Roark's Formulas for Stress and Strain, table of torsion constants: solid circular and hollow circular sections
    const solid = torsionConstantExact(rectangle({ width: 10, depth: 10 }));
    expect(solid.formula).toBe("solid-rectangle");
    const bar = torsionConstantExact({ parts: [{ kind: "circle", centre: { y: 3, z: 4 }, radius: 25 }] });
    expect(bar).toEqual({ torsionConstant: (Math.PI * 25 ** 4) / 2, formula: "solid-circle" });
    const tube = torsionConstantExact(pipe({ outsideDiameter: 100, wallThickness: 5 }));
    expect(tube.formula).toBe("circular-tube");
    expect(tube.torsionConstant).toBeCloseTo((Math.PI * (50 ** 4 - 45 ** 4)) / 2, 6);
  });
});

describe("closedSectionTorsion(thin-walled tubes and boxes)", () => {
  it("a box matches Roark's thin-walled hollow rectangle K = 2 t t1 (a - t)^2 (b - t1)^2 / (a t + b t1 - t^2 - t1^2)", () => {
    // Roark's Formulas for Stress and Strain, table of torsion constants, hollow rectangle (from memory);
    // outside a = 210 (walls t = 6 at its ends), b = 110 (walls t1 = 10 at its ends)
    const a = 210, b = 110, t = 6, t1 = 10;
    const am = a - t, bm = b - t1;
    const box = model(wall(-am / 2, bm / 2, am / 2, bm / 2, t1), wall(am / 2, bm / 2, am / 2, -bm / 2, t), wall(am / 2, -bm / 2, -am / 2, -bm / 2, t1), wall(-am / 2, -bm / 2, -am / 2, bm / 2, t));
    const r = closedSectionTorsion(box);
    expect(r.cells).toBe(1);
    expect(r.torsionConstant).toBeCloseTo((2 * t * t1 * (a - t) ** 2 * (b - t1) ** 2) / (a * t + b * t1 - t * t - t1 * t1), 4);
  });

  it("a 96-sided tube of thin wall approaches the exact tube's pi (r_o^4 - r_i^4) / 2 within 0.5%", () => {
    // Roark's Formulas for Stress and Strain: thin-walled tubes, J = 4 A^2 / (integral ds / t); exact for the circular tube as above
    const rm = 97.5, t = 5, n = 96;
    const plates = Array.from({ length: n }, (_, i) => {
      const a0 = (2 * Math.PI * i) / n, a1 = (2 * Math.PI * (i + 1)) / n;
      return wall(rm * Math.cos(a0), rm * Math.sin(a0), rm * Math.cos(a1), rm * Math.sin(a1), t);
    });
    within(closedSectionTorsion(model(...plates)).torsionConstant, (Math.PI * (100 ** 4 - 95 ** 4)) / 2, 0.005);
  });

  it("a symmetric two-cell box has the single cell's J, whatever its middle web (by symmetry it carries no flow)", () => {
    const outer = [wall(-100, 50, 0, 50, 10), wall(0, 50, 100, 50, 10), wall(100, 50, 100, -50, 6), wall(100, -50, 0, -50, 10), wall(0, -50, -100, -50, 10), wall(-100, -50, -100, 50, 6)];
    const single = closedSectionTorsion(model(...outer)).torsionConstant;
    for (const tw of [1, 6, 40]) {
      const two = closedSectionTorsion(model(...outer, wall(0, 50, 0, -50, tw)));
      expect(two.cells).toBe(2);
      expect(two.torsionConstant).toBeCloseTo(single, 3);
    }
  });

  it("an unsymmetric two-cell box: the middle web's flow from the two compatibility equations by hand", () => {
    // cells 1 (left, 100 x 100) and 2 (right, 200 x 100), all walls t = 10 except the middle web t_m = 5:
    // (sum L/t)_1 q1 - (h/t_m) q2 = 2 A1, -(h/t_m) q1 + (sum L/t)_2 q2 = 2 A2, J = 2 (q1 A1 + q2 A2)
    const h = 100, t = 10, tm = 5;
    const f1 = (100 + 100 + 100) / t + h / tm, f2 = (200 + 100 + 200) / t + h / tm, f12 = h / tm;
    const A1 = 100 * h, A2 = 200 * h;
    const det = f1 * f2 - f12 * f12;
    const q1 = (2 * A1 * f2 + f12 * 2 * A2) / det, q2 = (f1 * 2 * A2 + f12 * 2 * A1) / det;
    const walls = [wall(-100, 50, 0, 50, t), wall(0, 50, 200, 50, t), wall(200, 50, 200, -50, t), wall(200, -50, 0, -50, t), wall(0, -50, -100, -50, t), wall(-100, -50, -100, 50, t), wall(0, 50, 0, -50, tm)];
    expect(closedSectionTorsion(model(...walls)).torsionConstant).toBeCloseTo(2 * (q1 * A1 + q2 * A2), 3);
  });

  it("a box girder's flange outstands add L t^3 / 3", () => {
    const cell = [wall(-100, 50, 100, 50, 10), wall(100, 50, 100, -50, 6), wall(100, -50, -100, -50, 10), wall(-100, -50, -100, 50, 6)];
    const base = closedSectionTorsion(model(...cell));
    const r = closedSectionTorsion(model(...cell, wall(100, 50, 160, 50, 12), wall(-100, 50, -160, 50, 12)));
    expect(r.openPart).toBeCloseTo((2 * 60 * 12 ** 3) / 3, 6);
    expect(r.torsionConstant).toBeCloseTo(base.torsionConstant + r.openPart, 4);
  });
});

describe("openSectionProperties(shear centre and warping constant)", () => {
  it("a channel's shear centre lies e = 3 b^2 t_f / (6 b t_f + h t_w) behind the web, and C_w has its closed form", () => {
    // thin-walled channel, centre-line dimensions b (flange), h (web): e from Gere and Goodno, Mechanics of
    // Materials, shear centres of thin-walled open sections; C_w = t_f b^3 h^2 / 12 (3 b t_f + 2 h t_w) / (6 b t_f + h t_w)
    // from AISC Design Guide 9 (Seaburg and Carter, 1997), appendix (both from memory)
    const c = channel({ depth: 300, flangeWidth: 100, flangeThickness: 10, webThickness: 8 });
    const b = 100 - 4, h = 300 - 10, tf = 10, tw = 8;
    const p = openSectionProperties(c);
    const webLine = -50 + 4;
    expect(p.shearCentre.z).toBeCloseTo(webLine - (3 * b * b * tf) / (6 * b * tf + h * tw), 9);
    expect(p.shearCentre.y).toBeCloseTo(0, 9);
    within(p.warpingConstant, ((tf * b ** 3 * h ** 2) / 12) * ((3 * b * tf + 2 * h * tw) / (6 * b * tf + h * tw)), 1e-12);
  });

  it("a tee's and an angle's shear centre is where their walls' centre lines meet; C_w = 0 to thin-walled theory", () => {
    // Timoshenko and Gere, Theory of Elastic Stability, 2nd ed., chapter 5: sections of plates meeting at one point
    const t = openSectionProperties(tee({ depth: 150, flangeWidth: 150, flangeThickness: 12, webThickness: 8 }));
    expect(t.shearCentre.y).toBeCloseTo(75 - 6, 9);
    expect(t.shearCentre.z).toBeCloseTo(0, 9);
    expect(Math.abs(t.warpingConstant)).toBeLessThan(1e-6);
    const l = openSectionProperties(angle({ verticalLeg: 100, horizontalLeg: 75, thickness: 8 }));
    expect(l.shearCentre.z).toBeCloseTo(-37.5 + 4, 9);
    expect(l.shearCentre.y).toBeCloseTo(-50 + 4, 9);
    expect(Math.abs(l.warpingConstant)).toBeLessThan(1e-6);
  });

  it("a monosymmetric I: shear centre h I_2 / (I_1 + I_2) below the top flange, C_w = h^2 I_1 I_2 / (I_1 + I_2)", () => {
    // Timoshenko and Gere, Theory of Elastic Stability, 2nd ed., chapter 5 (from memory): I_1, I_2 the flanges' own second moments about the web
    const beam = iSection({ depth: 400, flangeWidth: 200, flangeThickness: 12, webThickness: 8, bottomFlangeWidth: 120, bottomFlangeThickness: 10 });
    const h = 400 - 6 - 5;
    const i1 = (12 * 200 ** 3) / 12, i2 = (10 * 120 ** 3) / 12;
    const p = openSectionProperties(beam);
    expect(p.shearCentre.y).toBeCloseTo(200 - 6 - (h * i2) / (i1 + i2), 9);
    within(p.warpingConstant, (h * h * i1 * i2) / (i1 + i2), 1e-12);
  });

  it("a Z-section (unsymmetric, point-symmetric) has its shear centre at its centroid", () => {
    const z = model(wall(-80, 150, 0, 150, 10), wall(0, 150, 0, -150, 6), wall(0, -150, 80, -150, 10));
    const p = openSectionProperties(z);
    expect(p.productMoment).not.toBeCloseTo(0, 0);
    expect(p.shearCentre.y).toBeCloseTo(0, 9);
    expect(p.shearCentre.z).toBeCloseTo(0, 9);
  });

  it("a doubly symmetric I gives C_w = I_y,flanges h_0^2 / 4 and sectorial coordinates b h_0 / 4 at the tips", () => {
    const p = openSectionProperties(iSection({ depth: 300, flangeWidth: 150, flangeThickness: 10, webThickness: 6 }));
    const h0 = 290;
    within(p.warpingConstant, ((2 * 10 * 150 ** 3) / 12) * (h0 * h0) / 4, 1e-12);
    const tips = p.nodes.filter((n) => Math.abs(n.z) > 74).map((n) => Math.abs(n.sectorialCoordinate));
    expect(tips).toHaveLength(4);
    for (const w of tips) expect(w).toBeCloseTo((75 * h0) / 2, 6);
  });

  it("a cover-plated I: the plate is linked to the flange and raises C_w; the shear centre moves towards it", () => {
    const beam = iSection({ depth: 300, flangeWidth: 150, flangeThickness: 10, webThickness: 6 });
    const cover = translateSection(rectangle({ width: 200, depth: 12 }), { y: 156, z: 0 });
    const m = centreLineModel(builtUp([beam, cover]));
    expect(m.plates.filter((w) => w.thickness === 0)).toHaveLength(1);
    const p = openSectionProperties(m);
    expect(p.warpingConstant).toBeGreaterThan(openSectionProperties(beam).warpingConstant);
    expect(p.shearCentre.y).toBeGreaterThan(0);
    expect(p.shearCentre.z).toBeCloseTo(0, 9);
  });
});

describe("principalAxisProperties and fullyPlasticMoments", () => {
  it("principalAxisProperties(I) are the z and y properties of sectionProperties", () => {
    const beam = iSection({ depth: 300, flangeWidth: 150, flangeThickness: 10, webThickness: 6, rootRadius: 12 });
    const p = sectionProperties(beam);
    const q = principalAxisProperties(beam);
    expect(q.major.sectionModulus.positive).toBeCloseTo(p.sectionModulus.top, 6);
    expect(q.major.radiusOfGyration).toBeCloseTo(p.radiusOfGyration.z, 12);
    expect(q.minor.sectionModulus.positive).toBeCloseTo(p.sectionModulus.right, 6);
    expect(q.minor.radiusOfGyration).toBeCloseTo(p.radiusOfGyration.y, 12);
  });

  it("an equal-leg angle's principal axes lie at 45 degrees; its least radius of gyration is below r_y", () => {
    const l = angle({ verticalLeg: 100, thickness: 10 });
    const q = principalAxisProperties(l);
    expect(Math.abs(q.angle)).toBeCloseTo(Math.PI / 4, 12);
    expect(q.minor.radiusOfGyration).toBeLessThan(sectionProperties(l).radiusOfGyration.y);
    // the major axis is the axis of symmetry through the heel; the heel's corner is the farthest
    // fibre from the minor axis, on its negative side; the toes are the farthest from the major axis
    const c = sectionProperties(l).centroid;
    expect(q.angle).toBeCloseTo(Math.PI / 4, 12);
    expect(q.minor.extremes.negative).toBeCloseTo(Math.SQRT2 * (c.z + 50), 9);
    expect(q.major.extremes.positive).toBeCloseTo(Math.abs((-50 - c.z) * -Math.SQRT1_2 + (50 - c.y) * Math.SQRT1_2), 9);
  });

  it("principalAxisProperties(circle) finds the arc's farthest point: S = pi r^3 / 4 both ways", () => {
    const q = principalAxisProperties({ parts: [{ kind: "circle", centre: { y: 0, z: 0 }, radius: 20 }] });
    expect(q.major.sectionModulus.positive).toBeCloseTo((Math.PI * 20 ** 3) / 4, 8);
    expect(q.minor.sectionModulus.negative).toBeCloseTo((Math.PI * 20 ** 3) / 4, 8);
  });

  it("fullyPlasticMoments of two plates of different yield strengths, by hand", () => {
    // bottom plate 300 x 10 at f_y 355 (y -5..5), top plate 300 x 10 at f_y 235 (y 5..15): the axis
    // where the yield forces balance, 235 * 3000 + 355 * 300 (5 - c) = 355 * 300 (c + 5),
    // c = 3.31 inside the bottom plate
    const steel = (fy: number) => ({ material: { elasticModulus: 210e3, yieldStrength: fy } });
    const s = builtUp([rectangle({ width: 300, depth: 10 }, steel(355)), translateSection(rectangle({ width: 300, depth: 10 }, steel(235)), { y: 10, z: 0 })]);
    const c = 5 - ((355 * 3000 + 235 * 3000) / 2 - 235 * 3000) / (355 * 300);
    const mp = 235 * 3000 * (10 - c) + (355 * 300 * ((5 - c) ** 2 + (c + 5) ** 2)) / 2;
    const r = fullyPlasticMoments(s);
    expect(r.neutralAxisY).toBeCloseTo(c, 9);
    expect(r.z).toBeCloseTo(mp, 0);
    expect(r.yieldForce).toBeCloseTo(355 * 3000 + 235 * 3000, 3);
    // about the vertical axis both plates are symmetric: (355 + 235) 10 300^2 / 4
    expect(r.y).toBeCloseTo(((355 + 235) * 10 * 300 ** 2) / 4, 0);
  });
});
