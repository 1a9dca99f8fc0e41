import { IssueCollector, attempt, requireFinite, type Result } from "../errors/index.js";
import { stressAt } from "./flexure.js";
import type { BendingPropertiesWithExtremes } from "./types.js";
import { checkExtremes, checkFibreInside, checkModularRatio, checkOrder, checkSecondMoment } from "./validate.js";

/** A band of one material over part of the depth, for a stress profile. */
export interface StressLayer {
  /** y of the band's bottom, up from the (transformed) centroid (length). */
  readonly yBottom: number;
  /** y of the band's top (length, >= yBottom). */
  readonly yTop: number;
  /** n = E of the band's material / E of the reference material (> 0); 1 when omitted. */
  readonly modularRatio?: number;
  /** A name to carry through to the result (the material, say). */
  readonly label?: string;
}

/** Options of {@link bendingStressProfile}. */
export interface BendingStressProfileOptions {
  /**
   * Material bands over the depth, for a multi-material section (the section's I_z is then the
   * transformed one). Omitted: one band of the reference material from the bottom to the top fibre.
   */
  readonly layers?: readonly StressLayer[];
}

/** The bending stress along one band of the depth: linear from bottom to top. */
export interface StressProfileSegment {
  /** y of the band's bottom (length). */
  readonly yBottom: number;
  /** y of the band's top (length). */
  readonly yTop: number;
  /** The band's modular ratio. */
  readonly modularRatio: number;
  /** The band's label, when one was given. */
  readonly label?: string;
  /** Stress at the band's bottom (force / length^2), tension positive. */
  readonly stressBottom: number;
  /** Stress at the band's top (force / length^2), tension positive. */
  readonly stressTop: number;
}

/** The bending stress over the depth of a section, for plotting. */
export interface BendingStressProfile {
  /** Tag. */
  readonly kind: "bending-stress-profile";
  /** The bands in the order given (one band for a single-material section); lines join each band's ends. */
  readonly segments: readonly StressProfileSegment[];
}

/**
 * The bending stress over the depth of a section: exact, since sigma = -n M y / I_z is linear in y
 * within each material, so each band is a straight line from its bottom to its top. Where
 * materials meet, the adjacent bands' end values differ: the jump at the interface.
 *
 * @param moment - Bending moment about z (force x length), positive sagging.
 * @param section - `secondMomentZ` (transformed, for several materials; length^4, > 0) and `extremes`.
 * @param options - Material bands; see {@link BendingStressProfileOptions}.
 * @returns One straight segment per band (force / length^2, tension positive).
 * @throws FlexuraError `second-moment-not-positive`, `extremes-missing`, `extremes-not-about-centroid`,
 *   `layer-upside-down`, `fibre-outside-section`, `modular-ratio-not-positive`, `not-a-number` / `not-finite`.
 * @example
 * ```ts
 * bendingStressProfile(1e7, { secondMomentZ: 1e8, extremes: { top: 100, bottom: -100 } }).segments[0];
 * // { yBottom: -100, yTop: 100, modularRatio: 1, stressBottom: 10, stressTop: -10 }
 * ```
 */
export function bendingStressProfile(
  moment: number,
  section: BendingPropertiesWithExtremes,
  options?: BendingStressProfileOptions,
): BendingStressProfile {
  const found = new IssueCollector();
  requireFinite(found, moment, ["moment"], "bending moment");
  checkSecondMoment(found, section.secondMomentZ, ["section", "secondMomentZ"]);
  const extremesOk = checkExtremes(found, section.extremes, ["section", "extremes"]);
  const layers: readonly StressLayer[] = options?.layers ?? (extremesOk ? [{ yBottom: section.extremes.bottom, yTop: section.extremes.top }] : []);
  layers.forEach((layer, i) => {
    const path = ["options", "layers", i];
    const b = requireFinite(found, layer.yBottom, [...path, "yBottom"], "band's bottom y");
    const t = requireFinite(found, layer.yTop, [...path, "yTop"], "band's top y");
    if (layer.modularRatio !== undefined) checkModularRatio(found, layer.modularRatio, [...path, "modularRatio"]);
    if (b && t) checkOrder(found, layer.yBottom, layer.yTop, path);
    if (extremesOk && b) checkFibreInside(found, layer.yBottom, section.extremes.top, section.extremes.bottom, [...path, "yBottom"]);
    if (extremesOk && t) checkFibreInside(found, layer.yTop, section.extremes.top, section.extremes.bottom, [...path, "yTop"]);
  });
  found.throwIfAny();
  const segments = layers.map((layer): StressProfileSegment => {
    const n = layer.modularRatio ?? 1;
    const base = {
      yBottom: layer.yBottom,
      yTop: layer.yTop,
      modularRatio: n,
      stressBottom: n * stressAt(moment, layer.yBottom, section.secondMomentZ),
      stressTop: n * stressAt(moment, layer.yTop, section.secondMomentZ),
    };
    return layer.label === undefined ? base : { ...base, label: layer.label };
  });
  return { kind: "bending-stress-profile", segments };
}

/**
 * Non-throwing form of {@link bendingStressProfile}.
 *
 * @example
 * ```ts
 * tryBendingStressProfile(1, { secondMomentZ: 1, extremes: { top: 1, bottom: -1 } }, { layers: [{ yBottom: 1, yTop: 0 }] }).ok; // false
 * ```
 */
export function tryBendingStressProfile(
  moment: number,
  section: BendingPropertiesWithExtremes,
  options?: BendingStressProfileOptions,
): Result<BendingStressProfile> {
  return attempt(() => bendingStressProfile(moment, section, options));
}
