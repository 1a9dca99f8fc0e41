import { FlexuraError, isFlexuraError } from "../errors/index.js";
import { circle, iSection, pipe, rectangle, sectionProperties, tee, type Section, type SectionProperties } from "../section/index.js";
import type { DepthBand } from "../stress/index.js";
import type { ModelScale, ModelSectionResult } from "./analysis.js";
import type { ModelSection } from "./model.js";

/** A model's section built in SI (m): its geometry, properties and depth bands for shear stress. */
export interface SectionInSI {
  /** The geometry, in m. */
  readonly geometry: Section;
  /** Its properties, in m, m^2, m^3, m^4. */
  readonly properties: SectionProperties;
  /** Horizontal bands, y up from the centroid (m), for tau = V Q / (I b). */
  readonly bands: readonly DepthBand[];
}

const rect = (yBottom: number, yTop: number, width: number): DepthBand => ({ kind: "trapezoid", yBottom, yTop, widthBottom: width, widthTop: width });

/** Stacks rectangles of the given [height, width] from the bottom fibre, relative to the centroid. */
function stack(bottom: number, layers: readonly (readonly [number, number])[]): DepthBand[] {
  let y = bottom;
  return layers.map(([height, width]) => {
    const band = rect(y, y + height, width);
    y += height;
    return band;
  });
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

function bandsOf(shape: string, d: Readonly<Record<string, number>>, bottom: number): DepthBand[] {
  const get = (name: string): number => d[name] ?? 0;
  switch (shape) {
    case "rectangle":
      return [rect(bottom, bottom + get("depth"), get("width"))];
    case "circle":
      return [{ kind: "circle", centreY: bottom + get("diameter") / 2, radius: get("diameter") / 2 }];
    case "pipe": {
      const r = get("outsideDiameter") / 2;
      return [
        { kind: "circle", centreY: bottom + r, radius: r },
        { kind: "circle", centreY: bottom + r, radius: r - get("wallThickness"), hole: true },
      ];
    }
    case "i-section": {
      const tf = get("flangeThickness");
      const tfb = d["bottomFlangeThickness"] ?? tf;
      const bfb = d["bottomFlangeWidth"] ?? get("flangeWidth");
      return stack(bottom, [
        [tfb, bfb],
        [get("depth") - tf - tfb, get("webThickness")],
        [tf, get("flangeWidth")],
      ]);
    }
    case "tee":
      return stack(bottom, [
        [get("depth") - get("flangeThickness"), get("webThickness")],
        [get("flangeThickness"), get("flangeWidth")],
      ]);
    default:
      return [];
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
    const bottom = properties.extremes.bottom;
    return { geometry, properties, bands: bandsOf(section.shape, dims, bottom) };
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
