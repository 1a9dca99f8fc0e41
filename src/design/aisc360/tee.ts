// Tees bent in the plane of their stem, AISC 360-16 F9 (tee shapes; double angles are not covered).
import { IssueCollector, fail } from "../../errors/index.js";
import { readPositive, readRecord, refuseUnknownKeys } from "../read.js";
import { chapterResult, checkLengthAndGradient, type ChapterFlexure, type LimitStateStrength } from "./chapter-flexure.js";
import { classOf } from "./classify.js";
import { checkSteel, type SteelForDesign } from "./shape.js";

/** A tee (a WT, or a welded tee) loaded in the plane of its stem, by the properties AISC 360-16 F9 uses. One length unit throughout. */
export interface TeeForDesign {
  /** `"tension"` when the bending puts the stem's tip in tension (the flange in compression), `"compression"` otherwise. */
  readonly stem: "tension" | "compression";
  /** Overall depth d (length). */
  readonly depth: number;
  /** Flange width b_f (length). */
  readonly flangeWidth: number;
  /** Flange thickness t_f (length). */
  readonly flangeThickness: number;
  /** Stem thickness t_w (length). */
  readonly stemThickness: number;
  /** S_x, the elastic section modulus to the tip of the stem, as tabulated (the smaller) (length^3). */
  readonly sectionModulus: number;
  /** S_xc, the elastic section modulus to the outer face of the flange (length^3): for flange local buckling (F9.3). */
  readonly flangeSectionModulus: number;
  /** Z_x (length^3). */
  readonly plasticModulus: number;
  /** I_y, about the axis of symmetry (length^4). */
  readonly minorMomentOfInertia: number;
  /** r_y (length). */
  readonly minorRadiusOfGyration: number;
  /** J (length^4). */
  readonly torsionConstant: number;
}

const KEYS = ["stem", "depth", "flangeWidth", "flangeThickness", "stemThickness", "sectionModulus", "flangeSectionModulus", "plasticModulus", "minorMomentOfInertia", "minorRadiusOfGyration", "torsionConstant"] as const;

/**
 * The nominal flexural strength M_n of a tee loaded in the plane of symmetry by AISC 360-16 F9:
 * yielding (F9.1), M_p = F_y Z_x <= 1.6 M_y with the stem in tension (F9-2), M_p = M_y with it in
 * compression (F9-4), M_y = F_y S_x (F9-3); lateral-torsional buckling (F9.2) with the stem in
 * tension by L_p = 1.76 r_y sqrt(E/F_y) (F9-8), L_r = 1.95 (E/F_y) (sqrt(I_y J) / S_x)
 * sqrt(2.36 (F_y/E) d S_x / J + 1) (F9-9), M_n = M_p - (M_p - M_y)(L_b - L_p)/(L_r - L_p) (F9-6)
 * and M_n = M_cr beyond L_r (F9-7), and with the stem in compression M_n = M_cr <= M_y (F9-12);
 * M_cr = (1.95 E / L_b) sqrt(I_y J) (B + sqrt(1 + B^2)) (F9-10), B = +-2.3 (d / L_b) sqrt(I_y / J)
 * (F9-11, F9-13); flange local buckling of a flange in compression (F9.3, Table B4.1b case 10 with
 * lambda = b_f / 2 t_f): M_n = M_p - (M_p - 0.7 F_y S_xc)(lambda - lambda_pf)/(lambda_rf - lambda_pf)
 * <= 1.6 M_y (F9-14), 0.7 E S_xc / lambda^2 (F9-15). C_b is not applied (taken as 1, conservative).
 *
 * @param shape - {@link TeeForDesign}.
 * @param steel - E and F_y.
 * @param unbracedLength - L_b (length), > 0.
 * @throws FlexuraError the input codes; `rule-not-covered` for a stem in compression with
 *   d / t_w > 0.84 sqrt(E/F_y), whose local buckling (F9.4, F9-18, F9-19) flexura does not
 *   implement; `shape-inconsistent` for dimensions that contradict each other.
 * @example
 * ```ts
 * nominalFlexureTee(wt, { elasticModulus: 29000, yieldStrength: 50 }, 120).governs;
 * ```
 */
export function nominalFlexureTee(shape: TeeForDesign, steel: SteelForDesign, unbracedLength: number): ChapterFlexure {
  const path = ["shape"];
  const obj = readRecord(shape, path, "tee");
  const found = new IssueCollector();
  refuseUnknownKeys(found, obj, KEYS, path, "tee");
  const stem = Object.hasOwn(obj, "stem") ? obj["stem"] : undefined;
  if (stem !== "tension" && stem !== "compression") found.add("missing-field", [...path, "stem"], 'Say whether the stem\'s tip is in "tension" or "compression" under this bending: F9 treats them differently.', { field: "stem" });
  const v = {} as Record<(typeof KEYS)[number], number>;
  for (const key of KEYS) if (key !== "stem") v[key] = readPositive(found, obj, key, path, key);
  found.throwIfAny();
  if (!(v.flangeThickness < v.depth)) found.add("shape-inconsistent", [...path, "flangeThickness"], `A flange of ${v.flangeThickness} does not fit in a depth of ${v.depth}.`);
  if (!(v.stemThickness < v.flangeWidth)) found.add("shape-inconsistent", [...path, "stemThickness"], `The stem (${v.stemThickness}) must be thinner than the flange is wide (${v.flangeWidth}).`);
  if (!(v.sectionModulus <= v.plasticModulus)) found.add("shape-inconsistent", [...path, "plasticModulus"], `Z_x (${v.plasticModulus}) cannot be below S_x (${v.sectionModulus}).`);
  found.throwIfAny();
  const { elasticModulus: E, yieldStrength: Fy } = checkSteel(steel);
  checkLengthAndGradient(unbracedLength, 1);
  const root = Math.sqrt(E / Fy);
  const My = Fy * v.sectionModulus;
  const Lb = unbracedLength;
  const tension = stem === "tension";
  if (!tension && v.depth / v.stemThickness > 0.84 * root)
    fail("rule-not-covered", [...path, "stemThickness"], `The stem is in compression with d/t_w = ${(v.depth / v.stemThickness).toPrecision(4)} > 0.84 sqrt(E/F_y) = ${(0.84 * root).toPrecision(4)}: its local buckling (AISC 360-16 F9.4) is not implemented in flexura.`, { ratio: v.depth / v.stemThickness, limit: 0.84 * root });
  const Mp = tension ? Math.min(Fy * v.plasticModulus, 1.6 * My) : My;
  const states: LimitStateStrength[] = [{ limitState: "yielding", nominal: Mp, equation: tension ? "F9-2" : "F9-4" }];
  const rootIJ = Math.sqrt(v.minorMomentOfInertia * v.torsionConstant);
  const mcr = (sign: number): number => {
    const B = sign * 2.3 * (v.depth / Lb) * Math.sqrt(v.minorMomentOfInertia / v.torsionConstant);
    return ((1.95 * E) / Lb) * rootIJ * (B + Math.sqrt(1 + B * B));
  };
  if (tension) {
    const lp = 1.76 * v.minorRadiusOfGyration * root;
    const lr = 1.95 * (E / Fy) * (rootIJ / v.sectionModulus) * Math.sqrt(2.36 * (Fy / E) * ((v.depth * v.sectionModulus) / v.torsionConstant) + 1);
    if (Lb > lp && Lb <= lr) states.push({ limitState: "lateral-torsional-buckling", nominal: Mp - (Mp - My) * ((Lb - lp) / (lr - lp)), equation: "F9-6" });
    else if (Lb > lr) states.push({ limitState: "lateral-torsional-buckling", nominal: mcr(1), equation: "F9-7" });
    const lambda = v.flangeWidth / (2 * v.flangeThickness);
    const lpf = 0.38 * root, lrf = 1.0 * root;
    const cls = classOf(lambda, lpf, lrf);
    if (cls === "noncompact") states.push({ limitState: "flange-local-buckling", nominal: Math.min(1.6 * My, Mp - (Mp - 0.7 * Fy * v.flangeSectionModulus) * ((lambda - lpf) / (lrf - lpf))), equation: "F9-14" });
    else if (cls === "slender") states.push({ limitState: "flange-local-buckling", nominal: (0.7 * E * v.flangeSectionModulus) / (lambda * lambda), equation: "F9-15" });
  } else {
    states.push({ limitState: "lateral-torsional-buckling", nominal: Math.min(My, mcr(-1)), equation: "F9-12" });
  }
  return chapterResult("F9", Mp, states);
}
