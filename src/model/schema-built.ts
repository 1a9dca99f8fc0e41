// The plate girder and the built-up section of the model-file schema: shapes given by plates and
// by parts rather than by named dimensions.
import { MODEL_LIST_LIMIT, type SchemaNode } from "./schema-parts.js";

const length = (description: string): SchemaNode => ({ $ref: "#/$defs/sectionLength", description: `${description} (section-length unit)` });
const angle = (description: string): SchemaNode => ({ $ref: "#/$defs/rotation", description: `${description} (rotation unit, radians by default)` });

/** The JSON `type` tags of the parts of a built-up section, in the order documented. */
export const SECTION_PART_TYPES = ["polygon", "circle", "sector", "fillet"] as const;

const plate: SchemaNode = {
  type: "object",
  title: "a flange plate { width, thickness }",
  required: ["width", "thickness"],
  properties: { width: length("Plate width across the member"), thickness: length("Plate thickness") },
  additionalProperties: false,
};

const webPlate: SchemaNode = {
  type: "object",
  title: "a web plate { depth, thickness }",
  required: ["depth", "thickness"],
  properties: { depth: length("Depth of the web between the flanges"), thickness: length("Web thickness") },
  additionalProperties: false,
};

const plateGirder: SchemaNode = {
  type: "object",
  title: "the plate-girder section",
  description: "A welded plate girder from its plates, the web centred under the flanges (welds not modelled).",
  required: ["shape", "topFlange", "web"],
  properties: {
    shape: { const: "plate-girder" },
    topFlange: { $ref: "#/$defs/plate", description: "The top flange plate." },
    web: { $ref: "#/$defs/webPlate", description: "The web plate." },
    bottomFlange: { $ref: "#/$defs/plate", description: "The bottom flange plate. Default: the top flange." },
  },
  additionalProperties: false,
};

const point: SchemaNode = {
  type: "object",
  title: "a point { y, z }",
  required: ["y", "z"],
  properties: { y: length("Height, positive up"), z: length("Horizontal position") },
  additionalProperties: false,
};

/** Fields every part may have besides its geometry. */
const common = {
  hole: { type: "boolean", description: "True for a hole, taken away from the solid it lies in. Default false." },
  material: { $ref: "#/$defs/material", description: "The part's own material, when it differs from the model's." },
  modularRatio: { type: "number", description: "n = E of this part / E of the model's material, instead of `material`." },
  bendingStress: {
    $ref: "#/$defs/stress",
    description: "Allowable bending stress in this part (stress unit), for a section of several materials. Parts of the model's material default to `limits.bendingStress`.",
  },
  shearStress: {
    $ref: "#/$defs/stress",
    description: "Allowable shear stress in this part (stress unit), for a section of several materials. Parts of the model's material default to `limits.shearStress`.",
  },
} as const;

/** A part may give its own `material` or a `modularRatio`, not both. */
const materialOrRatio: SchemaNode = { if: { required: ["material"] }, then: { properties: { modularRatio: false } } };

const part = (type: string, title: string, description: string, fields: Readonly<Record<string, SchemaNode>>): SchemaNode => ({
  type: "object",
  title,
  description,
  required: ["type", ...Object.keys(fields)],
  properties: { type: { const: type }, ...fields, ...common },
  additionalProperties: false,
  allOf: [materialOrRatio],
});

const polygonPart = part("polygon", "a polygon part", "A simple polygon, corners in order (either winding), not repeated.", {
  points: { type: "array", minItems: 3, maxItems: MODEL_LIST_LIMIT, items: { $ref: "#/$defs/point" }, description: "The corners, at least three." },
});

const circlePart = part("circle", "a circle part", "A full circle.", {
  centre: { $ref: "#/$defs/point", description: "The centre." },
  radius: length("Radius"),
});

const sectorPart = part("sector", "a sector part", "A circular sector (a semicircle has a sweep of half a turn); angles counterclockwise from the +z axis towards +y.", {
  centre: { $ref: "#/$defs/point", description: "Centre of the circle it is cut from." },
  radius: length("Radius"),
  startAngle: angle("Angle of the first straight edge"),
  sweep: angle("Angle swept counterclockwise, more than 0 and at most a full turn"),
});

const filletPart = part("fillet", "a fillet part", "The square of side `radius` at `corner` less the quarter disc centred on its opposite corner: the material a root fillet adds (as a hole, it rounds a corner).", {
  corner: { $ref: "#/$defs/point", description: "The corner it fills." },
  radius: length("Radius"),
  orientation: angle("Direction of its first leg, counterclockwise from +z; the second leg is a quarter turn further"),
});

const partTypeIs = (type: string, then: SchemaNode): SchemaNode => ({ if: { properties: { type: { const: type } }, required: ["type"] }, then });

const sectionPart: SchemaNode = {
  type: "object",
  title: "a part of a built-up section",
  description: "A polygon, circle, sector or fillet; solid or a hole; of the model's material or its own.",
  required: ["type"],
  properties: { type: { enum: [...SECTION_PART_TYPES], description: "polygon, circle, sector or fillet." } },
  allOf: [
    partTypeIs("polygon", { $ref: "#/$defs/polygonPart" }),
    partTypeIs("circle", { $ref: "#/$defs/circlePart" }),
    partTypeIs("sector", { $ref: "#/$defs/sectorPart" }),
    partTypeIs("fillet", { $ref: "#/$defs/filletPart" }),
  ],
};

const builtUp: SchemaNode = {
  type: "object",
  title: "the built-up section",
  description:
    "A section from parts in the section plane (y up, z horizontal, any origin): solids must touch but not overlap, holes must lie inside solids. Parts of other materials are transformed to the model's material by their modular ratio.",
  required: ["shape", "parts"],
  properties: {
    shape: { const: "built-up" },
    parts: { type: "array", minItems: 1, maxItems: MODEL_LIST_LIMIT, items: { $ref: "#/$defs/sectionPart" }, description: "The parts, in order." },
  },
  additionalProperties: false,
};

/** The `$defs` entries for plate girders and built-up sections. */
export const builtSectionDefinitions: Readonly<Record<string, SchemaNode>> = {
  plate,
  webPlate,
  plateGirder,
  point,
  sectionPart,
  polygonPart,
  circlePart,
  sectorPart,
  filletPart,
  builtUp,
};
