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
    shape: "i-section",
    description: "An I (rolled beam without root fillets, or a welded plate girder whose bottom flange may differ).",
    required: [depth, flangeWidth, flangeThickness, webThickness],
    optional: [d("bottomFlangeWidth", "Bottom flange width. Default flangeWidth."), d("bottomFlangeThickness", "Bottom flange thickness. Default flangeThickness.")],
  },
  {
    shape: "tee",
    description: "A tee with its flange at the top, without root fillets.",
    required: [depth, flangeWidth, flangeThickness, webThickness],
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
