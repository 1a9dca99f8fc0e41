// Building blocks of the model-file JSON Schema (draft 2020-12). The schema is written as data so
// that our own validator (validate.ts) walks the very same object that is published, and the two
// cannot drift apart.

/** A JSON Schema node as this module writes them (a plain JSON object or a boolean). */
export type SchemaNode = boolean | { readonly [keyword: string]: unknown };

/**
 * The most items a list of a model file may hold (supports, hinges, loads, segments, section parts,
 * polygon corners): parsing, analysing and drawing stay linear in the size of a model, and this
 * bound keeps each under about a second; a longer list is refused with `too-many-items`.
 */
export const MODEL_LIST_LIMIT = 10_000;

const ref = (name: string): SchemaNode => ({ $ref: `#/$defs/${name}` });

const q = (def: string, description: string): SchemaNode => ({ $ref: `#/$defs/${def}`, description });

/** The JSON `type` tags of supports, in the order documented. */
export const SUPPORT_TYPES = ["pin", "roller", "fixed", "guided", "spring"] as const;

/** The JSON `type` tags of loads, in the order documented. */
export const LOAD_TYPES = ["point", "moment", "distributed"] as const;

/** The unit-system presets a model may name in `units.system`. */
export const UNIT_SYSTEM_NAMES = ["siNewtonMetre", "siKilonewtonMetre", "siNewtonMillimetre", "usKipFoot", "usKipInch"] as const;

const unitField = (description: string): SchemaNode => ({ type: "string", minLength: 1, pattern: "\\S", description });

const units: SchemaNode = {
  type: "object",
  title: "the units of the model",
  description:
    "The unit of every plain number in the file and of every result. Fields left out take the preset named by `system`, else the defaults shown; derived units follow the base ones (moment = force*length).",
  properties: {
    system: { enum: [...UNIT_SYSTEM_NAMES], description: "A preset for every field not given here." },
    length: unitField('Member length and positions along it. Default "m".'),
    force: unitField('Point loads, reactions and shear. Default "kN".'),
    moment: unitField('Applied moments and bending moments. Default force*length, "kN*m".'),
    forcePerLength: unitField('Distributed loads. Default force/length, "kN/m".'),
    deflection: unitField('Deflections and settlements. Default "mm".'),
    rotation: unitField('Slopes and prescribed rotations. Default "rad".'),
    stress: unitField('Stresses and allowable stresses. Default "MPa".'),
    modulus: unitField("Modulus of elasticity E. Default: the stress unit."),
    sectionLength: unitField('Cross-section dimensions and fibre positions. Default "mm".'),
    area: unitField('Section areas. Default sectionLength^2, "mm^2".'),
    secondMoment: unitField('Second moments of area I. Default sectionLength^4, "mm^4".'),
    sectionModulus: unitField('Section moduli. Default sectionLength^3, "mm^3".'),
    translationalStiffness: unitField('Support spring stiffness. Default force/length, "kN/m".'),
    rotationalStiffness: unitField('Rotational spring stiffness. Default moment/rad, "kN*m/rad".'),
  },
  additionalProperties: false,
};

const supportTypeIs = (type: string): SchemaNode => ({ properties: { type: { const: type } }, required: ["type"] });

const support: SchemaNode = {
  type: "object",
  title: "a support",
  description: "A support of the member. Any type may have a settlement (positive downward).",
  required: ["at", "type"],
  properties: {
    at: q("length", "Position from the left end (length unit)."),
    type: {
      enum: [...SUPPORT_TYPES],
      description:
        "pin and roller hold deflection; fixed holds deflection and rotation; guided holds rotation only; spring resists deflection with `stiffness` and/or rotation with `rotationalStiffness`.",
    },
    stiffness: q("translationalStiffness", "Spring stiffness against deflection (spring supports only)."),
    rotationalStiffness: q("rotationalStiffness", "Spring stiffness against rotation (spring supports only)."),
    settlement: q("deflection", "Prescribed settlement, positive downward (deflection unit)."),
    rotation: q("rotation", "Prescribed rotation, positive counterclockwise (fixed and guided supports; rotation unit)."),
  },
  additionalProperties: false,
  allOf: [
    {
      if: supportTypeIs("spring"),
      then: { anyOf: [{ required: ["stiffness"] }, { required: ["rotationalStiffness"] }] },
      else: { properties: { stiffness: false, rotationalStiffness: false } },
    },
    { if: { properties: { type: { enum: ["pin", "roller", "spring"] } }, required: ["type"] }, then: { properties: { rotation: false } } },
  ],
};

const loadCase: SchemaNode = { type: "string", minLength: 1, pattern: "\\S", description: "The load case it belongs to. All loads act together, factor 1." };

const pointLoad: SchemaNode = {
  type: "object",
  title: "a point load",
  required: ["type", "at", "value"],
  properties: {
    type: { const: "point" },
    at: q("length", "Position from the left end (length unit)."),
    value: q("force", "Force, positive downward (force unit)."),
    case: loadCase,
  },
  additionalProperties: false,
};

const momentLoad: SchemaNode = {
  type: "object",
  title: "an applied moment",
  required: ["type", "at", "value"],
  properties: {
    type: { const: "moment" },
    at: q("length", "Position from the left end (length unit)."),
    value: q("moment", "Applied couple, positive counterclockwise (moment unit)."),
    case: loadCase,
  },
  additionalProperties: false,
};

const distributedLoad: SchemaNode = {
  type: "object",
  title: "a distributed load",
  required: ["type", "start"],
  properties: {
    type: { const: "distributed" },
    from: q("length", "Where it starts (length unit). Default 0."),
    to: q("length", "Where it ends (length unit). Default the member length."),
    start: q("forcePerLength", "Intensity at `from`, positive downward (force per length)."),
    end: q("forcePerLength", "Intensity at `to`, positive downward (force per length). Default `start`."),
    case: loadCase,
  },
  additionalProperties: false,
};

const loadTypeIs = (type: string, then: SchemaNode): SchemaNode => ({ if: { properties: { type: { const: type } }, required: ["type"] }, then });

const load: SchemaNode = {
  type: "object",
  title: "a load",
  description: "A point load, an applied moment or a distributed load (linearly varying).",
  required: ["type"],
  properties: { type: { enum: [...LOAD_TYPES], description: "point, moment or distributed." } },
  allOf: [loadTypeIs("point", ref("pointLoad")), loadTypeIs("moment", ref("momentLoad")), loadTypeIs("distributed", ref("distributedLoad"))],
};

const segment: SchemaNode = {
  type: "object",
  title: "a segment of constant stiffness",
  required: ["from", "to", "I"],
  properties: {
    from: q("length", "Where it starts (length unit)."),
    to: q("length", "Where it ends (length unit)."),
    E: q("modulus", "Modulus of elasticity. Default the model's `E` or `material.E`."),
    I: q("secondMoment", "Second moment of area (second-moment unit)."),
  },
  additionalProperties: false,
};

const limits: SchemaNode = {
  type: "object",
  title: "the limits to check",
  properties: {
    deflection: {
      type: ["number", "string"],
      title: 'a deflection limit such as "span/360" or a length',
      description: 'Largest deflection: "span/360" (per span; cantilevers use their length) or a length (deflection unit).',
    },
    bendingStress: q("stress", "Allowable bending stress (stress unit)."),
    shearStress: q("stress", "Allowable shear stress (stress unit)."),
  },
  additionalProperties: false,
};

const material: SchemaNode = {
  type: "object",
  title: "a material",
  required: ["E"],
  properties: {
    name: { type: "string", description: "A label for reports." },
    E: q("modulus", "Modulus of elasticity (modulus unit)."),
    yieldStrength: q("stress", "Yield strength (stress unit)."),
  },
  additionalProperties: false,
};

const quantity = (kind: string, example: string): SchemaNode => ({
  type: ["number", "string"],
  title: `a number in the model's ${kind} unit or a string with a unit, such as "${example}"`,
});

/** The `$defs` of the schema. */
export const definitions = {
  length: quantity("length", "3.5 m"),
  force: quantity("force", "18 kN"),
  moment: quantity("moment", "4 kN*m"),
  forcePerLength: quantity("force-per-length", "1.5 kip/ft"),
  deflection: quantity("deflection", "5 mm"),
  rotation: quantity("rotation", "0.002 rad"),
  stress: quantity("stress", "165 MPa"),
  modulus: quantity("modulus", "200 GPa"),
  sectionLength: quantity("section length", "300 mm"),
  secondMoment: quantity("second-moment", "120000000 mm^4"),
  translationalStiffness: quantity("stiffness", "5000 kN/m"),
  rotationalStiffness: quantity("rotational stiffness", "2000 kN*m/rad"),
  units,
  support,
  load,
  pointLoad,
  momentLoad,
  distributedLoad,
  segment,
  limits,
  material,
} as const;
