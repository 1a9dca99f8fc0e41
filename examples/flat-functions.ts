// flexura's spreadsheet functions called from plain code, as a sheet engine calls them: cells in (numbers,
// text with units, ranges as rows), a number or a table out, and an error value with a plain message when an
// input is wrong. The same functions a sheet engine registers (docs/sheet.md); examples/sheet/ holds a workbook.
// Run (after `npm run build`; the examples import the package by name, as your code will): node node_modules/.bin/unrun examples/flat-functions.ts
import { callSheetFunction, isSheetError, type SheetValue } from "flexura/sheet";

/** A cell's answer as a sheet shows it: a number to 12 significant digits, a table row by row, or the error. */
function shown(value: SheetValue): string {
  if (isSheetError(value)) return `#VALUE! ${value.message}`;
  if (typeof value === "number") return String(Number(value.toPrecision(12)));
  if (Array.isArray(value)) return `\n  ${(value as unknown[][]).map((row) => row.map((c) => (typeof c === "number" ? Number(c.toPrecision(8)) : String(c))).join(" | ")).join("\n  ")}`;
  return String(value);
}

// A 6 m floor beam (invented): E 200 GPa, I 225e6 mm^4, pinned at 0, on a roller at 6 m, 10 kN/m over it all.
// Ranges are rows of cells, as the sheet passes them; blank cells are null.
const supports = [[0, "pin", null], [6, "roller", null]];
const loads = [["distributed", null, null, 10]];
const member = [6, "200 GPa", "225e6 mm^4", supports, loads];

const calls: [string, unknown[]][] = [
  ["FLEXURA.MOMENT", [3, ...member]],
  ["FLEXURA.DEFLECTION", [3, ...member]],
  ["FLEXURA.REACTIONS", member],
  ["FLEXURA.SECTIONPROPERTY", ["secondMomentZ", "rectangle", [["width", 100], ["depth", 200]]]],
  ["FLEXURA.UTILISATION", [[["deflection", "span/360"], ["bendingStress", "165 MPa"]], "i-section", [["depth", 310], ["flangeWidth", 165], ["flangeThickness", 9.7], ["webThickness", 5.8]], 6, "200 GPa", null, supports, loads]],
  ["FLEXURA.MOMENT", [3, 6, "200 GPa", "225e6 mm^4", supports, [["point", 9, null, 5]]]],
];
for (const [name, args] of calls) console.log(`${name}(...) = ${shown(callSheetFunction(name, args))}`);
