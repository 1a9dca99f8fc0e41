import { describe, expect } from "vitest";
import { fc, test } from "@fast-check/vitest";
import { analyzeModel, parseModel, type ModelAnalysis } from "../../src/model/index.js";
import { convert } from "../../src/units/index.js";
import { physicalMember, writeMember } from "./sound-models.js";

type Json = Record<string, unknown>;
const mm = (lo: number, hi: number) => fc.integer({ min: lo * 10, max: hi * 10 }).map((n) => n / 10);

/** Sound sections of every shape the model format has, dimensions in mm. */
const sectionInMm: fc.Arbitrary<Json> = fc.oneof(
  fc.record({ depth: mm(100, 400), flangeWidth: mm(40, 120), flangeThickness: mm(5, 15), webThickness: mm(4, 10), rootRadius: mm(0, 8) }).map((d) => ({ shape: "channel", ...d })),
  fc.record({ verticalLeg: mm(50, 200), horizontalLeg: mm(50, 200), thickness: mm(5, 15), rootRadius: mm(0, 10) }).map((d) => ({ shape: "angle", ...d })),
  fc.record({ width: mm(50, 300), depth: mm(50, 300), wallThickness: mm(3, 12), corner: fc.double({ min: 0, max: 2, noNaN: true }) }).map(({ corner, ...d }) => ({ shape: "rectangular-hollow", ...d, cornerRadius: Math.round(corner * d.wallThickness * 10) / 10 })),
  fc
    .record({ flange: mm(100, 400), tf: mm(10, 40), web: mm(200, 1200), tw: mm(6, 20), bottom: mm(100, 400) })
    .map((d) => ({ shape: "plate-girder", topFlange: { width: d.flange, thickness: d.tf }, web: { depth: d.web, thickness: d.tw }, bottomFlange: { width: d.bottom, thickness: d.tf } })),
  fc.record({ ply: mm(30, 80), plate: mm(5, 20), depth: mm(150, 400), n: fc.integer({ min: 5, max: 20 }), hole: fc.boolean() }).map((d) => {
    const box = (z0: number, z1: number, extra: Json = {}): Json => ({ type: "polygon", points: [{ y: 0, z: z0 }, { y: 0, z: z1 }, { y: d.depth, z: z1 }, { y: d.depth, z: z0 }], ...extra });
    const parts = [box(0, d.ply), box(d.ply, d.ply + d.plate, { modularRatio: d.n }), box(d.ply + d.plate, 2 * d.ply + d.plate)];
    if (d.hole) parts.push({ type: "circle", centre: { y: d.depth / 2, z: d.ply / 2 }, radius: d.ply / 5, hole: true });
    return { shape: "built-up", parts };
  }),
);

/** Every length of a section written in mm, re-expressed in inches. */
function inInches(value: unknown, key = ""): unknown {
  if (typeof value === "number") return key === "modularRatio" ? value : convert(value, "mm", "in");
  if (Array.isArray(value)) return value.map((v) => inInches(v));
  if (typeof value === "object" && value !== null) return Object.fromEntries(Object.entries(value).map(([k, v]) => [k, inInches(v, k)]));
  return value;
}

function withSection(file: Json, section: unknown, E: number): Json {
  const { I: _I, E: _E, ...rest } = file;
  return { ...rest, section, material: { E: `${E} Pa` }, limits: { deflection: "span/300", bendingStress: "150 MPa", shearStress: "90 MPa" } };
}

describe("unit re-expression of the section shapes", () => {
  // The same physical member and section, written in SI (mm) and in US units (in), gives the same
  // section properties, stresses and verdicts once each is scaled to SI.
  test.prop([physicalMember, sectionInMm], { numRuns: 80 })("SI and US files of the same shape agree on properties, stresses and checks", (member, section) => {
    const inSI = analyzeModel(parseModel(withSection(writeMember(member, "siKilonewtonMetre"), section, member.E)));
    const inUS = analyzeModel(parseModel(withSection(writeMember(member, "usKipInch"), inInches(section), member.E)));
    const props = (a: ModelAnalysis) => [a.section!.area * a.scale.area, a.section!.secondMomentZ * a.scale.secondMoment, a.section!.secondMomentY * a.scale.secondMoment, a.section!.extremes.top * a.scale.sectionLength];
    props(inUS).forEach((v, i) => expect(Math.abs(v - props(inSI)[i]!)).toBeLessThanOrEqual(1e-9 * Math.abs(props(inSI)[i]!)));
    const stresses = (a: ModelAnalysis) => [a.stress!.tension.value, a.stress!.compression.value].map((v) => v * a.scale.stress);
    const big = Math.max(...stresses(inSI).map(Math.abs), 1e-6);
    stresses(inUS).forEach((v, i) => expect(Math.abs(v - stresses(inSI)[i]!)).toBeLessThanOrEqual(1e-6 * big));
    const shear = (a: ModelAnalysis) => (a.stress!.shear?.value ?? 0) * a.scale.stress;
    expect(Math.abs(shear(inUS) - shear(inSI))).toBeLessThanOrEqual(1e-6 * Math.abs(shear(inSI)) + 1e-9 * big);
    expect(inUS.checks.map((c) => c.kind)).toEqual(inSI.checks.map((c) => c.kind));
    inUS.checks.forEach((c, i) => {
      const other = inSI.checks[i]!;
      expect(Math.abs(c.utilisation - other.utilisation)).toBeLessThanOrEqual(1e-6 * Math.max(1e-9, ...inSI.checks.filter((x) => x.kind === c.kind).map((x) => x.utilisation)));
    });
  });
});
