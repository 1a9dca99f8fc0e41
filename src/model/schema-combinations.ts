// The JSON Schema of a model's load cases, combinations and check groups (draft 2020-12), written
// as data like the rest of the schema. Case names in `factors` and `options.map` are the user's own,
// so those objects are open here and their values are checked by parseModel.
import { CASE_CATEGORIES, PRESET_NAMES } from "../combine/index.js";
import type { SchemaNode } from "./schema-parts.js";
import { MODEL_LIST_LIMIT } from "./schema-parts.js";

const PURPOSES = ["strength", "allowable-stress", "serviceability"] as const;

const name = (description: string): SchemaNode => ({ type: "string", minLength: 1, pattern: "\\S", description });

const factors: SchemaNode = {
  type: "object",
  title: "load factors by case",
  description: 'A factor (a plain number) per case name, for example { "D": 1.2, "L": 1.6 }. A case not named has factor 0.',
};

const selection: SchemaNode = {
  type: ["string", "array"],
  title: "a choice of combinations",
  description: 'Every combination of one purpose ("strength", "allowable-stress", "serviceability"), or a list of combination names.',
  items: { type: "string", minLength: 1 },
  maxItems: MODEL_LIST_LIMIT,
};

const deflectionLimit: SchemaNode = { type: ["number", "string"], title: 'a deflection limit such as "span/360" or a length' };

/** The schema definitions of cases, combinations, patterns, self-weight and check groups. */
export const combinationDefinitions = {
  loadCase: {
    type: "object",
    title: "a load case",
    required: ["name", "category"],
    properties: {
      name: name('The name the loads give in their "case".'),
      category: { enum: [...CASE_CATEGORIES], description: "What the case is, for the presets." },
      reversible: { type: "boolean", description: "Acts in both senses (wind, seismic): each combination is formed with + and - factors." },
      patterned: { type: "boolean", description: "Placed span by span on a member of more than one span (imposed floor load)." },
    },
    additionalProperties: false,
  },
  combination: {
    type: "object",
    title: "a combination or a preset",
    description: 'A preset { "preset", "options" } or one combination { "name", "purpose", "factors" }.',
    if: { required: ["preset"] },
    then: {
      properties: {
        preset: { enum: [...PRESET_NAMES], description: "A standard's combinations, held as data with their clauses." },
        options: { type: "object", title: "the preset's options", description: 'loadsNotActing, liveFactorException (ASCE 7 strength), expression, imposedCategory, snowSite (EN 1990), map { case: category }.' },
      },
      additionalProperties: false,
    },
    else: {
      required: ["name", "purpose", "factors"],
      properties: {
        name: name("A name a user reads."),
        purpose: { enum: [...PURPOSES], description: "What the combination is checked for." },
        factors,
        clause: { type: "string", description: "Where it comes from." },
      },
      additionalProperties: false,
    },
  },
  patterns: {
    type: "object",
    title: "the pattern search",
    properties: { cap: { type: "number", description: "All subsets of a patterned case's spans are searched up to this many spans (default 8, at most 16); beyond it, the standard patterns." } },
    additionalProperties: false,
  },
  selfWeight: {
    type: "object",
    title: "the member's own weight",
    required: ["unitWeight"],
    properties: {
      case: name('The dead case it forms. Default "self-weight".'),
      unitWeight: { type: ["number", "string"], description: 'Weight per volume, such as "77 kN/m^3" (a plain number is in the force unit per length unit cubed).' },
    },
    additionalProperties: false,
  },
  checkGroups: {
    type: "object",
    title: "checks per combination",
    properties: {
      stress: {
        type: "array",
        maxItems: MODEL_LIST_LIMIT,
        items: {
          type: "object",
          title: "a stress check group",
          required: ["name", "combinations"],
          properties: {
            name: name("The group's name in the utilisation table."),
            combinations: selection,
            bendingStress: { $ref: "#/$defs/stress", description: "Allowable bending stress (stress unit)." },
            shearStress: { $ref: "#/$defs/stress", description: "Allowable shear stress (stress unit)." },
          },
          additionalProperties: false,
        },
      },
      deflection: {
        type: "array",
        maxItems: MODEL_LIST_LIMIT,
        items: {
          type: "object",
          title: "a deflection check group",
          required: ["name", "limit"],
          properties: {
            name: name("The group's name in the utilisation table."),
            factors,
            combinations: selection,
            limit: { type: ["number", "string", "array"], title: 'a deflection limit such as "span/360", a length, or a list of them', items: deflectionLimit, maxItems: MODEL_LIST_LIMIT },
          },
          additionalProperties: false,
        },
      },
    },
    additionalProperties: false,
  },
} as const;

/** The top-level properties of a model file for cases and combinations. */
export const combinationProperties = {
  cases: { type: "array", maxItems: MODEL_LIST_LIMIT, items: { $ref: "#/$defs/loadCase" }, description: 'The load cases; each load names its case in "case".' },
  settlementCase: name("The case that holds the supports' settlements and prescribed rotations (they do not scale with a load factor)."),
  selfWeight: { $ref: "#/$defs/selfWeight" },
  combinations: { type: "array", maxItems: MODEL_LIST_LIMIT, items: { $ref: "#/$defs/combination" }, description: "Presets and combinations written out; needs cases." },
  patterns: { $ref: "#/$defs/patterns" },
  checkGroups: { $ref: "#/$defs/checkGroups" },
} as const;
