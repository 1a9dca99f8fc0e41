import { describe, expect, it } from "vitest";
import { analysisToJson, analyzeModel, evaluateDiagram, modelToJson, parseModel, tryAnalyzeModel } from "../../src/model/index.js";

const near = (a: number, b: number, rel = 1e-10): void => {
  expect(Math.abs(a - b)).toBeLessThanOrEqual(rel * Math.max(1, Math.abs(b)));
};

// A 4 m cantilever with a 10 kN load at the tip (invented), N and mm section units by default.
const cantilever = {
  length: 4,
  material: { E: "200 GPa" },
  supports: [{ at: 0, type: "fixed" }],
  loads: [{ type: "point", at: 4, value: 10 }],
  limits: { bendingStress: 250, shearStress: 150 },
};

describe("analyzeModel with a section", () => {
  it("a solid circle: I = pi d^4 / 64 and the peak shear stress 4 V / (3 A) at the neutral axis", () => {
    const a = analyzeModel(parseModel({ ...cantilever, section: { shape: "circle", diameter: 120 } }));
    // Roark's Formulas for Stress and Strain, 8th ed., Table A.1 (solid circle) (from memory); Gere and Goodno, Mechanics of Materials, shear in circular beams (from memory).
    const d = 120;
    const A = (Math.PI * d * d) / 4;
    near(a.section!.secondMomentZ, (Math.PI * d ** 4) / 64);
    near(a.section!.area, A);
    near(a.stress!.shear!.value, (4 * 10e3) / (3 * A), 1e-8);
    near(a.stress!.tension.value, (40e6 * 60) / ((Math.PI * d ** 4) / 64)); // hogging: tension at the top
    near(a.stress!.tension.y, 60);
    near(a.stress!.tension.at, 0);
  });

  it("a pipe: I = pi (D^4 - d^4) / 64 and tau = 4V/(3A) (r2^2 + r2 r1 + r1^2) / (r2^2 + r1^2)", () => {
    const a = analyzeModel(parseModel({ ...cantilever, section: { shape: "pipe", outsideDiameter: 168.3, wallThickness: 7.1 } }));
    const [r2, r1] = [168.3 / 2, 168.3 / 2 - 7.1];
    const A = Math.PI * (r2 * r2 - r1 * r1);
    // Gere and Goodno, Mechanics of Materials, shear stresses in hollow circular beams (from memory).
    near(a.section!.secondMomentZ, (Math.PI * (r2 ** 4 - r1 ** 4)) / 4);
    near(a.stress!.shear!.value, ((4 * 10e3) / (3 * A)) * ((r2 * r2 + r2 * r1 + r1 * r1) / (r2 * r2 + r1 * r1)), 1e-8);
  });

  it("a tee and an unequal-flange I: centroid and I by composite areas and the parallel-axis theorem", () => {
    const tee = analyzeModel(parseModel({ ...cantilever, section: { shape: "tee", depth: 200, flangeWidth: 150, flangeThickness: 12, webThickness: 10 } }));
    // Composite-area centroid and parallel-axis theorem (common practice), measured up from the bottom fibre.
    const parts = [
      { A: 188 * 10, y: 94, I: (10 * 188 ** 3) / 12 },
      { A: 150 * 12, y: 194, I: (150 * 12 ** 3) / 12 },
    ];
    const area = parts.reduce((s, p) => s + p.A, 0);
    const yc = parts.reduce((s, p) => s + p.A * p.y, 0) / area;
    const I = parts.reduce((s, p) => s + p.I + p.A * (p.y - yc) ** 2, 0);
    near(tee.section!.area, area);
    near(tee.section!.extremes.bottom * -1, yc);
    near(tee.section!.extremes.top, 200 - yc);
    near(tee.section!.secondMomentZ, I);
    near(tee.section!.sectionModulus.bottom, I / yc);
    // Under hogging the top (flange) is in tension, the bottom of the stem in compression.
    near(tee.stress!.compression.value, -(40e6 * yc) / I);
    near(tee.stress!.compression.y, -yc);

    const girder = analyzeModel(
      parseModel({
        ...cantilever,
        section: { shape: "i-section", depth: 500, flangeWidth: 200, flangeThickness: 15, webThickness: 10, bottomFlangeWidth: 300, bottomFlangeThickness: 20 },
      }),
    );
    const g = [
      { A: 300 * 20, y: 10, I: (300 * 20 ** 3) / 12 },
      { A: 465 * 10, y: 20 + 465 / 2, I: (10 * 465 ** 3) / 12 },
      { A: 200 * 15, y: 492.5, I: (200 * 15 ** 3) / 12 },
    ];
    const gA = g.reduce((s, p) => s + p.A, 0);
    const gy = g.reduce((s, p) => s + p.A * p.y, 0) / gA;
    near(girder.section!.extremes.bottom * -1, gy);
    near(girder.section!.secondMomentZ, g.reduce((s, p) => s + p.I + p.A * (p.y - gy) ** 2, 0));
    expect(girder.checks.map((c) => c.kind)).toEqual(["bending-tension", "bending-compression", "shear-stress"]);
  });
});

describe("analyzeModel with segments", () => {
  it("a stepped cantilever's tip deflection is P/(3 E I1) (L^3 - (L-a)^3) + P/(3 E I2) (L-a)^3", () => {
    // Virtual work (unit load) on a cantilever with two stiffnesses (common practice).
    const a = analyzeModel(
      parseModel({
        length: 4,
        E: "200 GPa",
        segments: [
          { from: 0, to: 1.5, I: "2e8 mm^4" },
          { from: 1.5, to: 4, I: "8e7 mm^4", E: "200 GPa" },
        ],
        supports: [{ at: 0, type: "fixed" }],
        loads: [{ type: "point", at: 4, value: 10 }],
        limits: { deflection: "20 mm" },
      }),
    );
    const [P, L, s, EI1, EI2] = [10, 4, 1.5, 200e6 * 2e-4, 200e6 * 8e-5]; // kN, m, m, kN*m^2
    const tip = (P / (3 * EI1)) * (L ** 3 - (L - s) ** 3) + (P / (3 * EI2)) * (L - s) ** 3;
    near(a.deflection.min.value, -tip * 1000, 1e-9);
    near(a.checks[0]!.demand, tip * 1000, 1e-9);
    expect(a.checks[0]!.description).toContain("20 mm");
  });

  it("segments that do not tile the member are reported under segments", () => {
    const r = tryAnalyzeModel(
      parseModel({ length: 4, E: 1, segments: [{ from: 0, to: 1, I: 1 }, { from: 2, to: 4, I: 1 }], supports: [{ at: 0, type: "fixed" }] }),
    );
    expect(r.ok).toBe(false);
    if (!r.ok) expect(r.error.issues[0]!.path[0]).toBe("segments");
  });
});

describe("evaluateDiagram", () => {
  it("takes the left or right limit at a jump, reads 0 off the member at an end and refuses beyond the tolerance", () => {
    const a = analyzeModel(parseModel({ length: 4, E: 1e6, I: 1e6, supports: [{ at: 0, type: "pin" }, { at: 4, type: "roller" }], loads: [{ type: "point", at: 1, value: 8 }] }));
    // Simple span, point load P at a: V = P b / L left of the load, -P a / L right of it (AISC Manual 15th ed., Table 3-23 case 8).
    near(evaluateDiagram(a.diagrams.shear, 1, "left"), 6);
    near(evaluateDiagram(a.diagrams.shear, 1, "right"), -2);
    near(evaluateDiagram(a.diagrams.moment, 1), 6);
    near(evaluateDiagram(a.diagrams.moment, 4), 0);
    near(evaluateDiagram(a.diagrams.shear, 0), 6);
    expect(evaluateDiagram(a.diagrams.shear, 0, "left")).toBe(0);
    near(evaluateDiagram(a.diagrams.shear, 4), -2);
    near(evaluateDiagram(a.diagrams.shear, 4, "left"), -2);
    expect(evaluateDiagram(a.diagrams.shear, 4, "right")).toBe(0);
    near(evaluateDiagram(a.diagrams.shear, 4 + 1e-9), -2);
    expect(() => evaluateDiagram(a.diagrams.moment, 5)).toThrow(expect.objectContaining({ issues: [expect.objectContaining({ code: "outside-domain", path: ["x"] })] }));
    expect(() => evaluateDiagram(a.diagrams.moment, Number.NaN)).toThrow(expect.objectContaining({ issues: [expect.objectContaining({ code: "outside-domain" })] }));
    expect(() => evaluateDiagram(a.diagrams.moment, 1, "up" as "left")).toThrow(expect.objectContaining({ issues: [expect.objectContaining({ code: "unknown-side" })] }));
    expect(() => evaluateDiagram({ unit: "kN", pieces: [] }, 1)).toThrow(expect.objectContaining({ issues: [expect.objectContaining({ code: "diagram-invalid" })] }));
  });
});

describe("modelToJson and analysisToJson with every optional field", () => {
  it("round-trips a model with name, section, material, springs and prescribed rotations", () => {
    const file = {
      name: "lintel L1",
      description: "over the workshop door",
      units: { system: "siKilonewtonMetre" },
      length: 3,
      section: { shape: "rectangle", width: 100, depth: 300 },
      material: { name: "glulam", E: 12, yieldStrength: 0.024 },
      supports: [
        { at: 0, type: "fixed", rotation: 0.001, settlement: 1 },
        { at: 3, type: "spring", stiffness: 2000, rotationalStiffness: 500 },
      ],
      loads: [{ type: "point", at: 1.5, value: 5, case: "dead" }],
      limits: { deflection: 10, bendingStress: 20 },
    };
    const model = parseModel(file);
    expect(parseModel(modelToJson(model))).toEqual(model);
    const a = analyzeModel(model);
    const json = analysisToJson(a);
    expect(json.name).toBe("lintel L1");
    expect(json.section).toEqual(a.section);
    expect(json.model.material).toEqual({ name: "glulam", E: 12, yieldStrength: 0.024 });
  });
});
