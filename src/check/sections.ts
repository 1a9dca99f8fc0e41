import { requireFinite, type IssueCollector, type IssuePath } from "../errors/index.js";
import { sectionProperties, type Section, type SectionPropertiesOptions } from "../section/index.js";
import { tryExtremeBendingStresses, tryPeakShearStress, trySectionPeakShearStress, type BendingPropertiesWithExtremes, type DepthBand, type FibreExtremes } from "../stress/index.js";

/** One part of a multi-material section, for the stress in each material. */
export interface MemberSectionPart {
  /** n = E of the part / E of the reference material (> 0). */
  readonly modularRatio: number;
  /** True for a hole (left out). */
  readonly hole: boolean;
  /** The part's top and bottom y about the (transformed) centroid (length). */
  readonly extremes: FibreExtremes;
}

/** The properties the member checks read; the section module's properties object fits. */
export interface MemberSectionProperties extends BendingPropertiesWithExtremes {
  /**
   * The parts, for a multi-material section: stresses are then found in each part as
   * sigma = -n M y / I_z at its top and bottom, and the peaks are those of any part.
   */
  readonly parts?: readonly MemberSectionPart[];
}

/** A section as the member checks need it. */
export interface MemberSection {
  /**
   * I_z (length^4, > 0; transformed for several materials), the extreme fibres `{ top, bottom }`
   * about the centroid (length) and optionally the parts. The section module's properties object fits.
   */
  readonly properties: MemberSectionProperties;
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

/** One material's peak shear stress per unit shear force (a magnitude), with each of its parts'. */
export interface UnitMaterialShear {
  readonly modularRatio: number;
  readonly parts: readonly number[];
  readonly stress: number;
  readonly y: number;
  readonly byPart: readonly { readonly part: number; readonly stress: number; readonly y: number }[];
}

/** A stretch with its section reduced to numbers. */
export interface ResolvedStretch {
  readonly from: number;
  readonly to: number;
  readonly inertia: number;
  readonly top: number;
  readonly bottom: number;
  /**
   * Peak shear stress per unit shear force and its height, or null when no bands were given; for
   * a section of several materials the largest of the materials' own, with each material's and
   * each solid part's peak.
   */
  readonly unitShear: { readonly stress: number; readonly y: number; readonly materials: readonly UnitMaterialShear[] | null } | null;
  /** Fibres to check: [part index (-1 for the whole section), n, y, which]. */
  readonly fibres: readonly (readonly [number, number, number, "top" | "bottom"])[];
}

/**
 * Validates the sections against a member of `length` and reduces them to numbers. A section
 * in separate pieces has no shear stress (`unitShear` null) unless `needShear`, when that is
 * an error (`section-not-connected`).
 */
export function resolveSections(found: IssueCollector, sections: MemberSections, length: number, path: IssuePath, needShear = false): ResolvedStretch[] {
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
      if (!peak.ok && (needShear || !peak.error.issues.every((x) => x.code === "section-not-connected"))) {
        found.addAll(peak.error.issues.map((x) => ({ ...x, path: x.path[0] === "bands" ? x.path.slice(1) : x.path })), [...p, "shear"]);
        return;
      }
      // a section in separate pieces, for bending only: no shear stress (unitShear stays null)
      if (peak.ok) {
        const materials = peak.value.materials?.map((m): UnitMaterialShear => ({
          modularRatio: m.modularRatio,
          parts: m.parts,
          stress: Math.abs(m.stress),
          y: m.y,
          byPart: (m.byPart ?? []).map((b) => ({ part: b.part, stress: Math.abs(b.stress), y: b.y })),
        }));
        if (materials === undefined || materials.length === 0) unitShear = { stress: Math.abs(peak.value.stress), y: peak.value.y, materials: null };
        else {
          // the largest of the materials' own stresses, not the transformed section's (in the reference material)
          const top = materials.reduce((a, b) => (b.stress > a.stress ? b : a));
          unitShear = { stress: top.stress, y: top.y, materials };
        }
      }
    }
    const fibres: [number, number, number, "top" | "bottom"][] = [];
    const parts = s.properties.parts;
    if (parts === undefined) fibres.push([-1, 1, s.properties.extremes.top, "top"], [-1, 1, s.properties.extremes.bottom, "bottom"]);
    else
      parts.forEach((part, k) => {
        if (part.hole) return;
        const n = part.modularRatio;
        const q = [...p, "properties", "parts", k];
        const ok = requireFinite(found, n, [...q, "modularRatio"], "modular ratio") && requireFinite(found, part.extremes.top, [...q, "extremes", "top"], "part's top") && requireFinite(found, part.extremes.bottom, [...q, "extremes", "bottom"], "part's bottom");
        if (ok) fibres.push([k, n, part.extremes.top, "top"], [k, n, part.extremes.bottom, "bottom"]);
      });
    out.push({ from: s.from, to: s.to, inertia: s.properties.secondMomentZ, top: s.properties.extremes.top, bottom: s.properties.extremes.bottom, unitShear, fibres });
  });
  return out;
}
