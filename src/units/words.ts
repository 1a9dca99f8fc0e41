import type { QuantityKind } from "./kinds.js";

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

/** A few units of each kind, for messages. */
const KIND_EXAMPLES: Readonly<Record<QuantityKind, string>> = Object.freeze({
  length: "m, mm, in or ft",
  force: "N, kN, lbf or kip",
  moment: "kN*m, N*mm, kip*ft or kip*in",
  forcePerLength: "kN/m, N/mm, kip/ft or lbf/in",
  stress: "MPa, GPa, N/mm^2, psi or ksi",
  area: "mm^2, m^2 or in^2",
  secondMoment: "mm^4, m^4 or in^4",
  sectionModulus: "mm^3, m^3 or in^3",
  translationalStiffness: "kN/m, N/mm or kip/in",
  rotationalStiffness: "kN*m/rad or kip*in/rad",
  rotation: "rad, or no unit",
  dimensionless: "no unit",
});

/** A few units of a kind, for messages: `"m, mm, in or ft"`. */
export function kindExamples(kind: QuantityKind): string {
  return KIND_EXAMPLES[kind];
}
