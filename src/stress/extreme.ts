import { IssueCollector, attempt, requireFinite, type Result } from "../errors/index.js";
import { stressAt } from "./flexure.js";
import type { BendingPropertiesWithExtremes, FibreStress } from "./types.js";
import { checkExtremes, checkSecondMoment } from "./validate.js";

/** The bending stresses at both extreme fibres, and which of them is in tension. */
export interface ExtremeBendingStresses {
  /** Tag. */
  readonly kind: "extreme-bending-stresses";
  /** Stress at the top fibre. */
  readonly top: FibreStress;
  /** Stress at the bottom fibre. */
  readonly bottom: FibreStress;
  /**
   * The fibre with the greatest (most tensile) stress, >= 0: the bottom under a sagging moment,
   * the top under a hogging (negative) moment. For a zero moment, the bottom with zero stress.
   */
  readonly tension: FibreStress;
  /** The fibre with the least (most compressive) stress, <= 0: the other fibre. */
  readonly compression: FibreStress;
}

/**
 * Bending stress at the top and bottom fibres of a section under a moment about z, and which
 * is in tension and which in compression. For an unsymmetric section (a T, say) the two
 * fibres lie at different distances from the centroid, so the two stresses differ in size;
 * a negative (hogging) moment swaps tension and compression between the fibres.
 *
 * sigma = -M y / I_z at y = extremes.top and y = extremes.bottom (tension positive, M positive sagging).
 *
 * @param moment - Bending moment about z (force x length), positive sagging.
 * @param section - `secondMomentZ` (length^4, > 0) and `extremes` { top >= 0, bottom <= 0 } about the centroid (length).
 * @returns Both fibre stresses (force / length^2) with the tensile and compressive one named.
 * @throws FlexuraError `second-moment-not-positive`, `extremes-missing`, `extremes-not-about-centroid`,
 *   `not-a-number` / `not-finite`.
 * @example
 * ```ts
 * const s = extremeBendingStresses(-5e6, { secondMomentZ: 2e7, extremes: { top: 40, bottom: -80 } });
 * s.tension;     // { fibre: "top", y: 40, stress: 10 }
 * s.compression; // { fibre: "bottom", y: -80, stress: -20 }
 * ```
 */
export function extremeBendingStresses(moment: number, section: BendingPropertiesWithExtremes): ExtremeBendingStresses {
  const found = new IssueCollector();
  requireFinite(found, moment, ["moment"], "bending moment");
  checkSecondMoment(found, section.secondMomentZ, ["section", "secondMomentZ"]);
  checkExtremes(found, section.extremes, ["section", "extremes"]);
  found.throwIfAny();
  const { top: yTop, bottom: yBottom } = section.extremes;
  const top: FibreStress = { fibre: "top", y: yTop, stress: stressAt(moment, yTop, section.secondMomentZ) };
  const bottom: FibreStress = { fibre: "bottom", y: yBottom, stress: stressAt(moment, yBottom, section.secondMomentZ) };
  const topTension = top.stress > bottom.stress;
  return {
    kind: "extreme-bending-stresses",
    top,
    bottom,
    tension: topTension ? top : bottom,
    compression: topTension ? bottom : top,
  };
}

/**
 * Non-throwing form of {@link extremeBendingStresses}.
 *
 * @example
 * ```ts
 * tryExtremeBendingStresses(1, { secondMomentZ: 1, extremes: { top: -1, bottom: 1 } }).ok; // false
 * ```
 */
export function tryExtremeBendingStresses(moment: number, section: BendingPropertiesWithExtremes): Result<ExtremeBendingStresses> {
  return attempt(() => extremeBendingStresses(moment, section));
}
