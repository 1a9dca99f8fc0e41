// Cross-section classification and resistance of a doubly symmetric I-section bent about y-y:
// EN 1993-1-1:2005 Table 5.2, 6.2.5 (bending), 6.2.6 (shear) and 6.2.8 (bending and shear).
import { fail } from "../../errors/index.js";
import { checkEurocodeIShape, checkEurocodeSteel, type IShapeForEurocode, type SteelForEurocode } from "./shape.js";

/** Partial factors of EN 1993-1-1 6.1; the recommended values are 1.00 and 1.00 (6.1 Note 2B); a National Annex may set others. */
export interface PartialFactors {
  /** gamma_M0, resistance of cross-sections. */
  readonly crossSection: number;
  /** gamma_M1, resistance of members to instability. */
  readonly instability: number;
}

/** The recommended partial factors of EN 1993-1-1 6.1 Note 2B: gamma_M0 = gamma_M1 = 1.00. */
export const RECOMMENDED_PARTIAL_FACTORS: PartialFactors = Object.freeze({ crossSection: 1, instability: 1 });

/** The class of a cross-section (or part) by EN 1993-1-1 5.5.2: 1 to 4. */
export type SectionClass = 1 | 2 | 3 | 4;

/** One part's c/t against the limits of Table 5.2 (limits already multiplied by epsilon). */
export interface PartClass {
  /** c / t, dimensionless. */
  readonly ratio: number;
  /** The class 1, 2 and 3 limits. */
  readonly limits: readonly [number, number, number];
  /** The part's class. */
  readonly class: SectionClass;
}

/** Classification of an I-section in major-axis bending by Table 5.2. */
export interface EurocodeClassification {
  /** epsilon = sqrt(235 / f_y), f_y in N/mm^2. */
  readonly epsilon: number;
  /** Web, internal part in bending (Table 5.2 sheet 1): 72, 83, 124 epsilon. */
  readonly web: PartClass;
  /** Flange outstand in compression (Table 5.2 sheet 2): 9, 10, 14 epsilon. */
  readonly flange: PartClass;
  /** The section's class: the larger of the two (5.5.2(6)). */
  readonly class: SectionClass;
}

/** Cross-section resistances about y-y. */
export interface EurocodeResistance {
  /** The classification. */
  readonly classification: EurocodeClassification;
  /** M_c,Rd (6.2.5): W_pl,y f_y / gamma_M0 for class 1 and 2 (6.13), W_el,y f_y / gamma_M0 for class 3 (6.14); force * length. */
  readonly bending: number;
  /** The shear area A_v (6.2.6(3)), length^2. */
  readonly shearArea: number;
  /** V_pl,Rd = A_v (f_y / sqrt 3) / gamma_M0 (6.18), force. */
  readonly shear: number;
  /** eta of 6.2.6(3) used (1.0, the conservative value the clause's note allows). */
  readonly eta: number;
}

function partClass(ratio: number, limits: readonly [number, number, number]): PartClass {
  const c: SectionClass = ratio <= limits[0] ? 1 : ratio <= limits[1] ? 2 : ratio <= limits[2] ? 3 : 4;
  return Object.freeze({ ratio, limits: Object.freeze(limits), class: c });
}

/**
 * Refuses a steel whose modulus is not in N/mm^2: epsilon = sqrt(235 / f_y) of Table 5.2 holds
 * only with f_y in N/mm^2, so the EN 1993-1-1 functions take N and mm throughout.
 */
function requireNewtonMillimetre(steel: SteelForEurocode): void {
  if (!(steel.elasticModulus >= 150_000 && steel.elasticModulus <= 250_000))
    fail(
      "units-not-newton-millimetre",
      ["steel", "elasticModulus"],
      `EN 1993-1-1 checks take N and mm (epsilon = sqrt(235 / f_y) needs f_y in N/mm^2), so E should be about 210,000 N/mm^2; got ${steel.elasticModulus}.`,
      { value: steel.elasticModulus },
    );
}

/**
 * Classifies a doubly symmetric I-section in major-axis bending by EN 1993-1-1:2005 Table 5.2:
 * the web as an internal part in bending (c = h - 2 t_f - 2 r), the flange as an outstand in
 * compression (c = (b - t_w - 2 r) / 2). Inputs in N and mm.
 *
 * @throws FlexuraError `units-not-newton-millimetre` and the checks of the shape and steel.
 * @example
 * ```ts
 * classifyEurocodeIShape(ipe300, { elasticModulus: 210000, shearModulus: 81000, yieldStrength: 235 }).class; // 1
 * ```
 */
export function classifyEurocodeIShape(shape: IShapeForEurocode, steel: SteelForEurocode): EurocodeClassification {
  return classifyChecked(checkEurocodeIShape(shape), checkEurocodeSteel(steel));
}

function classifyChecked(shape: IShapeForEurocode, steel: SteelForEurocode): EurocodeClassification {
  requireNewtonMillimetre(steel);
  const e = Math.sqrt(235 / steel.yieldStrength);
  const web = partClass((shape.depth - 2 * shape.flangeThickness - 2 * shape.rootRadius) / shape.webThickness, [72 * e, 83 * e, 124 * e]);
  const flange = partClass((shape.flangeWidth - shape.webThickness - 2 * shape.rootRadius) / 2 / shape.flangeThickness, [9 * e, 10 * e, 14 * e]);
  return Object.freeze({ epsilon: e, web, flange, class: Math.max(web.class, flange.class) as SectionClass });
}

/**
 * The cross-section resistances of a doubly symmetric I-section about y-y by EN 1993-1-1:2005:
 * M_c,Rd (6.2.5), and V_pl,Rd (6.2.6) with the shear area of 6.2.6(3)(a) for rolled sections
 * (A - 2 b t_f + (t_w + 2 r) t_f, not less than eta h_w t_w) or (d) for welded ones (eta h_w t_w),
 * eta = 1.0. Inputs in N and mm.
 *
 * @throws FlexuraError `rule-not-covered` for a class 4 section (effective widths, EN 1993-1-5) or a
 *   web that must be checked for shear buckling (h_w / t_w > 72 epsilon / eta, 6.2.6(6)).
 */
export function eurocodeResistance(shape: IShapeForEurocode, steel: SteelForEurocode, factors: PartialFactors = RECOMMENDED_PARTIAL_FACTORS): EurocodeResistance {
  return resistanceChecked(checkEurocodeIShape(shape), checkEurocodeSteel(steel), factors);
}

/** @internal {@link eurocodeResistance} on a shape and steel already checked. */
export function resistanceChecked(shape: IShapeForEurocode, steel: SteelForEurocode, factors: PartialFactors): EurocodeResistance {
  const classification = classifyChecked(shape, steel);
  const gM0 = checkFactor(factors, "crossSection");
  if (classification.class === 4)
    fail("rule-not-covered", ["shape"], `The section is class 4 (${classification.web.class === 4 ? "web" : "flange"} c/t = ${(classification.web.class === 4 ? classification.web.ratio : classification.flange.ratio).toPrecision(4)}): effective widths of EN 1993-1-5 apply, which flexura does not implement.`);
  const eta = 1;
  const hw = shape.depth - 2 * shape.flangeThickness;
  if (hw / shape.webThickness > (72 * classification.epsilon) / eta)
    fail("rule-not-covered", ["shape", "webThickness"], `h_w / t_w = ${(hw / shape.webThickness).toPrecision(4)} exceeds 72 epsilon / eta = ${((72 * classification.epsilon) / eta).toPrecision(4)}: the web must be checked for shear buckling by EN 1993-1-5 (6.2.6(6)), which flexura does not implement.`);
  const fy = steel.yieldStrength;
  const bending = ((classification.class <= 2 ? shape.plasticModulus : shape.elasticModulus) * fy) / gM0;
  const rolledArea = shape.area - 2 * shape.flangeWidth * shape.flangeThickness + (shape.webThickness + 2 * shape.rootRadius) * shape.flangeThickness;
  const shearArea = shape.rolled ? Math.max(rolledArea, eta * hw * shape.webThickness) : eta * hw * shape.webThickness;
  return Object.freeze({ classification, bending, shearArea, shear: (shearArea * fy) / Math.sqrt(3) / gM0, eta });
}

/** @internal The partial factor `name` of `factors`, which must be a finite number of at least 1. */
export function checkFactor(factors: unknown, name: keyof PartialFactors): number {
  if (typeof factors !== "object" || factors === null) fail("partial-factor-invalid", ["factors"], "The partial factors must be an object { crossSection, instability } (recommended 1.00 each).");
  const value = Object.hasOwn(factors, name) ? (factors as Record<string, unknown>)[name] : undefined;
  if (typeof value !== "number" || !Number.isFinite(value) || value < 1)
    fail("partial-factor-invalid", ["factors", name], `The partial factor ${name} must be a number of at least 1 (recommended 1.00); got ${String(value)}.`);
  return value;
}

/**
 * The bending resistance reduced for shear, EN 1993-1-1:2005 6.2.8: no reduction while V_Ed <=
 * 0.5 V_pl,Rd; beyond it rho = (2 V_Ed / V_pl,Rd - 1)^2 and, for class 1 and 2 I-sections,
 * M_y,V,Rd = (W_pl,y - rho A_w^2 / (4 t_w)) f_y / gamma_M0 (6.30) with A_w = h_w t_w; for class 3,
 * (1 - rho) M_c,Rd (the reduced yield strength taken over the whole section: conservative).
 * Never above M_c,Rd. Refuses V_Ed above V_pl,Rd.
 *
 * @param resistance - The section's resistances, from {@link eurocodeResistance} with the same shape, steel and factors.
 * @param shear - V_Ed (force); its magnitude is used.
 * @throws FlexuraError `shear-exceeds-resistance` when |V_Ed| > V_pl,Rd; `not-a-number` / `not-finite`
 *   for V_Ed; `options-invalid` for resistances that are not positive numbers; the shape, steel and
 *   partial-factor checks.
 */
export function bendingWithShear(shape: IShapeForEurocode, steel: SteelForEurocode, resistance: EurocodeResistance, shear: number, factors: PartialFactors = RECOMMENDED_PARTIAL_FACTORS): number {
  shape = checkEurocodeIShape(shape);
  steel = checkEurocodeSteel(steel);
  const gM0 = checkFactor(factors, "crossSection");
  if (typeof shear !== "number") fail("not-a-number", ["shear"], `V_Ed must be a number; got ${typeof shear}.`);
  if (!Number.isFinite(shear)) fail("not-finite", ["shear"], `V_Ed must be a finite number; got ${shear}.`);
  if (typeof resistance !== "object" || resistance === null || !(resistance.shear > 0 && resistance.bending > 0) || !Number.isFinite(resistance.shear) || !Number.isFinite(resistance.bending))
    fail("options-invalid", ["resistance"], "Give the section's resistances from eurocodeResistance(shape, steel, factors).");
  const v = Math.abs(shear);
  if (v <= 0.5 * resistance.shear) return resistance.bending;
  if (v > resistance.shear) fail("shear-exceeds-resistance", ["shear"], `V_Ed = ${v} exceeds V_pl,Rd = ${resistance.shear}: no bending resistance is left by 6.2.8.`, { shear: v, resistance: resistance.shear });
  const rho = (2 * v / resistance.shear - 1) ** 2;
  if (resistance.classification.class === 3) return (1 - rho) * resistance.bending;
  const hw = shape.depth - 2 * shape.flangeThickness;
  const aw = hw * shape.webThickness;
  const reduced = ((shape.plasticModulus - (rho * aw * aw) / (4 * shape.webThickness)) * steel.yieldStrength) / gM0;
  return Math.min(reduced, resistance.bending);
}
