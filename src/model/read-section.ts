// Reads a model file's `section` (its structure already checked against the schema) into a typed
// section, every length in the section-length unit and every angle in the rotation unit.
import type { IssuePath } from "../errors/index.js";
import { readMaterial } from "./read-parts.js";
import { arrayAt, objectAt, readQuantity, requireNotNegative, requirePositive, type Reader } from "./reader.js";
import { SHAPES } from "./schema-section.js";
import type { ModelPlate, ModelSection, ModelSectionPart, ModelSectionPoint, ModelShapeName, ModelWebPlate } from "./section-types.js";

type Json = Readonly<Record<string, unknown>>;

function readLength(reader: Reader, value: unknown, path: IssuePath, what: string, zeroAllowed = false): number | undefined {
  const read = readQuantity(reader, value, "sectionLength", path);
  if (zeroAllowed) requireNotNegative(reader, read, path, what);
  else requirePositive(reader, read, path, what);
  return read;
}

function readShape(reader: Reader, s: Json, shape: string): ModelSection | undefined {
  const spec = SHAPES.find((x) => x.shape === shape);
  if (spec === undefined) return undefined;
  const dimensions: Record<string, number> = {};
  for (const dim of [...spec.required, ...spec.optional]) {
    const read = readLength(reader, s[dim.name], ["section", dim.name], `section's ${dim.name}`, dim.zeroAllowed === true);
    if (read !== undefined) dimensions[dim.name] = read;
  }
  return { shape: spec.shape as ModelShapeName, dimensions };
}

function readPlate(reader: Reader, value: unknown, name: string): ModelPlate | undefined {
  const p = objectAt(value);
  const width = readLength(reader, p["width"], ["section", name, "width"], `${name} width`);
  const thickness = readLength(reader, p["thickness"], ["section", name, "thickness"], `${name} thickness`);
  return width === undefined || thickness === undefined ? undefined : { width, thickness };
}

function readWeb(reader: Reader, value: unknown): ModelWebPlate | undefined {
  const p = objectAt(value);
  const depth = readLength(reader, p["depth"], ["section", "web", "depth"], "web depth");
  const thickness = readLength(reader, p["thickness"], ["section", "web", "thickness"], "web thickness");
  return depth === undefined || thickness === undefined ? undefined : { depth, thickness };
}

function readPlateGirder(reader: Reader, s: Json): ModelSection | undefined {
  const topFlange = readPlate(reader, s["topFlange"], "topFlange");
  const web = readWeb(reader, s["web"]);
  const bottomFlange = s["bottomFlange"] === undefined ? undefined : readPlate(reader, s["bottomFlange"], "bottomFlange");
  if (topFlange === undefined || web === undefined || (s["bottomFlange"] !== undefined && bottomFlange === undefined)) return undefined;
  return { shape: "plate-girder", topFlange, web, ...(bottomFlange === undefined ? {} : { bottomFlange }) };
}

function readPoint(reader: Reader, value: unknown, path: IssuePath): ModelSectionPoint | undefined {
  const p = objectAt(value);
  const y = readQuantity(reader, p["y"], "sectionLength", [...path, "y"]);
  const z = readQuantity(reader, p["z"], "sectionLength", [...path, "z"]);
  return y === undefined || z === undefined ? undefined : { y, z };
}

/** Reads one part of a built-up section, or undefined when some field cannot be read (already reported). */
function readPart(reader: Reader, value: unknown, path: IssuePath): ModelSectionPart | undefined {
  const p = objectAt(value);
  const material = readMaterial(reader, p["material"], [...path, "material"]);
  const ratio = p["modularRatio"];
  if (typeof ratio === "number") requirePositive(reader, ratio, [...path, "modularRatio"], "modular ratio");
  const bendingStress = readQuantity(reader, p["bendingStress"], "stress", [...path, "bendingStress"]);
  requirePositive(reader, bendingStress, [...path, "bendingStress"], "allowable bending stress");
  const shearStress = readQuantity(reader, p["shearStress"], "stress", [...path, "shearStress"]);
  requirePositive(reader, shearStress, [...path, "shearStress"], "allowable shear stress");
  const common = {
    hole: p["hole"] === true,
    ...(material === undefined ? {} : { material }),
    ...(typeof ratio === "number" && Number.isFinite(ratio) ? { modularRatio: ratio } : {}),
    ...(bendingStress === undefined ? {} : { bendingStress }),
    ...(shearStress === undefined ? {} : { shearStress }),
  };
  const centreOf = (name: string): ModelSectionPoint | undefined => readPoint(reader, p[name], [...path, name]);
  const radius = (): number | undefined => readLength(reader, p["radius"], [...path, "radius"], "radius");
  const angle = (name: string): number | undefined => readQuantity(reader, p[name], "rotation", [...path, name]);
  switch (p["type"]) {
    case "polygon": {
      const points = arrayAt(p["points"]).map((q, i) => readPoint(reader, q, [...path, "points", i]));
      return points.every((q) => q !== undefined) ? { kind: "polygon", points: points, ...common } : undefined;
    }
    case "circle": {
      const [centre, r] = [centreOf("centre"), radius()];
      return centre === undefined || r === undefined ? undefined : { kind: "circle", centre, radius: r, ...common };
    }
    case "sector": {
      const [centre, r, startAngle, sweep] = [centreOf("centre"), radius(), angle("startAngle"), angle("sweep")];
      if (centre === undefined || r === undefined || startAngle === undefined || sweep === undefined) return undefined;
      return { kind: "sector", centre, radius: r, startAngle, sweep, ...common };
    }
    case "fillet": {
      const [corner, r, orientation] = [centreOf("corner"), radius(), angle("orientation")];
      return corner === undefined || r === undefined || orientation === undefined ? undefined : { kind: "fillet", corner, radius: r, orientation, ...common };
    }
    default:
      return undefined; // an unknown or missing type is a structural issue
  }
}

function readBuiltUp(reader: Reader, s: Json): ModelSection | undefined {
  const parts = arrayAt(s["parts"]).map((p, i) => readPart(reader, p, ["section", "parts", i]));
  return parts.length > 0 && parts.every((p) => p !== undefined) ? { shape: "built-up", parts: parts } : undefined;
}

/**
 * Reads the section: a standard shape's dimensions (each above 0; radii 0 or more), a plate
 * girder's plates, or a built-up section's parts; undefined for an unknown shape or a field that
 * cannot be read (reported elsewhere or here).
 */
export function readSection(reader: Reader, value: unknown): ModelSection | undefined {
  const s = objectAt(value);
  switch (s["shape"]) {
    case "plate-girder":
      return readPlateGirder(reader, s);
    case "built-up":
      return readBuiltUp(reader, s);
    default:
      return readShape(reader, s, String(s["shape"]));
  }
}
