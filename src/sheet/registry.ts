import { sheetError, type SheetValue } from "./cells.js";
import { sheetChecks, sheetUtilisation } from "./checks.js";
import { sheetDeflection, sheetModelResult, sheetMoment, sheetPeaks, sheetReactions, sheetShear, sheetSlope, sheetStations } from "./functions.js";
import { sheetCombinations, sheetEnvelope, sheetEnvelopePeaks, sheetGoverning, sheetReactionEnvelope } from "./envelopes.js";
import { sheetBendingStress, sheetSection, sheetSectionProperty, sheetShearStress } from "./section.js";

/** One argument of a spreadsheet function: its name, whether it takes a range, and what goes in it. */
export interface SheetParameter {
  /** The argument's name, as the function's help shows it. */
  readonly name: string;
  /** `true` when the argument is a range of rows (supports, loads, a table); `false` for one cell. */
  readonly range: boolean;
  /** What to put in it, with its unit. */
  readonly summary: string;
}

/** One spreadsheet function: its name as a sheet shows it, its arguments in order, and what it returns. */
export interface SheetFunction {
  /** The name in the sheet, upper case, in the `FLEXURA.` namespace. */
  readonly name: string;
  /** Arguments in order; those after `required` may be left out. */
  readonly parameters: readonly SheetParameter[];
  /** How many arguments must be given. */
  readonly required: number;
  /** `"table"` when it spills rows of cells, `"value"` for one cell. */
  readonly returns: "table" | "value";
  /** One line on what it gives, with units and signs. */
  readonly summary: string;
  /** The implementation: plain cell values in, a {@link SheetValue} out; never throws. */
  readonly call: (...args: unknown[]) => SheetValue;
}

const cell = (name: string, summary: string): SheetParameter => Object.freeze({ name, range: false, summary });
const range = (name: string, summary: string): SheetParameter => Object.freeze({ name, range: true, summary });

const MEMBER: readonly SheetParameter[] = [
  cell("length", "Member length (length unit, or text with a unit such as \"6 m\")."),
  cell("E", "Modulus of elasticity (modulus unit, or text such as \"200 GPa\")."),
  range("I", "Second moment of area (section unit^4, or text such as \"80e6 mm^4\"), or rows of start | end | I | E for a stepped member."),
  range("supports", "Rows of position | kind (pin, roller, fixed, guided, spring) | spring stiffness or settlement."),
  range("loads", "Rows of kind (point, moment, distributed) | position | end position | value | end value | case; forces down positive."),
  cell("units", "Optional unit set: siNewtonMetre, siKilonewtonMetre, siNewtonMillimetre, usKipFoot, usKipInch; blank: m, kN, mm, MPa."),
];
const X = cell("x", "Position from the left end (length unit).");
const SECTION: readonly SheetParameter[] = [
  cell("shape", "Shape: rectangle, circle, pipe, i-section, tee, channel, angle, rectangular-hollow, plate-girder."),
  range("dimensions", "Rows of name | value, such as depth | 310 (section-length unit, or text with a unit)."),
];
const UNITS = MEMBER[5]!;
const LIMITS = range("limits", "Rows of name | value: deflection | span/360 (or a length), bendingStress | 165 MPa, shearStress | 95 MPa.");

const CASES = range("cases", "Rows of name | category (dead, live, roof-live, snow, rain, wind, seismic, crane, user) | reversible | patterned (TRUE or FALSE).");
const COMBINATIONS = range("combinations", "A preset: asce7-16-strength, asce7-16-allowable-stress, en1990-strength, en1990-serviceability; or factors: a header row of case names, then name | factor per case.");
const OPTIONS = range("options", "Rows of name | value: imposedCategory | B, loadsNotActing | FALSE, expression | 6.10a-b, map.<case> | dead, settlementCase, cap; may be blank.");
const COMBINED: readonly SheetParameter[] = [CASES, COMBINATIONS, OPTIONS, ...MEMBER];
const QUANTITY = cell("quantity", "shear, moment, slope or deflection.");
const BOUND = cell("bound", "max (upper envelope) or min (lower envelope).");

const entry = (name: string, parameters: readonly SheetParameter[], required: number, returns: "table" | "value", summary: string, call: (...args: never[]) => SheetValue): SheetFunction =>
  Object.freeze({ name, parameters: Object.freeze([...parameters]), required, returns, summary, call: guarded(name, parameters, required, call as (...args: unknown[]) => SheetValue) });

/** Checks the argument count and turns anything thrown into an error value: a sheet function never throws. */
function guarded(name: string, parameters: readonly SheetParameter[], required: number, call: (...args: unknown[]) => SheetValue): (...args: unknown[]) => SheetValue {
  return (...args: unknown[]): SheetValue => {
    // A host that passes every declared argument passes the ones left out as undefined: they do not count.
    let given = args.length;
    while (given > required && args[given - 1] === undefined) given -= 1;
    if (given < required || given > parameters.length) {
      const wanted = required === parameters.length ? `${required}` : `${required} to ${parameters.length}`;
      return sheetError("sheet-argument-count", `${name} takes ${wanted} arguments (${parameters.map((p) => p.name).join(", ")}); got ${given}.`);
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
  entry("FLEXURA.SHEAR", [X, ...MEMBER], 6, "value", "Shear force at x (right-hand limit at a point load).", sheetShear),
  entry("FLEXURA.MOMENT", [X, ...MEMBER], 6, "value", "Bending moment at x, positive sagging.", sheetMoment),
  entry("FLEXURA.SLOPE", [X, ...MEMBER], 6, "value", "Slope at x, positive counterclockwise.", sheetSlope),
  entry("FLEXURA.DEFLECTION", [X, ...MEMBER], 6, "value", "Deflection at x, positive upward.", sheetDeflection),
  entry("FLEXURA.PEAKS", MEMBER, 5, "table", "Largest and smallest shear, moment, slope and deflection, with where they occur.", sheetPeaks),
  entry("FLEXURA.STATIONS", [cell("intervals", "Number of equal intervals, 1 to 10,000 (a station at each end of each)."), ...MEMBER], 6, "table", "x, shear, moment and deflection at evenly spaced stations, for a chart.", sheetStations),
  entry("FLEXURA.SECTION", [...SECTION, UNITS], 2, "table", "A section's properties: area, centroid, second moments, section moduli, extreme fibres.", sheetSection),
  entry("FLEXURA.SECTIONPROPERTY", [cell("property", "A property name: area, secondMomentZ, sectionModulus.top, centroid.y, ..."), ...SECTION, UNITS], 3, "value", "One property of a section, by name.", sheetSectionProperty),
  entry("FLEXURA.BENDINGSTRESS", [cell("moment", "Bending moment, positive sagging (moment unit)."), cell("y", "Fibre height above the centroid, negative below (section-length unit)."), ...SECTION, UNITS], 4, "value", "Bending stress at a fibre, -M y / I, tension positive.", sheetBendingStress),
  entry("FLEXURA.SHEARSTRESS", [cell("shear", "Shear force (force unit)."), cell("y", "Height of the cut above the centroid, negative below (section-length unit)."), ...SECTION, UNITS], 4, "value", "Shear stress at a horizontal cut, V Q / (I b), with the sign of V.", sheetShearStress),
  entry("FLEXURA.CHECKS", [LIMITS, ...SECTION, ...MEMBER], 8, "table", "The member's checks against the limits: demand, capacity, utilisation, pass, where.", sheetChecks),
  entry("FLEXURA.UTILISATION", [LIMITS, ...SECTION, ...MEMBER], 8, "value", "The governing utilisation of the member's checks against the limits (at most 1 passes).", sheetUtilisation),
  entry("FLEXURA.COMBINATIONS", [CASES, COMBINATIONS, OPTIONS], 2, "table", "The combinations as applied: name, purpose, clause, and the factor on each case.", sheetCombinations),
  entry("FLEXURA.ENVELOPE", [QUANTITY, BOUND, X, ...COMBINED], 11, "value", "Envelope of shear, moment, slope or deflection at x over the combinations and span patterns.", sheetEnvelope),
  entry("FLEXURA.GOVERNING", [QUANTITY, BOUND, X, ...COMBINED], 11, "value", "The combination (and span pattern) that governs the envelope at x.", sheetGoverning),
  entry("FLEXURA.ENVELOPEPEAKS", COMBINED, 8, "table", "Peaks of the envelopes of shear, moment, slope and deflection, with where and the governing combination.", sheetEnvelopePeaks),
  entry("FLEXURA.REACTIONENVELOPE", COMBINED, 8, "table", "Each support's largest and smallest reaction force and moment over the combinations, with the governing ones.", sheetReactionEnvelope),
  entry("FLEXURA.MODEL", [cell("model", "A model file's JSON text (docs/model-format.md)."), cell("path", "A result path such as moment.max.value or reactions[0].force.")], 2, "value", "Any result of a model given as JSON text, by a path such as moment.max.value.", sheetModelResult),
]);

const byName: ReadonlyMap<string, SheetFunction> = new Map(sheetFunctions.map((f) => [f.name, f]));

/**
 * Calls a spreadsheet function by its name as a sheet shows it (`"FLEXURA.MOMENT"`, upper or lower case) with
 * plain cell values; an unknown name is an error value, and so is anything the function would have thrown.
 *
 * @example `callSheetFunction("FLEXURA.MOMENT", [3, 6, "200 GPa", "80e6 mm^4", [[0, "pin"], [6, "roller"]], [["distributed", null, null, 12]]])` is 54 (kN*m).
 */
export function callSheetFunction(name: string, args: readonly unknown[]): SheetValue {
  const f = typeof name === "string" ? byName.get(name.trim().toUpperCase()) : undefined;
  if (f === undefined) return sheetError("sheet-unknown-function", `"${String(name)}" is not a flexura sheet function; use one of ${sheetFunctions.map((g) => g.name).join(", ")}.`);
  return Array.isArray(args) ? f.call(...(args as readonly unknown[])) : f.call();
}
