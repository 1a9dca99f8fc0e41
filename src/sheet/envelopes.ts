import { envelopes, presetCombinations, solveCases, type Combination, type DiagramName, type Envelopes, type EnvelopeBound } from "../combine/index.js";
import { attempt } from "../errors/index.js";
import { evaluatePiecewise, findPiece } from "../math/index.js";
import { beamInputInSI } from "../model/beam-input.js";
import type { ModelAnalysis } from "../model/index.js";
import { cellQuantity, cellWord, isSheetError, sheetError, shown, type CellValue, type SheetError, type SheetValue } from "./cells.js";
import { combinationInput, type SheetCombinationInput } from "./combination-cells.js";
import { analysed, type SheetMemberArgs } from "./functions.js";
import { sheetPlace } from "./member.js";
import { cachedByCells, cellMessage, countSolve } from "./solve.js";

/** A member's envelopes as the combination functions read them, with what they were taken over. */
interface SheetEnvelopes {
  readonly analysis: ModelAnalysis;
  readonly combinations: readonly Combination[];
  readonly envelopes: Envelopes;
}

/** A path of the combination module in the sheet's words: combinations given as factors by their rows. */
function placeIn(input: SheetCombinationInput): (path: readonly (string | number)[]) => string {
  return (path) => {
    if (path[0] === "combinations" && typeof path[1] === "number") {
      const row = input.rows[path[1]];
      const rest = path[2] === "factors" && path[3] !== undefined ? `, ${String(path[3])}` : "";
      return row === undefined ? "combinations" : `combinations row ${row}${rest}`;
    }
    return sheetPlace(path);
  };
}

/** The combinations a function's cells ask for (a preset's for the cases, or the factors given), or the error. */
export function combinationsOf(input: SheetCombinationInput): readonly Combination[] | SheetError {
  if (input.preset === undefined) return input.combinations;
  const r = attempt(() => presetCombinations(input.preset!.name, input.cases, input.preset!.options));
  return r.ok ? r.value.combinations : cellMessage(r.error, placeIn(input));
}

function readEnvelopes(cases: unknown, combinations: unknown, options: unknown, member: SheetMemberArgs): SheetEnvelopes | SheetError {
  const input = combinationInput(cases, combinations, options);
  if (isSheetError(input)) return input;
  const list = combinationsOf(input);
  if (isSheetError(list)) return list;
  const a = analysed(member);
  if (isSheetError(a)) return a;
  const beam = beamInputInSI(a.model, a.scale, undefined);
  if (beam === undefined) return sheetError("stiffness-missing", "I: give the member's stiffness (E and I, or rows of start | end | I | E).");
  const place = placeIn(input);
  // The cases solved once per member, cases and settlement case, whatever combinations are asked of them.
  const solved = cachedByCells("cases", [cases, input.settlementCase ?? null, ...member], () => {
    countSolve();
    const r = attempt(() => solveCases(beam, input.cases, input.settlementCase === undefined ? undefined : { settlementCase: input.settlementCase }));
    return r.ok ? r.value : cellMessage(r.error, place);
  });
  if (isSheetError(solved)) return solved;
  const e = attempt(() => envelopes(solved, list, input.cap === undefined ? undefined : { pattern: { cap: input.cap } }));
  if (!e.ok) return cellMessage(e.error, place);
  if (e.value.arrangements.length === 0) return sheetError("sheet-value-missing", "combinations: no combination was formed for these cases.");
  return { analysis: a, combinations: list, envelopes: e.value };
}

/** The envelopes for a function's cells, formed once while they stay in the cache. */
function enveloped(cases: unknown, combinations: unknown, options: unknown, member: SheetMemberArgs): SheetEnvelopes | SheetError {
  return cachedByCells("envelopes", [cases, combinations, options, ...member], () => readEnvelopes(cases, combinations, options, member));
}

/**
 * The combinations as applied, a table with a header row: combination name, purpose, clause (blank for
 * combinations given as factors), then the factor on each case (blank: not in the combination). A preset
 * forms its rows for the cases given, with each "or" and each sense of a reversible case its own row, and with
 * the variable cases left out in turn unless the options say `loadsNotActing | FALSE`.
 *
 * @example `=FLEXURA.COMBINATIONS(A2:D3, "asce7-16-strength")` with `D | dead` and `L | live` gives 1.4D, 1.2D + 1.6L, ...
 */
export function sheetCombinations(cases: unknown, combinations: unknown, options?: unknown): SheetValue {
  const input = combinationInput(cases, combinations, options);
  if (isSheetError(input)) return input;
  const list = combinationsOf(input);
  if (isSheetError(list)) return list;
  const names = input.cases.map((c) => c.name);
  return [["combination", "purpose", "clause", ...names], ...list.map((c): CellValue[] => [c.name, c.purpose, c.clause ?? null, ...names.map((n) => c.factors[n] ?? null)])];
}

const QUANTITIES: readonly DiagramName[] = ["shear", "moment", "slope", "deflection"];

/** The unit kind and scale field of each diagram. */
const UNIT: Readonly<Record<DiagramName, "force" | "moment" | "rotation" | "deflection">> = { shear: "force", moment: "moment", slope: "rotation", deflection: "deflection" };

/** The envelope bound a `quantity` and `bound` cell name, read. */
function boundOf(e: SheetEnvelopes, quantity: unknown, bound: unknown): { bound: EnvelopeBound; q: DiagramName } | SheetError {
  const q = QUANTITIES.find((k) => k === cellWord(quantity));
  if (q === undefined) return sheetError("sheet-unknown-kind", `quantity: "${shown(quantity)}" is not a result; use ${QUANTITIES.join(", ")}.`);
  const b = cellWord(bound);
  const upper = b === "max" || b === "upper" ? true : b === "min" || b === "lower" ? false : undefined;
  if (upper === undefined) return sheetError("sheet-unknown-kind", `bound: "${shown(bound)}" is not a bound; use max (the upper envelope) or min (the lower).`);
  const d = e.envelopes[q]!;
  return { bound: upper ? d.upper : d.lower, q };
}

/** The position cell in SI, within the member, or the error naming it. */
function positionOf(e: SheetEnvelopes, x: unknown): number | SheetError {
  const a = e.analysis;
  const at = cellQuantity(x);
  if (typeof at !== "number" || !Number.isFinite(at)) return sheetError("sheet-not-a-number", `position: "${shown(x)}" is not a number in ${a.units.length}.`);
  if (at < 0 || at > a.model.length) return sheetError("sheet-position-outside", `position: ${at} ${a.units.length} is outside the member, which runs from 0 to ${a.model.length} ${a.units.length}.`);
  return at * a.scale.length;
}

function atPosition(which: "value" | "name", quantity: unknown, bound: unknown, x: unknown, cases: unknown, combinations: unknown, options: unknown, member: SheetMemberArgs): SheetValue {
  const e = enveloped(cases, combinations, options, member);
  if (isSheetError(e)) return e;
  const b = boundOf(e, quantity, bound);
  if (isSheetError(b)) return b;
  const at = positionOf(e, x);
  if (isSheetError(at)) return at;
  if (which === "value") return evaluatePiecewise(b.bound.curve, at) / e.analysis.scale[UNIT[b.q]];
  const i = b.bound.governing[findPiece(b.bound.curve, at)]!;
  return e.envelopes.arrangements[i]!.name;
}

/**
 * The envelope of shear, moment, slope or deflection at a position over every combination (and, for patterned
 * cases, every placement span by span): `bound` max gives the upper envelope, min the lower; in the sheet's
 * unit for the quantity, with the sign conventions of `FLEXURA.MOMENT` and the others (moment sagging positive, deflection
 * up positive, shear the right-hand limit at a point load). Exact: the envelope is a piecewise polynomial whose
 * breaks include every crossing of two combinations.
 *
 * @example `=FLEXURA.ENVELOPE("moment", "max", 3, A2:D3, "asce7-16-strength", , B1, B2, B3, D2:F3, G2:L4)`
 */
export function sheetEnvelope(quantity: unknown, bound: unknown, x: unknown, cases: unknown, combinations: unknown, options: unknown, ...member: SheetMemberArgs): SheetValue {
  return atPosition("value", quantity, bound, x, cases, combinations, options, member);
}

/**
 * The combination (with its pattern, for a patterned case) that governs {@link sheetEnvelope} at a position:
 * its name as {@link sheetCombinations} lists it, followed by the spans loaded (`1.2D + 1.6L, L on span 1`).
 *
 * @example `=FLEXURA.GOVERNING("moment", "max", 3, A2:D3, "asce7-16-strength", , B1, B2, B3, D2:F3, G2:L4)`
 */
export function sheetGoverning(quantity: unknown, bound: unknown, x: unknown, cases: unknown, combinations: unknown, options: unknown, ...member: SheetMemberArgs): SheetValue {
  return atPosition("name", quantity, bound, x, cases, combinations, options, member);
}

/**
 * The peaks of the envelopes as a table with a header row: quantity (with its unit), the largest value of the
 * upper envelope, where, the governing combination; the smallest value of the lower envelope, where, the
 * governing combination; for shear, moment, slope and deflection.
 *
 * @example `=FLEXURA.ENVELOPEPEAKS(A2:D3, "asce7-16-strength", , B1, B2, B3, D2:F3, G2:L4)`
 */
export function sheetEnvelopePeaks(cases: unknown, combinations: unknown, options: unknown, ...member: SheetMemberArgs): SheetValue {
  const e = enveloped(cases, combinations, options, member);
  if (isSheetError(e)) return e;
  const { units: u, scale } = e.analysis;
  const rows: CellValue[][] = [["quantity", "max", `at (${u.length})`, "governing", "min", `at (${u.length})`, "governing"]];
  for (const q of QUANTITIES) {
    const d = e.envelopes[q]!;
    const k = scale[UNIT[q]];
    rows.push([`${q} (${u[UNIT[q]]})`, d.upper.peak.value / k, d.upper.peak.at / scale.length, d.upper.peak.name, d.lower.peak.value / k, d.lower.peak.at / scale.length, d.lower.peak.name]);
  }
  return rows;
}

/**
 * The reaction envelope of each support as a table with a header row: support (numbered from 1 as the
 * supports range's rows), position, the largest upward force and its combination, the smallest (negative:
 * uplift) and its combination, the largest and smallest moment (counterclockwise positive; zero where the
 * support lets the member turn) with theirs; in the sheet's units.
 *
 * @example `=FLEXURA.REACTIONENVELOPE(A2:D3, "asce7-16-strength", , B1, B2, B3, D2:F3, G2:L4)`
 */
export function sheetReactionEnvelope(cases: unknown, combinations: unknown, options: unknown, ...member: SheetMemberArgs): SheetValue {
  const e = enveloped(cases, combinations, options, member);
  if (isSheetError(e)) return e;
  const { units: u, scale } = e.analysis;
  const rows: CellValue[][] = [
    ["support", `at (${u.length})`, `max force (${u.force})`, "governing", `min force (${u.force})`, "governing", `max moment (${u.moment})`, "governing", `min moment (${u.moment})`, "governing"],
  ];
  for (const r of e.envelopes.reactions) {
    rows.push([
      r.support + 1,
      r.at / scale.length,
      r.force.max.value / scale.force,
      r.force.max.name,
      r.force.min.value / scale.force,
      r.force.min.name,
      r.moment.max.value / scale.moment,
      r.moment.max.name,
      r.moment.min.value / scale.moment,
      r.moment.min.name,
    ]);
  }
  return rows;
}
