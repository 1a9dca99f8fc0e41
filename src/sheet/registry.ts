import { sheetError, type SheetValue } from "./cells.js";
import { sheetDeflection, sheetModelResult, sheetMoment, sheetPeaks, sheetReactions, sheetShear, sheetSlope, sheetStations } from "./functions.js";

/** One spreadsheet function: its name as a sheet shows it, its arguments in order, and what it returns. */
export interface SheetFunction {
  /** The name in the sheet, upper case, in the `FLEXURA.` namespace. */
  readonly name: string;
  /** Argument names in order; those after `required` may be left out. */
  readonly parameters: readonly string[];
  /** How many arguments must be given. */
  readonly required: number;
  /** `"table"` when it spills rows of cells, `"value"` for one cell. */
  readonly returns: "table" | "value";
  /** One line on what it gives, with units and signs. */
  readonly summary: string;
  /** The implementation: plain cell values in, a {@link SheetValue} out; never throws. */
  readonly call: (...args: unknown[]) => SheetValue;
}

const MEMBER = ["length", "E", "I", "supports", "loads", "units"] as const;

const entry = (name: string, parameters: readonly string[], required: number, returns: "table" | "value", summary: string, call: (...args: never[]) => SheetValue): SheetFunction =>
  Object.freeze({ name, parameters: Object.freeze([...parameters]), required, returns, summary, call: guarded(name, parameters, required, call as (...args: unknown[]) => SheetValue) });

/** Checks the argument count and turns anything thrown into an error value: a sheet function never throws. */
function guarded(name: string, parameters: readonly string[], required: number, call: (...args: unknown[]) => SheetValue): (...args: unknown[]) => SheetValue {
  return (...args: unknown[]): SheetValue => {
    if (args.length < required || args.length > parameters.length) {
      const wanted = required === parameters.length ? `${required}` : `${required} to ${parameters.length}`;
      return sheetError("sheet-argument-count", `${name} takes ${wanted} arguments (${parameters.join(", ")}); got ${args.length}.`);
    }
    try {
      return call(...args);
    } catch (e) {
      return sheetError("sheet-internal-error", `${name} failed unexpectedly: ${e instanceof Error ? e.message : String(e)}. Please report it with the sheet.`);
    }
  };
}

/** Every spreadsheet function of flexura, in the order docs/sheet.md lists them. */
export const sheetFunctions: readonly SheetFunction[] = Object.freeze([
  entry("FLEXURA.REACTIONS", MEMBER, 5, "table", "Reactions: support, position, force (up positive), moment (counterclockwise positive).", sheetReactions),
  entry("FLEXURA.SHEAR", ["x", ...MEMBER], 6, "value", "Shear force at x (right-hand limit at a point load).", sheetShear),
  entry("FLEXURA.MOMENT", ["x", ...MEMBER], 6, "value", "Bending moment at x, positive sagging.", sheetMoment),
  entry("FLEXURA.SLOPE", ["x", ...MEMBER], 6, "value", "Slope at x, positive counterclockwise.", sheetSlope),
  entry("FLEXURA.DEFLECTION", ["x", ...MEMBER], 6, "value", "Deflection at x, positive upward.", sheetDeflection),
  entry("FLEXURA.PEAKS", MEMBER, 5, "table", "Largest and smallest shear, moment, slope and deflection, with where they occur.", sheetPeaks),
  entry("FLEXURA.STATIONS", ["intervals", ...MEMBER], 6, "table", "x, shear, moment and deflection at evenly spaced stations, for a chart.", sheetStations),
  entry("FLEXURA.MODEL", ["model", "path"], 2, "value", "Any result of a model given as JSON text, by a path such as moment.max.value.", sheetModelResult),
]);
