import { FlexuraError, isFlexuraError, type IssuePath } from "../errors/index.js";
import {
  angle,
  builtUp,
  channel,
  circle,
  iSection,
  pipe,
  plateGirder,
  rectangle,
  rectangularHollow,
  sectionProperties,
  tee,
  type Material,
  type Section,
  type SectionPart,
  type SectionPoint,
  type SectionProperties,
} from "../section/index.js";
import type { ModelScale, ModelSectionResult } from "./analysis.js";
import type { Model } from "./model.js";
import type { ModelBuiltUpSection, ModelSection, ModelSectionPart, ModelSectionPoint, ModelShapeSection } from "./section-types.js";

/** A model's section built in SI (m): its geometry and properties. */
export interface SectionInSI {
  /** The geometry, in m. */
  readonly geometry: Section;
  /** Its properties, in m, m^2, m^3, m^4 (transformed to the model's material when parts differ). */
  readonly properties: SectionProperties;
  /** The modulus of the reference material (Pa) for a section of several materials; absent for one material. */
  readonly referenceModulus?: number;
}

/** The dimensions the section builders take for a standard shape, in m. */
function buildShape(section: ModelShapeSection, k: number): Section {
  const d = section.dimensions;
  const get = (name: string): number => (d[name] ?? Number.NaN) * k;
  const opt = (name: string): Record<string, number> => (d[name] === undefined ? {} : { [name]: d[name] * k });
  const flanged = { depth: get("depth"), flangeWidth: get("flangeWidth"), flangeThickness: get("flangeThickness"), webThickness: get("webThickness"), ...opt("rootRadius") };
  switch (section.shape) {
    case "rectangle":
      return rectangle({ width: get("width"), depth: get("depth") });
    case "circle":
      return circle({ diameter: get("diameter") });
    case "pipe":
      return pipe({ outsideDiameter: get("outsideDiameter"), wallThickness: get("wallThickness") });
    case "i-section":
      return iSection({ ...flanged, ...opt("bottomFlangeWidth"), ...opt("bottomFlangeThickness") });
    case "tee":
      return tee(flanged);
    case "channel":
      return channel(flanged);
    case "angle":
      return angle({ verticalLeg: get("verticalLeg"), thickness: get("thickness"), ...opt("horizontalLeg"), ...opt("rootRadius") });
    case "rectangular-hollow":
      return rectangularHollow({ width: get("width"), depth: get("depth"), wallThickness: get("wallThickness"), ...opt("cornerRadius"), ...opt("innerCornerRadius") });
    default:
      return section.shape satisfies never;
  }
}

/** Whether the built-up section has parts of another material than the model's. */
export function isMultiMaterial(section: ModelSection): section is ModelBuiltUpSection {
  return section.shape === "built-up" && section.parts.some((p) => p.material !== undefined || p.modularRatio !== undefined);
}

function partInSI(p: ModelSectionPart, k: number, angleScale: number, material: (p: ModelSectionPart) => Material | undefined): SectionPart {
  const at = (q: ModelSectionPoint): SectionPoint => ({ y: q.y * k, z: q.z * k });
  const m = material(p);
  const extras = { ...(p.hole ? { hole: true } : {}), ...(m === undefined ? {} : { material: m }) };
  switch (p.kind) {
    case "polygon":
      return { kind: "polygon", points: p.points.map(at), ...extras };
    case "circle":
      return { kind: "circle", centre: at(p.centre), radius: p.radius * k, ...extras };
    case "sector":
      return { kind: "sector", centre: at(p.centre), radius: p.radius * k, startAngle: p.startAngle * angleScale, sweep: p.sweep * angleScale, ...extras };
    case "fillet":
      return { kind: "fillet", corner: at(p.corner), radius: p.radius * k, orientation: p.orientation * angleScale, ...extras };
    default:
      return p satisfies never;
  }
}

/**
 * The built-up section's parts in SI. When some part has its own material or modular ratio,
 * every solid part gets a material (its own E, n times the model's E, or the model's), and the
 * model's E is the reference modulus of the transformed section.
 */
function buildBuiltUp(section: ModelBuiltUpSection, model: Model, scale: ModelScale): { geometry: Section; referenceModulus?: number } {
  const E = model.E ?? model.material?.E;
  const reference = isMultiMaterial(section) && E !== undefined ? E * scale.modulus : undefined;
  const name = model.material?.name ?? "model material";
  const material = (p: ModelSectionPart): Material | undefined => {
    if (reference === undefined || p.hole) return undefined;
    if (p.material !== undefined) return { elasticModulus: p.material.E * scale.modulus, ...(p.material.name === undefined ? {} : { name: p.material.name }) };
    if (p.modularRatio !== undefined) return { elasticModulus: p.modularRatio * reference, name: `n = ${p.modularRatio}` };
    return { elasticModulus: reference, name };
  };
  const geometry = builtUp(section.parts.map((p) => partInSI(p, scale.sectionLength, scale.rotation, material)));
  return reference === undefined ? { geometry } : { geometry, referenceModulus: reference };
}

function build(section: ModelSection, model: Model, scale: ModelScale): { geometry: Section; referenceModulus?: number } {
  const k = scale.sectionLength;
  switch (section.shape) {
    case "plate-girder": {
      const plate = (p: { width: number; thickness: number }) => ({ width: p.width * k, thickness: p.thickness * k });
      const web = { width: section.web.depth * k, thickness: section.web.thickness * k };
      return { geometry: plateGirder({ topFlange: plate(section.topFlange), web, ...(section.bottomFlange === undefined ? {} : { bottomFlange: plate(section.bottomFlange) }) }) };
    }
    case "built-up":
      return buildBuiltUp(section, model, scale);
    default:
      return { geometry: buildShape(section, k) };
  }
}

/** Where a section builder's issue path points in the model file. */
function toModelPath(path: IssuePath, section: ModelSection): IssuePath {
  const [head, ...rest] = path;
  switch (section.shape) {
    case "plate-girder":
      // the section module calls the web's depth its width
      return head === "web" && rest[0] === "width" ? ["section", "web", "depth"] : ["section", ...path];
    case "built-up":
      return head === "parts" ? ["section", ...path] : ["section"];
    default:
      return typeof head === "string" && head in section.dimensions ? ["section", head] : ["section"];
  }
}

/**
 * Builds the model's section in SI from its dimensions (section-length unit; angles in the
 * rotation unit), reporting the section module's problems (a web wider than the flange, a wall
 * thicker than the radius, overlapping parts) under `section.<field>`.
 */
export function sectionInSI(model: Model, scale: ModelScale): SectionInSI | undefined {
  const section = model.section;
  if (section === undefined) return undefined;
  try {
    const { geometry, referenceModulus } = build(section, model, scale);
    const properties = sectionProperties(geometry, referenceModulus === undefined ? undefined : { referenceModulus });
    return referenceModulus === undefined ? { geometry, properties } : { geometry, properties, referenceModulus };
  } catch (e) {
    if (!isFlexuraError(e)) throw e;
    throw new FlexuraError(e.issues.map((i) => ({ ...i, path: toModelPath(i.path, section) })));
  }
}

/** The section's properties in the model's units, with the names and frame of the typed API's `sectionProperties`. */
export function sectionResult(shape: string, p: SectionProperties, scale: ModelScale): ModelSectionResult {
  const len = scale.sectionLength;
  return {
    shape,
    area: p.area / scale.area,
    centroid: { y: p.centroid.y / len, z: p.centroid.z / len },
    secondMomentZ: p.secondMomentZ / scale.secondMoment,
    secondMomentY: p.secondMomentY / scale.secondMoment,
    productMoment: p.productMoment / scale.secondMoment,
    extremes: { top: p.extremes.top / len, bottom: p.extremes.bottom / len },
    sectionModulus: { top: p.sectionModulus.top / scale.sectionModulus, bottom: p.sectionModulus.bottom / scale.sectionModulus },
  } as ModelSectionResult;
}

/**
 * A frozen copy of the section result with the names before 0.1 as read-only aliases that JSON
 * leaves out (not enumerable): `productMomentYZ`, `sectionModulusTop`, `sectionModulusBottom`,
 * `yTop`, `yBottom` (a positive distance). Deprecated; to be removed.
 */
export function withDeprecatedNames(s: ModelSectionResult): ModelSectionResult {
  const alias = (value: number): PropertyDescriptor => ({ value, enumerable: false, writable: false, configurable: false });
  return Object.freeze(
    Object.defineProperties(
      { ...s },
      {
        productMomentYZ: alias(s.productMoment),
        sectionModulusTop: alias(s.sectionModulus.top),
        sectionModulusBottom: alias(s.sectionModulus.bottom),
        yTop: alias(s.extremes.top),
        yBottom: alias(-s.extremes.bottom),
      },
    ),
  );
}
