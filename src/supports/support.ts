/**
 * The kinds of support:
 * - `pin`: holds deflection and holds the member along its axis; free to rotate.
 * - `roller`: holds deflection only; free to rotate and to slide along the axis.
 * - `fixed`: holds deflection and rotation (and the axis).
 * - `guided`: holds rotation (and the axis) but lets the member deflect: a sliding clamp.
 * - `spring`: an elastic support with a translational `stiffness` and/or a `rotationalStiffness`.
 */
export type SupportKind = "pin" | "roller" | "fixed" | "guided" | "spring";

/**
 * A support at one point of the member. A free end is simply an end with no support.
 *
 * @example
 * ```ts
 * const left: Support = { kind: "pin", at: 0 };
 * const sinking: Support = { kind: "roller", at: 6, settlement: 0.002 }; // prescribed 2 mm down (in m)
 * const pad: Support = { kind: "spring", at: 3, stiffness: 5e6 }; // N/m
 * ```
 */
export interface Support {
  /** What the support holds; see {@link SupportKind}. */
  readonly kind: SupportKind;
  /** Position from the left end (length units), within `[0, length]`. */
  readonly at: number;
  /** Spring supports: translational stiffness (force per length), positive. */
  readonly stiffness?: number;
  /** Spring supports: rotational stiffness (force * length per radian), positive. */
  readonly rotationalStiffness?: number;
  /**
   * Prescribed settlement, POSITIVE DOWNWARD (length units): the support point moves down by
   * this much (for a spring, its base does). For supports that hold deflection: pin, roller,
   * fixed, and spring with `stiffness`.
   */
  readonly settlement?: number;
  /**
   * Prescribed rotation, positive counterclockwise (radians). For supports that hold rotation:
   * fixed, guided, and spring with `rotationalStiffness` (its base turns by this much).
   */
  readonly rotation?: number;
}

/**
 * True when the support holds (rigidly or elastically) the deflection at its point.
 *
 * @example
 * ```ts
 * restrainsDeflection({ kind: "guided", at: 0 }); // false
 * ```
 */
export function restrainsDeflection(support: Support): boolean {
  switch (support.kind) {
    case "pin":
    case "roller":
    case "fixed":
      return true;
    case "guided":
      return false;
    case "spring":
      return support.stiffness !== undefined;
    default:
      return support.kind satisfies never;
  }
}

/**
 * True when the support holds (rigidly or elastically) the rotation at its point.
 *
 * @example
 * ```ts
 * restrainsRotation({ kind: "fixed", at: 0 }); // true
 * ```
 */
export function restrainsRotation(support: Support): boolean {
  switch (support.kind) {
    case "pin":
    case "roller":
      return false;
    case "fixed":
    case "guided":
      return true;
    case "spring":
      return support.rotationalStiffness !== undefined;
    default:
      return support.kind satisfies never;
  }
}

/**
 * True when the support holds the member along its axis (pin, fixed, guided). A member needs
 * at least one such support, or it is free to slide along its axis.
 *
 * @example
 * ```ts
 * restrainsAxis({ kind: "roller", at: 0 }); // false
 * ```
 */
export function restrainsAxis(support: Support): boolean {
  switch (support.kind) {
    case "pin":
    case "fixed":
    case "guided":
      return true;
    case "roller":
    case "spring":
      return false;
    default:
      return support.kind satisfies never;
  }
}
