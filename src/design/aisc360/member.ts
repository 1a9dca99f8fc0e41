// A steel I-beam checked for flexure and shear by AISC 360-16 along a solved member: unbraced
// segments from the supports and the brace points, C_b from the exact moment diagram, LRFD or ASD.
import { IssueCollector, attempt, fail, requireFinite, type Result } from "../../errors/index.js";
import { extremesOf } from "../../math/index.js";
import type { BeamSolution } from "../../beam/index.js";
import { nominalFlexureChecked, type NominalFlexure } from "./flexure.js";
import { momentGradient, type MomentGradient } from "./moment-gradient.js";
import { nominalShear, type NominalShear } from "./shear.js";
import { checkIShape, checkSteel, type IShapeForDesign, type SteelForDesign } from "./shape.js";

/** LRFD (design strength phi R_n against factored load effects) or ASD (R_n / Omega against service-level combinations). */
export type DesignMethod = "lrfd" | "asd";

/** Options of {@link checkSteelBeam}. */
export interface SteelBeamOptions {
  /** `"lrfd"` or `"asd"`: the solution's loads must be the matching combination (the user's responsibility). */
  readonly method: DesignMethod;
  /**
   * Positions (length, inside the member) where the compression flange is braced against lateral
   * displacement, or the section against twist, besides the supports. Supports are taken as
   * braced points; a free end of a cantilever is not.
   */
  readonly braces?: readonly number[];
}

/** The flexure check of one unbraced segment. */
export interface SteelSegmentCheck {
  /** Start of the segment (length). */
  readonly from: number;
  /** End of the segment (length). */
  readonly to: number;
  /** L_b = to - from (length). */
  readonly unbracedLength: number;
  /** C_b and the moments it came from; 1 on a segment that ends at a free end (F1 user note for cantilevers). */
  readonly momentGradient: MomentGradient;
  /** M_n and how it was reached. */
  readonly flexure: NominalFlexure;
  /** phi_b M_n (LRFD, phi_b = 0.90) or M_n / Omega_b (ASD, Omega_b = 1.67), force * length. */
  readonly available: number;
  /** The largest |M| on the segment (force * length). */
  readonly demand: number;
  /** demand / available. */
  readonly utilisation: number;
  /** utilisation <= 1. */
  readonly pass: boolean;
}

/** The shear check of the member. */
export interface SteelShearCheck {
  /** V_n and its factors. */
  readonly shear: NominalShear;
  /** phi_v V_n or V_n / Omega_v (force). */
  readonly available: number;
  /** The largest |V| on the member (force). */
  readonly demand: number;
  /** Where it acts (length). */
  readonly at: number;
  /** demand / available. */
  readonly utilisation: number;
  /** utilisation <= 1. */
  readonly pass: boolean;
}

/** The check with the highest utilisation. */
export interface SteelGoverning {
  /** `"flexure"` (a segment's flexural strength) or `"shear"`. */
  readonly check: "flexure" | "shear";
  /** Index of the governing segment (from 0, left to right) for flexure; null for shear. */
  readonly segment: number | null;
  /** Its utilisation, demand / available strength. */
  readonly utilisation: number;
}

/** A steel I-beam checked for flexure and shear by AISC 360-16. */
export interface SteelBeamCheck {
  /** Tag. */
  readonly kind: "steel-beam-check";
  /** The standard and edition applied; jurisdictions amend it. */
  readonly standard: "AISC 360-16";
  /** LRFD or ASD. */
  readonly method: DesignMethod;
  /** One flexure check per unbraced segment, left to right. */
  readonly segments: readonly SteelSegmentCheck[];
  /** The shear check (webs without transverse stiffeners). */
  readonly shear: SteelShearCheck;
  /** The highest utilisation of all, and what it is: `"flexure"` with its segment index, or `"shear"`. */
  readonly governing: SteelGoverning;
  /** Every check passes. */
  readonly pass: boolean;
}

const PHI_B = 0.9;
const OMEGA_B = 1.67;

function bracePoints(solution: BeamSolution, braces: unknown, found: IssueCollector): { points: number[]; braced: Set<number> } {
  const L = solution.length;
  const braced = new Set<number>(solution.reactions.map((r) => r.at));
  if (braces !== undefined) {
    if (!Array.isArray(braces)) found.add("not-a-list", ["options", "braces"], "The brace points must be a list of positions along the member.");
    else
      braces.forEach((b: unknown, i) => {
        if (!requireFinite(found, b, ["options", "braces", i], "brace position")) return;
        if (!(b >= 0 && b <= L)) found.add("brace-outside-member", ["options", "braces", i], `The brace at ${b} lies outside the member (0 to ${L}).`, { at: b, length: L });
        else braced.add(b);
      });
  }
  const points = [...new Set([0, L, ...braced])].sort((a, b) => a - b);
  return { points, braced };
}

/**
 * Checks a doubly symmetric steel I-beam with a compact web for major-axis flexure (AISC 360-16
 * F2 or F3, with lateral-torsional buckling over each unbraced segment and C_b from F1-1 on the
 * exact moment diagram) and shear (G2.1, no stiffeners), by LRFD or ASD. Segments run between
 * the member's ends, its supports and the given brace points; a segment reaching a free end takes
 * C_b = 1. The demand in each segment is its largest |M|, exact.
 *
 * This checks a member for a user who knows the standard; it is not a substitute for it. The
 * user confirms the edition, the jurisdiction's amendments, the bracing and the load combination
 * (factored for LRFD, service-level for ASD) given in `solution`. Elastic first-order analysis.
 *
 * @param solution - The solved member, in the same consistent units as the shape and steel.
 * @param shape - The I-shape's tabulated properties (see `IShapeForDesign`).
 * @param steel - E and F_y.
 * @param options - Method and brace points.
 * @throws FlexuraError `options-invalid` (no solved member, a bad method); from `checkIShape`, `checkSteel`; `rule-not-covered` (noncompact or slender
 *   web); `not-a-list`, `brace-outside-member`.
 * @example
 * ```ts
 * const check = checkSteelBeam(solveBeam(input), w18x50, { elasticModulus: 29000, yieldStrength: 50 }, { method: "lrfd", braces: [210] });
 * check.segments[0].flexure.governs; // "lateral-torsional-buckling"
 * ```
 */
export function checkSteelBeam(solution: BeamSolution, shape: IShapeForDesign, steel: SteelForDesign, options: SteelBeamOptions): SteelBeamCheck {
  if (typeof solution !== "object" || solution === null || !(solution.length > 0) || !Array.isArray(solution.reactions))
    fail("options-invalid", ["solution"], "Give a solved member, the result of solveBeam, in the shape's units.");
  const s = checkIShape(shape);
  const m = checkSteel(steel);
  if (typeof options !== "object" || options === null) fail("options-invalid", ["options"], 'Give the options, at least { method: "lrfd" } or { method: "asd" }.');
  const method = Object.hasOwn(options, "method") ? options.method : undefined;
  const found = new IssueCollector();
  if (method !== "lrfd" && method !== "asd") found.add("options-invalid", ["options", "method"], `The method must be "lrfd" or "asd"; got ${String(method)}.`);
  const { points, braced } = bracePoints(solution, Object.hasOwn(options, "braces") ? options.braces : undefined, found);
  found.throwIfAny();
  const lrfd = method === "lrfd";
  const segments = points.slice(1).map((to, i) => segmentCheck(solution, s, m, points[i] as number, to, braced, lrfd));
  const sh = nominalShear(s, m);
  const v = extremesOf(solution.shear);
  const vTop = Math.abs(v.max.value) >= Math.abs(v.min.value) ? v.max : v.min;
  const shearAvailable = lrfd ? sh.resistanceFactor * sh.nominal : sh.nominal / sh.safetyFactor;
  const shearCheck: SteelShearCheck = Object.freeze({
    shear: sh,
    available: shearAvailable,
    demand: Math.abs(vTop.value),
    at: vTop.at,
    utilisation: Math.abs(vTop.value) / shearAvailable,
    pass: Math.abs(vTop.value) / shearAvailable <= 1,
  });
  let governing: SteelGoverning = { check: "shear", segment: null, utilisation: shearCheck.utilisation };
  segments.forEach((g, i) => {
    if (g.utilisation > governing.utilisation) governing = { check: "flexure", segment: i, utilisation: g.utilisation };
  });
  return Object.freeze({
    kind: "steel-beam-check",
    standard: "AISC 360-16",
    method: lrfd ? "lrfd" : "asd",
    segments: Object.freeze(segments),
    shear: shearCheck,
    governing: Object.freeze(governing),
    pass: shearCheck.pass && segments.every((g) => g.pass),
  });
}

function segmentCheck(solution: BeamSolution, shape: IShapeForDesign, steel: SteelForDesign, from: number, to: number, braced: ReadonlySet<number>, lrfd: boolean): SteelSegmentCheck {
  const gradient = momentGradient(solution.moment, from, to);
  const freeEnd = !braced.has(from) || !braced.has(to);
  const cb = freeEnd ? Object.freeze({ ...gradient, factor: 1 }) : gradient;
  const flexure = nominalFlexureChecked(shape, steel, to - from, cb.factor);
  const available = lrfd ? PHI_B * flexure.nominal : flexure.nominal / OMEGA_B;
  const utilisation = gradient.largest / available;
  return Object.freeze({ from, to, unbracedLength: to - from, momentGradient: cb, flexure, available, demand: gradient.largest, utilisation, pass: utilisation <= 1 });
}

/** Non-throwing form of {@link checkSteelBeam}. */
export function tryCheckSteelBeam(solution: BeamSolution, shape: IShapeForDesign, steel: SteelForDesign, options: SteelBeamOptions): Result<SteelBeamCheck> {
  return attempt(() => checkSteelBeam(solution, shape, steel, options));
}
