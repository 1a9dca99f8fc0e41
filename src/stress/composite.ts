import { IssueCollector, attempt, requireFinite, type Result } from "../errors/index.js";
import { stressAt } from "./flexure.js";
import type { BendingProperties } from "./types.js";
import { checkExtremes, checkFibreInside, checkModularRatio, checkSecondMoment } from "./validate.js";

/**
 * Bending stress in one material of a multi-material section, by the transformed-section method:
 * sigma = -n M y / I_t, where I_t is the second moment of the section transformed to the
 * reference material (each part's width scaled by its modular ratio n = E_part / E_ref), y is
 * measured up from the transformed section's centroid, and n is the modular ratio of the
 * material at that fibre. At an interface between materials the stress jumps in the ratio of
 * their moduli while the strain is continuous.
 *
 * Source: the transformed-section method for composite beams, e.g. Gere and Goodno, Mechanics of
 * Materials, Sec. 6.3 (from memory); Roark's Formulas for Stress and Strain, 8th ed., Sec. 8.1 (from memory).
 *
 * @param moment - Bending moment about z (force x length), positive sagging.
 * @param y - Fibre position, up from the transformed centroid (length).
 * @param modularRatio - n = E of the material at the fibre / E of the reference material (> 0).
 * @param section - Transformed `secondMomentZ` I_t in reference-material units (length^4, > 0);
 *   optionally `extremes` to check the fibre lies on the section.
 * @returns Normal stress in that material (force / length^2), tension positive.
 * @throws FlexuraError `second-moment-not-positive`, `modular-ratio-not-positive`, `fibre-outside-section`,
 *   `not-a-number` / `not-finite`.
 * @example
 * ```ts
 * // steel (n = 20) at 80 below the transformed centroid, I_t = 4e8, sagging 2e7
 * materialBendingStress(2e7, -80, 20, { secondMomentZ: 4e8 }); // 80 (tension)
 * ```
 */
export function materialBendingStress(moment: number, y: number, modularRatio: number, section: BendingProperties): number {
  const found = new IssueCollector();
  requireFinite(found, moment, ["moment"], "bending moment");
  requireFinite(found, y, ["y"], "fibre position y");
  checkModularRatio(found, modularRatio, ["modularRatio"]);
  checkSecondMoment(found, section.secondMomentZ, ["section", "secondMomentZ"]);
  if (section.extremes !== undefined && checkExtremes(found, section.extremes, ["section", "extremes"]) && Number.isFinite(y)) {
    checkFibreInside(found, y, section.extremes.top, section.extremes.bottom, ["y"]);
  }
  found.throwIfAny();
  return modularRatio * stressAt(moment, y, section.secondMomentZ);
}

/**
 * Non-throwing form of {@link materialBendingStress}.
 *
 * @example
 * ```ts
 * tryMaterialBendingStress(1, 0, 0, { secondMomentZ: 1 }).ok; // false (modular ratio 0)
 * ```
 */
export function tryMaterialBendingStress(moment: number, y: number, modularRatio: number, section: BendingProperties): Result<number> {
  return attempt(() => materialBendingStress(moment, y, modularRatio, section));
}
