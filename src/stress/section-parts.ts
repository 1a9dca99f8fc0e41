import { IssueCollector, attempt, requireFinite, type Result } from "../errors/index.js";
import { sectionProperties, type Section, type SectionPropertiesOptions } from "../section/index.js";
import { stressAt } from "./flexure.js";

/** The bending stress at the top and bottom of one solid part of a section. */
export interface PartStress {
  /** Index of the part in `section.parts`. */
  readonly part: number;
  /** The part's modular ratio n = E_part / E_ref. */
  readonly modularRatio: number;
  /** y of the part's top, up from the transformed centroid (length). */
  readonly yTop: number;
  /** y of the part's bottom (length). */
  readonly yBottom: number;
  /** Stress at the part's top, sigma = -n M y / I_t (force / length^2, tension positive). */
  readonly stressTop: number;
  /** Stress at the part's bottom (force / length^2, tension positive). */
  readonly stressBottom: number;
}

/** The stress at one fibre of one part. */
export interface PartFibreStress {
  /** Index of the part in `section.parts`. */
  readonly part: number;
  /** y of the fibre, up from the transformed centroid (length). */
  readonly y: number;
  /** The stress there (force / length^2, tension positive). */
  readonly stress: number;
}

/** Bending stresses in every solid part of a section. */
export interface PartStresses {
  /** Tag. */
  readonly kind: "part-stresses";
  /** One entry per solid part, in the order of `section.parts` (holes are left out). */
  readonly parts: readonly PartStress[];
  /** The most tensile stress in any part and where. */
  readonly tension: PartFibreStress;
  /** The most compressive stress in any part and where. */
  readonly compression: PartFibreStress;
}

/**
 * The bending stress in each material of a section from the section module under a moment
 * about z, by the transformed-section method: sigma = -n M y / I_t, with I_t the section's
 * transformed second moment and n each part's modular ratio. Where two materials meet, the
 * two parts' stresses at the interface differ in the ratio of their moduli: the jump.
 * Source: the transformed-section method, Gere and Goodno, Mechanics of Materials, Sec. 6.3 (from memory).
 *
 * @param moment - Bending moment about z (force x length), positive sagging.
 * @param section - The section (parts may carry materials).
 * @param options - Reference modulus (default: the first solid part's material).
 * @returns Each solid part's top and bottom stress, and the extremes over all parts.
 * @throws FlexuraError the section module's codes, `not-a-number` / `not-finite`.
 * @example
 * ```ts
 * sectionPartStresses(30e6, timberWithSteelPlate).parts[1]?.stressBottom; // stress in the steel at its bottom
 * ```
 */
export function sectionPartStresses(moment: number, section: Section, options?: SectionPropertiesOptions): PartStresses {
  const found = new IssueCollector();
  requireFinite(found, moment, ["moment"], "bending moment");
  found.throwIfAny();
  const props = sectionProperties(section, options);
  const parts: PartStress[] = [];
  props.parts.forEach((p, i) => {
    if (p.hole) return;
    const n = p.modularRatio;
    parts.push({
      part: i,
      modularRatio: n,
      yTop: p.extremes.top,
      yBottom: p.extremes.bottom,
      stressTop: n * stressAt(moment, p.extremes.top, props.secondMomentZ),
      stressBottom: n * stressAt(moment, p.extremes.bottom, props.secondMomentZ),
    });
  });
  let tension: PartFibreStress = { part: parts[0]?.part ?? 0, y: parts[0]?.yBottom ?? 0, stress: -Infinity };
  let compression: PartFibreStress = { part: parts[0]?.part ?? 0, y: parts[0]?.yTop ?? 0, stress: Infinity };
  for (const p of parts) {
    for (const [y, stress] of [
      [p.yTop, p.stressTop],
      [p.yBottom, p.stressBottom],
    ] as const) {
      if (stress > tension.stress) tension = { part: p.part, y, stress };
      if (stress < compression.stress) compression = { part: p.part, y, stress };
    }
  }
  return { kind: "part-stresses", parts, tension, compression };
}

/**
 * Non-throwing form of {@link sectionPartStresses}.
 *
 * @example
 * ```ts
 * trySectionPartStresses(Number.NaN, rectangle({ width: 1, depth: 1 })).ok; // false
 * ```
 */
export function trySectionPartStresses(moment: number, section: Section, options?: SectionPropertiesOptions): Result<PartStresses> {
  return attempt(() => sectionPartStresses(moment, section, options));
}
