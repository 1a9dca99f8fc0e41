import { describeValue, fail } from "../errors/index.js";
import { isQuantityKind, type QuantityKind } from "./kinds.js";

/**
 * What a unit system gives a unit for: every {@link QuantityKind}, plus two display roles that
 * share a kind with another but are customarily shown in other units: `deflection` (a length,
 * shown small: mm or in), `sectionLength` (a length: cross-section dimensions and fibre
 * positions, mm or in) and `modulus` (a stress: elastic modulus, shown in GPa or ksi).
 */
export type DisplayRole = QuantityKind | "deflection" | "modulus" | "sectionLength";

/**
 * A named set of units, one per {@link DisplayRole}, used to show results and to read model
 * files that name their units by preset. Every unit is a string in the grammar of
 * {@link unitFactor}, of the dimension of its role.
 */
export interface UnitSystem {
  /** Tag: always `"unit-system"`. */
  readonly kind: "unit-system";
  /** The preset's name, the same as its key in {@link unitSystems}. */
  readonly name: UnitSystemName;
  /** Unit for member lengths and positions along the member. */
  readonly length: string;
  /** Unit for forces (point loads, reactions, shear). */
  readonly force: string;
  /** Unit for moments (applied couples, bending moment). */
  readonly moment: string;
  /** Unit for distributed loads. */
  readonly forcePerLength: string;
  /** Unit for stresses. */
  readonly stress: string;
  /** Unit for elastic moduli (a stress). */
  readonly modulus: string;
  /** Unit for section areas. */
  readonly area: string;
  /** Unit for second moments of area. */
  readonly secondMoment: string;
  /** Unit for section moduli. */
  readonly sectionModulus: string;
  /** Unit for translational spring stiffness. */
  readonly translationalStiffness: string;
  /** Unit for rotational spring stiffness. */
  readonly rotationalStiffness: string;
  /** Unit for rotations and slopes. */
  readonly rotation: string;
  /** Unit for plain numbers (always `""`). */
  readonly dimensionless: string;
  /** Unit for deflections (a length, usually smaller than `length`). */
  readonly deflection: string;
  /** Unit for cross-section dimensions and fibre positions (a length, usually smaller than `length`). */
  readonly sectionLength: string;
}

/** The names of the presets in {@link unitSystems}. */
export type UnitSystemName = "siNewtonMetre" | "siKilonewtonMetre" | "siNewtonMillimetre" | "usKipFoot" | "usKipInch";

const system = (s: Omit<UnitSystem, "kind" | "rotation" | "dimensionless">): UnitSystem =>
  Object.freeze({ kind: "unit-system", rotation: "rad", dimensionless: "", ...s });

/**
 * The preset unit systems, by name:
 *
 * | preset | length | force | moment | w | stress | modulus | section length | area | I | S | k | k_rot | deflection |
 * | --- | --- | --- | --- | --- | --- | --- | --- | --- | --- | --- | --- | --- | --- |
 * | `siNewtonMetre` | m | N | N*m | N/m | Pa | Pa | m | m^2 | m^4 | m^3 | N/m | N*m/rad | m |
 * | `siKilonewtonMetre` | m | kN | kN*m | kN/m | MPa | GPa | mm | mm^2 | mm^4 | mm^3 | kN/m | kN*m/rad | mm |
 * | `siNewtonMillimetre` | mm | N | N*mm | N/mm | MPa | MPa | mm | mm^2 | mm^4 | mm^3 | N/mm | N*mm/rad | mm |
 * | `usKipFoot` | ft | kip | kip*ft | kip/ft | ksi | ksi | in | in^2 | in^4 | in^3 | kip/in | kip*ft/rad | in |
 * | `usKipInch` | in | kip | kip*in | kip/in | ksi | ksi | in | in^2 | in^4 | in^3 | kip/in | kip*in/rad | in |
 *
 * Rotations are in rad and plain numbers have no unit in every preset.
 *
 * @example
 * ```ts
 * const us = unitSystems.usKipFoot;
 * convert(parseQuantity("12 kN*m", "moment").value, "N*m", us.moment); // 8.850745791327185
 * ```
 */
export const unitSystems: Readonly<Record<UnitSystemName, UnitSystem>> = Object.freeze({
  siNewtonMetre: system({
    name: "siNewtonMetre",
    length: "m",
    force: "N",
    moment: "N*m",
    forcePerLength: "N/m",
    stress: "Pa",
    modulus: "Pa",
    area: "m^2",
    secondMoment: "m^4",
    sectionModulus: "m^3",
    translationalStiffness: "N/m",
    rotationalStiffness: "N*m/rad",
    deflection: "m",
    sectionLength: "m",
  }),
  siKilonewtonMetre: system({
    name: "siKilonewtonMetre",
    length: "m",
    force: "kN",
    moment: "kN*m",
    forcePerLength: "kN/m",
    stress: "MPa",
    modulus: "GPa",
    area: "mm^2",
    secondMoment: "mm^4",
    sectionModulus: "mm^3",
    translationalStiffness: "kN/m",
    rotationalStiffness: "kN*m/rad",
    deflection: "mm",
    sectionLength: "mm",
  }),
  siNewtonMillimetre: system({
    name: "siNewtonMillimetre",
    length: "mm",
    force: "N",
    moment: "N*mm",
    forcePerLength: "N/mm",
    stress: "MPa",
    modulus: "MPa",
    area: "mm^2",
    secondMoment: "mm^4",
    sectionModulus: "mm^3",
    translationalStiffness: "N/mm",
    rotationalStiffness: "N*mm/rad",
    deflection: "mm",
    sectionLength: "mm",
  }),
  usKipFoot: system({
    name: "usKipFoot",
    length: "ft",
    force: "kip",
    moment: "kip*ft",
    forcePerLength: "kip/ft",
    stress: "ksi",
    modulus: "ksi",
    area: "in^2",
    secondMoment: "in^4",
    sectionModulus: "in^3",
    translationalStiffness: "kip/in",
    rotationalStiffness: "kip*ft/rad",
    deflection: "in",
    sectionLength: "in",
  }),
  usKipInch: system({
    name: "usKipInch",
    length: "in",
    force: "kip",
    moment: "kip*in",
    forcePerLength: "kip/in",
    stress: "ksi",
    modulus: "ksi",
    area: "in^2",
    secondMoment: "in^4",
    sectionModulus: "in^3",
    translationalStiffness: "kip/in",
    rotationalStiffness: "kip*in/rad",
    deflection: "in",
    sectionLength: "in",
  }),
});

/**
 * The kind of quantity a display role holds: `deflection` and `sectionLength` are lengths, `modulus` a stress,
 * and every other role is its own kind.
 *
 * @throws FlexuraError `unknown-display-role` when `role` is not a {@link DisplayRole} (looked up as an own property).
 * @example
 * ```ts
 * kindOfRole("deflection"); // "length"
 * ```
 */
export function kindOfRole(role: DisplayRole): QuantityKind {
  switch (role) {
    case "deflection":
    case "sectionLength":
      return "length";
    case "modulus":
      return "stress";
    default:
      if (isQuantityKind(role)) return role;
      return fail("unknown-display-role", ["role"], `${describeValue(role)} is not a display role; use a kind of quantity, "deflection", "sectionLength" or "modulus".`, {
        value: describeValue(role),
      });
  }
}
