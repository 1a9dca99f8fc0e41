import type { QuantityKind } from "./kinds.js";
import { unitSystems } from "./systems.js";

/** Each kind in words, for messages: `"a force per length"`. */
export const KIND_WORDS: Readonly<Record<QuantityKind, string>> = Object.freeze({
  length: "a length",
  force: "a force",
  moment: "a moment",
  forcePerLength: "a force per length",
  stress: "a stress or modulus",
  area: "an area",
  secondMoment: "a second moment of area",
  sectionModulus: "a section modulus",
  translationalStiffness: "a translational stiffness",
  rotationalStiffness: "a rotational stiffness",
  rotation: "a rotation",
  dimensionless: "a plain number",
});

/** The units the presets use for a kind, for messages: `"m, mm, ft or in"`. */
export function kindExamples(kind: QuantityKind): string {
  const units = [...new Set(Object.values(unitSystems).map((system) => system[kind]))].filter((u) => u !== "");
  return units.length > 1 ? `${units.slice(0, -1).join(", ")} or ${units[units.length - 1] ?? ""}` : (units[0] ?? "");
}
