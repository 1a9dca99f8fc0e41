import type { ModelFile, ModelFileLoad, ModelFileSupport } from "./file.js";
import type { ModelFileMaterial, ModelFileSection, ModelFileSectionPart } from "./file-section.js";
import type { ModelCombinationEntry } from "./combination-types.js";
import type { Model, ModelDeflectionLimit, ModelLoad, ModelMaterial, ModelSupport } from "./model.js";
import type { ModelSection, ModelSectionPart } from "./section-types.js";

const materialToJson = (m: ModelMaterial): ModelFileMaterial => ({ ...m });

function partToJson(p: ModelSectionPart): ModelFileSectionPart {
  const common = {
    ...(p.hole ? { hole: true } : {}),
    ...(p.material === undefined ? {} : { material: materialToJson(p.material) }),
    ...(p.modularRatio === undefined ? {} : { modularRatio: p.modularRatio }),
    ...(p.bendingStress === undefined ? {} : { bendingStress: p.bendingStress }),
    ...(p.shearStress === undefined ? {} : { shearStress: p.shearStress }),
  };
  switch (p.kind) {
    case "polygon":
      return { type: "polygon", points: p.points.map((q) => ({ y: q.y, z: q.z })), ...common };
    case "circle":
      return { type: "circle", centre: { ...p.centre }, radius: p.radius, ...common };
    case "sector":
      return { type: "sector", centre: { ...p.centre }, radius: p.radius, startAngle: p.startAngle, sweep: p.sweep, ...common };
    case "fillet":
      return { type: "fillet", corner: { ...p.corner }, radius: p.radius, orientation: p.orientation, ...common };
    default:
      return p satisfies never;
  }
}

function sectionToJson(s: ModelSection): ModelFileSection {
  switch (s.shape) {
    case "plate-girder":
      return { shape: "plate-girder", topFlange: { ...s.topFlange }, web: { ...s.web }, ...(s.bottomFlange === undefined ? {} : { bottomFlange: { ...s.bottomFlange } }) };
    case "built-up":
      return { shape: "built-up", parts: s.parts.map(partToJson) };
    default:
      return { ...s.dimensions, shape: s.shape };
  }
}

function supportToJson(s: ModelSupport): ModelFileSupport {
  return {
    at: s.at,
    type: s.kind,
    ...(s.stiffness === undefined ? {} : { stiffness: s.stiffness }),
    ...(s.rotationalStiffness === undefined ? {} : { rotationalStiffness: s.rotationalStiffness }),
    ...(s.settlement === undefined ? {} : { settlement: s.settlement }),
    ...(s.rotation === undefined ? {} : { rotation: s.rotation }),
  };
}

function loadToJson(l: ModelLoad): ModelFileLoad {
  const loadCase = l.case === undefined ? {} : { case: l.case };
  switch (l.kind) {
    case "point":
      return { type: "point", at: l.at, value: l.value, ...loadCase };
    case "couple":
      return { type: "moment", at: l.at, value: l.value, ...loadCase };
    case "distributed":
      return { type: "distributed", from: l.from, to: l.to, start: l.start, end: l.end, ...loadCase };
    default:
      return l satisfies never;
  }
}

/**
 * Writes a {@link Model} back as a model file: every unit named, every number plain (in those
 * units), `kind` tags as JSON `type`s (a `"couple"` as `"moment"`). `parseModel` of the result gives
 * the same model again.
 *
 * @param model - A model from `parseModel`. It is not changed.
 * @returns A plain object ready for `JSON.stringify`.
 * @example
 * ```ts
 * const text = JSON.stringify(modelToJson(parseModel(file)), null, 2);
 * ```
 */
export function modelToJson(model: Model): ModelFile {
  const limits = model.limits;
  const deflection = limits.deflection;
  return {
    format: model.format,
    ...(model.name === undefined ? {} : { name: model.name }),
    ...(model.description === undefined ? {} : { description: model.description }),
    units: { ...model.units },
    length: model.length,
    ...(model.E === undefined ? {} : { E: model.E }),
    ...(model.I === undefined ? {} : { I: model.I }),
    ...(model.segments === undefined ? {} : { segments: model.segments.map((s) => ({ from: s.from, to: s.to, E: s.E, I: s.I })) }),
    ...(model.section === undefined ? {} : { section: sectionToJson(model.section) }),
    ...(model.material === undefined ? {} : { material: materialToJson(model.material) }),
    supports: model.supports.map(supportToJson),
    hinges: [...model.hinges],
    loads: model.loads.map(loadToJson),
    limits: {
      ...(deflection === undefined ? {} : { deflection: deflection.kind === "ratio" ? `span/${deflection.ratio}` : deflection.value }),
      ...(limits.bendingStress === undefined ? {} : { bendingStress: limits.bendingStress }),
      ...(limits.shearStress === undefined ? {} : { shearStress: limits.shearStress }),
    },
    ...combinationsToJson(model),
  };
}

const limitToJson = (l: ModelDeflectionLimit): number | string => (l.kind === "ratio" ? `span/${l.ratio}` : l.value);

/** The cases, combinations, patterns, self-weight and check groups of a model, as a model file writes them. */
function combinationsToJson(model: Model): Pick<ModelFile, "cases" | "settlementCase" | "selfWeight" | "combinations" | "patterns" | "checkGroups"> {
  const g = model.checkGroups;
  return {
    ...(model.cases === undefined ? {} : { cases: model.cases.map((c) => ({ ...c })) }),
    ...(model.settlementCase === undefined ? {} : { settlementCase: model.settlementCase }),
    ...(model.selfWeight === undefined ? {} : { selfWeight: { case: model.selfWeight.case, unitWeight: model.selfWeight.unitWeight } }),
    ...(model.combinations === undefined ? {} : { combinations: model.combinations.map((c) => JSON.parse(JSON.stringify(c)) as ModelCombinationEntry) }),
    ...(model.patterns === undefined ? {} : { patterns: { ...model.patterns } }),
    ...(g === undefined
      ? {}
      : {
          checkGroups: {
            ...(g.stress === undefined ? {} : { stress: g.stress.map((s) => ({ ...s, combinations: typeof s.combinations === "string" ? s.combinations : [...s.combinations] })) }),
            ...(g.deflection === undefined
              ? {}
              : {
                  deflection: g.deflection.map((d) => ({
                    name: d.name,
                    ...(d.factors === undefined ? {} : { factors: { ...d.factors } }),
                    ...(d.combinations === undefined ? {} : { combinations: typeof d.combinations === "string" ? d.combinations : [...d.combinations] }),
                    limit: Array.isArray(d.limit) ? d.limit.map(limitToJson) : limitToJson(d.limit as ModelDeflectionLimit),
                  })),
                }),
          },
        }),
  };
}
