// The sheet functions in a real engine (HyperFormula, test-time only): an invented schedule of 500 members,
// each asked for six results (two reactions' worth of table, moment and deflection at points, peaks), then
// recalculated in full with the cache warm and cold, and after a single-cell edit (one member re-solved).
import { bench, suite } from "./harness.js";
import { callSheetFunction, clearSheetCache } from "../src/sheet/index.js";
import { workbook } from "../tests/sheet/engine.js";

const MEMBERS = 500;

function schedule(): (string | number | null)[][] {
  const rows: (string | number | null)[][] = [];
  for (let i = 0; i < MEMBERS; i++) {
    const r = i * 3 + 1; // 1-based first row of member i
    const span = 4 + (i % 9) * 0.5;
    const m = `B${r}, C${r}, D${r}, E${r}:G${r + 1}, H${r}:M${r + 1}`;
    rows.push(
      [`M${i + 1}`, span, "200 GPa", `${60 + (i % 7) * 10}e6 mm^4`, 0, "pin", null, "distributed", null, null, 8 + (i % 5), null, null, `=FLEXURA.MOMENT(${span / 2}, ${m})`, `=FLEXURA.DEFLECTION(${span / 2}, ${m})`, `=FLEXURA.SHEAR(0, ${m})`, `=FLEXURA.MOMENT(1, ${m})`, `=FLEXURA.DEFLECTION(1, ${m})`, `=FLEXURA.SLOPE(0, ${m})`],
      [null, null, null, null, span, "roller", null, "point", 1 + (i % 3), null, 10 + (i % 4), null, null],
      [],
    );
  }
  return rows;
}

const hf = workbook({ Schedule: schedule() });
// The engine's own cost for the same shape of sheet: 3,000 SUM formulas over the same ranges.
const baseline = workbook({ Schedule: schedule().map((row) => row.map((c) => (typeof c === "string" && c.startsWith("=FLEXURA.") ? `=SUM(${c.slice(c.indexOf(",") + 1, -1)})` : c))) });
let edit = 0;

// Our functions alone, outside an engine: the same 3,000 calls with the ranges as an engine hands them (fresh
// rows of plain cells each call), cache warm; what the engine adds on top is its own.
const direct = schedule()
  .flatMap((row, r) => row.map((c, col) => ({ c, r, col })))
  .filter(({ c }) => typeof c === "string" && c.startsWith("=FLEXURA."))
  .map(({ c }) => {
    const text = c as string;
    const name = text.slice(1, text.indexOf("("));
    const [x] = text.slice(text.indexOf("(") + 1).split(",");
    return { name, x: Number(x) };
  });
const memberCells = (i: number): unknown[] => {
  const span = 4 + (i % 9) * 0.5;
  return [span, "200 GPa", `${60 + (i % 7) * 10}e6 mm^4`, [[0, "pin", null], [span, "roller", null]], [["distributed", null, null, 8 + (i % 5), null, null], ["point", 1 + (i % 3), null, 10 + (i % 4), null, null]]];
};

suite("sheet", () => {
  bench("sheet: engine baseline, 3,000 SUM cells over the same ranges, full recalculation", () => baseline.rebuildAndRecalculate());
  bench("sheet: 500 members x 6 cells, full recalculation, cache warm", () => hf.rebuildAndRecalculate());
  bench("sheet: 500 members x 6 cells, full recalculation, cache cold", () => {
    clearSheetCache();
    hf.rebuildAndRecalculate();
  });
  bench("sheet: the same 3,000 calls outside an engine, cache warm (our share)", () => {
    for (let k = 0; k < direct.length; k++) callSheetFunction(direct[k]!.name, [direct[k]!.x, ...memberCells(Math.floor(k / 6))]);
  });
  bench("sheet: one load edited, recalculation (one member re-solved)", () => {
    edit += 1;
    hf.setCellContents({ sheet: 0, row: 1, col: 10 }, 10 + (edit % 50));
  });
});
