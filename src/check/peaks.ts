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

/** Peak stresses anywhere on a member. */
export interface MemberStresses {
  /** Tag. */
  readonly kind: "member-stresses";
  /** The most tensile bending stress and where. */
  readonly tension: PeakBendingStress;
  /** The most compressive bending stress and where. */
  readonly compression: PeakBendingStress;
  /** The largest shear stress and where; null when no stretch described its section for shear. */
  readonly shear: PeakShearStress | null;
}

function at(stress: number, x: number, fibre: ExtremeFibre, y: number, moment: number, stretch: number): PeakBendingStress {
  return { stress: stress + 0, x, fibre, y, moment, stretch };
}

/** Peak stresses from validated stretches. */
export function stressesOf(solution: CheckedSolution, stretches: readonly ResolvedStretch[]): MemberStresses {
  let tension = at(0, 0, "bottom", stretches[0]?.bottom ?? 0, 0, 0);
  let compression = at(0, 0, "top", stretches[0]?.top ?? 0, 0, 0);
  let shear: PeakShearStress | null = null;
  stretches.forEach((s, i) => {
    const m = extremesOf(solution.moment, s.from, s.to);
    // sagging (M > 0): bottom in tension, top in compression; hogging (M < 0): the reverse
    const candidates = [
      at((-m.max.value * s.bottom) / s.inertia, m.max.at, "bottom", s.bottom, m.max.value, i),
      at((-m.max.value * s.top) / s.inertia, m.max.at, "top", s.top, m.max.value, i),
      at((-m.min.value * s.top) / s.inertia, m.min.at, "top", s.top, m.min.value, i),
      at((-m.min.value * s.bottom) / s.inertia, m.min.at, "bottom", s.bottom, m.min.value, i),
    ];
    for (const c of candidates) {
      if (c.stress > tension.stress) tension = c;
      if (c.stress < compression.stress) compression = c;
    }
    if (s.unitShear !== null) {
      const v = extremesOf(solution.shear, s.from, s.to);
      const big = Math.abs(v.max.value) >= Math.abs(v.min.value) ? v.max : v.min;
      const stress = Math.abs(big.value) * s.unitShear.stress;
      if (shear === null || stress > shear.stress) shear = { stress, x: big.at, y: s.unitShear.y, shear: big.value, stretch: i };
    }
  });
  return { kind: "member-stresses", tension, compression, shear };
}

/**
 * The peak tensile and compressive bending stress anywhere on a solved member, and the peak
 * shear stress. On each stretch of constant section the largest sagging moment puts the bottom
 * fibre in tension and the top in compression, the largest hogging moment the reverse; for an
 * unsymmetric section (a T) the two can govern at different places, so all four are compared:
 * sigma = -M y / I_z at y = top and y = bottom. The moment extremes are exact (roots of the
 * derivative of the moment polynomial on each piece). The peak shear stress is the largest |V|
 * on each stretch times the section's peak of Q / (I b) over its depth.
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
