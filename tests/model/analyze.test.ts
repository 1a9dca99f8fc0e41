import { describe, expect, it } from "vitest";
import { fc, test } from "@fast-check/vitest";
import { formatPath } from "../../src/errors/index.js";
import { analysisToJson, analyzeModel, evaluateDiagram, parseModel, tryAnalyzeModel, type ModelAnalysis } from "../../src/model/index.js";
import { physicalMember, writeMember, writeMemberWithUnits } from "./sound-models.js";

const simpleSpan = {
  length: 6,
  E: "200 GPa",
  I: "85000000 mm^4",
  supports: [
    { at: 0, type: "pin" },
    { at: 6, type: "roller" },
  ],
  loads: [{ type: "distributed", start: 12 }],
};

const near = (a: number, b: number, rel = 1e-12): void => {
  expect(Math.abs(a - b)).toBeLessThanOrEqual(rel * Math.max(1, Math.abs(b)));
};

describe("analyzeModel", () => {
  it("analyzeModel(simple span, uniform load) gives w L / 2, w L^2 / 8 and 5 w L^4 / (384 E I) in the model's units", () => {
    const a = analyzeModel(parseModel(simpleSpan));
    const [w, L, EI] = [12, 6, 200e6 * 85e-6]; // kN/m, m, kN*m^2
    // AISC Steel Construction Manual 15th ed., Table 3-23 case 1 (simple beam, uniformly distributed load).
    near(a.reactions[0]!.force, (w * L) / 2);
    near(a.reactions[1]!.force, (w * L) / 2);
    near(a.moment.max.value, (w * L * L) / 8);
    near(a.moment.max.at, L / 2);
    near(a.deflection.min.value, (-5 * w * L ** 4) / (384 * EI) * 1000, 1e-10); // mm
    near(a.slope.min.value, (-w * L ** 3) / (24 * EI), 1e-10);
    near(evaluateDiagram(a.diagrams.moment, L / 2), (w * L * L) / 8, 1e-10);
    near(evaluateDiagram(a.diagrams.shear, 0), (w * L) / 2, 1e-10);
    expect(a.units.moment).toBe("kN*m");
    expect(a.checks).toEqual([]);
    expect(a.pass).toBe(false); // nothing checked: no pass is claimed
  });

  it("analyzeModel(cantilever, point load at the tip, US units) gives P L and P L^3 / (3 E I)", () => {
    const a = analyzeModel(
      parseModel({
        units: { system: "usKipFoot" },
        length: 8,
        E: 29000,
        I: 350,
        supports: [{ at: 0, type: "fixed" }],
        loads: [{ type: "point", at: 8, value: 5 }],
        limits: { deflection: "span/180" },
      }),
    );
    const [P, L, E, I] = [5, 8 * 12, 29000, 350]; // kip, in, ksi, in^4
    // AISC Steel Construction Manual 15th ed., Table 3-23 case 22 (cantilever, load at free end) (from memory).
    near(a.reactions[0]!.force, P);
    near(a.reactions[0]!.moment, P * 8); // kip*ft, counterclockwise at the left fixed end
    near(a.moment.min.value, -P * 8);
    near(a.deflection.min.value, -(P * L ** 3) / (3 * E * I), 1e-10); // in
    expect(a.units.deflection).toBe("in");
    const check = a.checks[0]!;
    near(check.capacity, (8 * 12) / 180, 1e-12);
    near(check.demand, (P * L ** 3) / (3 * E * I), 1e-10);
    expect(check.pass).toBe(check.demand <= check.capacity);
  });

  it("analyzeModel(rectangle section) gives b d^3 / 12, M / S and 1.5 V / A", () => {
    const a = analyzeModel(
      parseModel({
        ...simpleSpan,
        I: undefined,
        E: undefined,
        material: { E: "11 GPa", name: "timber" },
        section: { shape: "rectangle", width: 90, depth: 240 },
        limits: { bendingStress: "10 MPa", shearStress: "3 MPa", deflection: "span/300" },
      }),
    );
    const [b, d] = [90, 240];
    // Gere and Goodno, Mechanics of Materials: I = b d^3 / 12, S = b d^2 / 6, tau_max = 3 V / (2 A) for a rectangle (common practice).
    near(a.section!.secondMomentZ, (b * d ** 3) / 12, 1e-12);
    near(a.section!.sectionModulus.top, (b * d * d) / 6, 1e-12);
    near(a.section!.area, b * d, 1e-12);
    // one vocabulary and frame with sectionProperties: extremes as signed y from the centroid, sectionModulus nested
    expect([a.section!.extremes, a.section!.sectionModulus.bottom]).toEqual([{ top: 120, bottom: -120 }, expect.closeTo((b * d * d) / 6, 6)]);
    const json = JSON.parse(JSON.stringify(analysisToJson(a))) as { section: Record<string, unknown> };
    expect(Object.keys(json.section)).toEqual(["shape", "area", "centroid", "secondMomentZ", "secondMomentY", "productMoment", "extremes", "sectionModulus"]);
    // the names before 0.1 still read, as aliases left out of the JSON
    expect([a.section!.yTop, a.section!.yBottom, a.section!.sectionModulusTop, a.section!.productMomentYZ]).toEqual([120, 120, a.section!.sectionModulus.top, a.section!.productMoment]);
    const M = (12 * 36) / 8; // kN*m
    near(a.stress!.tension.value, (M * 1e6) / ((b * d * d) / 6), 1e-10); // MPa
    near(a.stress!.tension.y, -120, 1e-12);
    near(a.stress!.compression.value, -(M * 1e6) / ((b * d * d) / 6), 1e-10);
    near(a.stress!.shear!.value, (1.5 * 36e3) / (b * d), 1e-9);
    expect(a.checks.map((c) => [c.kind, c.pass])).toEqual([
      ["deflection", false],
      ["bending-tension", false],
      ["bending-compression", false],
      ["shear-stress", true],
    ]);
    expect(a.pass).toBe(false);
    expect(a.sectionGeometry).toBeDefined();
  });

  it("analyzeModel warns when stress limits cannot be checked without a section", () => {
    const a = analyzeModel(parseModel({ ...simpleSpan, limits: { bendingStress: 165 } }));
    expect(a.warnings.map((w) => w.code)).toEqual(["stress-limit-without-section"]);
  });

  it("analyzeModel reports a mechanism and a bad section with paths into the model", () => {
    const loose = tryAnalyzeModel(parseModel({ ...simpleSpan, supports: [{ at: 0, type: "pin" }] }));
    expect(loose.ok).toBe(false);
    if (!loose.ok) expect(loose.error.issues.map((i) => i.code)).toContain("mechanism");
    const badSection = tryAnalyzeModel(
      parseModel({ ...simpleSpan, I: undefined, section: { shape: "i-section", depth: 300, flangeWidth: 100, flangeThickness: 10, webThickness: 120 } }),
    );
    expect(badSection.ok).toBe(false);
    if (!badSection.ok) expect(formatPath(badSection.error.issues[0]!.path)).toMatch(/^section/);
  });
});

const resultsOf = (a: ModelAnalysis) => ({
  units: a.units,
  reactions: a.reactions,
  shear: a.shear,
  moment: a.moment,
  slope: a.slope,
  deflection: a.deflection,
  checks: a.checks,
  pass: a.pass,
  warnings: a.warnings,
  diagrams: a.diagrams,
  ...(a.section === undefined ? {} : { section: a.section }),
  ...(a.stress === undefined ? {} : { stress: a.stress }),
});

describe("analysisToJson", () => {
  test.prop([physicalMember, fc.constantFrom("siKilonewtonMetre" as const, "usKipInch" as const)], { numRuns: 60 })(
    "its JSON text holds exactly the typed results, and the model echoed parses back to the same model",
    (member, system) => {
      const a = analyzeModel(parseModel(writeMember(member, system)));
      const json = JSON.parse(JSON.stringify(analysisToJson(a))) as Record<string, unknown>;
      const { format, model, ...rest } = json;
      expect(format).toBe(1);
      expect(rest).toEqual(resultsOf(a));
      expect(parseModel(model)).toEqual(a.model);
    },
  );
});

describe("unit re-expression", () => {
  // Tolerance 1e-9 relative: the three files hold the same member rounded differently (one rounding per converted
  // number); loads add no elements to the stiffness solve, so nothing amplifies those roundings much.
  test.prop([physicalMember], { numRuns: 60 })("the same member written in SI, in US units and with units on every number gives the same physical results", (member) => {
    const inSI = analyzeModel(parseModel(writeMember(member, "siKilonewtonMetre")));
    const inUS = analyzeModel(parseModel(writeMember(member, "usKipFoot")));
    const withUnits = analyzeModel(parseModel(writeMemberWithUnits(member)));
    const scaleF = (a: ModelAnalysis) => a.reactions.map((r) => [r.force * a.scale.force, r.moment * a.scale.moment]);
    const peaks = (a: ModelAnalysis) => [a.moment.max.value * a.scale.moment, a.moment.min.value * a.scale.moment, a.deflection.min.value * a.scale.deflection, a.shear.max.value * a.scale.force];
    const size = Math.max(1, ...scaleF(inSI).flat().map(Math.abs), ...peaks(inSI).slice(0, 2).map(Math.abs));
    for (const other of [inUS, withUnits]) {
      scaleF(other).flat().forEach((v, i) => expect(Math.abs(v - scaleF(inSI).flat()[i]!)).toBeLessThanOrEqual(1e-9 * size));
      const p = peaks(other);
      const q = peaks(inSI);
      expect(Math.abs(p[0]! - q[0]!)).toBeLessThanOrEqual(1e-9 * size);
      expect(Math.abs(p[1]! - q[1]!)).toBeLessThanOrEqual(1e-9 * size);
      const sway = Math.max(Math.abs(inSI.deflection.min.value), Math.abs(inSI.deflection.max.value)) * inSI.scale.deflection;
      expect(Math.abs(p[2]! - q[2]!)).toBeLessThanOrEqual(1e-9 * sway);
      expect(Math.abs(p[3]! - q[3]!)).toBeLessThanOrEqual(1e-9 * size);
    }
  });
});
