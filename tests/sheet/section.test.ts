// Section, stress, stiffness-segment and check functions, called as a spreadsheet calls them, against hand
// formulas (common practice unless a source is named) and the typed API.
import { fc, test } from "@fast-check/vitest";
import { describe, expect } from "vitest";
import { analyzeModel, evaluateDiagram, parseModel } from "../../src/model/index.js";
import {
  isSheetError,
  memberModelJson,
  sheetBendingStress,
  sheetChecks,
  sheetDeflection,
  sheetMoment,
  sheetSection,
  sheetSectionProperty,
  sheetShearStress,
  sheetUtilisation,
  type SheetValue,
} from "../../src/sheet/index.js";

const message = (v: SheetValue): string => (isSheetError(v) ? v.message : `not an error: ${JSON.stringify(v)}`);
const rect = [["width", 100], ["depth", 200]];
const table = (v: SheetValue): Map<string, number> => new Map((v as [string, number][]).slice(1).map(([k, n]) => [k.replace(/ \(.*\)$/, ""), n]));

describe("FLEXURA.SECTION and FLEXURA.SECTIONPROPERTY", () => {
  test("sheetSection(rectangle) gives b h^3 / 12, h b^3 / 12, b h^2 / 6 and b h", () => {
    const t = sheetSection("rectangle", rect);
    const rows = t as unknown[][];
    expect(rows[0]).toEqual(["property", "value"]);
    expect(rows.map((r) => r[0])).toContain("secondMomentZ (mm^4)");
    const p = table(t);
    expect(p.get("area")).toBeCloseTo(100 * 200, 8);
    expect(p.get("secondMomentZ")).toBeCloseTo((100 * 200 ** 3) / 12, 4);
    expect(p.get("secondMomentY")).toBeCloseTo((200 * 100 ** 3) / 12, 4);
    expect(p.get("sectionModulusTop")).toBeCloseTo((100 * 200 ** 2) / 6, 5);
    expect(p.get("yTop")).toBeCloseTo(100, 10);
    expect(p.get("yBottom")).toBeCloseTo(100, 10);
  });
  test("sheetSection(pipe, i-section, plate-girder) gives the closed forms", () => {
    // Pipe: I = pi (D^4 - d^4) / 64.
    const pipe = table(sheetSection("pipe", [["outsideDiameter", 168.3], ["wallThickness", 7.1]]));
    expect(pipe.get("secondMomentZ")).toBeCloseTo((Math.PI * (168.3 ** 4 - (168.3 - 14.2) ** 4)) / 64, 3);
    // I-section with sharp corners: I = [b h^3 - (b - t_w)(h - 2 t_f)^3] / 12.
    const [h, b, tf, tw] = [310, 165, 9.7, 5.8];
    const i = table(sheetSection("i-section", [["depth", h], ["flangeWidth", b], ["flangeThickness", tf], ["webThickness", tw]]));
    expect(i.get("secondMomentZ")! / ((b * h ** 3 - (b - tw) * (h - 2 * tf) ** 3) / 12)).toBeCloseTo(1, 12);
    expect(i.get("area")).toBeCloseTo(2 * b * tf + (h - 2 * tf) * tw, 8);
    // Plate girder: web 800 x 10, flanges 300 x 20: I = t d^3 / 12 + 2 (b t^3 / 12 + b t (d / 2 + t / 2)^2).
    const g = table(sheetSection("plate-girder", [["topFlange.width", 300], ["topflange.thickness", 20], ["web.depth", 800], ["web.thickness", 10]]));
    expect(g.get("secondMomentZ")! / ((10 * 800 ** 3) / 12 + 2 * ((300 * 20 ** 3) / 12 + 300 * 20 * 410 ** 2))).toBeCloseTo(1, 12);
  });
  test("names in any case, numbers stored as text, text with units, blank rows, and a US unit set", () => {
    const I = (b: number, h: number): number => (b * h ** 3) / 12;
    expect(sheetSectionProperty("SecondMomentZ", "Rectangle", [["WIDTH", "100"], [null, null], ["depth", "0.2 m"], ["", ""]])).toBeCloseTo(I(100, 200), 4);
    expect(sheetSectionProperty("secondMomentZ (mm^4)", "rectangle", rect)).toBeCloseTo(I(100, 200), 4);
    expect(sheetSectionProperty("secondMomentZ", "rectangle", [["width", 4], ["depth", 10]], "usKipInch")).toBeCloseTo(I(4, 10), 9); // in^4
  });
  test("bad input: the shape, the dimension and the property are named", () => {
    expect(message(sheetSection("", rect))).toMatch(/^shape: give a shape name/);
    expect(message(sheetSection("hexagon", rect))).toMatch(/^shape: /);
    expect(message(sheetSection("rectangle", [["width", 100]]))).toMatch(/^dimensions, depth: /);
    expect(message(sheetSection("rectangle", [["width", 100], ["depth", "2 kN"]]))).toMatch(/^dimensions, depth: /);
    expect(message(sheetSection("rectangle", [["width", 100], ["width", 100], ["depth", 200]]))).toMatch(/^dimensions row 2, name: "width" is given twice/);
    expect(message(sheetSection("rectangle", [["width", 100], ["depth", 200], ["height", 5]]))).toMatch(/^dimensions, height: /);
    expect(message(sheetSection("i-section", [["depth", 310], ["flangeWidth", 165], ["flangeThickness", 9.7], ["webThickness", 200]]))).toMatch(/^dimensions, webThickness: /);
    expect(message(sheetSection("rectangle", [[100, 200]]))).toMatch(/^dimensions row 1, name: "100" is not a dimension name/);
    expect(message(sheetSectionProperty("inertia", "rectangle", rect))).toMatch(/^property: "inertia" is not a section property/);
    expect(message(sheetSection("built-up", []))).toMatch(/use FLEXURA\.MODEL/);
  });
});

describe("FLEXURA.BENDINGSTRESS and FLEXURA.SHEARSTRESS", () => {
  test("sigma = -M y / I and tau = V Q / (I b) on a 100 x 200 mm rectangle", () => {
    // M = 10 kN*m = 1e7 N*mm, y = 100 mm: -1e7 * 100 / (100 * 200^3 / 12) = -15 MPa (compression at the top).
    expect(sheetBendingStress(10, 100, "rectangle", rect)).toBeCloseTo(-15, 10);
    expect(sheetBendingStress(10, -50, "rectangle", rect)).toBeCloseTo(7.5, 10);
    // At the centroid tau = 1.5 V / A; at y = 50: V Q / (I b), Q = b (h/2 - y)(h/2 + y) / 2.
    expect(sheetShearStress(30, 0, "rectangle", rect)).toBeCloseTo(1.5 * 30e3 / 20000, 10);
    const Q = (100 * 50 * 150) / 2;
    expect(sheetShearStress(30, 50, "rectangle", rect)).toBeCloseTo((30e3 * Q) / (((100 * 200 ** 3) / 12) * 100), 10);
    expect(sheetBendingStress("10 kN*m", "0.1 m", "rectangle", rect)).toBeCloseTo(-15, 10);
  });
  test("bad input: a fibre outside the section and a moment that is not a number are named", () => {
    expect(message(sheetBendingStress(10, 101, "rectangle", rect))).toMatch(/^y: the fibre is outside the section, which runs from 100 mm below the centroid to 100 mm above it/);
    expect(message(sheetShearStress(10, -120, "rectangle", rect))).toMatch(/^y: the fibre is outside/);
    expect(message(sheetBendingStress("ten", 0, "rectangle", rect))).toMatch(/^moment: "ten" is not a number in kN\*m/);
    expect(message(sheetShearStress(null, 0, "rectangle", rect))).toMatch(/^shear: "" is not a number in kN/);
    expect(message(sheetShearStress("3 m", 0, "rectangle", rect))).toMatch(/^shear: "3 m" is not a number in kN or a force with its unit/);
  });
});

const supports = [[0, "pin", null], [6, "roller", null]];
const udl = [["distributed", null, null, 12]];

describe("stiffness segments in the I argument", () => {
  test("a stepped member gives the typed API's values; a determinate moment does not depend on I", () => {
    const segments = [[0, 2, "120e6 mm^4", null], [2, 4, "80e6 mm^4", "210 GPa"], [4, 6, "120e6 mm^4", null]];
    const json = memberModelJson(6, "200 GPa", segments, supports, udl, null);
    const a = analyzeModel(parseModel(json));
    expect(sheetDeflection(3, 6, "200 GPa", segments, supports, udl)).toBe(evaluateDiagram(a.diagrams.deflection, 3));
    expect(sheetMoment(3, 6, "200 GPa", segments, supports, udl)).toBeCloseTo(54, 10); // w L^2 / 8
  });
  test.prop([fc.integer({ min: 1, max: 5 }), fc.integer({ min: 1, max: 11 })])("segments of one I equal the single I", (n, x) => {
    const rows = Array.from({ length: n }, (_, i) => [(6 * i) / n, (6 * (i + 1)) / n, "80e6 mm^4"]);
    const one = sheetDeflection(x / 2, 6, "200 GPa", "80e6 mm^4", supports, udl) as number;
    expect(sheetDeflection(x / 2, 6, "200 GPa", rows, supports, udl)).toBeCloseTo(one, 10);
  });
  test("bad rows are named: a gap, an end beyond the member, a blank row between", () => {
    expect(message(sheetMoment(3, 6, "200 GPa", [[0, 3, "80e6 mm^4"], [3, 7, "40e6 mm^4"]], supports, udl))).toMatch(/^I row 2, end: /);
    expect(message(sheetMoment(3, 6, "200 GPa", [[0, 2, "80e6 mm^4"], [3, 6, "40e6 mm^4"]], supports, udl))).toMatch(/^I row 2/);
    expect(message(sheetMoment(3, 6, "200 GPa", [[0, 3, "80e6 mm^4"], [null, null, null], [3, 6, "40e6 mm^4"]], supports, udl))).toMatch(/^I row 2: a blank row/);
    expect(message(sheetMoment(3, 6, "200 GPa", [[0, 6, "80 kN"]], supports, udl))).toMatch(/^I row 1, I: /);
  });
});

describe("FLEXURA.CHECKS and FLEXURA.UTILISATION", () => {
  const [h, b, tf, tw] = [310, 165, 9.7, 5.8];
  const ishape = [["depth", h], ["flangeWidth", b], ["flangeThickness", tf], ["webThickness", tw]];
  const limits = [["deflection", "span/360"], ["bending stress", "165 MPa"], ["shearStress", 95], [null, null]];
  const member = [6, "200 GPa", null, supports, udl] as const;
  test("deflection, bending and shear stress by the handbook formulas; the governing utilisation is the largest", () => {
    const I = (b * h ** 3 - (b - tw) * (h - 2 * tf) ** 3) / 12; // mm^4
    const t = sheetChecks(limits, "i-section", ishape, ...member) as unknown[][];
    expect(t[0]).toEqual(["check", "description", "demand", "capacity", "unit", "utilisation", "pass", "at (m)"]);
    const row = (kind: string): unknown[] => t.find((r) => r[0] === kind)!;
    // 5 w L^4 / (384 E I), in mm, against 6000 / 360.
    const delta = (5 * 12 * 6000 ** 4) / (384 * 200e3 * I);
    expect(row("deflection")[2]).toBeCloseTo(delta, 8);
    expect(row("deflection")[5]).toBeCloseTo(delta / (6000 / 360), 10);
    // M / S with M = w L^2 / 8 = 54 kN*m, S = I / (h / 2).
    expect(row("bending-tension")[2]).toBeCloseTo((54e6 * (h / 2)) / I, 8);
    // tau at the neutral axis = V Q / (I t_w), V = w L / 2 = 36 kN, Q = b t_f (h - t_f) / 2 + t_w (h / 2 - t_f)^2 / 2.
    const Q = (b * tf * (h - tf)) / 2 + (tw * (h / 2 - tf) ** 2) / 2;
    expect(row("shear-stress")[2]).toBeCloseTo((36e3 * Q) / (I * tw), 8);
    const governing = Math.max(...t.slice(1).map((r) => r[5] as number));
    expect(sheetUtilisation(limits, "i-section", ishape, ...member)).toBe(governing);
    expect(governing).toBeCloseTo(delta / (6000 / 360), 10);
  });
  test("deflection limits alone need no section", () => {
    const u = sheetUtilisation([["deflection", "span/360"]], "", null, 6, "200 GPa", "80e6 mm^4", supports, udl) as number;
    expect(u).toBeCloseTo((5 * 12 * 6000 ** 4) / (384 * 200e3 * 80e6) / (6000 / 360), 10);
  });
  test("a limit that cannot be checked, an unknown limit or none at all is an error, never a smaller utilisation", () => {
    expect(message(sheetUtilisation([["deflection", "span/360"], ["bendingStress", 165]], "", null, 6, "200 GPa", "80e6 mm^4", supports, udl))).toMatch(/^limits: The stress limits are not checked/);
    expect(message(sheetUtilisation([["deflexion", "span/360"]], "", null, ...member))).toMatch(/^limits row 1, name: "deflexion" is not a limit/);
    expect(message(sheetUtilisation([], "i-section", ishape, ...member))).toMatch(/^limits: give at least one limit/);
    expect(message(sheetUtilisation([["shearStress", null]], "i-section", ishape, ...member))).toMatch(/^limits row 1, value: give the shearStress limit/);
    expect(message(sheetChecks(limits, "i-section", ishape, 6, "200 GPa", null, supports, [["point", 7, null, 10]]))).toMatch(/^loads row 1, position: /);
    expect(message(sheetChecks(limits, "i-section", ishape, 6, "200 GPa", "80e6 mm^4", supports, udl))).toMatch(/^(member|I|section)/);
  });
});
