// The doubly symmetric I-shape and the steel a member check by AISC 360-16 reads: the tabulated
// properties an engineer takes from a rolled-shape table (or computes for a welded girder), in
// any one consistent unit set, checked once and frozen.
import { IssueCollector, fail, type IssuePath } from "../../errors/index.js";
import { readPositive, readRecord, refuseUnknownKeys } from "../read.js";

/**
 * A doubly symmetric I-shape (or, with `form: "channel"`, a rolled channel) bent about its major
 * axis, described by the properties that AISC 360-16 Chapters F and G use. Every length in one unit (say in or mm), every property in
 * powers of it. Take them from the shape table that lists the section, or compute them for a
 * welded girder; flexura does not guess any of them.
 */
export interface IShapeForDesign {
  /**
   * `"i-shape"` (the default) for a doubly symmetric I; `"channel"` for a rolled channel bent about
   * its major axis (F2 with c = (h_0 / 2) sqrt(I_y / C_w), F2-8b; flange b = b_f in Table B4.1b; shear by
   * G2.1(b)). Loads must pass through the channel's shear centre, or be restrained against twist.
   */
  readonly form?: "i-shape" | "channel";
  /** `true` for a hot-rolled shape, `false` for a welded (built-up) one: it selects Table B4.1b case 10 or 11 and G2.1(a). */
  readonly rolled: boolean;
  /** Overall depth d (length). */
  readonly depth: number;
  /** Flange width b_f (length). */
  readonly flangeWidth: number;
  /** Flange thickness t_f (length). */
  readonly flangeThickness: number;
  /** Web thickness t_w (length). */
  readonly webThickness: number;
  /**
   * Web height h (length) as AISC 360-16 B4.1b defines it: for rolled shapes the clear distance
   * between flanges less the fillets at each flange, for welded shapes the clear distance between flanges.
   */
  readonly webHeight: number;
  /** Elastic section modulus about the major axis S_x (length^3). */
  readonly sectionModulus: number;
  /** Plastic section modulus about the major axis Z_x (length^3). */
  readonly plasticModulus: number;
  /** Second moment of area about the minor axis I_y (length^4). */
  readonly minorMomentOfInertia: number;
  /** Radius of gyration about the minor axis r_y (length). */
  readonly minorRadiusOfGyration: number;
  /** St Venant torsion constant J (length^4). */
  readonly torsionConstant: number;
  /** Warping constant C_w (length^6). */
  readonly warpingConstant: number;
}

/** The steel: modulus of elasticity and specified minimum yield stress, in one stress unit (force / length^2). */
export interface SteelForDesign {
  /** Modulus of elasticity E (force / length^2), for example 29,000 ksi or 200,000 MPa. */
  readonly elasticModulus: number;
  /** Specified minimum yield stress F_y (force / length^2): the grade's value, never a default. */
  readonly yieldStrength: number;
}

const SHAPE_KEYS = [
  "form",
  "rolled",
  "depth",
  "flangeWidth",
  "flangeThickness",
  "webThickness",
  "webHeight",
  "sectionModulus",
  "plasticModulus",
  "minorMomentOfInertia",
  "minorRadiusOfGyration",
  "torsionConstant",
  "warpingConstant",
] as const;
const STEEL_KEYS = ["elasticModulus", "yieldStrength"] as const;

/**
 * Checks an I-shape's properties: every one present, finite and positive, no unknown key, and
 * the dimensions consistent (flanges thinner than half the depth, web height within the depth,
 * web thinner than the flange). Returns a frozen copy.
 *
 * @throws FlexuraError `not-an-object`, `missing-field`, `unknown-field`, `not-a-number`,
 *   `not-finite`, `value-not-positive`, `shape-inconsistent`, all collected.
 */
export function checkIShape(value: unknown, path: IssuePath = ["shape"]): IShapeForDesign {
  const obj = readRecord(value, path, "I-shape");
  const found = new IssueCollector();
  refuseUnknownKeys(found, obj, SHAPE_KEYS, path, "I-shape");
  const rolled = Object.hasOwn(obj, "rolled") ? obj["rolled"] : undefined;
  if (typeof rolled !== "boolean")
    found.add("missing-field", [...path, "rolled"], "Say whether the shape is rolled (true) or welded (false): it selects the flange limit of AISC 360-16 Table B4.1b and the shear rule G2.1(a).", { field: "rolled" });
  const form = Object.hasOwn(obj, "form") ? obj["form"] : "i-shape";
  if (form !== "i-shape" && form !== "channel")
    found.add("options-invalid", [...path, "form"], `The form must be "i-shape" or "channel"; got ${String(form)}.`);
  else if (form === "channel" && rolled === false)
    found.add("rule-not-covered", [...path, "rolled"], "AISC 360-16 F2 covers rolled channels; the flange limits of Table B4.1b for welded channels are not implemented in flexura.");
  const names: Record<(typeof SHAPE_KEYS)[number], string> = {
    form: "",
    rolled: "",
    depth: "depth d",
    flangeWidth: "flange width b_f",
    flangeThickness: "flange thickness t_f",
    webThickness: "web thickness t_w",
    webHeight: "web height h",
    sectionModulus: "elastic section modulus S_x",
    plasticModulus: "plastic section modulus Z_x",
    minorMomentOfInertia: "minor-axis second moment of area I_y",
    minorRadiusOfGyration: "minor-axis radius of gyration r_y",
    torsionConstant: "torsion constant J",
    warpingConstant: "warping constant C_w",
  };
  const v = {} as Record<string, number>;
  for (const key of SHAPE_KEYS) if (key !== "rolled" && key !== "form") v[key] = readPositive(found, obj, key, path, names[key]);
  found.throwIfAny();
  const s = v as unknown as Omit<IShapeForDesign, "rolled" | "form">;
  if (!(2 * s.flangeThickness < s.depth))
    found.add("shape-inconsistent", [...path, "flangeThickness"], `Two flanges of ${s.flangeThickness} do not fit in a depth of ${s.depth}.`);
  if (!(s.webHeight <= s.depth - 2 * s.flangeThickness))
    found.add("shape-inconsistent", [...path, "webHeight"], `The web height ${s.webHeight} exceeds the clear distance between the flanges, ${s.depth - 2 * s.flangeThickness}.`);
  if (!(s.webThickness < s.flangeWidth))
    found.add("shape-inconsistent", [...path, "webThickness"], `The web (${s.webThickness}) must be thinner than the flange is wide (${s.flangeWidth}).`);
  if (!(s.sectionModulus <= s.plasticModulus))
    found.add("shape-inconsistent", [...path, "plasticModulus"], `The plastic modulus Z_x (${s.plasticModulus}) cannot be below the elastic modulus S_x (${s.sectionModulus}).`);
  found.throwIfAny();
  return Object.freeze({ form: form as "i-shape" | "channel", rolled: rolled as boolean, ...s });
}

/**
 * Checks the steel: E and F_y present, finite and positive, F_y below E, no unknown key.
 *
 * @throws FlexuraError `not-an-object`, `missing-field`, `unknown-field`, `not-a-number`, `not-finite`,
 *   `value-not-positive`, `steel-inconsistent`.
 */
export function checkSteel(value: unknown, path: IssuePath = ["steel"]): SteelForDesign {
  const obj = readRecord(value, path, "steel");
  const found = new IssueCollector();
  refuseUnknownKeys(found, obj, STEEL_KEYS, path, "steel");
  const elasticModulus = readPositive(found, obj, "elasticModulus", path, "modulus of elasticity E");
  const yieldStrength = readPositive(found, obj, "yieldStrength", path, "yield stress F_y");
  found.throwIfAny();
  if (!(yieldStrength < elasticModulus))
    fail("steel-inconsistent", [...path, "yieldStrength"], `The yield stress ${yieldStrength} is not below the modulus ${elasticModulus}: are they in the same unit?`);
  return Object.freeze({ elasticModulus, yieldStrength });
}
