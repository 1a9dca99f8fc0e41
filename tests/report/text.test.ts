import { describe, expect, test } from "vitest";
import { REPORT_CAUTION, reportChecks, reportForces, reportInputs, reportSection, textReport } from "../../src/report/index.js";
import { simpleSpanAnalysis, simpleSpanModel } from "./fixture.js";

describe("textReport", () => {
  const text = textReport(simpleSpanAnalysis());
  test("textReport heads the report with the member's name and ends with a line feed", () => {
    expect(text.startsWith('flexura report: Test beam <B1> & "quotes"\n=====')).toBe(true);
    expect(text.endsWith("\n")).toBe(true);
    expect(text).toContain("A simple span under a uniform load, for report tests.");
  });
  test("textReport carries the caution, wrapped", () => {
    expect(REPORT_CAUTION).toContain("licensed engineer");
    expect(text.replace(/\s+/g, " ")).toContain(REPORT_CAUTION);
  });
  test("textReport echoes the inputs with their units", () => {
    expect(text).toContain("Member length: 6 m");
    expect(text).toContain("Section: rectangle (width 100 mm, depth 300 mm)");
    expect(text).toMatch(/1\s+pin\s+0 m\s+-\s+-/);
    expect(text).toMatch(/2\s+roller\s+6 m\s+-\s+0 mm down/);
    expect(text).toMatch(/1\s+distributed\s+0 to 6 m\s+10 kN\/m\s+live/);
    expect(text).toContain("Limits: deflection span/360; bending stress 165 MPa");
  });
  test("textReport states reactions and peaks of a simple span with their locations", () => {
    // R = wL/2 = 30 kN, max M = wL^2/8 = 45 kN*m at midspan, max deflection 5wL^4/(384EI) = 3.75 mm:
    // AISC Steel Construction Manual 15th ed., Table 3-23 case 1.
    expect(text).toMatch(/1\s+pin\s+0 m\s+30 kN\s+0 kN\*m/);
    expect(text).toContain("Sum of vertical reactions: 60 kN upward");
    expect(text).toMatch(/bending moment \(sagging \+\)\s+45 kN\*m\s+x = 3 m\s+0 kN\*m\s+x = 0 m/);
    expect(text).toMatch(/shear force\s+30 kN\s+x = 0 m\s+-30 kN\s+x = 6 m/);
    expect(text).toContain("Largest downward deflection: 3.75 mm at x = 3 m");
  });
  test("textReport lists section properties and extreme stresses", () => {
    // Rectangle 100 x 300: A = bd = 30 000 mm^2, I = bd^3/12 = 2.25e8 mm^4, S = bd^2/6 = 1.5e6 mm^3
    // (Roark's Formulas for Stress and Strain, 8th ed., Table A.1 case 2); sigma = M/S = 30 MPa.
    expect(text).toMatch(/area A\s+3e4 mm\^2|area A\s+30000 mm\^2/);
    expect(text).toMatch(/second moment I_z \(bending axis\)\s+2\.25e8 mm\^4/);
    expect(text).toMatch(/section modulus, top\s+1\.5e6 mm\^3/);
    expect(text).toMatch(/largest tension\s+30 MPa\s+x = 3 m, y = -150 mm/);
    expect(text).toMatch(/largest compression\s+-30 MPa\s+x = 3 m, y = 150 mm/);
  });
  test("textReport lists each check with demand, limit, utilisation and PASS, then the verdict", () => {
    expect(text).toMatch(/deflection against span\/360\s+3\.75 mm\s+16\.67 mm\s+0\.225\s+PASS/);
    expect(text).toMatch(/bending stress against allowable\s+30 MPa\s+165 MPa\s+0\.182\s+PASS/);
    expect(text).toContain("Overall: PASS (all 2 checks pass)");
  });
});

describe("report parts", () => {
  test("reportInputs covers segments, springs with settlement and rotation, hinges, couples, tapered loads and a fixed deflection limit", () => {
    const model = simpleSpanModel({
      name: undefined as unknown as string,
      E: undefined as unknown as number,
      section: undefined as unknown as never,
      I: 8e7,
      segments: [{ from: 0, to: 3, E: 200_000, I: 8e7 }],
      material: { name: "steel", E: 200_000, yieldStrength: 300 },
      supports: [
        { kind: "spring", at: 0, stiffness: 5000, rotationalStiffness: 800, settlement: 5, rotation: 0.001 },
        { kind: "fixed", at: 6 },
      ],
      hinges: [2.5],
      loads: [
        { kind: "couple", at: 1, value: 4 },
        { kind: "point", at: 2, value: 18, case: "dead" },
        { kind: "distributed", from: 1, to: 5, start: 3, end: 5 },
      ],
      limits: { deflection: { kind: "length", value: 12 }, shearStress: 95 },
    });
    const text = reportInputs(model);
    expect(text).not.toContain("Modulus of elasticity E");
    expect(text).toContain("Second moment of area I: 8e7 mm^4");
    expect(text).toMatch(/0 m\s+3 m\s+2e5 MPa\s+8e7 mm\^4|0 m\s+3 m\s+200000 MPa\s+8e7 mm\^4/);
    expect(text).toContain("Material: steel, E 2e5 MPa, yield strength 300 MPa".replace("2e5", "200000"));
    expect(text).toMatch(/spring\s+0 m\s+5000 kN\/m, 800 kN\*m\/rad\s+5 mm down, rotation 0\.001 rad/);
    expect(text).toContain("Hinges at: 2.5 m");
    expect(text).toMatch(/couple\s+at 1 m\s+4 kN\*m/);
    expect(text).toMatch(/distributed\s+1 to 5 m\s+3 to 5 kN\/m/);
    expect(text).toContain("Limits: deflection 12 mm; shear stress 95 MPa");
  });
  test("reportInputs says when there are no loads and no limits", () => {
    const text = reportInputs(simpleSpanModel({ loads: [], limits: {}, material: { E: 11_000 } }));
    expect(text).toContain("    none");
    expect(text).toContain("Limits: none given");
    expect(text).toContain("Material: E 1.1e4 MPa".replace("1.1e4", "11000"));
  });
  test("reportSection is empty without a section and omits stresses without them", () => {
    const { section: _s, stress: _t, ...bare } = simpleSpanAnalysis();
    expect(reportSection(bare)).toBe("");
    const { stress: _u, ...noStress } = simpleSpanAnalysis();
    expect(reportSection(noStress)).not.toContain("BENDING STRESS");
    const withShear = simpleSpanAnalysis({ stress: { ...simpleSpanAnalysis().stress!, shear: { value: 1.5, at: 0, y: 0 } } });
    expect(reportSection(withShear)).toMatch(/largest shear stress\s+1\.5 MPa\s+x = 0 m/);
  });
  test("reportChecks counts failures, says when nothing was checked, and lists warnings", () => {
    const base = simpleSpanAnalysis();
    const failing = simpleSpanAnalysis({
      checks: [{ ...base.checks[0]!, demand: 20, utilisation: 1.2, pass: false }, base.checks[1]!],
      pass: false,
      warnings: [{ code: "no-section", message: "No section was given, so stresses were not checked." }],
    });
    const text = reportChecks(failing);
    expect(text).toMatch(/deflection against span\/360\s+20 mm\s+16\.67 mm\s+1\.20\s+FAIL/);
    expect(text).toContain("Overall: FAIL (1 of 2 checks fail)");
    expect(text).toContain("- No section was given, so stresses were not checked. [no-section]");
    expect(reportChecks(simpleSpanAnalysis({ checks: [] }))).toContain("No limits given, so nothing was checked.");
  });
  test("reportForces omits the downward line when nothing deflects down", () => {
    const up = simpleSpanAnalysis({ deflection: { max: { value: 1, at: 3 }, min: { value: 0, at: 0 } } });
    expect(reportForces(up)).not.toContain("Largest downward deflection");
  });
  test("textReport names an unnamed member and honours the width", () => {
    const { name: _n, description: _d, ...model } = simpleSpanModel();
    const text = textReport(simpleSpanAnalysis({ model }), { width: 40 });
    expect(text.startsWith("flexura report: unnamed member\n")).toBe(true);
    const caution = text.split("\n\n")[1]!;
    for (const line of caution.split("\n")) expect(line.length).toBeLessThanOrEqual(40);
  });
});
