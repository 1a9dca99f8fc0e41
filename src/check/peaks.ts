import { IssueCollector, attempt, type Result } from "../errors/index.js";
import { extremesOf } from "../math/index.js";
import type { ExtremeFibre } from "../stress/index.js";
import { resolveSections, type MemberSections, type ResolvedStretch } from "./sections.js";
import type { CheckedSolution } from "./solution.js";

/** The peak bending stress of one sign along a member. */
export interface PeakBendingStress {
  /** The stress (force / length^2): >= 0 for the peak tension, <= 0 for the peak compression. */
  readonly stress: number;
  /** Where along the member (length). */
  readonly x: number;
  /** Which fibre. */
  readonly fibre: ExtremeFibre;
  /** Height of that fibre above the centroid (length). */
  readonly y: number;
  /** The bending moment there (force x length, positive sagging). */
  readonly moment: number;
  /** Index of the section stretch (0 for a uniform member). */
  readonly stretch: number;
  /** For a section given with its parts: the part's index (`fibre` is then the part's top or bottom); -1 otherwise. */
  readonly part: number;
}

/** The peak bending stresses in one part of a multi-material section. */
export interface PartPeakStresses {
  /** The part's index. */
  readonly part: number;
  /** The most tensile stress in the part. */
  readonly tension: PeakBendingStress;
  /** The most compressive stress in the part. */
  readonly compression: PeakBendingStress;
}

/** The peak shear stress along a member. */
export interface PeakShearStress {
  /** Magnitude of the shear stress (force / length^2, >= 0). */
  readonly stress: number;
  /** Where along the member (length). */
  readonly x: number;
  /** Height in the section where it acts, up from the centroid (length). */
  readonly y: number;
  /** The shear force there (force). */
  readonly shear: number;
  /** Index of the section stretch. */
  readonly stretch: number;
}

/** The peak shear stress in one material of a multi-material section along a member. */
export interface MaterialPeakShearStress extends PeakShearStress {
  /** The material's modular ratio n = E / E_ref (parts of equal modulus are one material). */
  readonly modularRatio: number;
  /** Indices of the material's solid parts (in the section of the stretch where the peak is). */
  readonly parts: readonly number[];
}

/** The peak shear stress in one solid part of a multi-material section along a member, over the part's own heights. */
export interface PartPeakShearStress extends PeakShearStress {
  /** The part's index. */
  readonly part: number;
}

/** Peak stresses anywhere on a member. */
export interface MemberStresses {
  /** Tag. */
  readonly kind: "member-stresses";
  /** The most tensile bending stress and where. */
  readonly tension: PeakBendingStress;
  /** The most compressive bending stress and where. */
  readonly compression: PeakBendingStress;
  /**
   * The largest shear stress and where; null when no stretch described its section for shear.
   * For a section of several materials (from the section module), the largest of the materials'
   * own stresses tau_i = n_i |V| Q* / (I* b*), not the transformed section's.
   */
  readonly shear: PeakShearStress | null;
  /**
   * Sections of several materials from the section module: each material's own peak shear
   * stress, by modular ratio in the order first met; empty otherwise. Check each against its own allowable.
   */
  readonly shearByMaterial: readonly MaterialPeakShearStress[];
  /** Sections of several materials from the section module: each solid part's peak shear stress over its own heights, by part index; empty otherwise. */
  readonly shearByPart: readonly PartPeakShearStress[];
  /** Peaks in each part, when the sections were given with their parts (multi-material); empty otherwise. */
  readonly parts: readonly PartPeakStresses[];
}

function at(stress: number, x: number, fibre: ExtremeFibre, y: number, moment: number, stretch: number, part = -1): PeakBendingStress {
  return { stress: stress + 0, x, fibre, y, moment, stretch, part };
}

/** Peak stresses from validated stretches. */
export function stressesOf(solution: CheckedSolution, stretches: readonly ResolvedStretch[]): MemberStresses {
  let tension = at(0, 0, "bottom", stretches[0]?.bottom ?? 0, 0, 0);
  let compression = at(0, 0, "top", stretches[0]?.top ?? 0, 0, 0);
  const parts = new Map<number, { tension: PeakBendingStress; compression: PeakBendingStress }>();
  let shear: PeakShearStress | null = null;
  const byMaterial = new Map<number, MaterialPeakShearStress>();
  const byPartShear = new Map<number, PartPeakShearStress>();
  stretches.forEach((s, i) => {
    const m = extremesOf(solution.moment, s.from, s.to);
    // sagging (M > 0) puts fibres below the centroid in tension, hogging (M < 0) those above
    for (const [part, n, y, fibre] of s.fibres) {
      for (const e of [m.max, m.min]) {
        const c = at((-n * e.value * y) / s.inertia, e.at, fibre, y, e.value, i, part);
        if (c.stress > tension.stress) tension = c;
        if (c.stress < compression.stress) compression = c;
        if (part < 0) continue;
        const old = parts.get(part);
        if (old === undefined) parts.set(part, { tension: c, compression: c });
        else {
          if (c.stress > old.tension.stress) parts.set(part, { ...old, tension: c });
          const now = parts.get(part)!;
          if (c.stress < now.compression.stress) parts.set(part, { ...now, compression: c });
        }
      }
    }
    if (s.unitShear !== null) {
      const v = extremesOf(solution.shear, s.from, s.to);
      const big = Math.abs(v.max.value) >= Math.abs(v.min.value) ? v.max : v.min;
      const stress = Math.abs(big.value) * s.unitShear.stress;
      if (shear === null || stress > shear.stress) shear = { stress, x: big.at, y: s.unitShear.y, shear: big.value, stretch: i };
      for (const m of s.unitShear.materials ?? []) {
        const ms = Math.abs(big.value) * m.stress;
        const old = byMaterial.get(m.modularRatio);
        if (old === undefined || ms > old.stress) byMaterial.set(m.modularRatio, { modularRatio: m.modularRatio, parts: m.parts, stress: ms, x: big.at, y: m.y, shear: big.value, stretch: i });
        for (const b of m.byPart) {
          const ps = Math.abs(big.value) * b.stress;
          const was = byPartShear.get(b.part);
          if (was === undefined || ps > was.stress) byPartShear.set(b.part, { part: b.part, stress: ps, x: big.at, y: b.y, shear: big.value, stretch: i });
        }
      }
    }
  });
  const byPart = [...parts.entries()].sort((a, b) => a[0] - b[0]).map(([part, p]): PartPeakStresses => ({ part, ...p }));
  const shearByPart = [...byPartShear.values()].sort((a, b) => a.part - b.part);
  return { kind: "member-stresses", tension, compression, shear, shearByMaterial: [...byMaterial.values()], shearByPart, parts: byPart };
}

/**
 * The peak tensile and compressive bending stress anywhere on a solved member, and the peak
 * shear stress. On each stretch of constant section the largest sagging moment puts the bottom
 * fibre in tension and the top in compression, the largest hogging moment the reverse; for an
 * unsymmetric section (a T) the two can govern at different places, so all four are compared:
 * sigma = -M y / I_z at y = top and y = bottom. The moment extremes are exact (roots of the
 * derivative of the moment polynomial on each piece). The peak shear stress is the largest |V|
 * on each stretch times the section's peak of Q / (I b) over its depth; for a section of
 * several materials, by the transformed section, each material's own peak n_i |V| Q* / (I* b*)
 * and each solid part's (over the part's heights), with `shear` the largest of them.
 *
 * @param solution - A solved member (`solveBeam`'s result).
 * @param sections - One section for the whole member, or stretches tiling it.
 * @returns The peaks with location, fibre and the internal force there. With no moment anywhere, zero stresses at x = 0.
 * @throws FlexuraError `no-sections`, `stretches-not-tiling`, `second-moment-not-positive`, `extremes-missing`,
 *   `extremes-not-about-centroid`, the band codes of `cutAt`, `not-a-number` / `not-finite`.
 * @example
 * ```ts
 * const s = solveBeam({ length: 6000, stiffness: 2e5 * 3.4e8, supports: [{ kind: "pin", at: 0 }, { kind: "roller", at: 6000 }],
 *   loads: [{ kind: "distributed", from: 0, to: 6000, start: 10, end: 10 }] });
 * memberStresses(s, { properties: { secondMomentZ: 3.4e8, extremes: { top: 200, bottom: -200 } } }).tension.stress; // 26.47 (N/mm^2)
 * ```
 */
export function memberStresses(solution: CheckedSolution, sections: MemberSections): MemberStresses {
  const found = new IssueCollector();
  const stretches = resolveSections(found, sections, solution.length, ["sections"]);
  found.throwIfAny();
  return stressesOf(solution, stretches);
}

/**
 * Non-throwing form of {@link memberStresses}.
 *
 * @example
 * ```ts
 * tryMemberStresses(solution, []).ok; // false (no-sections)
 * ```
 */
export function tryMemberStresses(solution: CheckedSolution, sections: MemberSections): Result<MemberStresses> {
  return attempt(() => memberStresses(solution, sections));
}
