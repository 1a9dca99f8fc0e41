// The model's checks, run by the member-check module (src/check): this file only converts the
// model's limits to SI, hands them over, and re-expresses the results in the model's units.
import type { BeamSolution } from "../beam/index.js";
import {
  checkDeflection,
  checkMember,
  memberSection,
  memberStresses,
  spanDeflections,
  type CheckResult,
  type DeflectionLimit,
  type MemberCheck,
  type MemberLimits,
  type PeakBendingStress,
  type SpanDeflection,
} from "../check/index.js";
import { FlexuraError, isFlexuraError, type IssuePath } from "../errors/index.js";
import { connectedPieces } from "../section/index.js";
import type { ModelCheck, ModelScale, ModelStress, ModelStressExtreme, ModelWarning } from "./analysis.js";
import type { Model, ModelDeflectionLimit } from "./model.js";
import { isMultiMaterial, type SectionInSI } from "./model-section.js";
import type { ModelBuiltUpSection } from "./section-types.js";

const fmt = (x: number): string => String(Number(x.toPrecision(6)));

/**
 * A model's deflection limit as the check module's, in SI: `span/N` applies to cantilevers as
 * their own length / N (factor 1, as the model format has always said).
 */
export function deflectionLimitInSI(limit: ModelDeflectionLimit, scale: ModelScale): DeflectionLimit {
  return limit.kind === "ratio" ? { kind: "ratio", ratio: limit.ratio, cantileverFactor: 1 } : { kind: "absolute", limit: limit.value * scale.deflection };
}

/** The model's limits as the check module's, in SI (N/m^2, m). */
export function memberLimitsInSI(model: Model, scale: ModelScale): MemberLimits {
  const { deflection, bendingStress, shearStress } = model.limits;
  return {
    ...(deflection === undefined ? {} : { deflection: deflectionLimitInSI(deflection, scale) }),
    ...(bendingStress === undefined ? {} : { bendingStress: bendingStress * scale.stress }),
    ...(shearStress === undefined ? {} : { shearStress: shearStress * scale.stress }),
  };
}

/** What the model reports of the checks: each check in model units, and the stresses when there is a section. */
export interface ModelVerdicts {
  /** The checks, in the model's units. */
  readonly checks: ModelCheck[];
  /** The peak stresses, when the model has a section. */
  readonly stress?: ModelStress;
}

function deflectionDescription(model: Model, d: SpanDeflection, scale: ModelScale): string {
  const limit = model.limits.deflection;
  const what = `${d.spanKind} ${d.span + 1} (${fmt(d.from / scale.length)} to ${fmt(d.to / scale.length)} ${model.units.length})`;
  const against = limit === undefined || limit.kind === "ratio" ? `its length/${fmt(limit?.ratio ?? 0)}` : `${fmt(limit.value)} ${model.units.deflection}`;
  return `deflection of ${what} against ${against}`;
}

function inModelUnits(c: CheckResult, model: Model, scale: ModelScale, context: { deflections: readonly SpanDeflection[]; part?: number }): ModelCheck {
  const base = { demand: 0, capacity: 0, utilisation: c.utilisation, pass: c.pass, at: c.at.x / scale.length };
  const units = model.units;
  switch (c.check) {
    case "deflection": {
      const d = context.deflections[c.at.span ?? 0];
      const span = c.at.span ?? 0;
      const description = d === undefined ? "deflection" : deflectionDescription(model, d, scale);
      return { kind: "deflection", ...base, demand: c.demand / scale.deflection, capacity: c.capacity / scale.deflection, unit: units.deflection, description, span };
    }
    case "bending-tension":
    case "bending-compression": {
      const sense = c.check === "bending-tension" ? "tension" : "compression";
      // Text numbers parts from 1, as spans and supports are; the `part` field stays the index into `section.parts`.
      const inPart = context.part === undefined ? "" : ` in part ${context.part + 1}`;
      const capacity = c.capacity / scale.stress;
      return {
        kind: c.check,
        ...base,
        demand: c.demand / scale.stress,
        capacity,
        unit: units.stress,
        description: `extreme-fibre bending stress (${sense})${inPart} against ${fmt(capacity)} ${units.stress}`,
        ...(c.at.fibre === undefined ? {} : { fibre: c.at.fibre }),
        ...(c.at.y === undefined ? {} : { y: c.at.y / scale.sectionLength }),
        ...(context.part === undefined ? {} : { part: context.part }),
      };
    }
    case "shear-stress": {
      const capacity = c.capacity / scale.stress;
      return {
        kind: "shear-stress",
        ...base,
        demand: c.demand / scale.stress,
        capacity,
        unit: units.stress,
        description: `peak shear stress${context.part === undefined ? "" : ` in part ${context.part + 1}`} against ${fmt(capacity)} ${units.stress}`,
        ...(c.at.y === undefined ? {} : { y: c.at.y / scale.sectionLength }),
        ...(context.part === undefined ? {} : { part: context.part }),
      };
    }
    default:
      return c.check satisfies never;
  }
}

function extremeOf(p: PeakBendingStress, scale: ModelScale, multiMaterial: boolean): ModelStressExtreme {
  return { value: p.stress / scale.stress, at: p.x / scale.length, y: p.y / scale.sectionLength, ...(multiMaterial && p.part >= 0 ? { part: p.part } : {}) };
}

function stressOf(r: Pick<MemberCheck, "stresses">, scale: ModelScale, multiMaterial: boolean): ModelStress {
  const s = r.stresses;
  const v = s.shear;
  return {
    tension: extremeOf(s.tension, scale, multiMaterial),
    compression: extremeOf(s.compression, scale, multiMaterial),
    ...(v === null || v.shear === 0 ? {} : { shear: { value: v.stress / scale.stress, at: v.x / scale.length, y: v.y / scale.sectionLength } }),
    ...(!multiMaterial || v === null || v.shear === 0 || s.shearByPart.length === 0
      ? {}
      : { shearByPart: s.shearByPart.map((p) => ({ part: p.part, value: p.stress / scale.stress, at: p.x / scale.length, y: p.y / scale.sectionLength })) }),
  };
}

/**
 * For a section of several materials: the allowable bending stress of each part in SI (a part's
 * own, else `limits.bendingStress` for parts of the model's material; null for holes and for
 * parts of another material without one), and the parts of another material left unchecked.
 */
function partAllowables(model: Model, section: ModelBuiltUpSection, scale: ModelScale, which: "bendingStress" | "shearStress"): { byPart: (number | null)[]; unchecked: number[] } {
  const common = model.limits[which];
  const unchecked: number[] = [];
  const byPart = section.parts.map((p, i) => {
    if (p.hole) return null;
    const own = p[which];
    if (own !== undefined) return own * scale.stress;
    if (p.material === undefined && p.modularRatio === undefined) return common === undefined ? null : common * scale.stress;
    unchecked.push(i);
    return null;
  });
  return { byPart, unchecked: byPart.some((b) => b !== null) ? unchecked : [] };
}

/** A path into the check module's limits as a path into the model: a part's allowable is its own `bendingStress` or `shearStress`, else the common one. */
function limitPathInModel(model: Model, path: IssuePath): IssuePath {
  const which = path[1] === "bendingStressByPart" ? "bendingStress" : path[1] === "shearStressByPart" ? "shearStress" : undefined;
  if (which === undefined || typeof path[2] !== "number") return path;
  const section = model.section;
  const part = section !== undefined && isMultiMaterial(section) ? section.parts[path[2]] : undefined;
  return part?.[which] === undefined ? ["limits", which] : ["section", "parts", path[2], which];
}

/** Runs the check module on a member with a section; its problems are reported under `section`. */
function withSection(model: Model, solution: BeamSolution, section: SectionInSI, scale: ModelScale, warnings: ModelWarning[]): ModelVerdicts {
  const built = model.section !== undefined && isMultiMaterial(model.section) ? model.section : undefined;
  const multi = built === undefined ? undefined : partAllowables(model, built, scale, "bendingStress");
  const multiShear = built === undefined ? undefined : partAllowables(model, built, scale, "shearStress");
  const { bendingStress: _common, shearStress: _commonShear, ...others } = memberLimitsInSI(model, scale);
  const limits: MemberLimits =
    multi === undefined || multiShear === undefined
      ? memberLimitsInSI(model, scale)
      : { ...others, bendingStressByPart: multi.byPart, ...(multiShear.byPart.some((b) => b !== null) ? { shearStressByPart: multiShear.byPart } : {}) };
  const unchecked = (list: readonly number[], what: string, field: string): void => {
    if (list.length === 0) return;
    warnings.push({
      code: `part-${field === "bendingStress" ? "bending" : "shear"}-stress-not-checked`,
      message: `The ${what} in part${list.length === 1 ? "" : "s"} ${list.join(", ")} of the section is not checked: a part of its own material needs its own "${field}".`,
    });
  };
  unchecked(multi?.unchecked ?? [], "bending stress", "bendingStress");
  unchecked(multiShear?.unchecked ?? [], "shear stress", "shearStress");
  const pieces = section.geometry.parts.length > 1 ? connectedPieces(section.geometry) : [];
  if (pieces.length > 1) {
    warnings.push({
      code: "section-not-connected",
      message: `The section is in ${pieces.length} separate pieces (parts ${pieces.map((p) => `[${p.join(", ")}]`).join(", ")}): its bending properties assume they act together, joined by connectors the model does not describe, and no shear stress is given (a shear-stress limit cannot be checked). Make the parts meet along an edge.`,
    });
  }
  const member = memberSection(section.geometry, section.referenceModulus === undefined ? undefined : { referenceModulus: section.referenceModulus });
  const anyLimit =
    limits.bendingStress !== undefined || limits.shearStress !== undefined || limits.deflection !== undefined || [...(limits.bendingStressByPart ?? []), ...(limits.shearStressByPart ?? [])].some((b) => b !== null);
  let r: Pick<MemberCheck, "checks" | "stresses" | "deflections">;
  try {
    // With no limit there is nothing to check (checkMember refuses to give a verdict then): the stresses alone.
    r = anyLimit ? checkMember(solution, member, limits) : { checks: [], stresses: memberStresses(solution, member), deflections: [] };
  } catch (e) {
    if (!isFlexuraError(e)) throw e;
    throw new FlexuraError(e.issues.map((i) => ({ ...i, path: i.path[0] === "limits" ? limitPathInModel(model, i.path) : ["section"] })));
  }
  // checkMember names the part of each per-part check in its location
  const withPart = r.checks.map((c) => (c.at.part === undefined ? { c } : { c, part: c.at.part }));
  // Deflection checks first, then stresses: the order the model's results have always had.
  const ordered = [...withPart.filter((x) => x.c.check === "deflection"), ...withPart.filter((x) => x.c.check !== "deflection")];
  const checks = ordered.map((x) => inModelUnits(x.c, model, scale, { deflections: r.deflections, ...(x.part === undefined ? {} : { part: x.part }) }));
  return { checks, stress: stressOf(r, scale, section.referenceModulus !== undefined) };
}

/**
 * The model's checks and stresses, all decided by the check module: with a section,
 * `checkMember` on the member in SI; without one, its deflection checks span by span (stress
 * limits then cannot be checked: the warning `stress-limit-without-section` is added).
 */
export function modelVerdicts(model: Model, solution: BeamSolution, section: SectionInSI | undefined, scale: ModelScale, warnings: ModelWarning[]): ModelVerdicts {
  if (section !== undefined) return withSection(model, solution, section, scale, warnings);
  const { bendingStress, shearStress, deflection } = model.limits;
  if (bendingStress !== undefined || shearStress !== undefined) {
    warnings.push({ code: "stress-limit-without-section", message: 'The stress limits are not checked: give a "section" so that stresses can be computed.' });
  }
  if (deflection === undefined) return { checks: [] };
  const limit = deflectionLimitInSI(deflection, scale);
  const deflections = spanDeflections(solution);
  const checks = deflections.map((d) =>
    checkDeflection(d.deflection, d.to - d.from, limit, { cantilever: d.spanKind === "cantilever", at: { x: d.at, span: d.span } }),
  );
  return { checks: checks.map((c) => inModelUnits(c, model, scale, { deflections })) };
}
