import { IssueCollector, attempt, fail, type IssuePath, type Result } from "../errors/index.js";
import { spanDeflections, type SpanDeflection } from "./deflection.js";
import { bendingAllowables, checkLimits, deflectionLimits, type DeflectionLimit, type MemberLimits } from "./limits.js";
import { stressesOf, type MemberStresses, type PeakBendingStress } from "./peaks.js";
import { resolveSections, type MemberSections } from "./sections.js";
import type { CheckedSolution } from "./solution.js";
import { deflectionResult } from "./single.js";
import { checkResultAt, type CheckResult } from "./types.js";

/** Everything checked on a member, and the governing check. */
export interface MemberCheck {
  /** Tag. */
  readonly kind: "member-check";
  /** Every check run: bending tension and compression, shear stress, and one deflection check per limit and span. */
  readonly checks: readonly CheckResult[];
  /** The check with the highest utilisation (the first on ties); there is always at least one check. */
  readonly governing: CheckResult;
  /** True when every check passes (there is always at least one). */
  readonly pass: boolean;
  /** The peak stresses along the member. */
  readonly stresses: MemberStresses;
  /** The peak deflection of every span and cantilever. */
  readonly deflections: readonly SpanDeflection[];
}

function bendingFormula(p: PeakBendingStress, sense: "t" | "c"): string {
  const which = p.moment >= 0 ? "sagging" : "hogging";
  return p.part < 0 ? `sigma_${sense} = |M y_${p.fibre} / I_z|, ${which}` : `sigma_${sense} = |n M y / I_z| at part ${p.part}'s ${p.fibre}, ${which}`;
}

function deflectionCheck(limit: DeflectionLimit, d: SpanDeflection, index: number, path: IssuePath): CheckResult {
  const label = `deflection, ${d.spanKind} ${d.span + 1} (x = ${d.from} to ${d.to}), limit ${index + 1}`;
  return deflectionResult(limit, Math.abs(d.deflection), d.to - d.from, d.spanKind === "cantilever", { x: d.at, span: d.span }, label, path);
}

/**
 * Checks a solved member against the limits the engineer supplies: bending stress (tension
 * and compression, anywhere on the member, see `memberStresses`), shear stress (for several
 * materials each part against its own allowable, `shearStressByPart`), and deflection
 * per span and cantilever (span / n, or an absolute limit; see {@link commonDeflectionRatios}).
 * Each check reports demand, capacity, utilisation = demand / capacity, pass (utilisation <= 1),
 * where it governs and the formula used; the governing check is the one with the highest
 * utilisation. No design-code capacity formulas: the allowable values are the user's.
 *
 * @param solution - A solved member (`solveBeam`'s result), in the same consistent units as the sections and limits.
 * @param sections - One section, or stretches of constant section tiling the member.
 * @param limits - Allowable stresses and deflection limits; a missing one is not checked, but at
 *   least one must be given. Only own properties are read.
 * @returns Every check (at least one), the governing one and the peaks.
 * @throws FlexuraError `limits-not-an-object`, `limits-empty` (no limit given: a verdict never
 *   passes by default), `unknown-field` (a misspelt limit), `not-a-list`, `deflection-limit-invalid`,
 *   `result-not-finite` (a utilisation that overflows), `allowable-not-positive`, `unknown-limit-kind`, `shear-section-missing` (a shear
 *   limit but no bands on some stretch), the codes of `memberStresses`, `not-a-number` / `not-finite`.
 * @example
 * ```ts
 * const r = checkMember(solution, { properties: { secondMomentZ: 3.4e8, extremes: { top: 200, bottom: -200 } } },
 *   { bendingStress: 165, deflection: { kind: "ratio", ratio: commonDeflectionRatios.floorLive } });
 * r.governing?.label; r.pass;
 * ```
 */
export function checkMember(solution: CheckedSolution, sections: MemberSections, limits: MemberLimits): MemberCheck {
  const found = new IssueCollector();
  // the limits first (they say whether shear is needed), their issues listed after the sections'
  const limitIssues = new IssueCollector();
  const given = checkLimits(limitIssues, limits, ["limits"]);
  const needShear = given?.shearStress !== undefined || (given?.shearStressByPart ?? []).some((b) => b !== null);
  const stretches = resolveSections(found, sections, solution.length, ["sections"], needShear);
  found.addAll(limitIssues.issues);
  if (needShear && found.empty) {
    stretches.forEach((s, i) => {
      if (s.unitShear === null) {
        const path = Array.isArray(sections) ? ["sections", i, "shear"] : ["sections", "shear"];
        found.add("shear-section-missing", path, "A shear-stress limit was given, so describe the section for shear: give its depth bands in `shear`.");
      }
    });
  }
  found.throwIfAny();
  const sound = given as MemberLimits;
  const stresses = stressesOf(solution, stretches);
  const deflections = spanDeflections(solution);
  const checks: CheckResult[] = [];
  const bending = (t: PeakBendingStress, c: PeakBendingStress, allow: { tension: number; compression: number }, suffix: string, path: IssuePath, part?: number): void => {
    const inPart = part === undefined ? {} : { part };
    checks.push(checkResultAt(path, "bending-tension", `bending stress, tension${suffix}`, t.stress, allow.tension, { x: t.x, fibre: t.fibre, y: t.y, stretch: t.stretch, ...inPart }, bendingFormula(t, "t")));
    checks.push(checkResultAt(path, "bending-compression", `bending stress, compression${suffix}`, -c.stress + 0, allow.compression, { x: c.x, fibre: c.fibre, y: c.y, stretch: c.stretch, ...inPart }, bendingFormula(c, "c")));
  };
  const allow = bendingAllowables(sound.bendingStress);
  if (allow !== null) bending(stresses.tension, stresses.compression, allow, "", ["limits", "bendingStress"]);
  sound.bendingStressByPart?.forEach((b, i) => {
    const partAllow = bendingAllowables(b);
    if (partAllow === null) return;
    const p = stresses.parts.find((q) => q.part === i);
    if (p === undefined) fail("part-not-found", ["limits", "bendingStressByPart", i], `No part ${i} in the sections' parts: give the sections with their parts (memberSection does) or remove this limit.`);
    bending(p.tension, p.compression, partAllow, `, part ${i}`, ["limits", "bendingStressByPart", i], i);
  });
  if (sound.shearStress !== undefined && stresses.shear !== null) {
    const v = stresses.shear;
    const formula = stresses.shearByMaterial.length > 0 ? "tau = max over materials of n_i |V| Q* / (I* b*)" : "tau = |V| Q / (I_z b)";
    checks.push(checkResultAt(["limits", "shearStress"], "shear-stress", "shear stress", v.stress, sound.shearStress, { x: v.x, y: v.y, stretch: v.stretch }, formula));
  }
  sound.shearStressByPart?.forEach((allowable, i) => {
    if (allowable === null) return;
    const path = ["limits", "shearStressByPart", i];
    const p = stresses.shearByPart.find((q) => q.part === i);
    if (p === undefined) fail("part-not-found", path, `No solid part ${i} of several materials in the sections for shear: give sections of the section module with their materials (memberSection does) or remove this limit.`);
    checks.push(checkResultAt(path, "shear-stress", `shear stress, part ${i}`, p.stress, allowable, { x: p.x, y: p.y, stretch: p.stretch, part: i }, `tau = n |V| Q* / (I* b*) in part ${i}`));
  });
  const list = deflectionLimits(sound);
  list.forEach((limit, i) => {
    const path = Array.isArray(limits.deflection) ? ["limits", "deflection", i] : ["limits", "deflection"];
    for (const d of deflections) checks.push(deflectionCheck(limit, d, i, path));
  });
  // Every limit given yields at least one check (there is always a span); a verdict never passes with none.
  if (checks.length === 0) fail("no-checks-run", ["limits"], "No check could be run with these limits and sections, so there is no verdict.");
  let governing = checks[0] as CheckResult;
  for (const c of checks) if (c.utilisation > governing.utilisation) governing = c;
  return { kind: "member-check", checks, governing, pass: checks.every((c) => c.pass), stresses, deflections };
}

/**
 * Non-throwing form of {@link checkMember}.
 *
 * @example
 * ```ts
 * tryCheckMember(solution, section, { bendingStress: -1 }).ok; // false (allowable-not-positive)
 * ```
 */
export function tryCheckMember(solution: CheckedSolution, sections: MemberSections, limits: MemberLimits): Result<MemberCheck> {
  return attempt(() => checkMember(solution, sections, limits));
}
