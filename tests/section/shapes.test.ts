import { describe, expect, it } from "vitest";
import { isFlexuraError } from "../../src/errors/index.js";
import {
  angle,
  builtUp,
  channel,
  firstMomentAbove,
  iSection,
  mirrorSection,
  outlines,
  pipe,
  plasticProperties,
  plateGirder,
  rectangle,
  rectangularHollow,
  rotateSection,
  section,
  sectionProperties,
  tee,
  torsionConstantThinWalled,
  translateSection,
  tryOutlines,
  tryTorsionConstantThinWalled,
} from "../../src/section/index.js";

const close = (a: number, b: number, rel = 1e-12): void => {
  expect(Math.abs(a - b)).toBeLessThanOrEqual(rel * Math.max(1, Math.abs(b)));
};

function codes(fn: () => unknown): unknown {
  try {
    fn();
  } catch (e) {
    if (isFlexuraError(e)) return e.issues.map((i) => `${i.code} @ ${i.path.join(".")}`);
    throw e;
  }
  return "no error";
}

describe("rectangularHollow", () => {
  it("rectangularHollow(square corners) gives I = (B D^3 - b d^3) / 12", () => {
    // Roark's Formulas for Stress and Strain, 8th ed., Table A.1 (hollow rectangle)
    const p = sectionProperties(rectangularHollow({ width: 100, depth: 200, wallThickness: 8 }));
    close(p.area, 100 * 200 - 84 * 184);
    close(p.secondMomentZ, (100 * 200 ** 3 - 84 * 184 ** 3) / 12);
    close(p.secondMomentY, (200 * 100 ** 3 - 184 * 84 ** 3) / 12);
  });

  it("rectangularHollow(rounded corners) takes (4 - pi) r^2 off each outline", () => {
    // quarter-circular spandrel of area (1 - pi/4) r^2 at each corner (Gere & Goodno, Mechanics of Materials, appendix of plane-area properties)
    const ro = 16, ri = 8;
    const p = sectionProperties(rectangularHollow({ width: 100, depth: 200, wallThickness: 8, cornerRadius: ro }));
    close(p.area, 100 * 200 - (4 - Math.PI) * ro ** 2 - (84 * 184 - (4 - Math.PI) * ri ** 2), 1e-12);
    const square = sectionProperties(rectangularHollow({ width: 100, depth: 200, wallThickness: 8 }));
    expect(p.secondMomentZ).toBeLessThan(square.secondMomentZ);
    expect(Math.abs(p.centroid.y) + Math.abs(p.centroid.z)).toBeLessThan(1e-12);
    expect(firstMomentAbove(rectangularHollow({ width: 100, depth: 200, wallThickness: 8, cornerRadius: ro }), 0).width).toBe(16);
  });

  it("rectangularHollow checks its proportions", () => {
    expect(codes(() => rectangularHollow({ width: 10, depth: 20, wallThickness: 5 }))).toEqual(["wall-too-thick @ wallThickness"]);
    expect(codes(() => rectangularHollow({ width: 10, depth: 20, wallThickness: 1, cornerRadius: 6, innerCornerRadius: 5 }))).toEqual([
      "corner-radius-too-large @ innerCornerRadius",
      "corner-radius-too-large @ cornerRadius",
    ]);
    expect(codes(() => rectangularHollow({ width: 10, depth: 20, wallThickness: 0 }))).toEqual(["dimension-not-positive @ wallThickness"]);
  });
});

describe("channel, angle, plateGirder", () => {
  it("channel(no fillets) follows composite areas: centroid of the web and flanges", () => {
    // composite areas and the parallel-axis theorem: Gere & Goodno, Mechanics of Materials, chapter 12
    const d = 200, b = 75, tf = 11, tw = 7;
    const Af = b * tf, Aw = tw * (d - 2 * tf);
    const zbar = (2 * Af * (b / 2) + Aw * (tw / 2)) / (2 * Af + Aw);
    const p = sectionProperties(channel({ depth: d, flangeWidth: b, flangeThickness: tf, webThickness: tw }));
    close(p.centroid.z + b / 2, zbar);
    close(p.secondMomentZ, (b * d ** 3 - (b - tw) * (d - 2 * tf) ** 3) / 12);
    close(p.productMoment, 0, 1e-9);
    const filleted = sectionProperties(channel({ depth: d, flangeWidth: b, flangeThickness: tf, webThickness: tw, rootRadius: 12 }));
    close(filleted.area, p.area + 2 * (1 - Math.PI / 4) * 144);
  });

  it("angle(equal legs) has its principal axes at 45 degrees", () => {
    // common practice: an equal-leg angle is symmetric about the 45-degree line through its heel
    const p = sectionProperties(angle({ verticalLeg: 100, thickness: 10, rootRadius: 8 }));
    close(p.secondMomentZ, p.secondMomentY, 1e-12);
    close(p.principal.angle, Math.PI / 4, 1e-12);
    close(p.centroid.y, p.centroid.z, 1e-12);
  });

  it("angle(unequal legs) has the composite-area centroid and product of inertia", () => {
    // composite areas and the parallel-axis theorem: Gere & Goodno, Mechanics of Materials, chapter 12
    const h = 100, w = 75, t = 8;
    const A1 = t * h, z1 = t / 2, y1 = h / 2;
    const A2 = (w - t) * t, z2 = t + (w - t) / 2, y2 = t / 2;
    const A = A1 + A2;
    const zc = (A1 * z1 + A2 * z2) / A, yc = (A1 * y1 + A2 * y2) / A;
    const Iyz = A1 * (z1 - zc) * (y1 - yc) + A2 * (z2 - zc) * (y2 - yc);
    const p = sectionProperties(angle({ verticalLeg: h, horizontalLeg: w, thickness: t }));
    close(p.centroid.z + w / 2, zc);
    close(p.centroid.y + h / 2, yc);
    close(p.productMoment, Iyz);
    expect(p.principal.angle).toBeGreaterThan(0);
  });

  it("angle checks its proportions", () => {
    expect(codes(() => angle({ verticalLeg: 10, horizontalLeg: 5, thickness: 5 }))).toEqual(["thickness-too-large @ thickness"]);
    expect(codes(() => angle({ verticalLeg: 10, thickness: 2, rootRadius: 9 }))).toEqual(["root-radius-too-large @ rootRadius"]);
  });

  it("channel checks its proportions", () => {
    expect(codes(() => channel({ depth: 20, flangeWidth: 10, flangeThickness: 10, webThickness: 10 }))).toEqual(["flange-too-thick @ flangeThickness", "web-too-thick @ webThickness"]);
    expect(codes(() => channel({ depth: 100, flangeWidth: 50, flangeThickness: 10, webThickness: 5, rootRadius: 46 }))).toEqual(["root-radius-too-large @ rootRadius"]);
  });

  it("plateGirder(unequal flanges) equals iSection with the same plates", () => {
    // the same plates give the same section (common practice)
    const g = sectionProperties(plateGirder({ topFlange: { width: 400, thickness: 30 }, web: { width: 1500, thickness: 12 }, bottomFlange: { width: 500, thickness: 40 } }));
    const i = sectionProperties(iSection({ depth: 1570, flangeWidth: 400, flangeThickness: 30, webThickness: 12, bottomFlangeWidth: 500, bottomFlangeThickness: 40 }));
    close(g.secondMomentZ, i.secondMomentZ);
    close(g.centroid.y, i.centroid.y, 1e-9);
    expect(codes(() => plateGirder({ topFlange: { width: 0, thickness: 30 }, web: { width: 1500, thickness: -1 } }))).toEqual([
      "dimension-not-positive @ topFlange.width",
      "dimension-not-positive @ web.thickness",
    ]);
    expect(codes(() => plateGirder({ topFlange: { width: 10, thickness: 30 }, web: { width: 1500, thickness: 12 } }))).toEqual(["web-too-thick @ web.thickness"]);
  });
});

describe("builtUp", () => {
  it("builtUp(I-beam + cover plate) follows the parallel-axis theorem", () => {
    // composite areas and the parallel-axis theorem: Gere & Goodno, Mechanics of Materials, chapter 12
    const beam = iSection({ depth: 300, flangeWidth: 150, flangeThickness: 10, webThickness: 6 });
    const cover = translateSection(rectangle({ width: 200, depth: 12 }), { y: 156, z: 0 });
    const s = builtUp([beam, cover]);
    const pb = sectionProperties(beam), pc = sectionProperties(cover);
    const A = pb.area + pc.area;
    const ybar = (pc.area * 156) / A;
    close(sectionProperties(s).centroid.y, ybar);
    close(sectionProperties(s).secondMomentZ, pb.secondMomentZ + pb.area * ybar ** 2 + pc.secondMomentZ + pc.area * (156 - ybar) ** 2);
    expect(s.parts).toHaveLength(4);
  });

  it("builtUp(timber with steel flitch plates) transforms by the modular ratio", () => {
    // transformed section, n = E_steel / E_timber (Gere & Goodno, Mechanics of Materials, composite beams)
    const timber = { name: "timber", elasticModulus: 10_000 };
    const steel = { name: "steel", elasticModulus: 200_000 };
    const s = builtUp([
      translateSection(rectangle({ width: 50, depth: 250 }, { material: timber }), { y: 0, z: -31 }),
      rectangle({ width: 12, depth: 250 }, { material: steel }),
      translateSection(rectangle({ width: 50, depth: 250 }, { material: timber }), { y: 0, z: 31 }),
    ]);
    const p = sectionProperties(s);
    close(p.secondMomentZ, (100 * 250 ** 3) / 12 + (20 * 12 * 250 ** 3) / 12);
    expect(p.transformed).toEqual({ referenceModulus: 10_000, modularRatios: [1, 20, 1] });
    const inSteel = sectionProperties(s, { referenceModulus: 200_000 });
    close(inSteel.secondMomentZ, p.secondMomentZ / 20);
    expect(inSteel.parts[0]?.modularRatio).toBe(0.05);
    // Q and the actual width at the neutral axis
    const q = firstMomentAbove(s, 0);
    close(q.firstMoment, (100 + 20 * 12) * 125 * 62.5);
    close(q.width, 112);
  });

  it("builtUp(plate with a bolt hole) gives the hole its plate's material", () => {
    // common practice: a hole removes the material it is cut from
    const steel = { elasticModulus: 200_000 };
    const timber = { elasticModulus: 10_000 };
    const s = builtUp([
      rectangle({ width: 100, depth: 100 }, { material: timber }),
      translateSection(rectangle({ width: 100, depth: 10 }, { material: steel }), { y: 55, z: 0 }),
      { kind: "circle", centre: { y: 55, z: 0 }, radius: 3, hole: true },
    ]);
    const p = sectionProperties(s);
    expect(p.transformed.modularRatios).toEqual([1, 20, 20]);
    close(p.area, 100 * 100 + 20 * (1000 - Math.PI * 9));
    expect(codes(() => builtUp("x" as never))).toEqual(["section-empty @ parts"]);
  });
});

describe("torsionConstantThinWalled", () => {
  it("torsionConstantThinWalled(I) is the sum of b t^3 / 3 over the plates", () => {
    // common practice: J of a thin-walled open section, sum of b t^3 / 3
    close(torsionConstantThinWalled(iSection({ depth: 300, flangeWidth: 150, flangeThickness: 10, webThickness: 6, rootRadius: 10 })), (2 * 150 * 1000 + 280 * 216) / 3);
    close(torsionConstantThinWalled(rotateSection(tee({ depth: 100, flangeWidth: 80, flangeThickness: 8, webThickness: 6 }), 0.3)), (80 * 512 + 92 * 216) / 3, 1e-9);
  });
  it("torsionConstantThinWalled refuses tubes and round parts", () => {
    const r = tryTorsionConstantThinWalled(pipe({ outsideDiameter: 100, wallThickness: 5 }));
    expect(r.ok).toBe(false);
    if (!r.ok) expect(r.error.issues.map((i) => i.code)).toEqual(["torsion-part-not-plate", "torsion-closed-section"]);
    expect(codes(() => torsionConstantThinWalled(section([{ kind: "polygon", points: [{ y: 0, z: 0 }, { y: 0, z: 2 }, { y: 1, z: 3 }, { y: 1, z: 0 }] }])))).toEqual(["torsion-part-not-plate @ parts.0"]);
  });
});

describe("outlines", () => {
  it("outlines(pipe) draws each circle with the requested chords, the hole flagged", () => {
    // common practice: a polygon of 4 n chords inscribed in each circle
    const o = outlines(pipe({ outsideDiameter: 100, wallThickness: 5 }), { segmentsPerQuarterTurn: 4 });
    expect(o.map((x) => [x.part, x.hole, x.points.length])).toEqual([
      [0, false, 16],
      [1, true, 16],
    ]);
    for (const p of o[0]!.points) close(Math.hypot(p.y, p.z), 50);
  });
  it("outlines(rectangle) gives its four corners counterclockwise in absolute coordinates", () => {
    const o = outlines(translateSection(rectangle({ width: 10, depth: 20 }), { y: 100, z: 0 }));
    expect(o[0]?.points).toEqual([
      { y: 90, z: -5 },
      { y: 90, z: 5 },
      { y: 110, z: 5 },
      { y: 110, z: -5 },
    ]);
    expect(tryOutlines(rectangle({ width: 1, depth: 1 }), { segmentsPerQuarterTurn: 0.5 }).ok).toBe(false);
  });
});

describe("mirrorSection and plastic properties of unsymmetric shapes", () => {
  it("mirrorSection(tee, 'z') turns it over and moves the centroid to the other side", () => {
    const t = tee({ depth: 150, flangeWidth: 150, flangeThickness: 12, webThickness: 8, rootRadius: 6 });
    const a = sectionProperties(t);
    const b = sectionProperties(mirrorSection(t, "z"));
    close(b.centroid.y, -a.centroid.y, 1e-12);
    close(b.secondMomentZ, a.secondMomentZ, 1e-12);
    close(plasticProperties(mirrorSection(t, "z")).neutralAxisY, -plasticProperties(t).neutralAxisY, 1e-12);
  });
});
