import { describe, expect } from "vitest";
import { fc, test } from "@fast-check/vitest";
import {
  channel,
  closedSectionTorsion,
  fullyPlasticMoments,
  iSection,
  openSectionProperties,
  plasticProperties,
  principalAxisProperties,
  rectangle,
  rotateSection,
  sectionProperties,
  torsionConstantExact,
  torsionConstantRolledI,
  translateSection,
  type WallModel,
  type WallPlate,
} from "../../src/section/index.js";

const opts = { numRuns: 100 };
const near = (a: number, b: number, rel: number): boolean => Math.abs(a - b) <= rel * Math.max(Math.abs(a), Math.abs(b), 1e-300);
const length = (min: number, max: number) => fc.double({ min, max, noNaN: true });

/** A channel with plausible proportions. */
const channelDims = fc.record({ depth: length(100, 600), flangeWidth: length(40, 150), flangeThickness: length(5, 20), webThickness: length(4, 15) }).filter((d) => d.webThickness < d.flangeWidth / 2 && 2 * d.flangeThickness < d.depth / 3);
/** A doubly symmetric I with root fillets. */
const iDims = fc
  .record({ depth: length(100, 900), flangeWidth: length(50, 400), flangeThickness: length(5, 40), webThickness: length(4, 25), rootRadius: length(2, 25) })
  .filter((d) => d.webThickness + 2 * d.rootRadius < d.flangeWidth && 2 * d.rootRadius < d.depth - 2 * d.flangeThickness && d.flangeWidth > 2 * d.flangeThickness && d.depth - 2 * d.flangeThickness > 2 * d.webThickness);
const scale = length(0.05, 20);
const shift = fc.record({ y: length(-1e3, 1e3), z: length(-1e3, 1e3) });

const scaleModel = (m: WallModel, s: number): WallModel => ({
  kind: "wall-model",
  plates: m.plates.map((w) => ({ start: { y: w.start.y * s, z: w.start.z * s }, end: { y: w.end.y * s, z: w.end.z * s }, thickness: w.thickness * s })),
});

describe("laws of the stability properties", () => {
  test.prop([fc.record({ b: length(1, 100), t: length(1, 100) }), scale], opts)("torsionConstantExact(rectangle) scales as length^4", ({ b, t }, s) => {
    const j = torsionConstantExact(rectangle({ width: b, depth: t })).torsionConstant;
    const js = torsionConstantExact(rectangle({ width: b * s, depth: t * s })).torsionConstant;
    expect(near(js, j * s ** 4, 1e-12)).toBe(true);
  });

  test.prop([iDims, scale], opts)("torsionConstantRolledI scales as length^4", (d, s) => {
    const j = torsionConstantRolledI(d);
    const js = torsionConstantRolledI({ depth: d.depth * s, flangeWidth: d.flangeWidth * s, flangeThickness: d.flangeThickness * s, webThickness: d.webThickness * s, rootRadius: d.rootRadius * s });
    expect(near(js, j * s ** 4, 1e-11)).toBe(true);
  });

  test.prop([channelDims, scale], opts)("openSectionProperties(channel): C_w scales as length^6 and the shear centre as length", (d, s) => {
    const p = openSectionProperties(channel(d));
    const q = openSectionProperties(channel({ depth: d.depth * s, flangeWidth: d.flangeWidth * s, flangeThickness: d.flangeThickness * s, webThickness: d.webThickness * s }));
    expect(near(q.warpingConstant, p.warpingConstant * s ** 6, 1e-10)).toBe(true);
    expect(near(q.shearCentre.z, p.shearCentre.z * s, 1e-10)).toBe(true);
  });

  test.prop([channelDims, shift], opts)("the shear centre moves with a translated section, and C_w does not change", (d, by) => {
    const c = channel(d);
    const p = openSectionProperties(c);
    const q = openSectionProperties(translateSection(c, by));
    const size = d.depth + Math.abs(by.y) + Math.abs(by.z);
    expect(Math.abs(q.shearCentre.y - (p.shearCentre.y + by.y))).toBeLessThan(1e-9 * size);
    expect(Math.abs(q.shearCentre.z - (p.shearCentre.z + by.z))).toBeLessThan(1e-9 * size);
    expect(near(q.warpingConstant, p.warpingConstant, 1e-8)).toBe(true);
  });

  test.prop([iDims, shift], opts)("a doubly symmetric I's shear centre is its centroid", (d, by) => {
    const beam = translateSection(iSection(d), by);
    const p = openSectionProperties(beam);
    const c = sectionProperties(beam).centroid;
    const size = d.depth + Math.abs(by.y) + Math.abs(by.z);
    expect(Math.abs(p.shearCentre.y - c.y)).toBeLessThan(1e-9 * size);
    expect(Math.abs(p.shearCentre.z - c.z)).toBeLessThan(1e-9 * size);
  });

  test.prop([channelDims, fc.double({ min: -3.2, max: 3.2, noNaN: true })], opts)("rotating a channel rotates its shear centre about the origin and keeps C_w", (d, angle) => {
    const c = channel(d);
    const p = openSectionProperties(c);
    const q = openSectionProperties(rotateSection(c, angle));
    const cos = Math.cos(angle), sin = Math.sin(angle);
    expect(Math.abs(q.shearCentre.z - (p.shearCentre.z * cos - p.shearCentre.y * sin))).toBeLessThan(1e-9 * d.depth);
    expect(Math.abs(q.shearCentre.y - (p.shearCentre.z * sin + p.shearCentre.y * cos))).toBeLessThan(1e-9 * d.depth);
    expect(near(q.warpingConstant, p.warpingConstant, 1e-8)).toBe(true);
  });

  const boxWalls = fc.record({ a: length(50, 500), b: length(50, 500), t1: length(1, 10), t2: length(1, 10), order: fc.array(fc.nat(), { minLength: 4, maxLength: 4 }), flip: fc.array(fc.boolean(), { minLength: 4, maxLength: 4 }) });
  test.prop([boxWalls, scale], opts)("closedSectionTorsion: J scales as length^4 and does not depend on the order or direction of the walls", ({ a, b, t1, t2, order, flip }, s) => {
    const walls: WallPlate[] = [
      { start: { y: b / 2, z: -a / 2 }, end: { y: b / 2, z: a / 2 }, thickness: t1 },
      { start: { y: b / 2, z: a / 2 }, end: { y: -b / 2, z: a / 2 }, thickness: t2 },
      { start: { y: -b / 2, z: a / 2 }, end: { y: -b / 2, z: -a / 2 }, thickness: t1 },
      { start: { y: -b / 2, z: -a / 2 }, end: { y: b / 2, z: -a / 2 }, thickness: t2 },
    ];
    const j = closedSectionTorsion({ kind: "wall-model", plates: walls }).torsionConstant;
    const shuffled = walls.map((w, i) => ({ w, k: order[i]! })).sort((p, q) => p.k - q.k).map(({ w }, i) => (flip[i] ? { start: w.end, end: w.start, thickness: w.thickness } : w));
    const js = closedSectionTorsion(scaleModel({ kind: "wall-model", plates: shuffled }, s)).torsionConstant;
    expect(near(js, j * s ** 4, 1e-10)).toBe(true);
    // Bredt-Batho for one cell: 4 A^2 / sum (L / t)
    expect(near(j, (4 * (a * b) ** 2) / ((2 * a) / t1 + (2 * b) / t2), 1e-12)).toBe(true);
  });

  test.prop([fc.record({ b: length(1, 100), d: length(1, 100) }), fc.double({ min: -3.2, max: 3.2, noNaN: true })], opts)(
    "principalAxisProperties(rotated rectangle): major and minor moduli are b d^2 / 6 and d b^2 / 6 at any angle",
    ({ b, d }, angle) => {
      const q = principalAxisProperties(rotateSection(rectangle({ width: b, depth: d }), angle));
      const big = Math.max(b, d), small = Math.min(b, d);
      expect(near(q.major.sectionModulus.positive, (small * big * big) / 6, 1e-9)).toBe(true);
      expect(near(q.major.sectionModulus.negative, (small * big * big) / 6, 1e-9)).toBe(true);
      expect(near(q.minor.sectionModulus.positive, (big * small * small) / 6, 1e-9)).toBe(true);
    },
  );

  test.prop([iDims, fc.double({ min: 100, max: 700, noNaN: true })], opts)("fullyPlasticMoments of one material is f_y Z of plasticProperties", (d, fy) => {
    const beam = iSection(d, { material: { elasticModulus: 200e3, yieldStrength: fy } });
    const one = plasticProperties(beam);
    const many = fullyPlasticMoments(beam);
    expect(near(many.z, one.plasticMoment!.z, 1e-9)).toBe(true);
    expect(near(many.y, one.plasticMoment!.y, 1e-9)).toBe(true);
    expect(Math.abs(many.neutralAxisY - one.neutralAxisY)).toBeLessThan(1e-9 * d.depth);
  });
});
