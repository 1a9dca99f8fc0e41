// The `section` part of the model-file schema: one standard shape with its named dimensions.
import type { SchemaNode } from "./schema-parts.js";
import { builtSectionDefinitions } from "./schema-built.js";

/** A dimension of a shape: its name, what it measures (for the schema's descriptions), and whether 0 is allowed. */
interface Dimension {
  readonly name: string;
  readonly description: string;
  /** True for a radius that may be 0 (a sharp corner); other dimensions must be above 0. */
  readonly zeroAllowed?: boolean;
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

const d = (name: string, description: string, zeroAllowed = false): Dimension => ({ name, description, ...(zeroAllowed ? { zeroAllowed } : {}) });
const depth = d("depth", "Overall depth, top to bottom.");
const flangeWidth = d("flangeWidth", "Flange width.");
const flangeThickness = d("flangeThickness", "Flange thickness.");
const webThickness = d("webThickness", "Web thickness.");
const rootRadius = d("rootRadius", "Root fillet radius where web meets flange (0 or more). Default 0.", true);

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
    optional: [d("bottomFlangeWidth", "Bottom flange width. Default flangeWidth."), d("bottomFlangeThickness", "Bottom flange thickness. Default flangeThickness."), rootRadius],
  },
  {
    shape: "tee",
    description: "A tee with its flange at the top.",
    required: [depth, flangeWidth, flangeThickness, webThickness],
    optional: [rootRadius],
  },
  {
    shape: "channel",
    description: "A channel with parallel flanges (use the mean thickness of a sloping flange), web on the left, flanges pointing right.",
    required: [depth, d("flangeWidth", "Flange width, back of web to flange tip."), flangeThickness, webThickness],
    optional: [rootRadius],
  },
  {
    shape: "angle",
    description: "An angle (L) with its heel at the bottom left: one leg up, one along the bottom. Its principal axes are inclined.",
    required: [d("verticalLeg", "Overall length of the vertical leg."), d("thickness", "Thickness of both legs.")],
    optional: [d("horizontalLeg", "Overall length of the horizontal leg. Default verticalLeg."), d("rootRadius", "Root fillet radius in the inside corner (0 or more). Default 0.", true)],
  },
  {
    shape: "rectangular-hollow",
    description: "A rectangular or square hollow section (box, tube), corners square or rounded as circular arcs.",
    required: [d("width", "Outside width."), depth, d("wallThickness", "Wall thickness.")],
    optional: [d("cornerRadius", "Outside corner radius (0 or more). Default 0.", true), d("innerCornerRadius", "Inside corner radius (0 or more). Default cornerRadius less wallThickness, or 0.", true)],
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

const shapeIs = (shape: string, then: SchemaNode): SchemaNode => ({ if: { properties: { shape: { const: shape } }, required: ["shape"] }, then });

/** Every `shape` a model file may name: the standard shapes, then the plate girder and the built-up section. */
export const SECTION_SHAPES: readonly string[] = [...SHAPES.map((s) => s.shape), "plate-girder", "built-up"];

/** The `$defs` entries for sections. */
export const sectionDefinitions: Readonly<Record<string, SchemaNode>> = {
  section: {
    type: "object",
    title: "a cross-section",
    description:
      "A standard shape and its dimensions, a plate girder by its plates, or a section built up from parts (section-length unit). Give `material` for its E. Bending is about the horizontal axis.",
    required: ["shape"],
    properties: { shape: { enum: [...SECTION_SHAPES], description: "The shape; its dimensions follow." } },
    allOf: [...SHAPES.map((s) => shapeIs(s.shape, shapeSchema(s))), shapeIs("plate-girder", { $ref: "#/$defs/plateGirder" }), shapeIs("built-up", { $ref: "#/$defs/builtUp" })],
  },
  ...builtSectionDefinitions,
};
