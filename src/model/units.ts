import { describeValue, type FlexuraIssue, issue } from "../errors/index.js";
import { dimensionOfKind, fitsDimension, tryUnitFactor, unitSystems, type QuantityKind, type UnitSystemName } from "../units/index.js";
import type { ModelScale } from "./analysis.js";
import type { ModelQuantityKind, ModelUnits } from "./model.js";
import { UNIT_SYSTEM_NAMES } from "./schema-parts.js";

/** The units module's kind of quantity behind each model unit. */
export const QUANTITY_KIND_OF: { readonly [K in ModelQuantityKind]: QuantityKind } = {
  length: "length",
  force: "force",
  moment: "moment",
  forcePerLength: "forcePerLength",
  deflection: "length",
  rotation: "rotation",
  stress: "stress",
  modulus: "stress",
  sectionLength: "length",
  area: "area",
  secondMoment: "secondMoment",
  sectionModulus: "sectionModulus",
  translationalStiffness: "translationalStiffness",
  rotationalStiffness: "rotationalStiffness",
};

/** Every model unit field, in the order documented. */
export const MODEL_UNIT_FIELDS = Object.keys(QUANTITY_KIND_OF) as readonly ModelQuantityKind[];

const SECTION_LENGTH_OF_SYSTEM: Readonly<Record<UnitSystemName, string>> = {
  siNewtonMetre: "m",
  siKilonewtonMetre: "mm",
  siNewtonMillimetre: "mm",
  usKipFoot: "in",
  usKipInch: "in",
};

/** The units a model gets when its file names none (documented in docs/model-format.md); frozen. */
export const DEFAULT_MODEL_UNITS: ModelUnits = Object.freeze({
  length: "m",
  force: "kN",
  moment: "kN*m",
  forcePerLength: "kN/m",
  deflection: "mm",
  rotation: "rad",
  stress: "MPa",
  modulus: "MPa",
  sectionLength: "mm",
  area: "mm^2",
  secondMoment: "mm^4",
  sectionModulus: "mm^3",
  translationalStiffness: "kN/m",
  rotationalStiffness: "kN*m/rad",
});

// Brackets only where the unit grammar needs them (one "/" per level; a power binds to one symbol).
const wrap = (unit: string): string => (unit.includes("/") ? `(${unit})` : unit);
const wrapPower = (unit: string): string => (/[*/\s-]/.test(unit) ? `(${unit})` : unit);

/**
 * Fills in every unit of a model: a unit given in the file wins, then the preset named by
 * `system`, then a unit derived from the base ones (moment = force*length, ...), then the defaults.
 */
export function resolveUnits(given: Readonly<Record<string, unknown>>): ModelUnits {
  const name = Object.hasOwn(given, "system") ? given["system"] : undefined;
  // Own names only: "hasOwnProperty" or "constructor" is not a preset (the schema reports it).
  const system = (UNIT_SYSTEM_NAMES as readonly unknown[]).includes(name) ? unitSystems[name as UnitSystemName] : undefined;
  const pick = (field: ModelQuantityKind, derived: string): string => {
    const value = Object.hasOwn(given, field) ? given[field] : undefined;
    if (typeof value === "string" && value.trim() !== "") return value.trim();
    if (system !== undefined) return field === "sectionLength" ? SECTION_LENGTH_OF_SYSTEM[system.name] : system[field];
    return derived;
  };
  const length = pick("length", DEFAULT_MODEL_UNITS.length);
  const force = pick("force", DEFAULT_MODEL_UNITS.force);
  const moment = pick("moment", `${wrap(force)}*${wrap(length)}`);
  const stress = pick("stress", DEFAULT_MODEL_UNITS.stress);
  const sectionLength = pick("sectionLength", DEFAULT_MODEL_UNITS.sectionLength);
  return {
    length,
    force,
    moment,
    forcePerLength: pick("forcePerLength", `${wrap(force)}/${wrap(length)}`),
    deflection: pick("deflection", DEFAULT_MODEL_UNITS.deflection),
    rotation: pick("rotation", DEFAULT_MODEL_UNITS.rotation),
    stress,
    modulus: pick("modulus", stress),
    sectionLength,
    area: pick("area", `${wrapPower(sectionLength)}^2`),
    secondMoment: pick("secondMoment", `${wrapPower(sectionLength)}^4`),
    sectionModulus: pick("sectionModulus", `${wrapPower(sectionLength)}^3`),
    translationalStiffness: pick("translationalStiffness", `${wrap(force)}/${wrap(length)}`),
    rotationalStiffness: pick("rotationalStiffness", `${wrap(moment)}/rad`),
  };
}

/**
 * The SI scale of every model unit (SI base units per model unit). Units that cannot be read, or
 * that measure the wrong thing, are reported as issues under `units.<field>` (when `given(field)`,
 * the field having been written in the file rather than derived) and left out.
 */
export function scaleOfUnits(units: ModelUnits, found: FlexuraIssue[], given: (field: ModelQuantityKind) => boolean = () => true): Partial<ModelScale> {
  const scale: { -readonly [K in ModelQuantityKind]?: number } = {};
  for (const field of MODEL_UNIT_FIELDS) {
    const unit = units[field];
    const path = ["units", field];
    const read = tryUnitFactor(unit, { path });
    // A unit that was not given is derived from given ones: a problem there is reported once, where it was given.
    if (!read.ok) {
      if (given(field)) found.push(...read.error.issues);
      continue;
    }
    const kind = QUANTITY_KIND_OF[field];
    if (!fitsDimension(read.value.dimension, dimensionOfKind(kind))) {
      if (given(field)) found.push(
        issue("wrong-dimension", path, `The unit ${describeValue(unit)} cannot measure ${field === kind ? field : `${field} (a ${kind})`}; use a unit such as "${DEFAULT_MODEL_UNITS[field]}".`, {
          unit,
          expected: kind,
        }),
      );
      continue;
    }
    scale[field] = read.value.scale;
  }
  return scale;
}
