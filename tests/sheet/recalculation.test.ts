// Recalculation in a real engine (HyperFormula): a schedule of members with six result cells each; an edit to
// one member's load re-solves that member alone (counted), an edit every cell depends on re-reads every member,
// and re-solves none when the members are unchanged (E written another way) or every one when they all change.
import { describe, expect, test } from "vitest";
import { sheetSolveCount } from "../../src/sheet/index.js";
import { workbook } from "./engine.js";

const MEMBERS = 60;
/** An invented schedule: member i on rows 3i+1 and 3i+2, its E from the shared cell C1, six result cells in N:S. */
function schedule(): (string | number | null)[][] {
  const rows: (string | number | null)[][] = [];
  for (let i = 0; i < MEMBERS; i++) {
    const r = i * 3 + 1;
    const span = 4 + (i % 9) * 0.5;
    const m = `B${r}, $C$1, D${r}, E${r}:G${r + 1}, H${r}:M${r + 1}`;
    rows.push(
      [`M${i + 1}`, span, i === 0 ? "200 GPa" : null, `${60 + (i % 7) * 10}e6 mm^4`, 0, "pin", null, "distributed", null, null, 8 + (i % 5), null, null, `=FLEXURA.MOMENT(${span / 2}, ${m})`, `=FLEXURA.DEFLECTION(${span / 2}, ${m})`, `=FLEXURA.SHEAR(0, ${m})`, `=FLEXURA.MOMENT(1, ${m})`, `=FLEXURA.DEFLECTION(1, ${m})`, `=FLEXURA.SLOPE(0, ${m})`],
      [null, null, null, null, span, "roller", null, "point", 1 + (i % 3), null, 10 + (i % 4), null, null],
      [],
    );
  }
  return rows;
}
const results = (hf: ReturnType<typeof workbook>): unknown[][] => Array.from({ length: MEMBERS }, (_, i) => hf.getSheetValues(0)[i * 3]!.slice(13, 19));

describe("recalculation", () => {
  test("an edit to one member's load re-solves that member once, and no other cell changes", () => {
    const hf = workbook({ Schedule: schedule() });
    const before = results(hf);
    const solves = sheetSolveCount();
    hf.setCellContents({ sheet: 0, row: 3 * 17 + 1, col: 10 }, 25); // member 18's point load: 25 kN
    expect(sheetSolveCount() - solves).toBe(1);
    const after = results(hf);
    for (let i = 0; i < MEMBERS; i++) {
      if (i === 17) expect(after[i]).not.toEqual(before[i]);
      else expect(after[i]).toEqual(before[i]);
    }
    hf.destroy();
  });
  test("an edit every cell depends on: none re-solved when the members are the same, every one when they change", () => {
    const hf = workbook({ Schedule: schedule() });
    const first = results(hf);
    hf.setCellContents({ sheet: 0, row: 0, col: 2 }, 200_000); // the same E in the default MPa
    hf.setCellContents({ sheet: 0, row: 0, col: 2 }, "200 GPa");
    let solves = sheetSolveCount();
    hf.setCellContents({ sheet: 0, row: 0, col: 2 }, 200_000);
    expect(sheetSolveCount() - solves).toBe(0);
    expect(results(hf)).toEqual(first);
    solves = sheetSolveCount();
    hf.setCellContents({ sheet: 0, row: 0, col: 2 }, "100 GPa");
    expect(sheetSolveCount() - solves).toBe(MEMBERS);
    // Half the stiffness, twice the deflection (linear elastic, common practice); moments unchanged (determinate spans).
    const soft = results(hf);
    // The engine rounds what it shows to about ten significant digits.
    const close = (got: unknown, want: number): void => expect(Math.abs((got as number) - want)).toBeLessThanOrEqual(1e-8 * Math.max(1, Math.abs(want)));
    for (let i = 0; i < MEMBERS; i++) {
      close(soft[i]![0], first[i]![0] as number);
      close(soft[i]![1], 2 * (first[i]![1] as number));
    }
    hf.destroy();
  });
});
