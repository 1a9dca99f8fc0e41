// The sheet functions in a real engine (HyperFormula, test-time only): an invented schedule of 500 members,
// each asked for six results (moment, deflection and shear at points, slope at an end), recalculated in full
// (the engine's rebuild, and one edit that every cell depends on), and after a single-cell edit (one member
// re-solved); each beside the engine's own cost for the same sheet with SUM cells.
import { bench, suite } from "./harness.js";
import { callSheetFunction, clearSheetCache } from "../src/sheet/index.js";
import { workbook } from "../tests/sheet/engine.js";

const MEMBERS = 500;

/** The schedule; with `sharedE`, every member takes its E from one cell (C1), so that one edit reaches every cell. */
function schedule(sharedE = false): (string | number | null)[][] {
  const rows: (string | number | null)[][] = [];
  for (let i = 0; i < MEMBERS; i++) {
    const r = i * 3 + 1; // 1-based first row of member i
    const span = 4 + (i % 9) * 0.5;
    const m = `B${r}, ${sharedE ? "$C$1" : `C${r}`}, D${r}, E${r}:G${r + 1}, H${r}:M${r + 1}`;
    rows.push(
      [`M${i + 1}`, span, "200 GPa", `${60 + (i % 7) * 10}e6 mm^4`, 0, "pin", null, "distributed", null, null, 8 + (i % 5), null, null, `=FLEXURA.MOMENT(${span / 2}, ${m})`, `=FLEXURA.DEFLECTION(${span / 2}, ${m})`, `=FLEXURA.SHEAR(0, ${m})`, `=FLEXURA.MOMENT(1, ${m})`, `=FLEXURA.DEFLECTION(1, ${m})`, `=FLEXURA.SLOPE(0, ${m})`],
      [null, null, null, null, span, "roller", null, "point", 1 + (i % 3), null, 10 + (i % 4), null, null],
      [],
    );
  }
  return rows;
}
/** The same sheet with each of our cells replaced by a SUM over the same arguments: the engine's own cost. */
const summed = (rows: (string | number | null)[][]): (string | number | null)[][] =>
  rows.map((row) => row.map((c) => (typeof c === "string" && c.startsWith("=FLEXURA.") ? `=SUM(${c.slice(c.indexOf(",") + 1, -1)})` : c)));

const hf = workbook({ Schedule: schedule() });
const baseline = workbook({ Schedule: summed(schedule()) });
const shared = workbook({ Schedule: schedule(true) });
const sharedBaseline = workbook({ Schedule: summed(schedule(true)) });
let edit = 0;
let sameE = 0;
let newE = 0;

// Our functions alone, outside an engine: the same 3,000 calls with the ranges as an engine hands them (fresh
// rows of plain cells each call), cache warm; what the engine adds on top is its own.
const direct = schedule()
  .flatMap((row) => row)
  .filter((c): c is string => typeof c === "string" && c.startsWith("=FLEXURA."))
  .map((text) => ({ name: text.slice(1, text.indexOf("(")), x: Number(text.slice(text.indexOf("(") + 1).split(",")[0]) }));
const memberCells = (i: number): unknown[] => {
  const span = 4 + (i % 9) * 0.5;
  return [span, "200 GPa", `${60 + (i % 7) * 10}e6 mm^4`, [[0, "pin", null], [span, "roller", null]], [["distributed", null, null, 8 + (i % 5), null, null], ["point", 1 + (i % 3), null, 10 + (i % 4), null, null]]];
};

suite("sheet", () => {
  bench("sheet: engine baseline, 3,000 SUM cells over the same ranges, full rebuild and recalculation", () => baseline.rebuildAndRecalculate());
  bench("sheet: 500 members x 6 cells, full rebuild and recalculation, cache warm", () => hf.rebuildAndRecalculate());
  bench("sheet: 500 members x 6 cells, full rebuild and recalculation, cache cold", () => {
    clearSheetCache();
    hf.rebuildAndRecalculate();
  });
  bench("sheet: engine baseline, one edit every SUM cell depends on (3,000 recalculated)", () => {
    sharedBaseline.setCellContents({ sheet: 0, row: 0, col: 2 }, (sameE += 1) % 2 === 0 ? "200 GPa" : 200_000);
  });
  bench("sheet: one edit every cell depends on, E written another way (3,000 recalculated, none re-solved)", () => {
    shared.setCellContents({ sheet: 0, row: 0, col: 2 }, (sameE += 1) % 2 === 0 ? "200 GPa" : 200_000);
  });
  bench("sheet: one edit every cell depends on, a new E (3,000 recalculated, 500 members re-solved)", () => {
    shared.setCellContents({ sheet: 0, row: 0, col: 2 }, `${190 + ((newE += 1) % 20)} GPa`);
  });
  bench("sheet: the same 3,000 calls outside an engine, cache warm (our share)", () => {
    for (let k = 0; k < direct.length; k++) callSheetFunction(direct[k]!.name, [direct[k]!.x, ...memberCells(Math.floor(k / 6))]);
  });
  bench("sheet: one load edited, recalculation (one member re-solved)", () => {
    edit += 1;
    hf.setCellContents({ sheet: 0, row: 1, col: 10 }, 10 + (edit % 50));
  });
});
