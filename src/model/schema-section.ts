// The `section` part of the model-file schema: one standard shape with its named dimensions.
import type { SchemaNode } from "./schema-parts.js";

/** A dimension of a shape: its name and what it measures (for the schema's descriptions). */
interface Dimension {
  readonly name: string;
  readonly description: string;
}

/** A standard shape of a model file: its `shape` name and its dimensions. */
export interface ShapeSpec {
  /** The `shape` value in the file. */
  readonly shape: string;
  /** What it is. */
  readonly description: string;
  /** Dimensions that must be given. */
  readonly required: readonly Dimension[];
  /** Dimensions that may be given. */
  readonly optional: readonly Dimension[];
}

const d = (name: string, description: string): Dimension => ({ name, description });
const depth = d("depth", "Overall depth, top to bottom.");
const flangeWidth = d("flangeWidth", "Flange width.");
const flangeThickness = d("flangeThickness", "Flange thickness.");
const webThickness = d("webThickness", "Web thickness.");

/** Every standard shape a model file may name, with its dimensions (all in the section-length unit). */
export const SHAPES: readonly ShapeSpec[] = [
  { shape: "rectangle", description: "A solid rectangle.", required: [d("width", "Width."), depth], optional: [] },
  { shape: "circle", description: "A solid round bar.", required: [d("diameter", "Diameter.")], optional: [] },
  {
    shape: "pipe",
    description: "A circular tube.",
    required: [d("outsideDiameter", "Outside diameter."), d("wallThickness", "Wall thickness.")],
    optional: [],
  },
  {
    shape: "rectangular-hollow",
    description: "A rectangular tube with square corners.",
    required: [d("width", "Outside width."), d("depth", "Outside depth."), d("wallThickness", "Wall thickness.")],
    optional: [],
  },
  {
    shape: "i-section",
    description: "A doubly symmetric I (wide-flange or universal beam), without root fillets.",
    required: [depth, flangeWidth, flangeThickness, webThickness],
    optional: [],
  },
  {
    shape: "tee",
    description: "A tee with its flange at the top.",
    required: [depth, flangeWidth, flangeThickness, webThickness],
    optional: [],
  },
  {
    shape: "channel",
    description: "A channel with its web vertical and flanges to the right.",
    required: [depth, flangeWidth, flangeThickness, webThickness],
    optional: [],
  },
  {
    shape: "angle",
    description: "An angle with one leg vertical and one horizontal, the heel at bottom left.",
    required: [d("depth", "Length of the vertical leg."), d("width", "Length of the horizontal leg."), d("thickness", "Leg thickness.")],
    optional: [],
  },
  {
    shape: "plate-girder",
    description: "An I built from three plates, the flanges may differ.",
    required: [
      d("webDepth", "Web depth, between the flanges."),
      webThickness,
      d("topFlangeWidth", "Top flange width."),
      d("topFlangeThickness", "Top flange thickness."),
      d("bottomFlangeWidth", "Bottom flange width."),
      d("bottomFlangeThickness", "Bottom flange thickness."),
    ],
    optional: [],
  },
];

const dimensionSchema = (dim: Dimension): SchemaNode => ({ $ref: "#/$defs/sectionLength", description: `${dim.description} (section-length unit)` });

const shapeSchema = (spec: ShapeSpec): SchemaNode => ({
  type: "object",
  title: `the ${spec.shape} section`,
  description: spec.description,
  required: ["shape", ...spec.required.map((x) => x.name)],
  properties: {
    shape: { const: spec.shape },
    ...Object.fromEntries([...spec.required, ...spec.optional].map((x) => [x.name, dimensionSchema(x)])),
  },
  additionalProperties: false,
});

/** The `$defs` entries for sections. */
export const sectionDefinitions: Readonly<Record<string, SchemaNode>> = {
  section: {
    type: "object",
    title: "a cross-section",
    description: "A standard shape and its dimensions (section-length unit). Give `material` for its E. Bending is about the horizontal axis.",
    required: ["shape"],
    properties: { shape: { enum: SHAPES.map((s) => s.shape), description: "The shape; its dimensions follow." } },
    allOf: SHAPES.map((s) => ({ if: { properties: { shape: { const: s.shape } }, required: ["shape"] }, then: shapeSchema(s) })),
  },
};
