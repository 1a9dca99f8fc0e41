export type { CellValue, CellRange, SheetError, SheetValue } from "./cells.js";
export { isSheetError } from "./cells.js";
export { memberModelJson, SHEET_UNIT_SYSTEMS, type ModelJson } from "./member.js";
export { SHEET_CACHE_SIZE, clearSheetCache, sheetSolveCount, cellsKey } from "./solve.js";
export { type SheetMemberArgs, MAX_STATIONS, sheetReactions, sheetShear, sheetMoment, sheetSlope, sheetDeflection, sheetPeaks, sheetStations, sheetModelResult } from "./functions.js";
export { sheetFunctions, callSheetFunction, type SheetFunction, type SheetParameter } from "./registry.js";
export { sectionJson, sheetSection, sheetSectionProperty, sheetBendingStress, sheetShearStress } from "./section.js";
export { limitsJson, sheetChecks, sheetUtilisation } from "./checks.js";
