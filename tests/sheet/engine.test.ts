// The sheet functions in a real spreadsheet engine: formulas that reference ranges, spilled tables, an edit
// and a recalculation, every value compared with the typed API, and our messages in error cells.
import { describe, expect, test } from "vitest";
import { analyzeModel, evaluateDiagram, parseModel } from "../../src/model/index.js";
import { memberModelJson, sheetSolveCount } from "../../src/sheet/index.js";
import { workbook } from "./engine.js";

// An invented floor beam: 6 m, E 200 GPa, I 80e6 mm^4, pin and roller, 12 kN/m and 20 kN at 2 m.
const rows = (): (string | number | null)[][] => [
  ["length", 6, "", "supports", "", "", "loads"],
  ["E", "200 GPa", "", 0, "pin", "", "distributed", "", "", 12],
  ["I", "80e6 mm^4", "", 6, "roller", "", "point", 2, "", 20],
  [],
  ["=FLEXURA.MOMENT(2, B1, B2, B3, D2:F3, G2:L3)", "=FLEXURA.DEFLECTION(3, B1, B2, B3, D2:F3, G2:L3)", "=FLEXURA.SHEAR(1, B1, B2, B3, D2:F3, G2:L3)"],
  ["=FLEXURA.REACTIONS(B1, B2, B3, D2:F3, G2:L3)"],
];

const typed = (): ReturnType<typeof analyzeModel> => {
  const json = memberModelJson(6, "200 GPa", "80e6 mm^4", [[0, "pin", null], [6, "roller", null]], [["distributed", null, null, 12], ["point", 2, null, 20]], null);
  return analyzeModel(parseModel(json));
};

describe("HyperFormula", () => {
  test("values at a position equal the typed API's, and a simple-span hand check holds", () => {
    const hf = workbook({ Beam: rows() });
    const a = typed();
    const at = (row: number, col: number): unknown => hf.getCellValue({ sheet: 0, row, col });
    // The engine rounds what it shows to about ten significant digits; the typed API's values, rounded so, agree.
    expect(at(4, 0)).toBeCloseTo(evaluateDiagram(a.diagrams.moment, 2), 8);
    expect(at(4, 1)).toBeCloseTo(evaluateDiagram(a.diagrams.deflection, 3), 8);
    expect(at(4, 2)).toBeCloseTo(evaluateDiagram(a.diagrams.shear, 1), 8);
    // Simple span (common practice): R_left = w L / 2 + P b / L = 36 + 20 * 4 / 6; M(2) = R_left * 2 - w * 2^2 / 2.
    const rLeft = 36 + 80 / 6;
    expect(at(4, 0)).toBeCloseTo(rLeft * 2 - 12 * 2, 9);
    hf.destroy();
  });
  test("the reactions table spills with its header, and follows an edit", () => {
    const hf = workbook({ Beam: rows() });
    const table = (): unknown[][] => hf.getSheetValues(0).slice(5, 8).map((r) => r.slice(0, 4));
    expect(table()[0]).toEqual(["support", "at (m)", "force (kN)", "moment (kN*m)"]);
    expect(table()[1]![2]).toBeCloseTo(36 + 80 / 6, 9);
    expect(table()[2]![2]).toBeCloseTo(36 + 40 / 6, 9);
    const before = sheetSolveCount();
    hf.setCellContents({ sheet: 0, row: 2, col: 9 }, 30); // the point load becomes 30 kN
    expect(table()[1]![2]).toBeCloseTo(36 + 120 / 6, 9);
    // One edit, one member: solved once however many cells ask about it.
    expect(sheetSolveCount() - before).toBe(1);
    hf.destroy();
  });
  test("bad input shows our message in the cell, naming the range and row", () => {
    const sheet = rows();
    sheet[2]![7] = 9; // the point load at 9 m on a 6 m member
    sheet[1]![4] = "hinge-ish";
    const hf = workbook({ Beam: sheet });
    const moment = hf.getCellValue({ sheet: 0, row: 4, col: 0 }) as { type: string; message: string };
    expect(moment.type).toBe("VALUE");
    expect(moment.message).toMatch(/^supports row 1, kind: "hinge-ish" is not a support kind/);
    hf.setCellContents({ sheet: 0, row: 1, col: 4 }, "pin");
    const again = hf.getCellValue({ sheet: 0, row: 4, col: 0 }) as { type: string; message: string };
    expect(again.message).toMatch(/^loads row 2, position: .*outside the member/);
    hf.destroy();
  });
  test("sections, stresses, stepped members and checks: spilled tables, values and an edit, against the typed API", () => {
    // An invented lintel: 4.2 m, a 100 x 250 mm timber-like rectangle (E 11 GPa), 3 kN/m.
    const hf = workbook({
      Lintel: [
        ["shape", "rectangle", "", "limits", "", "", "segments"],
        ["width", 100, "", "deflection", "span/300", "", 0, 2.1, "150e6 mm^4"],
        ["depth", 250, "", "bendingStress", "10 MPa", "", 2.1, 4.2, "100e6 mm^4"],
        ["", "", "", "", "", "", "", "", ""],
        ["=FLEXURA.SECTIONPROPERTY(\"secondMomentZ\", B1, A2:B4)", "=FLEXURA.BENDINGSTRESS(5, 125, B1, A2:B4)", "=FLEXURA.SHEARSTRESS(6, 0, B1, A2:B4)", "=FLEXURA.UTILISATION(D2:E4, B1, A2:B4, 4.2, \"11 GPa\", , A9:C10, D9:I9)", "=FLEXURA.MOMENT(2.1, 4.2, \"11 GPa\", G2:I4, A9:C10, D9:I9)"],
        ["", "", "", "", "", "", "", "", "", "", "=FLEXURA.SECTION(B1, A2:B4)"],
        [],
        [],
        [0, "pin", null, "distributed", null, null, 3],
        [4.2, "roller", null],
        [],
        [],
        [],
        [],
        [],
        [],
        ["=FLEXURA.CHECKS(D2:E4, B1, A2:B4, 4.2, \"11 GPa\", , A9:C10, D9:I9)"],
      ],
    });
    const at = (row: number, col: number): unknown => hf.getCellValue({ sheet: 0, row, col });
    const I = (100 * 250 ** 3) / 12; // b h^3 / 12, mm^4
    expect(at(4, 0)).toBeCloseTo(I, 2);
    expect(at(4, 1)).toBeCloseTo((-5e6 * 125) / I, 9); // -M y / I, MPa
    expect(at(4, 2)).toBeCloseTo((1.5 * 6e3) / (100 * 250), 9); // 1.5 V / A
    expect(at(4, 4)).toBeCloseTo((3 * 4.2 ** 2) / 8, 9); // w L^2 / 8 on the stepped member: determinate
    // The section table spills two columns under its header.
    expect(at(5, 10)).toBe("property");
    expect(at(6, 10)).toBe("area (mm^2)");
    expect(at(6, 11)).toBeCloseTo(25000, 6);
    // Deflection governs: 5 w L^4 / (384 E I) against 4200 / 300; bending M / S = 6.615e6 / (b h^2 / 6) against 10 MPa.
    const deflection = (5 * 3 * 4200 ** 4) / (384 * 11e3 * I) / (4200 / 300);
    const bending = ((3 * 4.2 ** 2) / 8) * 1e6 / ((100 * 250 ** 2) / 6) / 10;
    expect(at(4, 3)).toBeCloseTo(Math.max(deflection, bending), 9);
    expect(at(16, 0)).toBe("check");
    expect([at(17, 0), at(18, 0), at(19, 0)]).toEqual(["deflection", "bending-tension", "bending-compression"]);
    expect(at(17, 5)).toBeCloseTo(deflection, 9);
    // A deeper section: every cell that asks about it follows.
    hf.setCellContents({ sheet: 0, row: 2, col: 1 }, 300);
    expect(at(4, 3)).toBeCloseTo(Math.max(deflection * (250 / 300) ** 3, bending * (250 / 300) ** 2), 9);
    // A bad dimension makes every result that uses it an error with our message, never a number.
    hf.setCellContents({ sheet: 0, row: 2, col: 1 }, "deep");
    for (const col of [0, 1, 2, 3]) expect((at(4, col) as { message: string }).message).toMatch(/^dimensions, depth: /);
    hf.destroy();
  });
});
