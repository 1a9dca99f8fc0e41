import { FlexuraError, isFlexuraError } from "../errors/index.js";
import { circle, iSection, pipe, rectangle, sectionProperties, tee, type Section, type SectionProperties } from "../section/index.js";
import type { ModelScale, ModelSectionResult } from "./analysis.js";
import type { ModelSection } from "./model.js";

/** A model's section built in SI (m): its geometry, properties and depth bands for shear stress. */
export interface SectionInSI {
  /** The geometry, in m. */
  readonly geometry: Section;
  /** Its properties, in m, m^2, m^3, m^4. */
  readonly properties: SectionProperties;
  /** The modulus of the reference material (Pa) for a section of several materials; absent for one material. */
  readonly referenceModulus?: number;
}

function build(shape: string, d: Readonly<Record<string, number>>): Section {
  const get = (name: string): number => d[name] ?? Number.NaN;
  switch (shape) {
    case "rectangle":
      return rectangle({ width: get("width"), depth: get("depth") });
    case "circle":
      return circle({ diameter: get("diameter") });
    case "pipe":
      return pipe({ outsideDiameter: get("outsideDiameter"), wallThickness: get("wallThickness") });
    case "i-section":
      return iSection({
        depth: get("depth"),
        flangeWidth: get("flangeWidth"),
        flangeThickness: get("flangeThickness"),
        webThickness: get("webThickness"),
        ...(d["bottomFlangeWidth"] === undefined ? {} : { bottomFlangeWidth: d["bottomFlangeWidth"] }),
        ...(d["bottomFlangeThickness"] === undefined ? {} : { bottomFlangeThickness: d["bottomFlangeThickness"] }),
      });
    case "tee":
      return tee({ depth: get("depth"), flangeWidth: get("flangeWidth"), flangeThickness: get("flangeThickness"), webThickness: get("webThickness") });
    default:
      throw new FlexuraError([{ code: "not-an-option", path: ["section", "shape"], message: `Unknown section shape ${JSON.stringify(shape)}.` }]);
  }
}

/**
 * Builds the model's section in SI from its dimensions (section-length unit), reporting the
 * section module's problems (a web wider than the flange, a wall thicker than the radius) under
 * `section.<dimension>`.
 */
export function sectionInSI(section: ModelSection, scale: ModelScale): SectionInSI {
  const dims = Object.fromEntries(Object.entries(section.dimensions).map(([k, v]) => [k, v * scale.sectionLength]));
  try {
    const geometry = build(section.shape, dims);
    const properties = sectionProperties(geometry);
    return { geometry, properties };
  } catch (e) {
    if (!isFlexuraError(e)) throw e;
    throw new FlexuraError(e.issues.map((i) => ({ ...i, path: ["section", ...(typeof i.path[0] === "string" && i.path[0] in section.dimensions ? i.path.slice(0, 1) : [])] })));
  }
}

/** The section's properties in the model's units. */
export function sectionResult(shape: string, p: SectionProperties, scale: ModelScale): ModelSectionResult {
  const len = scale.sectionLength;
  return {
    shape,
    area: p.area / scale.area,
    centroid: { y: p.centroid.y / len, z: p.centroid.z / len },
    secondMomentZ: p.secondMomentZ / scale.secondMoment,
    secondMomentY: p.secondMomentY / scale.secondMoment,
    productMomentYZ: p.productMoment / scale.secondMoment,
    sectionModulusTop: p.sectionModulus.top / scale.sectionModulus,
    sectionModulusBottom: p.sectionModulus.bottom / scale.sectionModulus,
    yTop: p.extremes.top / len,
    yBottom: -p.extremes.bottom / len,
  };
}
