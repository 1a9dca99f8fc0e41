import { IssueCollector, attempt, fail, requireFinite, type Result } from "../errors/index.js";
import type { BendingProperties } from "./types.js";
import { checkExtremes, checkFibreInside, checkSecondMoment } from "./validate.js";

/**
 * Bending (flexure) stress at one fibre of a section bent about its horizontal centroidal
 * axis: sigma = -M y / I_z (the flexure formula).
 *
 * Sign conventions: `moment` is positive when sagging (compression at the top); `y` is measured
 * up from the centroid; the result is positive in tension. So a sagging moment gives compression
 * above the centroid and tension below it.
 *
 * Source: the elementary flexure formula, e.g. Roark's Formulas for Stress and Strain, 8th ed.,
 * Sec. 8.1 (from memory); here with the sign carried for y up and sagging moment positive.
 *
 * @param moment - Bending moment M about z (force x length), positive sagging.
 * @param y - Fibre position, up from the centroid (length).
 * @param section - `secondMomentZ` (length^4, > 0) and optionally `extremes` to check the fibre lies on the section.
 * @returns Normal stress (force / length^2), tension positive.
 * @throws FlexuraError `second-moment-not-positive` (I_z <= 0), `fibre-outside-section` (y beyond the
 *   extreme fibres, when given), `not-a-number` / `not-finite` (bad numbers), `extremes-not-about-centroid`.
 * @example
 * ```ts
 * // 100 x 200 rectangle: I_z = 100 * 200^3 / 12; sagging 10 kN m = 1e7 N mm
 * bendingStress(1e7, 100, { secondMomentZ: 100 * 200 ** 3 / 12 }); // -15 (N/mm^2, compression at the top)
 * ```
 */
export function bendingStress(moment: number, y: number, section: BendingProperties): number {
  const found = new IssueCollector();
  requireFinite(found, moment, ["moment"], "bending moment");
  requireFinite(found, y, ["y"], "fibre position y");
  checkSecondMoment(found, section.secondMomentZ, ["section", "secondMomentZ"]);
  if (section.extremes !== undefined && checkExtremes(found, section.extremes, ["section", "extremes"]) && Number.isFinite(y)) {
    checkFibreInside(found, y, section.extremes.top, section.extremes.bottom, ["y"]);
  }
  found.throwIfAny();
  return stressAt(moment, y, section.secondMomentZ);
}

/**
 * Non-throwing form of {@link bendingStress}.
 *
 * @example
 * ```ts
 * const r = tryBendingStress(1e7, 100, { secondMomentZ: 0 }); // { ok: false, error } with code second-moment-not-positive
 * ```
 */
export function tryBendingStress(moment: number, y: number, section: BendingProperties): Result<number> {
  return attempt(() => bendingStress(moment, y, section));
}

/**
 * sigma = -M y / I, written so that a zero stress is +0 (never -0). When the product M y overflows but the
 * stress itself is representable, it is computed as -(M / I) y instead; a stress beyond double precision is
 * refused with `stress-overflow` (path `moment`), never returned as an infinity.
 */
export function stressAt(moment: number, y: number, secondMoment: number): number {
  let s = (-moment * y) / secondMoment;
  if (!Number.isFinite(s)) s = -(moment / secondMoment) * y;
  if (!Number.isFinite(s)) {
    fail("stress-overflow", ["moment"], `The bending stress -M y / I is beyond what double precision can hold (M = ${moment}, y = ${y}, I = ${secondMoment}); check the units of the moment and the section.`, { moment, y, secondMoment });
  }
  return s === 0 ? 0 : s;
}

/**
 * Bending stress at an extreme fibre from the elastic section modulus, the M / S form:
 * sigma_top = -M / S_top and sigma_bottom = +M / S_bottom, where S = I_z / c and c is the
 * distance from the centroid to that fibre.
 *
 * @param moment - Bending moment about z (force x length), positive sagging.
 * @param sectionModulus - Elastic section modulus to that fibre (length^3, > 0).
 * @param fibre - `"top"` or `"bottom"`.
 * @returns Normal stress at that fibre (force / length^2), tension positive.
 * @throws FlexuraError `section-modulus-not-positive`, `not-a-number` / `not-finite`.
 * @example
 * ```ts
 * bendingStressFromModulus(1e7, 100 * 200 ** 2 / 6, "bottom"); // 15 (N/mm^2, tension)
 * ```
 */
export function bendingStressFromModulus(moment: number, sectionModulus: number, fibre: "top" | "bottom"): number {
  const found = new IssueCollector();
  requireFinite(found, moment, ["moment"], "bending moment");
  if (requireFinite(found, sectionModulus, ["sectionModulus"], "section modulus") && !(sectionModulus > 0)) {
    found.add("section-modulus-not-positive", ["sectionModulus"], `The section modulus must be above zero; got ${sectionModulus}.`, { value: sectionModulus });
  }
  if (fibre !== "top" && fibre !== "bottom") {
    found.add("unknown-fibre", ["fibre"], `The fibre must be "top" or "bottom"; got ${String(fibre)}.`);
  }
  found.throwIfAny();
  const s = fibre === "top" ? -moment / sectionModulus : moment / sectionModulus;
  return s === 0 ? 0 : s;
}

/**
 * Non-throwing form of {@link bendingStressFromModulus}.
 *
 * @example
 * ```ts
 * tryBendingStressFromModulus(1e7, -1, "top").ok; // false
 * ```
 */
export function tryBendingStressFromModulus(moment: number, sectionModulus: number, fibre: "top" | "bottom"): Result<number> {
  return attempt(() => bendingStressFromModulus(moment, sectionModulus, fibre));
}
