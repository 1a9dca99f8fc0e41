// Lateral-torsional buckling of a doubly symmetric I-section, EN 1993-1-1:2005 6.3.2.2 (general case)
// and 6.3.2.3 (rolled or equivalent welded sections), with M_cr from the three-factor formula.
import { fail } from "../../errors/index.js";
import { checkFactor, resistanceChecked, RECOMMENDED_PARTIAL_FACTORS, type PartialFactors } from "./resistance.js";
import { checkEurocodeIShape, checkEurocodeSteel, type IShapeForEurocode, type SteelForEurocode } from "./shape.js";

/** A buckling curve of EN 1993-1-1 Table 6.3 and its imperfection factor. */
export type BucklingCurve = "a" | "b" | "c" | "d";

/** Imperfection factors alpha_LT of EN 1993-1-1 Table 6.3 (recommended values of Table 6.3 via 6.3.2.2(2)). */
export const IMPERFECTION_FACTORS: Readonly<Record<BucklingCurve, number>> = Object.freeze({ a: 0.21, b: 0.34, c: 0.49, d: 0.76 });

/** Options of the three-factor critical moment. */
export interface CriticalMomentOptions {
  /** C_1, the factor for the shape of the bending moment diagram (1.0 for uniform moment); from a published table for the segment's moment shape. */
  readonly momentShapeFactor: number;
  /** C_2, the factor for the load height (needed only with `loadHeight`). */
  readonly loadHeightFactor?: number;
  /** z_g (length): distance of the point of load application above the shear centre (positive when destabilising, on the top flange). Default 0. */
  readonly loadHeight?: number;
}

/**
 * The elastic critical moment of a doubly symmetric I-section segment of length L, free to rotate
 * in plan and to warp at its ends (k = k_w = 1), by the three-factor formula:
 * M_cr = C_1 (pi^2 E I_z / L^2) [sqrt(I_w / I_z + L^2 G I_t / (pi^2 E I_z) + (C_2 z_g)^2) - C_2 z_g].
 * (The formula and the C_1, C_2 tables are published in the non-contradictory complementary
 * information on M_cr for EN 1993-1-1; flexura takes C_1 and C_2 from the user.)
 *
 * @param length - The segment's length between lateral restraints (length), positive.
 * @throws FlexuraError `value-not-positive` (length, C_1), `not-finite` (z_g, C_2), `options-invalid` (no options), `missing-field` (z_g without C_2).
 */
export function criticalMoment(shape: IShapeForEurocode, steel: SteelForEurocode, length: number, options: CriticalMomentOptions): number {
  shape = checkEurocodeIShape(shape);
  steel = checkEurocodeSteel(steel);
  if (!(length > 0) || !Number.isFinite(length)) fail("value-not-positive", ["length"], `The segment length must be positive and finite; got ${length}.`);
  if (typeof options !== "object" || options === null) fail("options-invalid", ["options"], "Give the options, at least { momentShapeFactor: C_1 } (1.0 for uniform moment).");
  const c1 = options.momentShapeFactor;
  if (typeof c1 !== "number" || !(c1 > 0) || !Number.isFinite(c1)) fail("value-not-positive", ["options", "momentShapeFactor"], `C_1 must be a positive number (1.0 for uniform moment); got ${String(c1)}.`);
  const zg = options.loadHeight ?? 0;
  const c2 = options.loadHeightFactor ?? 0;
  if (!Number.isFinite(zg) || !Number.isFinite(c2)) fail("not-finite", ["options"], "The load height and C_2 must be finite numbers.");
  if (zg !== 0 && options.loadHeightFactor === undefined) fail("missing-field", ["options", "loadHeightFactor"], "A load height needs its factor C_2 for the segment's moment shape.");
  const { elasticModulus: E, shearModulus: G } = steel;
  const euler = (Math.PI * Math.PI * E * shape.minorMomentOfInertia) / (length * length);
  const root = Math.sqrt(shape.warpingConstant / shape.minorMomentOfInertia + (length * length * G * shape.torsionConstant) / (Math.PI * Math.PI * E * shape.minorMomentOfInertia) + (c2 * zg) ** 2);
  return c1 * euler * (root - c2 * zg);
}

/** The lateral-torsional buckling resistance of a segment. */
export interface BucklingResistance {
  /** M_b,Rd = chi_LT W_y f_y / gamma_M1 (6.55), force * length. */
  readonly resistance: number;
  /** chi_LT, the reduction factor, at most 1. */
  readonly reduction: number;
  /** The non-dimensional slenderness lambda_LT = sqrt(W_y f_y / M_cr). */
  readonly slenderness: number;
  /** The critical moment used. */
  readonly criticalMoment: number;
  /** The curve (Table 6.4 or 6.5) and its alpha_LT. */
  readonly curve: BucklingCurve;
  /** `"6.3.2.2"` (general case) or `"6.3.2.3"` (rolled or equivalent welded). */
  readonly clause: "6.3.2.2" | "6.3.2.3";
}

/**
 * The lateral-torsional buckling resistance M_b,Rd of a segment by EN 1993-1-1:2005 6.3.2, from its
 * elastic critical moment: W_y = W_pl,y (class 1, 2) or W_el,y (class 3); the general case 6.3.2.2
 * (6.56, curves of Table 6.4: rolled I h/b <= 2 a, > 2 b; welded c, d), or 6.3.2.3 (6.57 with
 * lambda_LT,0 = 0.4 and beta = 0.75, the recommended values; curves of Table 6.5: rolled b, c;
 * welded c, d; the modification factor f of 6.3.2.3(2) is not used, which is conservative).
 *
 * @param method - `"general"` (6.3.2.2) or `"rolled"` (6.3.2.3).
 * @throws FlexuraError `value-not-positive` (M_cr), `options-invalid` (method).
 */
export function bucklingResistance(shape: IShapeForEurocode, steel: SteelForEurocode, mcr: number, method: "general" | "rolled", factors: PartialFactors = RECOMMENDED_PARTIAL_FACTORS): BucklingResistance {
  shape = checkEurocodeIShape(shape);
  steel = checkEurocodeSteel(steel);
  const section = resistanceChecked(shape, steel, factors);
  const gM1 = checkFactor(factors, "instability");
  if (!(mcr > 0) || !Number.isFinite(mcr)) fail("value-not-positive", ["criticalMoment"], `The critical moment must be positive and finite; got ${mcr}.`);
  if (method !== "general" && method !== "rolled") fail("options-invalid", ["method"], `The method must be "general" (6.3.2.2) or "rolled" (6.3.2.3); got ${String(method)}.`);
  const wy = section.classification.class <= 2 ? shape.plasticModulus : shape.elasticModulus;
  const fy = steel.yieldStrength;
  const lam = Math.sqrt((wy * fy) / mcr);
  const tall = shape.depth / shape.flangeWidth > 2;
  const curve: BucklingCurve = method === "general" ? (shape.rolled ? (tall ? "b" : "a") : tall ? "d" : "c") : shape.rolled ? (tall ? "c" : "b") : tall ? "d" : "c";
  const alpha = IMPERFECTION_FACTORS[curve];
  let chi: number;
  if (method === "general") {
    const phi = 0.5 * (1 + alpha * (lam - 0.2) + lam * lam);
    chi = lam <= 0.2 ? 1 : Math.min(1, 1 / (phi + Math.sqrt(phi * phi - lam * lam)));
  } else {
    const lam0 = 0.4;
    const beta = 0.75;
    const phi = 0.5 * (1 + alpha * (lam - lam0) + beta * lam * lam);
    chi = lam <= lam0 ? 1 : Math.min(1, 1 / (lam * lam), 1 / (phi + Math.sqrt(phi * phi - beta * lam * lam)));
  }
  return Object.freeze({ resistance: (chi * wy * fy) / gM1, reduction: chi, slenderness: lam, criticalMoment: mcr, curve, clause: method === "general" ? "6.3.2.2" : "6.3.2.3" });
}
