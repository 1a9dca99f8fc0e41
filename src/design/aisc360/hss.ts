// Rectangular HSS and boxes (AISC 360-16 F7) and round HSS (F8) in flexure.
import { IssueCollector, fail, type IssuePath } from "../../errors/index.js";
import { readPositive, readRecord, refuseUnknownKeys } from "../read.js";
import { chapterResult, checkLengthAndGradient, type ChapterFlexure, type LimitStateStrength } from "./chapter-flexure.js";
import { classOf } from "./classify.js";
import { checkSteel, type SteelForDesign } from "./shape.js";

/**
 * A rectangular HSS or box section bent about one of its axes, by the properties AISC 360-16 F7
 * uses, about that axis. One length unit throughout; take the values from the shape table (they
 * use the design wall thickness) or compute them for a built-up box.
 */
export interface RectangularHssForDesign {
  /** `"major"` when bent about the axis of greater I (lateral-torsional buckling, F7.4, applies), `"minor"` otherwise. */
  readonly axis: "major" | "minor";
  /** Width b of the compression flange as Table B4.1b note (d) defines it: for HSS the clear distance between webs less the inside corner radii (B - 3t when the radius is not known); for a box, the clear distance between webs (length). */
  readonly flangeWidth: number;
  /** Height h of the webs, defined likewise (H - 3t for HSS when the radius is not known) (length). */
  readonly webHeight: number;
  /** Wall thickness t: the design wall thickness of an HSS (length). */
  readonly wallThickness: number;
  /** Elastic section modulus S about the bending axis (length^3). */
  readonly sectionModulus: number;
  /** Plastic section modulus Z about the bending axis (length^3). */
  readonly plasticModulus: number;
  /** Gross area A (length^2), for F7.4. */
  readonly area: number;
  /** Torsion constant J (length^4), for F7.4. */
  readonly torsionConstant: number;
  /** Radius of gyration about the other axis, r_y for major-axis bending (length), for F7.4. */
  readonly minorRadiusOfGyration: number;
}

/** A round HSS (pipe) in flexure by AISC 360-16 F8. */
export interface RoundHssForDesign {
  /** Outside diameter D (length). */
  readonly outsideDiameter: number;
  /** Wall thickness t: the design wall thickness of an HSS (length). */
  readonly wallThickness: number;
  /** Elastic section modulus S (length^3). */
  readonly sectionModulus: number;
  /** Plastic section modulus Z (length^3). */
  readonly plasticModulus: number;
}

const RECT_KEYS = ["axis", "flangeWidth", "webHeight", "wallThickness", "sectionModulus", "plasticModulus", "area", "torsionConstant", "minorRadiusOfGyration"] as const;
const ROUND_KEYS = ["outsideDiameter", "wallThickness", "sectionModulus", "plasticModulus"] as const;

function readShape<K extends string>(value: unknown, keys: readonly K[], path: IssuePath, what: string, skip: readonly string[] = []): { found: IssueCollector; v: Record<K, number>; obj: Readonly<Record<string, unknown>> } {
  const obj = readRecord(value, path, what);
  const found = new IssueCollector();
  refuseUnknownKeys(found, obj, keys, path, what);
  const v = {} as Record<K, number>;
  for (const key of keys) if (!skip.includes(key)) v[key] = readPositive(found, obj, key, path, key);
  return { found, v, obj };
}

/**
 * The nominal flexural strength M_n of a rectangular HSS or box section by AISC 360-16 F7:
 * yielding, M_p = F_y Z (F7-1); flange local buckling of a noncompact flange (F7-2); web local
 * buckling of a noncompact web (F7-5); and, bent about the major axis, lateral-torsional
 * buckling (F7.4) with L_p = 0.13 E r_y sqrt(J A) / M_p (F7-12) and L_r = 2 E r_y sqrt(J A) /
 * (0.7 F_y S_x) (F7-13): M_n = C_b [M_p - (M_p - 0.7 F_y S_x)(L_b - L_p) / (L_r - L_p)] <= M_p
 * (F7-10) and M_n = 2 E C_b sqrt(J A) / (L_b / r_y) <= M_p (F7-11). Slenderness by Table B4.1b
 * case 17 (flanges: lambda_p = 1.12 sqrt(E/F_y), lambda_r = 1.40 sqrt(E/F_y)) and case 19 (webs:
 * lambda_p = 2.42 sqrt(E/F_y), lambda_r = 5.70 sqrt(E/F_y)).
 *
 * @param shape - The section's properties about the bending axis ({@link RectangularHssForDesign}).
 * @param steel - E and F_y, in the shape's units.
 * @param unbracedLength - L_b (length), > 0.
 * @param momentGradient - C_b (F1-1), > 0.
 * @throws FlexuraError the input codes (`missing-field`, `unknown-field`, `value-not-positive`,
 *   ...); `rule-not-covered` for a slender flange (F7.2(c) needs the effective section modulus of
 *   F7-3, F7-4) or a slender web (F7.3(c)), which flexura does not implement.
 * @example
 * ```ts
 * nominalFlexureRectangularHss(hss, { elasticModulus: 29000, yieldStrength: 50 }, 120, 1).governs; // "yielding"
 * ```
 */
export function nominalFlexureRectangularHss(shape: RectangularHssForDesign, steel: SteelForDesign, unbracedLength: number, momentGradient: number): ChapterFlexure {
  const path = ["shape"];
  const { found, v, obj } = readShape(shape, RECT_KEYS, path, "rectangular HSS", ["axis"]);
  const axis = Object.hasOwn(obj, "axis") ? obj["axis"] : undefined;
  if (axis !== "major" && axis !== "minor") found.add("missing-field", [...path, "axis"], 'Say which axis the section bends about: "major" (F7.4 lateral-torsional buckling applies) or "minor".', { field: "axis" });
  found.throwIfAny();
  if (!(v.sectionModulus <= v.plasticModulus)) fail("shape-inconsistent", [...path, "plasticModulus"], `The plastic modulus Z (${v.plasticModulus}) cannot be below the elastic modulus S (${v.sectionModulus}).`);
  const s = checkSteel(steel);
  checkLengthAndGradient(unbracedLength, momentGradient);
  const { elasticModulus: E, yieldStrength: Fy } = s;
  const root = Math.sqrt(E / Fy);
  const flange = v.flangeWidth / v.wallThickness;
  const web = v.webHeight / v.wallThickness;
  const flangeClass = classOf(flange, 1.12 * root, 1.4 * root);
  const webClass = classOf(web, 2.42 * root, 5.7 * root);
  if (flangeClass === "slender")
    fail("rule-not-covered", [...path, "flangeWidth"], `The flange is slender (b/t = ${flange.toPrecision(4)} > ${(1.4 * root).toPrecision(4)}, Table B4.1b case 17): AISC 360-16 F7.2(c) needs the effective section modulus (F7-3, F7-4), which flexura does not implement.`, { ratio: flange, limit: 1.4 * root });
  if (webClass === "slender")
    fail("rule-not-covered", [...path, "webHeight"], `The web is slender (h/t = ${web.toPrecision(4)} > ${(5.7 * root).toPrecision(4)}, Table B4.1b case 19): AISC 360-16 F7.3(c) applies, which flexura does not implement.`, { ratio: web, limit: 5.7 * root });
  const S = v.sectionModulus;
  const Mp = Fy * v.plasticModulus;
  const states: LimitStateStrength[] = [{ limitState: "yielding", nominal: Mp, equation: "F7-1" }];
  if (flangeClass === "noncompact") states.push({ limitState: "flange-local-buckling", nominal: Math.min(Mp, Mp - (Mp - Fy * S) * (3.57 * flange * Math.sqrt(Fy / E) - 4.0)), equation: "F7-2" });
  if (webClass === "noncompact") states.push({ limitState: "web-local-buckling", nominal: Math.min(Mp, Mp - (Mp - Fy * S) * (0.305 * web * Math.sqrt(Fy / E) - 0.738)), equation: "F7-5" });
  if (axis === "major") {
    const root2 = Math.sqrt(v.torsionConstant * v.area);
    const lp = (0.13 * E * v.minorRadiusOfGyration * root2) / Mp;
    const lr = (2 * E * v.minorRadiusOfGyration * root2) / (0.7 * Fy * S);
    const Lb = unbracedLength;
    if (Lb > lp && Lb <= lr) states.push({ limitState: "lateral-torsional-buckling", nominal: Math.min(Mp, momentGradient * (Mp - (Mp - 0.7 * Fy * S) * ((Lb - lp) / (lr - lp)))), equation: "F7-10" });
    else if (Lb > lr) states.push({ limitState: "lateral-torsional-buckling", nominal: Math.min(Mp, (2 * E * momentGradient * root2) / (Lb / v.minorRadiusOfGyration)), equation: "F7-11" });
  }
  return chapterResult("F7", Mp, states);
}

/**
 * The nominal flexural strength M_n of a round HSS by AISC 360-16 F8 (for D/t < 0.45 E/F_y):
 * yielding M_p = F_y Z (F8-1); local buckling of a noncompact wall (Table B4.1b case 20:
 * 0.07 E/F_y < D/t <= 0.31 E/F_y), M_n = (0.021 E / (D/t) + F_y) S (F8-2); of a slender wall,
 * M_n = F_cr S with F_cr = 0.33 E / (D/t) (F8-3, F8-4). Lateral-torsional buckling does not apply.
 *
 * @param shape - {@link RoundHssForDesign}.
 * @param steel - E and F_y, in the shape's units.
 * @throws FlexuraError the input codes; `rule-not-covered` for D/t >= 0.45 E/F_y (outside F8's scope).
 * @example
 * ```ts
 * nominalFlexureRoundHss({ outsideDiameter: 10.75, wallThickness: 0.465, sectionModulus: 36.5, plasticModulus: 48.5 }, { elasticModulus: 29000, yieldStrength: 42 }).nominal;
 * ```
 */
export function nominalFlexureRoundHss(shape: RoundHssForDesign, steel: SteelForDesign): ChapterFlexure {
  const path = ["shape"];
  const { found, v } = readShape(shape, ROUND_KEYS, path, "round HSS");
  found.throwIfAny();
  if (!(2 * v.wallThickness < v.outsideDiameter)) fail("shape-inconsistent", [...path, "wallThickness"], `A wall of ${v.wallThickness} does not fit in a diameter of ${v.outsideDiameter}.`);
  if (!(v.sectionModulus <= v.plasticModulus)) fail("shape-inconsistent", [...path, "plasticModulus"], `The plastic modulus Z (${v.plasticModulus}) cannot be below the elastic modulus S (${v.sectionModulus}).`);
  const { elasticModulus: E, yieldStrength: Fy } = checkSteel(steel);
  const ratio = v.outsideDiameter / v.wallThickness;
  if (!(ratio < (0.45 * E) / Fy))
    fail("rule-not-covered", [...path, "wallThickness"], `D/t = ${ratio.toPrecision(4)} is not below 0.45 E/F_y = ${((0.45 * E) / Fy).toPrecision(4)}: AISC 360-16 F8 does not apply to so thin a wall.`, { ratio, limit: (0.45 * E) / Fy });
  const S = v.sectionModulus;
  const Mp = Fy * v.plasticModulus;
  const states: LimitStateStrength[] = [{ limitState: "yielding", nominal: Mp, equation: "F8-1" }];
  const cls = classOf(ratio, (0.07 * E) / Fy, (0.31 * E) / Fy);
  if (cls === "noncompact") states.push({ limitState: "local-buckling", nominal: ((0.021 * E) / ratio + Fy) * S, equation: "F8-2" });
  else if (cls === "slender") states.push({ limitState: "local-buckling", nominal: ((0.33 * E) / ratio) * S, equation: "F8-3" });
  return chapterResult("F8", Mp, states);
}
