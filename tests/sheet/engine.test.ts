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
});
