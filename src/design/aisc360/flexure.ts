// Nominal flexural strength of a doubly symmetric I-shape with a compact web bent about its
// major axis: AISC 360-16 F2 (compact flanges) and F3 (noncompact or slender flanges).
import { fail } from "../../errors/index.js";
import { classifyCheckedIShape, flangeBucklingCoefficient, type IShapeClassification } from "./classify.js";
import { checkIShape, checkSteel, type IShapeForDesign, type SteelForDesign } from "./shape.js";

/** The limit state that sets a nominal flexural strength. */
export type FlexuralLimitState = "yielding" | "lateral-torsional-buckling" | "flange-local-buckling";

/** The lengths that bound the lateral-torsional buckling ranges of AISC 360-16 F2.2. */
export interface BucklingLengths {
  /** L_p = 1.76 r_y sqrt(E / F_y) (F2-5), length: up to it the limit state does not apply. */
  readonly plastic: number;
  /** L_r (F2-6), length: beyond it buckling is elastic. */
  readonly inelastic: number;
  /** r_ts, with r_ts^2 = sqrt(I_y C_w) / S_x (F2-7), length. */
  readonly effectiveRadius: number;
  /** h_0 = d - t_f, distance between flange centroids (length). */
  readonly flangeCentroidDistance: number;
  /** c of F2-8: 1 for a doubly symmetric I (F2-8a), (h_0 / 2) sqrt(I_y / C_w) for a channel (F2-8b). */
  readonly torsionCoefficient: number;
}

/** A nominal flexural strength and how it was reached. */
export interface NominalFlexure {
  /** The nominal flexural strength M_n (force * length): the least of the limit states that apply. */
  readonly nominal: number;
  /** The limit state that governs M_n. */
  readonly governs: FlexuralLimitState;
  /** The clause of the governing limit state's equation, for example `"F2-2"`. */
  readonly equation: string;
  /** M_p = F_y Z_x (F2-1), force * length. */
  readonly plasticMoment: number;
  /** M_n from yielding, lateral-torsional buckling and (F3) flange local buckling; null where it does not apply. */
  readonly byLimitState: Readonly<Record<FlexuralLimitState, number | null>>;
  /** L_p, L_r, r_ts, h_0. */
  readonly lengths: BucklingLengths;
  /** The slenderness classes. */
  readonly classification: IShapeClassification;
  /** `"F2"` (compact flanges) or `"F3"` (noncompact or slender flanges). */
  readonly section: "F2" | "F3";
}

/**
 * L_p, L_r, r_ts, h_0 and c of a doubly symmetric I-shape or a channel, AISC 360-16 F2-5 to F2-8
 * (c = 1 for the I, F2-8a; c = (h_0 / 2) sqrt(I_y / C_w) for a channel, F2-8b).
 *
 * @example
 * ```ts
 * bucklingLengths(w18x50, { elasticModulus: 29000, yieldStrength: 50 }).plastic; // 69.9 in (5.83 ft)
 * ```
 */
export function bucklingLengths(shape: IShapeForDesign, steel: SteelForDesign): BucklingLengths {
  return lengthsOf(checkIShape(shape), checkSteel(steel));
}

function lengthsOf(shape: IShapeForDesign, steel: SteelForDesign): BucklingLengths {
  const { elasticModulus: E, yieldStrength: Fy } = steel;
  const rts = Math.sqrt(Math.sqrt(shape.minorMomentOfInertia * shape.warpingConstant) / shape.sectionModulus);
  const h0 = shape.depth - shape.flangeThickness;
  const c = shape.form === "channel" ? (h0 / 2) * Math.sqrt(shape.minorMomentOfInertia / shape.warpingConstant) : 1;
  const jTerm = (shape.torsionConstant * c) / (shape.sectionModulus * h0);
  const ratio = (0.7 * Fy) / E;
  const lp = 1.76 * shape.minorRadiusOfGyration * Math.sqrt(E / Fy);
  const lr = 1.95 * rts * (E / (0.7 * Fy)) * Math.sqrt(jTerm + Math.sqrt(jTerm * jTerm + 6.76 * ratio * ratio));
  return Object.freeze({ plastic: lp, inelastic: lr, effectiveRadius: rts, flangeCentroidDistance: h0, torsionCoefficient: c });
}

/**
 * The nominal flexural strength M_n of a doubly symmetric I-shape with a compact web, bent about
 * its major axis, over an unbraced length L_b with the moment-gradient factor C_b: AISC 360-16
 * F2 (compact flanges: yielding F2-1, lateral-torsional buckling F2-2 to F2-4) or F3 (noncompact
 * or slender flanges: lateral-torsional buckling by F2.2, flange local buckling F3-1, F3-2).
 *
 * @param shape - A checked I-shape.
 * @param steel - The steel, in the shape's stress unit.
 * @param unbracedLength - L_b (length), the distance between points braced against lateral
 *   displacement of the compression flange or twist; positive.
 * @param momentGradient - C_b (F1-1), at least 1 in practice; positive.
 * @returns M_n, the governing limit state and its equation.
 * @throws FlexuraError `rule-not-covered` for a noncompact web (F4) or slender web (F5), which
 *   this release does not implement; `value-not-positive` for L_b or C_b.
 */
export function nominalFlexure(shape: IShapeForDesign, steel: SteelForDesign, unbracedLength: number, momentGradient: number): NominalFlexure {
  return nominalFlexureChecked(checkIShape(shape), checkSteel(steel), unbracedLength, momentGradient);
}

/** @internal {@link nominalFlexure} on a shape and steel already checked (the member check reuses them per segment). */
export function nominalFlexureChecked(shape: IShapeForDesign, steel: SteelForDesign, unbracedLength: number, momentGradient: number): NominalFlexure {
  if (!(unbracedLength > 0) || !Number.isFinite(unbracedLength))
    fail("value-not-positive", ["unbracedLength"], `The unbraced length must be a positive finite length; got ${unbracedLength}.`, { value: unbracedLength });
  if (!(momentGradient > 0) || !Number.isFinite(momentGradient))
    fail("value-not-positive", ["momentGradient"], `C_b must be a positive finite number; got ${momentGradient}.`, { value: momentGradient });
  const classification = classifyCheckedIShape(shape, steel);
  const web = classification.web;
  if (web.class !== "compact")
    fail(
      "rule-not-covered",
      ["shape", "webHeight"],
      `The web is ${web.class} (h/t_w = ${web.ratio.toPrecision(4)} > ${web.compactLimit.toPrecision(4)}, ${web.clause}): AISC 360-16 ${web.class === "noncompact" ? "F4" : "F5"} applies, which flexura does not implement; F2 and F3 need a compact web.`,
      { ratio: web.ratio, limit: web.compactLimit },
    );
  const { elasticModulus: E, yieldStrength: Fy } = steel;
  const Sx = shape.sectionModulus;
  const Mp = Fy * shape.plasticModulus;
  const lengths = lengthsOf(shape, steel);
  const Lb = unbracedLength;
  let ltb: number | null = null;
  let ltbEquation = "";
  if (Lb > lengths.plastic) {
    if (Lb <= lengths.inelastic) {
      ltb = Math.min(Mp, momentGradient * (Mp - (Mp - 0.7 * Fy * Sx) * ((Lb - lengths.plastic) / (lengths.inelastic - lengths.plastic))));
      ltbEquation = "F2-2";
    } else {
      const slender = Lb / lengths.effectiveRadius;
      const jTerm = (shape.torsionConstant * lengths.torsionCoefficient) / (Sx * lengths.flangeCentroidDistance);
      const Fcr = ((momentGradient * Math.PI * Math.PI * E) / (slender * slender)) * Math.sqrt(1 + 0.078 * jTerm * slender * slender);
      ltb = Math.min(Mp, Fcr * Sx);
      ltbEquation = "F2-3";
    }
  }
  const flange = classification.flange;
  if (shape.form === "channel" && flange.class !== "compact")
    fail(
      "rule-not-covered",
      ["shape", "flangeWidth"],
      `The channel's flange is ${flange.class} (b/t = ${flange.ratio.toPrecision(4)} > ${flange.compactLimit.toPrecision(4)}, ${flange.clause}): AISC 360-16 F2 covers channels with compact flanges, and F3 is for I-shapes; flexura computes no strength for it.`,
      { ratio: flange.ratio, limit: flange.compactLimit },
    );
  let flb: number | null = null;
  let flbEquation = "";
  if (flange.class === "noncompact") {
    flb = Mp - (Mp - 0.7 * Fy * Sx) * ((flange.ratio - flange.compactLimit) / (flange.noncompactLimit - flange.compactLimit));
    flbEquation = "F3-1";
  } else if (flange.class === "slender") {
    flb = (0.9 * E * flangeBucklingCoefficient(shape) * Sx) / (flange.ratio * flange.ratio);
    flbEquation = "F3-2";
  }
  const section = flange.class === "compact" ? "F2" : "F3";
  // Yielding is a limit state of F2 only; F3 caps both at M_p through F2.2 and F3-1.
  const yielding = section === "F2" ? Mp : null;
  let nominal = yielding ?? Mp;
  let governs: FlexuralLimitState = "yielding";
  let equation = "F2-1";
  if (ltb !== null && ltb < nominal) {
    nominal = ltb;
    governs = "lateral-torsional-buckling";
    equation = ltbEquation;
  }
  if (flb !== null && flb < nominal) {
    nominal = flb;
    governs = "flange-local-buckling";
    equation = flbEquation;
  }
  return Object.freeze({
    nominal,
    governs,
    equation,
    plasticMoment: Mp,
    byLimitState: Object.freeze({ yielding, "lateral-torsional-buckling": ltb, "flange-local-buckling": flb }),
    lengths,
    classification,
    section,
  });
}
