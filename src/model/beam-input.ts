import type { BeamInput, StiffnessSegment } from "../beam/index.js";
import type { Load } from "../loads/index.js";
import type { Support } from "../supports/index.js";
import type { ModelScale } from "./analysis.js";
import type { Model, ModelLoad, ModelSupport } from "./model.js";

function supportInSI(s: ModelSupport, scale: ModelScale): Support {
  return {
    kind: s.kind,
    at: s.at * scale.length,
    ...(s.stiffness === undefined ? {} : { stiffness: s.stiffness * scale.translationalStiffness }),
    ...(s.rotationalStiffness === undefined ? {} : { rotationalStiffness: s.rotationalStiffness * scale.rotationalStiffness }),
    ...(s.settlement === undefined ? {} : { settlement: s.settlement * scale.deflection }),
    ...(s.rotation === undefined ? {} : { rotation: s.rotation * scale.rotation }),
  };
}

function loadInSI(l: ModelLoad, scale: ModelScale): Load {
  const loadCase = l.case === undefined ? {} : { case: l.case };
  switch (l.kind) {
    case "point":
      return { kind: "point", at: l.at * scale.length, value: l.value * scale.force, ...loadCase };
    case "couple":
      return { kind: "couple", at: l.at * scale.length, value: l.value * scale.moment, ...loadCase };
    case "distributed":
      return {
        kind: "distributed",
        from: l.from * scale.length,
        to: l.to * scale.length,
        start: l.start * scale.forcePerLength,
        end: l.end * scale.forcePerLength,
        ...loadCase,
      };
    default:
      return l satisfies never;
  }
}

/**
 * The bending stiffness E I of the member in SI (N*m^2): from `segments`, else from `E` (or
 * `material.E`) with `I` (or the section's I_z, given in m^4 as `sectionSecondMomentSI`).
 * Returns undefined when the model gives no stiffness (parseModel reports that).
 */
function stiffnessInSI(model: Model, scale: ModelScale, sectionSecondMomentSI: number | undefined): BeamInput["stiffness"] | undefined {
  if (model.segments !== undefined) {
    return model.segments.map(
      (s): StiffnessSegment => ({ from: s.from * scale.length, to: s.to * scale.length, stiffness: s.E * scale.modulus * (s.I * scale.secondMoment) }),
    );
  }
  const E = model.E ?? model.material?.E;
  const I = model.I === undefined ? sectionSecondMomentSI : model.I * scale.secondMoment;
  return E === undefined || I === undefined ? undefined : E * scale.modulus * I;
}

/** The model as the beam solver's input, in SI base units (m, N, N*m, N/m, rad). */
export function beamInputInSI(model: Model, scale: ModelScale, sectionSecondMomentSI: number | undefined): BeamInput | undefined {
  const stiffness = stiffnessInSI(model, scale, sectionSecondMomentSI);
  if (stiffness === undefined) return undefined;
  return {
    length: model.length * scale.length,
    stiffness,
    supports: model.supports.map((s) => supportInSI(s, scale)),
    hinges: model.hinges.map((h) => h * scale.length),
    loads: model.loads.map((l) => loadInSI(l, scale)),
  };
}
