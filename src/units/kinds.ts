/**
 * The kinds of physical quantity that flexura reads and writes, and their dimensions.
 *
 * Internally a dimension is a vector of exponents over length and force, plus an angle
 * exponent that is tracked only to tell a moment (kN*m) from a rotational stiffness (kN*m/rad).
 * As in the SI, the radian is dimensionless: 1 rad = 1.
 */
import { describeValue, fail } from "../errors/index.js";

/**
 * The name of a kind of quantity. Each has one dimension (length^a force^b):
 *
 * | kind | dimension | SI base unit |
 * | --- | --- | --- |
 * | `length` | L | m |
 * | `force` | F | N |
 * | `moment` | F L | N*m |
 * | `forcePerLength` | F / L | N/m |
 * | `stress` (also elastic modulus) | F / L^2 | Pa |
 * | `area` | L^2 | m^2 |
 * | `secondMoment` (second moment of area) | L^4 | m^4 |
 * | `sectionModulus` | L^3 | m^3 |
 * | `translationalStiffness` (spring) | F / L | N/m |
 * | `rotationalStiffness` (spring, per radian) | F L / rad | N*m/rad |
 * | `rotation` | rad (dimensionless) | rad |
 * | `dimensionless` | 1 | (no unit) |
 *
 * `forcePerLength` and `translationalStiffness` share a dimension, as do `moment` and
 * `rotationalStiffness` (the radian being 1); the kind says which is meant.
 */
export type QuantityKind =
  | "length"
  | "force"
  | "moment"
  | "forcePerLength"
  | "stress"
  | "area"
  | "secondMoment"
  | "sectionModulus"
  | "translationalStiffness"
  | "rotationalStiffness"
  | "rotation"
  | "dimensionless";

/**
 * Every {@link QuantityKind}, in a fixed order.
 *
 * @example
 * ```ts
 * quantityKinds.includes("stress"); // true
 * ```
 */
export const quantityKinds: readonly QuantityKind[] = Object.freeze([
  "length",
  "force",
  "moment",
  "forcePerLength",
  "stress",
  "area",
  "secondMoment",
  "sectionModulus",
  "translationalStiffness",
  "rotationalStiffness",
  "rotation",
  "dimensionless",
]);

/**
 * A dimension as integer exponents: `length^length * force^force * rad^angle`.
 * Two units are compatible when their `length` and `force` exponents agree and their
 * `angle` exponents agree or one of them is 0 (the radian is dimensionless).
 */
export interface Dimension {
  /** Exponent of length (1 for m, 2 for m^2, -1 for per metre). */
  readonly length: number;
  /** Exponent of force (1 for N). */
  readonly force: number;
  /** Exponent of plane angle (1 for rad, -1 for per radian); the radian itself is 1. */
  readonly angle: number;
}

const dim = (length: number, force: number, angle = 0): Dimension => Object.freeze({ length, force, angle });

const DIMENSIONS: Readonly<Record<QuantityKind, Dimension>> = Object.freeze({
  length: dim(1, 0),
  force: dim(0, 1),
  moment: dim(1, 1),
  forcePerLength: dim(-1, 1),
  stress: dim(-2, 1),
  area: dim(2, 0),
  secondMoment: dim(4, 0),
  sectionModulus: dim(3, 0),
  translationalStiffness: dim(-1, 1),
  rotationalStiffness: dim(1, 1, -1),
  rotation: dim(0, 0, 1),
  dimensionless: dim(0, 0),
});

/**
 * The dimension of a kind of quantity.
 *
 * @throws FlexuraError `unknown-quantity-kind` when `kind` is not one of {@link quantityKinds}
 *   (looked up as an own property: `"constructor"` is not a kind).
 * @example
 * ```ts
 * dimensionOfKind("stress"); // { length: -2, force: 1, angle: 0 }
 * ```
 */
export function dimensionOfKind(kind: QuantityKind): Dimension {
  if (!isQuantityKind(kind))
    fail("unknown-quantity-kind", ["kind"], `${describeValue(kind)} is not a kind of quantity; use one of ${quantityKinds.join(", ")}.`, { value: describeValue(kind) });
  return DIMENSIONS[kind];
}

/**
 * True when `value` names a {@link QuantityKind}.
 *
 * @example
 * ```ts
 * isQuantityKind("moment"); // true
 * isQuantityKind("torque"); // false
 * ```
 */
export function isQuantityKind(value: unknown): value is QuantityKind {
  return typeof value === "string" && Object.prototype.hasOwnProperty.call(DIMENSIONS, value);
}

/**
 * True when a unit of dimension `unit` may express a quantity of dimension `wanted`: the length
 * and force exponents agree, and the angle exponents agree or the unit's is 0 (so `kN*m` is
 * accepted as a rotational stiffness, but `kN*m/rad` is refused as a moment).
 *
 * @example
 * ```ts
 * fitsDimension({ length: 1, force: 1, angle: 0 }, dimensionOfKind("rotationalStiffness")); // true
 * ```
 */
export function fitsDimension(unit: Dimension, wanted: Dimension): boolean {
  return unit.length === wanted.length && unit.force === wanted.force && (unit.angle === wanted.angle || unit.angle === 0);
}

/**
 * True when values may be converted between units of these two dimensions: length and force
 * exponents agree, and the angle exponents agree or one of them is 0.
 *
 * @example
 * ```ts
 * sameDimension(dimensionOfKind("forcePerLength"), dimensionOfKind("translationalStiffness")); // true
 * ```
 */
export function sameDimension(a: Dimension, b: Dimension): boolean {
  return a.length === b.length && a.force === b.force && (a.angle === b.angle || a.angle === 0 || b.angle === 0);
}

/**
 * The kinds a unit of this dimension can express (see {@link fitsDimension}); empty when none.
 *
 * @example
 * ```ts
 * kindsOfDimension({ length: -1, force: 1, angle: 0 }); // ["forcePerLength", "translationalStiffness"]
 * ```
 */
export function kindsOfDimension(d: Dimension): readonly QuantityKind[] {
  return Object.freeze(quantityKinds.filter((k) => fitsDimension(d, DIMENSIONS[k])));
}

/**
 * A dimension in words, for messages: `"force*length^-1"`, `"length^4"`, `"1"`.
 *
 * @example
 * ```ts
 * describeDimension(dimensionOfKind("stress")); // "force*length^-2"
 * ```
 */
export function describeDimension(d: Dimension): string {
  const parts: string[] = [];
  const put = (name: string, e: number): void => {
    if (e !== 0) parts.push(e === 1 ? name : `${name}^${e}`);
  };
  put("force", d.force);
  put("length", d.length);
  put("rad", d.angle);
  return parts.length === 0 ? "1" : parts.join("*");
}
