// The doubly symmetric I-section and the steel a check by EN 1993-1-1:2005 reads, in N and mm (or
// any consistent set), checked once and frozen.
import { IssueCollector, fail, type IssuePath } from "../../errors/index.js";
import { readPositive, readRecord, refuseUnknownKeys } from "../read.js";

/**
 * A doubly symmetric I-section bent about its major axis (y-y), described by the properties that
 * EN 1993-1-1:2005 clauses 5.5, 6.2 and 6.3.2 use, in one consistent unit set (say mm). Take them
 * from the section table (EN 10365 lists the dimensions of rolled sections) or compute them for a
 * welded girder; flexura does not guess any of them.
 */
export interface IShapeForEurocode {
  /** `true` for a rolled section, `false` for a welded one: it selects the shear area of 6.2.6(3) and the buckling curves of Tables 6.4 and 6.5. */
  readonly rolled: boolean;
  /** Overall depth h (length). */
  readonly depth: number;
  /** Flange width b (length). */
  readonly flangeWidth: number;
  /** Flange thickness t_f (length). */
  readonly flangeThickness: number;
  /** Web thickness t_w (length). */
  readonly webThickness: number;
  /** Root radius r of a rolled section, or the weld leg of a welded one (length; 0 allowed). */
  readonly rootRadius: number;
  /** Cross-section area A (length^2). */
  readonly area: number;
  /** Elastic section modulus W_el,y (length^3). */
  readonly elasticModulus: number;
  /** Plastic section modulus W_pl,y (length^3). */
  readonly plasticModulus: number;
  /** Second moment of area about the minor axis I_z (length^4). */
  readonly minorMomentOfInertia: number;
  /** St Venant torsion constant I_t (length^4). */
  readonly torsionConstant: number;
  /** Warping constant I_w (length^6). */
  readonly warpingConstant: number;
}

/** The steel: moduli and yield strength in one stress unit (force / length^2). */
export interface SteelForEurocode {
  /** Modulus of elasticity E (3.2.6: 210,000 N/mm^2), force / length^2. */
  readonly elasticModulus: number;
  /** Shear modulus G (3.2.6: about 81,000 N/mm^2), force / length^2. */
  readonly shearModulus: number;
  /** Yield strength f_y for the flange and web thickness (Table 3.1 or the product standard), force / length^2. */
  readonly yieldStrength: number;
}

const SHAPE_KEYS = [
  "rolled",
  "depth",
  "flangeWidth",
  "flangeThickness",
  "webThickness",
  "rootRadius",
  "area",
  "elasticModulus",
  "plasticModulus",
  "minorMomentOfInertia",
  "torsionConstant",
  "warpingConstant",
] as const;
const STEEL_KEYS = ["elasticModulus", "shearModulus", "yieldStrength"] as const;

const NAMES: Readonly<Record<(typeof SHAPE_KEYS)[number], string>> = {
  rolled: "",
  depth: "depth h",
  flangeWidth: "flange width b",
  flangeThickness: "flange thickness t_f",
  webThickness: "web thickness t_w",
  rootRadius: "root radius r",
  area: "area A",
  elasticModulus: "elastic section modulus W_el,y",
  plasticModulus: "plastic section modulus W_pl,y",
  minorMomentOfInertia: "minor-axis second moment of area I_z",
  torsionConstant: "torsion constant I_t",
  warpingConstant: "warping constant I_w",
};

/**
 * Checks an I-section for EN 1993-1-1: every property present, finite and positive (the root
 * radius may be 0), no unknown key, and the dimensions consistent. Returns a frozen copy.
 *
 * @throws FlexuraError `not-an-object`, `missing-field`, `unknown-field`, `not-a-number`, `not-finite`,
 *   `value-not-positive`, `shape-inconsistent`, all collected.
 */
export function checkEurocodeIShape(value: unknown, path: IssuePath = ["shape"]): IShapeForEurocode {
  const obj = readRecord(value, path, "I-section");
  const found = new IssueCollector();
  refuseUnknownKeys(found, obj, SHAPE_KEYS, path, "I-section");
  const rolled = Object.hasOwn(obj, "rolled") ? obj["rolled"] : undefined;
  if (typeof rolled !== "boolean") found.add("missing-field", [...path, "rolled"], "Say whether the section is rolled (true) or welded (false): it selects the shear area and the buckling curve.", { field: "rolled" });
  const v: Record<string, number> = {};
  for (const key of SHAPE_KEYS) if (key !== "rolled") v[key] = readPositive(found, obj, key, path, NAMES[key], key === "rootRadius");
  found.throwIfAny();
  const s = v as unknown as Omit<IShapeForEurocode, "rolled">;
  if (!(s.depth - 2 * s.flangeThickness - 2 * s.rootRadius > 0))
    found.add("shape-inconsistent", [...path, "depth"], `Two flanges of ${s.flangeThickness} and root radii of ${s.rootRadius} leave no straight web in a depth of ${s.depth}.`);
  if (!(s.flangeWidth - s.webThickness - 2 * s.rootRadius > 0))
    found.add("shape-inconsistent", [...path, "flangeWidth"], `A web of ${s.webThickness} and root radii of ${s.rootRadius} leave no flange outstand in a width of ${s.flangeWidth}.`);
  if (!(s.elasticModulus <= s.plasticModulus))
    found.add("shape-inconsistent", [...path, "plasticModulus"], `W_pl,y (${s.plasticModulus}) cannot be below W_el,y (${s.elasticModulus}).`);
  found.throwIfAny();
  return Object.freeze({ rolled: rolled as boolean, ...s });
}

/**
 * Checks the steel for EN 1993-1-1: E, G and f_y present, finite, positive, f_y below G below E.
 *
 * @throws FlexuraError `not-an-object`, `missing-field`, `unknown-field`, `not-a-number`, `not-finite`,
 *   `value-not-positive`, `steel-inconsistent`.
 */
export function checkEurocodeSteel(value: unknown, path: IssuePath = ["steel"]): SteelForEurocode {
  const obj = readRecord(value, path, "steel");
  const found = new IssueCollector();
  refuseUnknownKeys(found, obj, STEEL_KEYS, path, "steel");
  const elasticModulus = readPositive(found, obj, "elasticModulus", path, "modulus of elasticity E");
  const shearModulus = readPositive(found, obj, "shearModulus", path, "shear modulus G");
  const yieldStrength = readPositive(found, obj, "yieldStrength", path, "yield strength f_y");
  found.throwIfAny();
  if (!(yieldStrength < shearModulus && shearModulus < elasticModulus))
    fail("steel-inconsistent", path, `Expected f_y < G < E; got f_y = ${yieldStrength}, G = ${shearModulus}, E = ${elasticModulus}: are they in the same unit?`);
  return Object.freeze({ elasticModulus, shearModulus, yieldStrength });
}
