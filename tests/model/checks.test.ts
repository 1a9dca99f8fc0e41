import { describe, expect, it } from "vitest";
import { fc, test } from "@fast-check/vitest";
import { checkMember, memberSection, type DeflectionLimit } from "../../src/check/index.js";
import { analyzeModel, parseModel } from "../../src/model/index.js";
import { builtUp, iSection, rectangle, type Section, type SectionPart } from "../../src/section/index.js";
import { physicalMember, writeMember } from "./sound-models.js";

const near = (a: number, b: number, rel = 1e-9): void => {
  expect(Math.abs(a - b)).toBeLessThanOrEqual(rel * Math.max(1e-12, Math.abs(b)));
};

/** A section in mm as a model file writes it, and the same section built directly in metres. */
const shapes = fc.oneof(
  fc.record({ width: fc.integer({ min: 50, max: 400 }), depth: fc.integer({ min: 100, max: 800 }) }).map((d) => ({
    file: { shape: "rectangle", ...d },
    inMetres: (): Section => rectangle({ width: d.width / 1000, depth: d.depth / 1000 }),
  })),
  fc
    .record({ depth: fc.integer({ min: 150, max: 900 }), flangeWidth: fc.integer({ min: 80, max: 400 }), tf: fc.integer({ min: 6, max: 30 }), tw: fc.integer({ min: 4, max: 20 }) })
    .map((d) => ({
      file: { shape: "i-section", depth: d.depth, flangeWidth: d.flangeWidth, flangeThickness: d.tf, webThickness: d.tw },
      inMetres: (): Section => iSection({ depth: d.depth / 1000, flangeWidth: d.flangeWidth / 1000, flangeThickness: d.tf / 1000, webThickness: d.tw / 1000 }),
    })),
);

const limits = fc.record({
  deflection: fc.oneof(
    fc.integer({ min: 100, max: 600 }).map((n): { file: string; si: DeflectionLimit } => ({ file: `span/${n}`, si: { kind: "ratio", ratio: n, cantileverFactor: 1 } })),
    fc.integer({ min: 1, max: 60 }).map((mm): { file: string; si: DeflectionLimit } => ({ file: `${mm} mm`, si: { kind: "absolute", limit: mm / 1000 } })),
  ),
  bendingStress: fc.integer({ min: 1, max: 400 }), // MPa
  shearStress: fc.integer({ min: 1, max: 200 }), // MPa
});

describe("analyzeModel's checks are checkMember's", () => {
  // The law: a model's verdicts are exactly what the member-check module decides for the same
  // member, section and limits given directly in SI (one implementation of pass/fail).
  test.prop([physicalMember, shapes, limits], { numRuns: 120 })("on random members, sections and limits, each check's verdict and utilisation equal a direct checkMember call", (member, shape, lim) => {
    const { E: _E, I: _I, ...file } = writeMember(member, "siKilonewtonMetre");
    const a = analyzeModel(
      parseModel({ ...file, material: { E: `${member.E} Pa` }, section: shape.file, limits: { deflection: lim.deflection.file, bendingStress: lim.bendingStress, shearStress: lim.shearStress } }),
    );
    const direct = checkMember(a.solution!, memberSection(shape.inMetres()), { bendingStress: lim.bendingStress * 1e6, shearStress: lim.shearStress * 1e6, deflection: lim.deflection.si });
    const key = (kind: string, span: number | undefined): string => `${kind}:${span ?? -1}`;
    const ours = new Map(a.checks.map((c) => [key(c.kind, c.span), c]));
    expect(ours.size).toBe(direct.checks.length);
    for (const c of direct.checks) {
      const m = ours.get(key(c.check, c.at.span));
      expect(m).toBeDefined();
      expect(m!.pass).toBe(c.pass);
      near(m!.utilisation, c.utilisation);
      near(m!.at, c.at.x, 1e-12);
    }
    expect(a.pass).toBe(direct.pass);
    near(a.stress!.tension.value * 1e6, direct.stresses.tension.stress);
    near(a.stress!.compression.value * 1e6, direct.stresses.compression.stress);
  });
});

describe("analyzeModel's checks of a section of two materials are checkMember's, part by part", () => {
  const plies = fc.record({ ply: fc.integer({ min: 30, max: 80 }), plate: fc.integer({ min: 5, max: 20 }), depth: fc.integer({ min: 150, max: 400 }), timber: fc.integer({ min: 5, max: 20 }), steel: fc.integer({ min: 100, max: 300 }) });
  test.prop([physicalMember, plies], { numRuns: 60 })("a flitch beam's bending and shear checks per part and deflection equal a direct checkMember call with bendingStressByPart and shearStressByPart", (member, d) => {
    const corners = (z0: number, z1: number) => [{ y: 0, z: z0 }, { y: 0, z: z1 }, { y: d.depth, z: z1 }, { y: d.depth, z: z0 }];
    const { E: _E, I: _I, ...file } = writeMember(member, "siKilonewtonMetre");
    const Et = 11e9;
    const a = analyzeModel(
      parseModel({
        ...file,
        material: { E: `${Et} Pa` },
        section: {
          shape: "built-up",
          parts: [
            { type: "polygon", points: corners(0, d.ply) },
            { type: "polygon", points: corners(d.ply, d.ply + d.plate), material: { E: "200 GPa" }, bendingStress: d.steel, shearStress: d.steel / 2 },
            { type: "polygon", points: corners(d.ply + d.plate, 2 * d.ply + d.plate) },
          ],
        },
        limits: { deflection: "span/300", bendingStress: d.timber, shearStress: 2 },
      }),
    );
    const m = (p: { y: number; z: number }[], E: number): SectionPart => ({ kind: "polygon", points: p.map((q) => ({ y: q.y / 1000, z: q.z / 1000 })), material: { elasticModulus: E } });
    const geometry = builtUp([m(corners(0, d.ply), Et), m(corners(d.ply, d.ply + d.plate), 200e9), m(corners(d.ply + d.plate, 2 * d.ply + d.plate), Et)]);
    const direct = checkMember(a.solution!, memberSection(geometry, { referenceModulus: Et }), {
      bendingStressByPart: [d.timber * 1e6, d.steel * 1e6, d.timber * 1e6],
      // the common shear allowable is the timber's (the model's material); the plate has its own
      shearStressByPart: [2e6, (d.steel / 2) * 1e6, 2e6],
      deflection: { kind: "ratio", ratio: 300, cantileverFactor: 1 },
    });
    const ours = [...a.checks].sort((x, y) => x.kind.localeCompare(y.kind) || (x.span ?? 0) - (y.span ?? 0));
    expect(ours.map((c) => [c.kind, c.pass])).toEqual([...direct.checks].sort((x, y) => x.check.localeCompare(y.check) || (x.at.span ?? 0) - (y.at.span ?? 0)).map((c) => [c.check, c.pass]));
    const tension = a.checks.filter((c) => c.kind === "bending-tension");
    direct.stresses.parts.forEach((p, i) => near(tension[i]!.demand * 1e6, p.tension.stress));
    const shear = a.checks.filter((c) => c.kind === "shear-stress");
    expect(shear.map((c) => c.part)).toEqual([0, 1, 2]);
    direct.stresses.shearByPart.forEach((p, i) => near(shear[i]!.demand * 1e6, p.stress));
    if (a.stress?.shear !== undefined) expect(a.stress.shearByPart?.map((p) => p.part)).toEqual([0, 1, 2]);
    expect(a.pass).toBe(direct.pass);
  });
});

describe("analyzeModel's checks in the model's units", () => {
  const span = {
    units: { system: "siKilonewtonMetre" },
    length: 5,
    material: { E: "200 GPa" },
    section: { shape: "rectangle", width: 100, depth: 300 },
    supports: [{ at: 0, type: "pin" }, { at: 5, type: "roller" }],
    loads: [{ type: "point", at: 2.5, value: 40 }],
  };

  it("names the span, the fibre and its height, in model units", () => {
    const a = analyzeModel(parseModel({ ...span, limits: { deflection: "span/250", bendingStress: 165, shearStress: 95 } }));
    const [d, t, c, v] = a.checks;
    // Simple span, central point load: M = P L / 4, deflection P L^3 / (48 E I) (AISC Steel Construction Manual 15th ed., Table 3-23 case 7).
    const I = (100 * 300 ** 3) / 12; // mm^4
    near(d!.demand, (40e3 * 5000 ** 3) / (48 * 200e3 * I), 1e-9);
    near(d!.capacity, 5000 / 250, 1e-12);
    expect(d).toMatchObject({ kind: "deflection", span: 0, unit: "mm", description: "deflection of span 1 (0 to 5 m) against its length/250" });
    near(t!.demand, (50e6 * 150) / I, 1e-9); // M = 50 kN*m; sigma = M c / I (common practice)
    expect(t).toMatchObject({ kind: "bending-tension", fibre: "bottom", y: -150, unit: "MPa" });
    expect(c).toMatchObject({ kind: "bending-compression", fibre: "top", y: 150 });
    near(v!.demand, (1.5 * 20e3) / (100 * 300), 1e-9); // tau = 1.5 V / A for a rectangle (common practice)
    expect(v).toMatchObject({ kind: "shear-stress", y: 0 });
  });

  it("checks an absolute deflection limit span by span, relative to the supports", () => {
    const a = analyzeModel(parseModel({ ...span, supports: [{ at: 0, type: "pin", settlement: 10 }, { at: 5, type: "roller" }], limits: { deflection: "12 mm" } }));
    expect(a.checks).toHaveLength(1);
    const I = (100 * 300 ** 3) / 12;
    // Settlement moves the span rigidly and is not counted; P L^3 / (48 E I) remains (AISC Manual 15th ed., Table 3-23 case 7).
    near(a.checks[0]!.demand, (40e3 * 5000 ** 3) / (48 * 200e3 * I), 1e-6);
    expect(a.checks[0]!.description).toBe("deflection of span 1 (0 to 5 m) against 12 mm");
  });

  it("without a section checks deflection only, cantilevers against their own length / N", () => {
    const a = analyzeModel(
      parseModel({ length: 3, E: "200 GPa", I: "5e7 mm^4", supports: [{ at: 0, type: "fixed" }], loads: [{ type: "point", at: 3, value: 5 }], limits: { deflection: "span/180", bendingStress: 100 } }),
    );
    expect(a.warnings.map((w) => w.code)).toEqual(["stress-limit-without-section"]);
    expect(a.checks.map((c) => [c.kind, c.span])).toEqual([["deflection", 0]]);
    near(a.checks[0]!.capacity, 3000 / 180, 1e-12);
    // Cantilever, load at the free end: P L^3 / (3 E I) (AISC Steel Construction Manual 15th ed., Table 3-23 case 22).
    near(a.checks[0]!.demand, (5e3 * 3000 ** 3) / (3 * 200e3 * 5e7), 1e-9);
    expect(a.checks[0]!.description).toBe("deflection of cantilever 1 (0 to 3 m) against its length/180");
  });
});
