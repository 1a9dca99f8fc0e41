import type { ModelFile, ModelFileLoad, ModelFileSupport } from "./file.js";
import type { ModelFileMaterial, ModelFileSection, ModelFileSectionPart } from "./file-section.js";
import type { Model, ModelLoad, ModelMaterial, ModelSupport } from "./model.js";
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
  };
}
