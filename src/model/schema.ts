import { MODEL_FORMAT_VERSION } from "./model.js";
import { definitions, MODEL_LIST_LIMIT } from "./schema-parts.js";
import { combinationDefinitions, combinationProperties } from "./schema-combinations.js";
import { sectionDefinitions } from "./schema-section.js";

/** Freezes plain data and everything it holds, so that no caller can change what it shares. */
function deepFreeze<T>(value: T): T {
  if (typeof value === "object" && value !== null && !Object.isFrozen(value)) {
    Object.freeze(value);
    for (const child of Object.values(value)) deepFreeze(child);
  }
  return value;
}

/** The `$id` of the published model-file schema. */
export const MODEL_SCHEMA_ID = "urn:flexura:model-schema:1";

/** A JSON Schema document as a plain JSON object (keywords to values). */
export interface ModelJsonSchema {
  /** A schema keyword (`type`, `properties`, `$defs`, ...) and its value. */
  readonly [keyword: string]: unknown;
}

/**
 * The JSON Schema (draft 2020-12) of flexura model files, as a plain object: the same object that
 * is published in the package as `flexura/schema.json` (file `schema/flexura-model.schema.json`)
 * and that {@link parseModel} checks structure against. Point an editor at it (`"$schema"` in the
 * model file, or the editor's schema settings) to get completion and checking as you type.
 *
 * It is frozen all the way down: code that tries to change it gets a TypeError (in strict mode),
 * and {@link parseModel} always checks against the published schema.
 *
 * The schema checks structure (fields, types, allowed values); {@link parseModel} also checks
 * meaning (units, positions inside the member, a source of stiffness).
 *
 * @example
 * ```ts
 * console.log(JSON.stringify(modelSchema, null, 2)); // what `flexura schema` prints
 * ```
 */
export const modelSchema: ModelJsonSchema = deepFreeze({
  $schema: "https://json-schema.org/draft/2020-12/schema",
  $id: MODEL_SCHEMA_ID,
  title: "a flexura model",
  description:
    "A beam for flexura to analyse: its length, stiffness, supports, loads, optional cross-section and limits. Any number may instead be a string with its own unit, such as \"3.5 m\" or \"29000 ksi\"; plain numbers are in the model's `units`.",
  type: "object",
  required: ["length", "supports"],
  properties: {
    $schema: { type: "string", description: "The schema this file follows (for editors)." },
    format: { enum: [MODEL_FORMAT_VERSION], description: `The model-file format version. Default ${MODEL_FORMAT_VERSION}.` },
    name: { type: "string", description: "A label for reports." },
    description: { type: "string", description: "A longer description for reports." },
    units: { $ref: "#/$defs/units" },
    length: { $ref: "#/$defs/length", description: "Member length (length unit)." },
    E: { $ref: "#/$defs/modulus", description: "Modulus of elasticity of the member (modulus unit). May come from `material` instead." },
    I: {
      $ref: "#/$defs/secondMoment",
      description: "Second moment of area of the member (second-moment unit). May come from `section` or `segments` instead.",
    },
    segments: {
      type: "array",
      minItems: 1,
      maxItems: MODEL_LIST_LIMIT,
      items: { $ref: "#/$defs/segment" },
      description: "Stretches of constant E and I for a stepped member, covering it from 0 to its length.",
    },
    section: { $ref: "#/$defs/section" },
    material: { $ref: "#/$defs/material" },
    supports: { type: "array", minItems: 1, maxItems: MODEL_LIST_LIMIT, items: { $ref: "#/$defs/support" }, description: "The supports of the member." },
    hinges: { type: "array", maxItems: MODEL_LIST_LIMIT, items: { $ref: "#/$defs/length" }, description: "Positions of internal hinges (length unit)." },
    loads: { type: "array", maxItems: MODEL_LIST_LIMIT, items: { $ref: "#/$defs/load" }, description: "The loads; all act together with factor 1 in the main results, and by case in the combinations." },
    limits: { $ref: "#/$defs/limits" },
    ...combinationProperties,
  },
  additionalProperties: false,
  $defs: { ...definitions, ...sectionDefinitions, ...combinationDefinitions },
});
