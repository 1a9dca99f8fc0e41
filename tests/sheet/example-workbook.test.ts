// The example workbook (examples/sheet/mezzanine.xlsx) opened with exceljs and recalculated in a real engine
// (HyperFormula with flexura's functions): every result cell against the typed API, a few against hand
// formulas (common practice), and the committed file against a fresh build of its script.
import { readFileSync } from "node:fs";
import { resolve } from "node:path";
import ExcelJS from "exceljs";
import { beforeAll, describe, expect, test } from "vitest";
import { analyzeModel, evaluateDiagram, parseModel, type ModelAnalysis } from "../../src/model/index.js";
import { envelopes, presetCombinations, solveCases, type LoadCase } from "../../src/combine/index.js";
import { uniformLoad } from "../../src/loads/index.js";
import { isSheetError, limitsJson, memberModelJson, sectionJson } from "../../src/sheet/index.js";
import { BLOCK_ROWS, CASES, COLUMNS, FIRST_ROW, MEMBERS, mezzanineWorkbook, type ExampleMember } from "../../examples/sheet/mezzanine.js";
import { workbook } from "./engine.js";

type Cell = string | number | boolean | null;

/** A worksheet as rows of cell contents for the engine: formulas as "=...", values as they are. */
function rowsOf(ws: ExcelJS.Worksheet): Cell[][] {
  const rows: Cell[][] = [];
  ws.eachRow({ includeEmpty: true }, (row, r) => {
    const cells: Cell[] = [];
    row.eachCell({ includeEmpty: true }, (cell, c) => {
      const v = cell.value as unknown;
      cells[c - 1] = v !== null && typeof v === "object" && "formula" in v ? `=${(v as { formula: string }).formula}` : (v as Cell);
    });
    rows[r - 1] = Array.from(cells, (c) => c ?? null);
  });
  return Array.from(rows, (r) => r ?? []);
}

const committed = resolve(import.meta.dirname, "../../examples/sheet/mezzanine.xlsx");
let fileRows: Cell[][] = [];
beforeAll(async () => {
  const wb = new ExcelJS.Workbook();
  await wb.xlsx.load(readFileSync(committed) as unknown as ArrayBuffer);
  fileRows = rowsOf(wb.getWorksheet("Members")!);
});

/** The member through the typed API, from the example's own data. */
function typed(m: ExampleMember): ModelAnalysis {
  const stiffness = "segments" in m.section ? m.section.segments : null;
  const json = memberModelJson(m.length, m.E, stiffness, m.supports, m.loads, null);
  const section = "segments" in m.section ? undefined : sectionJson(m.section.shape, m.section.dimensions);
  const limits = limitsJson(m.limits);
  if (isSheetError(json) || isSheetError(section) || isSheetError(limits)) throw new Error("example data does not read");
  return analyzeModel(parseModel({ ...json, ...(section === undefined ? {} : { section }), limits }));
}
const col = (letter: string): number => letter.charCodeAt(0) - 65;
const close = (got: unknown, want: number): void => {
  expect(typeof got).toBe("number");
  expect(Math.abs((got as number) - want)).toBeLessThanOrEqual(1e-9 * Math.max(1, Math.abs(want)));
};

describe("the example workbook", () => {
  test("the committed file is what its script writes", async () => {
    const fresh = new ExcelJS.Workbook();
    await fresh.xlsx.load((await mezzanineWorkbook().xlsx.writeBuffer()));
    expect(fileRows).toEqual(rowsOf(fresh.getWorksheet("Members")!));
    expect(MEMBERS).toHaveLength(12);
  });
  test("recalculated in HyperFormula, every result equals the typed API's, and hand checks hold", () => {
    const hf = workbook({ Members: fileRows });
    const at = (row: number, letter: string): unknown => hf.getCellValue({ sheet: 0, row: row - 1, col: col(letter) });
    for (const [i, m] of MEMBERS.entries()) {
      const r = FIRST_ROW + i * BLOCK_ROWS;
      const a = typed(m);
      expect(at(r, COLUMNS.mark)).toBe(m.mark);
      close(at(r, COLUMNS.reaction), a.reactions[0]!.force);
      close(at(r, COLUMNS.moment), evaluateDiagram(a.diagrams.moment, m.length / 2));
      close(at(r, COLUMNS.maxMoment), a.moment.max.value);
      close(at(r, COLUMNS.deflection), a.deflection.min.value);
      close(at(r, COLUMNS.utilisation), Math.max(...a.checks.map((c) => c.utilisation)));
    }
    const row = (mark: string): number => FIRST_ROW + MEMBERS.findIndex((m) => m.mark === mark) * BLOCK_ROWS;
    // PB1, simple span, 24 kN at 2 m and 4 m and 1.2 kN/m: R = 24 + 1.2 * 6 / 2; M(3) = 3 R - 24 * 1 - 1.2 * 3^2 / 2.
    close(at(row("PB1"), COLUMNS.reaction), 27.6);
    close(at(row("PB1"), COLUMNS.moment), 53.4);
    // PB3, two equal spans of 4 m under 9 kN/m: end reaction 3 w L / 8.
    close(at(row("PB3"), COLUMNS.reaction), (3 * 9 * 4) / 8);
    // CP1, simple span, 10 kN/m over 7 m: w L / 2 and w L^2 / 8, whatever the cover plates.
    close(at(row("CP1"), COLUMNS.reaction), 35);
    close(at(row("CP1"), COLUMNS.moment), (10 * 49) / 8);
    // LB1, cantilever: the fixed end carries 8 + 2 * 1.5 kN.
    close(at(row("LB1"), COLUMNS.reaction), 11);
    // PB3's envelope over ASCE 7-16 2.3.1 with its live load placed span by span, against flexura/combine on the
    // same member in SI (its section's I_z from the sheet's own SECTIONPROPERTY cell, in mm^4).
    expect(MEMBERS.filter((m) => m.enveloped === true).map((m) => m.mark)).toEqual(["PB3"]);
    const cases: LoadCase[] = CASES.map(([name, category, reversible, patterned]) => ({ name, category: category as LoadCase["category"], reversible, patterned }));
    const I = at(row("PB3"), COLUMNS.I) as number;
    const solved = solveCases(
      { length: 8, stiffness: 200e9 * I * 1e-12, supports: [{ kind: "pin", at: 0 }, { kind: "roller", at: 4 }, { kind: "roller", at: 8 }], loads: [uniformLoad(0, 8, 3000, "D"), uniformLoad(0, 8, 6000, "L")] },
      cases,
    );
    const e = envelopes(solved, presetCombinations("asce7-16-strength", cases).combinations);
    close(at(row("PB3"), COLUMNS.envelope), e.moment!.lower.peak.value / 1000);
    expect(at(row("PB3") + 1, COLUMNS.envelope)).toBe(e.moment!.lower.peak.name);
    // Two equal spans, both loaded: M at the middle support = -w l^2 / 8 (common practice), w = 1.2 * 3 + 1.6 * 6 (ASCE 7-16 2.3.1 (2)).
    close(at(row("PB3"), COLUMNS.envelope), (-(1.2 * 3 + 1.6 * 6) * 16) / 8);
    expect(at(row("PB3") + 1, COLUMNS.envelope)).toBe("1.2D + 1.6L, L on all spans");
    hf.destroy();
  });
});
