// The model's combinations, analysed by the combine and check modules on the member in SI: each
// case solved once, the envelopes over every combination and pattern, the check groups' table;
// this file only converts to SI, hands over, and re-expresses the results in the model's units.
import type { BeamInput } from "../beam/index.js";
import { checkLoadCombinations, memberSection, selfWeight, type CombinationCheckGroups, type GoverningCheck, type LoadCombinationChecks } from "../check/index.js";
import { envelopes, solveCases, type CaseSolutions, type DiagramEnvelope, type EnvelopeBound, type Envelopes, type LoadArrangement, type ReactionRange } from "../combine/index.js";
import { FlexuraError, isFlexuraError, type FlexuraIssue, type IssuePath } from "../errors/index.js";
import type { ModelScale } from "./analysis.js";
import { deflectionLimitInSI } from "./checks.js";
import type { ModelCombinationCheck, ModelCombinationCheckRow, ModelCombinationResults, ModelEnvelope, ModelEnvelopeBound, ModelReactionRange } from "./combination-types.js";
import { diagramInModelUnits } from "./diagrams.js";
import type { Model, ModelDeflectionLimit } from "./model.js";
import type { SectionInSI } from "./model-section.js";
import { resolveCombinations, selectCombinations, type ResolvedCombinations } from "./resolve-combinations.js";

const fmt = (x: number): string => String(Number(x.toPrecision(6)));

/** Runs `fn`, moving the paths of its typed errors with `move`. */
function movingPaths<T>(fn: () => T, move: (path: IssuePath) => IssuePath): T {
  try {
    return fn();
  } catch (e) {
    if (!isFlexuraError(e)) throw e;
    throw new FlexuraError(e.issues.map((i) => ({ ...i, path: move(i.path) })));
  }
}

function bound(b: EnvelopeBound, arrangements: readonly LoadArrangement[], lengthScale: number, valueScale: number, unit: string): ModelEnvelopeBound {
  return {
    diagram: diagramInModelUnits(b.curve, lengthScale, valueScale, unit),
    governing: b.governing.map((k) => arrangements[k]?.name ?? ""),
    peak: { value: b.peak.value / valueScale, at: b.peak.at / lengthScale, combination: b.peak.name },
  };
}

function envelopeOf(e: DiagramEnvelope | undefined, arrangements: readonly LoadArrangement[], lengthScale: number, valueScale: number, unit: string): ModelEnvelope {
  const d = e as DiagramEnvelope; // every diagram is asked for
  return { upper: bound(d.upper, arrangements, lengthScale, valueScale, unit), lower: bound(d.lower, arrangements, lengthScale, valueScale, unit) };
}

function range(r: ReactionRange, scale: number): ModelReactionRange {
  return { max: { value: r.max.value / scale, combination: r.max.name }, min: { value: r.min.value / scale, combination: r.min.name } };
}

function checkInModelUnits(g: GoverningCheck, model: Model, scale: ModelScale, solved: CaseSolutions): ModelCombinationCheck {
  const c = g.check;
  const deflection = c.check === "deflection";
  const s = deflection ? solved.spans[c.at.span ?? 0] : undefined;
  const u = model.units;
  const description =
    s === undefined ? c.label : `deflection of ${s.kind} ${(c.at.span ?? 0) + 1} (${fmt(s.from / scale.length)} to ${fmt(s.to / scale.length)} ${u.length})${/limit \d+$/.test(c.label) ? `, ${c.label.slice(c.label.lastIndexOf("limit"))}` : ""}`;
  const k = deflection ? scale.deflection : scale.stress;
  return { kind: c.check, description, demand: c.demand / k, capacity: c.capacity / k, unit: deflection ? u.deflection : u.stress, utilisation: c.utilisation, pass: c.pass, at: c.at.x / scale.length, pattern: g.pattern };
}

/** The check groups in SI, as the check module takes them. */
function groupsInSI(model: Model, resolved: ResolvedCombinations, scale: ModelScale): CombinationCheckGroups {
  const g = model.checkGroups ?? {};
  const ignore: FlexuraIssue[] = []; // resolved: the selections were checked
  return {
    stress: (g.stress ?? []).map((s) => ({
      name: s.name,
      combinations: selectCombinations(resolved.combinations, s.combinations, [], ignore) ?? [],
      limits: { ...(s.bendingStress === undefined ? {} : { bendingStress: s.bendingStress * scale.stress }), ...(s.shearStress === undefined ? {} : { shearStress: s.shearStress * scale.stress }) },
    })),
    deflection: (g.deflection ?? []).map((d) => {
      const list: readonly ModelDeflectionLimit[] = Array.isArray(d.limit) ? (d.limit as readonly ModelDeflectionLimit[]) : [d.limit as ModelDeflectionLimit];
      const limits = list.map((l) => deflectionLimitInSI(l, scale));
      const limit = limits.length === 1 ? (limits[0] as (typeof limits)[number]) : limits;
      return d.factors !== undefined
        ? { name: d.name, factors: d.factors, limit }
        : { name: d.name, combinations: selectCombinations(resolved.combinations, d.combinations ?? [], [], ignore) ?? [], limit };
    }),
  };
}

/**
 * The member in SI with the model's self-weight added (one uniform load per member, area times
 * unit weight, in the self-weight case), when it has one and a section.
 *
 * @throws FlexuraError `result-not-finite` at `selfWeight` when the weight per length overflows.
 */
export function withSelfWeight(model: Model, scale: ModelScale, section: SectionInSI | undefined, beam: BeamInput): BeamInput {
  const sw = model.selfWeight;
  if (sw === undefined || section === undefined) return beam;
  const own = movingPaths(() => selfWeight(beam.length, section.properties.area, sw.unitWeight * (scale.force / scale.length ** 3), { case: sw.case }), () => ["selfWeight"]);
  return { ...beam, loads: [...(beam.loads ?? []), ...own.loads] };
}

/**
 * The model's combinations analysed, in its units (`beam` from {@link withSelfWeight}); undefined when the model has no cases.
 *
 * @throws FlexuraError the codes of resolveCombinations, solveCases, envelopes and checkLoadCombinations, with paths into the model.
 */
export function combinationResults(model: Model, scale: ModelScale, section: SectionInSI | undefined, beam: BeamInput): ModelCombinationResults | undefined {
  const found: FlexuraIssue[] = [];
  const resolved = resolveCombinations(model, found);
  if (found.length > 0) throw new FlexuraError(found);
  if (resolved === undefined) return undefined;
  const modelLoads = model.loads.length;
  const solved = movingPaths(
    () => solveCases(beam, resolved.cases, model.settlementCase === undefined ? undefined : { settlementCase: model.settlementCase }),
    (p) => (p[0] === "beam" && p[1] === "loads" && typeof p[2] === "number" ? (p[2] < modelLoads ? p.slice(1) : ["selfWeight"]) : p[0] === "beam" ? p.slice(1) : p[0] === "options" ? ["settlementCase"] : p),
  );
  const pattern = model.patterns?.cap === undefined ? {} : { pattern: { cap: model.patterns.cap } };
  let env: Envelopes | undefined;
  if (resolved.combinations.length > 0) env = movingPaths(() => envelopes(solved, resolved.combinations, pattern), (p) => (p[0] === "options" ? ["patterns", ...p.slice(2)] : p[0] === "combinations" ? ["combinations"] : p));
  const groups = groupsInSI(model, resolved, scale);
  let table: LoadCombinationChecks | undefined;
  if ((groups.stress?.length ?? 0) + (groups.deflection?.length ?? 0) > 0) {
    const sections = section === undefined ? undefined : memberSection(section.geometry, section.referenceModulus === undefined ? undefined : { referenceModulus: section.referenceModulus });
    table = movingPaths(
      () => checkLoadCombinations(solved, sections, groups, pattern),
      (p) => (p[0] === "checks" ? ["checkGroups", ...p.slice(1)] : p[0] === "sections" ? ["section"] : p[0] === "options" ? ["patterns", ...p.slice(2)] : p),
    );
  }
  const rows = (table?.rows ?? []).map((r): ModelCombinationCheckRow => {
    const checks = r.checks.map((g) => checkInModelUnits(g, model, scale, solved));
    return { group: r.group, groupKind: r.groupKind, combination: r.combination, ...(r.clause === undefined ? {} : { clause: r.clause }), checks, governing: r.checks.indexOf(r.governing), utilisation: r.utilisation, pass: r.pass };
  });
  const u = model.units;
  const a = env?.arrangements ?? [];
  return {
    cases: resolved.cases,
    combinations: resolved.combinations,
    notes: resolved.notes,
    arrangements: a.length,
    ...(env === undefined
      ? {}
      : {
          envelopes: {
            shear: envelopeOf(env.shear, a, scale.length, scale.force, u.force),
            moment: envelopeOf(env.moment, a, scale.length, scale.moment, u.moment),
            slope: envelopeOf(env.slope, a, scale.length, scale.rotation, u.rotation),
            deflection: envelopeOf(env.deflection, a, scale.length, scale.deflection, u.deflection),
          },
          reactions: env.reactions.map((r) => ({ support: r.support, at: r.at / scale.length, force: range(r.force, scale.force), moment: range(r.moment, scale.moment) })),
        }),
    checks: rows,
    ...(table === undefined ? {} : { governing: table.rows.indexOf(table.governing), pass: table.pass }),
  };
}
