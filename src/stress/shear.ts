import { IssueCollector, attempt, requireFinite, type Result } from "../errors/index.js";
import type { BandCut } from "./bands.js";
import { checkSecondMoment } from "./validate.js";

/** What the shear-stress formula needs from the section as a whole. */
export interface ShearProperties {
  /** (Transformed) second moment of area about the centroidal z axis (length^4, > 0). */
  readonly secondMomentZ: number;
}

/**
 * Shear stress at a horizontal cut of a section carrying a vertical shear force:
 * tau = V Q / (I b), the average over the cut's width, where Q is the first moment about the
 * centroidal axis of the area beyond the cut. The result has the sign of V.
 *
 * Source: the shear formula, Roark's Formulas for Stress and Strain, 8th ed., Sec. 8.1 (from memory).
 * It assumes the section bends about a principal axis and the stress is uniform across the width:
 * good for webs and solid sections, rough across wide, thin flanges.
 *
 * @param shear - Shear force V (force), the beam results' sign.
 * @param cut - `firstMoment` Q (length^3) and `width` b (length, > 0) at the cut.
 * @param section - `secondMomentZ` I (length^4, > 0).
 * @returns Shear stress (force / length^2).
 * @throws FlexuraError `second-moment-not-positive`, `width-not-positive`, `not-a-number` / `not-finite`.
 * @example
 * ```ts
 * // 100 x 200 rectangle at its centroid: Q = 5e5, b = 100, I = 100 * 200^3 / 12; V = 30 kN
 * shearStress(30e3, { firstMoment: 5e5, width: 100 }, { secondMomentZ: 100 * 200 ** 3 / 12 }); // 2.25 = 1.5 V / A
 * ```
 */
export function shearStress(shear: number, cut: BandCut, section: ShearProperties): number {
  const found = new IssueCollector();
  requireFinite(found, shear, ["shear"], "shear force");
  requireFinite(found, cut.firstMoment, ["cut", "firstMoment"], "first moment Q");
  if (requireFinite(found, cut.width, ["cut", "width"], "width at the cut") && !(cut.width > 0)) {
    found.add("width-not-positive", ["cut", "width"], `The width at the cut must be above zero; got ${cut.width}.`, {
      value: cut.width,
    });
  }
  checkSecondMoment(found, section.secondMomentZ, ["section", "secondMomentZ"]);
  found.throwIfAny();
  const t = (shear * cut.firstMoment) / (section.secondMomentZ * cut.width);
  return t === 0 ? 0 : t;
}

/**
 * Non-throwing form of {@link shearStress}.
 *
 * @example
 * ```ts
 * tryShearStress(1, { firstMoment: 1, width: 0 }, { secondMomentZ: 1 }).ok; // false
 * ```
 */
export function tryShearStress(shear: number, cut: BandCut, section: ShearProperties): Result<number> {
  return attempt(() => shearStress(shear, cut, section));
}

/**
 * Shear flow q = V Q / I: the longitudinal shear force per unit length that a connection (bolts,
 * nails, welds) must carry where a part joins the rest of a built-up section. Q is the first
 * moment of the part beyond the connection about the centroidal axis. Fastener spacing is then
 * the capacity of one fastener (per row) divided by q. The result has the sign of V.
 *
 * Source: Roark's Formulas for Stress and Strain, 8th ed., Sec. 8.1 (from memory).
 *
 * @param shear - Shear force V (force).
 * @param firstMoment - Q of the connected part about the centroidal axis (length^3).
 * @param section - `secondMomentZ` I (length^4, > 0).
 * @returns Shear flow (force / length).
 * @throws FlexuraError `second-moment-not-positive`, `not-a-number` / `not-finite`.
 * @example
 * ```ts
 * shearFlow(40e3, 6e5, { secondMomentZ: 2.4e8 }); // 100 (N/mm along the connection)
 * ```
 */
export function shearFlow(shear: number, firstMoment: number, section: ShearProperties): number {
  const found = new IssueCollector();
  requireFinite(found, shear, ["shear"], "shear force");
  requireFinite(found, firstMoment, ["firstMoment"], "first moment Q");
  checkSecondMoment(found, section.secondMomentZ, ["section", "secondMomentZ"]);
  found.throwIfAny();
  const q = (shear * firstMoment) / section.secondMomentZ;
  return q === 0 ? 0 : q;
}

/**
 * Non-throwing form of {@link shearFlow}.
 *
 * @example
 * ```ts
 * tryShearFlow(1, 1, { secondMomentZ: 0 }).ok; // false
 * ```
 */
export function tryShearFlow(shear: number, firstMoment: number, section: ShearProperties): Result<number> {
  return attempt(() => shearFlow(shear, firstMoment, section));
}
