import type { IssueCollector} from "../errors/index.js";
import { requireFinite, type IssuePath } from "../errors/index.js";
import { sectionProperties, type Section, type SectionPropertiesOptions } from "../section/index.js";
import { tryExtremeBendingStresses, tryPeakShearStress, trySectionPeakShearStress, type BendingPropertiesWithExtremes, type DepthBand } from "../stress/index.js";

/** A section as the member checks need it. */
export interface MemberSection {
  /**
   * I_z (length^4, > 0; transformed for several materials) and the extreme fibres `{ top, bottom }`
   * about the centroid (length). The section module's properties object fits.
   */
  readonly properties: BendingPropertiesWithExtremes;
  /**
   * The section for the shear stress, needed when a shear limit is given: a section from the
   * section module, or depth bands about its centroid.
   */
  readonly shear?: readonly DepthBand[] | Section;
  /** Reference modulus for a multi-material `shear` section (as in `sectionProperties`). */
  readonly referenceModulus?: number;
}

/**
 * A {@link MemberSection} from a section of the section module: its properties (transformed
 * for several materials) and the section itself for the shear stress.
 *
 * @param section - The section.
 * @param options - Reference modulus for a multi-material section.
 * @returns What the member checks need.
 * @throws FlexuraError the section module's codes.
 * @example
 * ```ts
 * checkMember(solution, memberSection(rectangle({ width: 200, depth: 400 })), { bendingStress: 20 });
 * ```
 */
export function memberSection(section: Section, options?: SectionPropertiesOptions): MemberSection {
  const properties = sectionProperties(section, options);
  return options?.referenceModulus === undefined ? { properties, shear: section } : { properties, shear: section, referenceModulus: options.referenceModulus };
}

/** A section over one stretch of a stepped member. */
export interface SectionStretch extends MemberSection {
  /** Start of the stretch (length). */
  readonly from: number;
  /** End of the stretch (length). */
  readonly to: number;
}

/** One section for the whole member, or stretches that tile it from 0 to its length in order. */
export type MemberSections = MemberSection | readonly SectionStretch[];

/** A stretch with its section reduced to numbers. */
export interface ResolvedStretch {
  readonly from: number;
  readonly to: number;
  readonly inertia: number;
  readonly top: number;
  readonly bottom: number;
  /** Peak shear stress per unit shear force and its height, or null when no bands were given. */
  readonly unitShear: { readonly stress: number; readonly y: number } | null;
}

/** Validates the sections against a member of `length` and reduces them to numbers. */
export function resolveSections(found: IssueCollector, sections: MemberSections, length: number, path: IssuePath): ResolvedStretch[] {
  const list: readonly SectionStretch[] = Array.isArray(sections)
    ? (sections as readonly SectionStretch[])
    : [{ ...(sections as MemberSection), from: 0, to: length }];
  if (list.length === 0) found.add("no-sections", path, "Give the member's section, or a list of stretches that covers it.");
  const tolerance = 1e-9 * length;
  const out: ResolvedStretch[] = [];
  list.forEach((s, i) => {
    const p = Array.isArray(sections) ? [...path, i] : path;
    const fromOk = requireFinite(found, s.from, [...p, "from"], "stretch start");
    const toOk = requireFinite(found, s.to, [...p, "to"], "stretch end");
    if (fromOk && toOk) {
      const expected = i === 0 ? 0 : (list[i - 1]?.to ?? 0);
      if (Math.abs(s.from - expected) > tolerance || !(s.to > s.from) || (i === list.length - 1 && Math.abs(s.to - length) > tolerance)) {
        found.add(
          "stretches-not-tiling",
          p,
          `Stretches must tile x = 0 to ${length} in order; stretch ${i} runs from ${s.from} to ${s.to}.`,
          { from: s.from, to: s.to, length },
        );
      }
    }
    const props = tryExtremeBendingStresses(0, s.properties);
    if (!props.ok) {
      found.addAll(props.error.issues.filter((x) => x.path[0] === "section").map((x) => ({ ...x, path: x.path.slice(1) })), [...p, "properties"]);
      return;
    }
    let unitShear: ResolvedStretch["unitShear"] = null;
    if (s.shear !== undefined) {
      const inertia = { secondMomentZ: s.properties.secondMomentZ };
      const peak = Array.isArray(s.shear)
        ? tryPeakShearStress(1, s.shear as readonly DepthBand[], inertia)
        : trySectionPeakShearStress(1, s.shear as Section, s.referenceModulus === undefined ? undefined : { referenceModulus: s.referenceModulus });
      if (!peak.ok) {
        found.addAll(peak.error.issues.map((x) => ({ ...x, path: x.path[0] === "bands" ? x.path.slice(1) : x.path })), [...p, "shear"]);
        return;
      }
      unitShear = { stress: Math.abs(peak.value.stress), y: peak.value.y };
    }
    out.push({ from: s.from, to: s.to, inertia: s.properties.secondMomentZ, top: s.properties.extremes.top, bottom: s.properties.extremes.bottom, unitShear });
  });
  return out;
}
