import { describe, expect, test } from "vitest";
import { lineDiagramSvg, memberSvg, reportDiagrams, sectionSvg, type DrawnSectionPart, type MemberDrawing } from "../../src/report/index.js";
import { simpleSpanAnalysis } from "./fixture.js";
import { expectWellFormedSvg, renderSvg } from "./svg-check.js";

const member: MemberDrawing = {
  title: "Every support & load <kind>",
  length: 9,
  lengthUnit: "m",
  forceUnit: "kN",
  momentUnit: "kN*m",
  distributedUnit: "kN/m",
  hinges: [5.5],
  supports: [
    { at: 0, type: "pin" },
    { at: 2.5, type: "guided" },
    { at: 4, type: "spring" },
    { at: 7.5, type: "roller" },
    { at: 9, type: "fixed" },
  ],
  loads: [
    { kind: "point", at: 2, value: 18 },
    { kind: "point", at: 6, value: -6 },
    { kind: "moment", at: 8.5, value: 4 },
    { kind: "moment", at: 1, value: -4 },
    { kind: "distributed", from: 0, to: 9, start: 3, end: 5 },
    { kind: "distributed", from: 6, to: 8, start: -2, end: -2 },
  ],
};

const rectangle: DrawnSectionPart = { points: [[0, 0], [100, 0], [100, 300], [0, 300]], hole: false, material: "timber" };

describe("drawings render", () => {
  test("memberSvg draws every kind of support and load as well-formed SVG that renders with ink", () => {
    const svg = memberSvg(member);
    expectWellFormedSvg(svg);
    const { inked, width, height } = renderSvg(svg, "member-all-kinds");
    expect([width, height]).toEqual([760, 350]);
    expect(inked).toBeGreaterThan(0.02);
    expect(svg).toContain("Every support &amp; load &lt;kind&gt;");
    expect(svg).toContain("18 kN");
    expect(svg).toContain("6 kN up");
    expect(svg).toContain("3 to 5 kN/m");
    expect(svg).toContain("4 kN*m ccw");
    expect(svg).toContain("4 kN*m cw");
    expect(svg).toContain("L = 9 m");
  });
  test("lineDiagramSvg labels each peak with value, unit and location", () => {
    const svg = lineDiagramSvg({
      title: "Shear",
      length: 4,
      lengthUnit: "m",
      valueUnit: "kN",
      points: [[0, 5], [2, 5], [2, -5], [4, -5], [Number.NaN, 1]],
      peaks: [{ name: "max", at: 0, value: 5 }, { name: "min", at: 4, value: -5 }, { name: "bad", at: Number.NaN, value: 1 }],
    });
    expectWellFormedSvg(svg);
    expect(svg).toContain("max 5 kN at x = 0 m");
    expect(svg).toContain("min -5 kN at x = 4 m");
    expect(svg).not.toContain("bad");
    expect(renderSvg(svg, "line-shear").inked).toBeGreaterThan(0.02);
  });
  test("lineDiagramSvg of no points still draws axes", () => {
    const svg = lineDiagramSvg({ title: "Empty", length: 1, lengthUnit: "m", valueUnit: "kN", points: [], peaks: [] }, { width: 300, height: 200 });
    expectWellFormedSvg(svg);
    expect(renderSvg(svg).width).toBe(300);
  });
  test("sectionSvg draws holes, a legend for two materials, the neutral axis and a stress profile with a jump", () => {
    const svg = sectionSvg({
      title: "Two materials",
      lengthUnit: "mm",
      stressUnit: "MPa",
      parts: [rectangle, { points: [[40, 100], [60, 100], [60, 200], [40, 200]], hole: true, material: "timber" }, { points: [[0, 300], [100, 300], [100, 310], [0, 310]], hole: false, material: "steel" }],
      centroid: { y: 150, z: 50 },
      stress: [[0, 20], [300, -20], [300, -360], [310, -372]],
      stressNote: "at x = 3 m",
    });
    expectWellFormedSvg(svg);
    expect(svg).toContain("neutral axis");
    expect(svg).toContain("centroid");
    expect(svg).toContain("steel");
    expect(svg).toContain("-372 MPa");
    expect(renderSvg(svg, "section-two-materials").inked).toBeGreaterThan(0.02);
  });
  test("sectionSvg with fewer than two stress points draws the section alone", () => {
    const svg = sectionSvg({ title: "Bare", lengthUnit: "mm", stressUnit: "MPa", parts: [rectangle], centroid: { y: 150, z: 50 }, stress: [], stressNote: "" });
    expectWellFormedSvg(svg);
    expect(svg).not.toContain("MPa<");
  });
});

describe("reportDiagrams", () => {
  test("reportDiagrams gives member, shear, moment and deflection drawings, and the section when an outline is given", () => {
    const analysis = simpleSpanAnalysis();
    const without = reportDiagrams(analysis);
    expect(without.map((d) => d.name)).toEqual(["member", "shear", "moment", "deflection"]);
    const withSection = reportDiagrams(analysis, { sectionOutline: [rectangle] });
    expect(withSection.map((d) => d.name)).toEqual(["member", "shear", "moment", "deflection", "section"]);
    for (const d of withSection) {
      expectWellFormedSvg(d.svg);
      expect(renderSvg(d.svg, `fixture-${d.name}`).inked).toBeGreaterThan(0.02);
    }
    // Peak moment wL^2/8 = 45 kN*m at midspan; AISC Steel Construction Manual 15th ed., Table 3-23 case 1.
    expect(withSection[2]!.svg).toContain("max 45 kN*m at x = 3 m");
    // Peak deflection 5wL^4/(384EI) = 3.75 mm downward at midspan; same table.
    expect(withSection[3]!.svg).toContain("min -3.75 mm at x = 3 m");
    // Extreme fibre stress M c / I = 45e6 * 150 / 225e6 = 30 MPa (common practice).
    expect(withSection[4]!.svg).toContain("-30 MPa");
    expect(withSection[4]!.svg).toContain("M = 45 kN*m");
  });
  test("reportDiagrams draws couples as moments and omits the section without stresses", () => {
    const base = simpleSpanAnalysis();
    const analysis = simpleSpanAnalysis({ model: { ...base.model, loads: [{ kind: "couple", at: 2, value: 3 }, { kind: "point", at: 1, value: 2 }] } });
    const { stress: _omit, ...rest } = analysis;
    const drawings = reportDiagrams(rest, { sectionOutline: [rectangle] });
    expect(drawings.map((d) => d.name)).not.toContain("section");
    expect(drawings[0]!.svg).toContain("3 kN*m ccw");
  });
});
