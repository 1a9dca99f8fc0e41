// Solid rectangular bars and rounds in flexure, AISC 360-16 F11.
import { IssueCollector } from "../../errors/index.js";
import { readPositive, readRecord, refuseUnknownKeys } from "../read.js";
import { chapterResult, checkLengthAndGradient, type ChapterFlexure, type LimitStateStrength } from "./chapter-flexure.js";
import { checkSteel, type SteelForDesign } from "./shape.js";

/**
 * A solid bar for AISC 360-16 F11: a rectangle `{ kind: "rectangular", depth, width }` bent about
 * the axis parallel to its width, or a round `{ kind: "round", diameter }`. S and Z follow exactly
 * from the dimensions (rectangle S = t d^2 / 6, Z = t d^2 / 4; round S = pi D^3 / 32, Z = D^3 / 6).
 */
export type SolidBarForDesign =
  | {
      /** Tag: a rectangular bar. */
      readonly kind: "rectangular";
      /** d, the dimension perpendicular to the axis of bending (length). */
      readonly depth: number;
      /** t, the dimension parallel to the axis of bending (length). */
      readonly width: number;
    }
  | {
      /** Tag: a round bar. */
      readonly kind: "round";
      /** D (length). */
      readonly diameter: number;
    };

/**
 * The nominal flexural strength M_n of a solid rectangular bar or round by AISC 360-16 F11:
 * yielding, M_n = M_p = F_y Z <= 1.6 F_y S (F11-1); and, for a rectangular bar bent about its
 * major axis (depth > width), lateral-torsional buckling by the slenderness L_b d / t^2:
 * none up to 0.08 E/F_y; M_n = C_b [1.52 - 0.274 (L_b d / t^2)(F_y / E)] M_y <= M_p up to 1.9 E/F_y
 * (F11-2); M_n = F_cr S <= M_p with F_cr = 1.9 E C_b / (L_b d / t^2) beyond (F11-3, F11-4).
 * Bars bent about their minor axis (depth <= width) and rounds do not buckle laterally (F11.2).
 *
 * @param bar - {@link SolidBarForDesign}.
 * @param steel - E and F_y, in the bar's units.
 * @param unbracedLength - L_b (length), > 0.
 * @param momentGradient - C_b (F1-1), > 0.
 * @throws FlexuraError `not-an-object`, `missing-field`, `unknown-field`, `value-not-positive`,
 *   `not-a-number`, `not-finite`; `options-invalid` for an unknown `kind`.
 * @example
 * ```ts
 * nominalFlexureSolidBar({ kind: "rectangular", depth: 6, width: 1 }, { elasticModulus: 29000, yieldStrength: 36 }, 48, 1).equation; // "F11-2"
 * ```
 */
export function nominalFlexureSolidBar(bar: SolidBarForDesign, steel: SteelForDesign, unbracedLength: number, momentGradient: number): ChapterFlexure {
  const path = ["bar"];
  const obj = readRecord(bar, path, "bar");
  const found = new IssueCollector();
  const kind = Object.hasOwn(obj, "kind") ? obj["kind"] : undefined;
  let S = 0, Z = 0, slenderness: number | null = null;
  if (kind === "rectangular") {
    refuseUnknownKeys(found, obj, ["kind", "depth", "width"], path, "rectangular bar");
    const d = readPositive(found, obj, "depth", path, "depth d");
    const t = readPositive(found, obj, "width", path, "width t");
    found.throwIfAny();
    S = (t * d * d) / 6;
    Z = (t * d * d) / 4;
    if (d > t) slenderness = (unbracedLength * d) / (t * t);
  } else if (kind === "round") {
    refuseUnknownKeys(found, obj, ["kind", "diameter"], path, "round bar");
    const D = readPositive(found, obj, "diameter", path, "diameter D");
    found.throwIfAny();
    S = (Math.PI * D ** 3) / 32;
    Z = D ** 3 / 6;
  } else {
    found.add("options-invalid", [...path, "kind"], `A bar is { kind: "rectangular", depth, width } or { kind: "round", diameter }; got kind ${String(kind)}.`);
    found.throwIfAny();
  }
  const { elasticModulus: E, yieldStrength: Fy } = checkSteel(steel);
  checkLengthAndGradient(unbracedLength, momentGradient);
  const My = Fy * S;
  const Mp = Math.min(Fy * Z, 1.6 * My);
  const states: LimitStateStrength[] = [{ limitState: "yielding", nominal: Mp, equation: "F11-1" }];
  if (slenderness !== null && slenderness > (0.08 * E) / Fy) {
    if (slenderness <= (1.9 * E) / Fy) states.push({ limitState: "lateral-torsional-buckling", nominal: Math.min(Mp, momentGradient * (1.52 - 0.274 * slenderness * (Fy / E)) * My), equation: "F11-2" });
    else states.push({ limitState: "lateral-torsional-buckling", nominal: Math.min(Mp, ((1.9 * E * momentGradient) / slenderness) * S), equation: "F11-3" });
  }
  return chapterResult("F11", Mp, states);
}
