import { attempt, type Result } from "../../errors/index.js";
import { section } from "../construct.js";
import type { Section } from "../types.js";
import { checkDimensions, checkShapeOptions, withExtras, type ShapeOptions } from "./dimensions.js";

/**
 * Dimensions of a solid circle (a round bar).
 *
 * @example
 * ```ts
 * const d: CircleDimensions = { diameter: 50 };
 * ```
 */
export interface CircleDimensions {
  /** Diameter, > 0 (length). */
  readonly diameter: number;
}

/**
 * Dimensions of a hollow circle (a pipe or round tube).
 *
 * @example
 * ```ts
 * const d: PipeDimensions = { outsideDiameter: 168.3, wallThickness: 7.1 };
 * ```
 */
export interface PipeDimensions {
  /** Outside diameter, > 0 (length). */
  readonly outsideDiameter: number;
  /** Wall thickness, > 0 and less than half the outside diameter (length). */
  readonly wallThickness: number;
}

/**
 * A solid circle centred on the origin (exact, not a polygon).
 *
 * @param dims - {@link CircleDimensions}.
 * @param options - {@link ShapeOptions}.
 * @throws FlexuraError `unknown-field` (a misspelt dimension or option, with the closest name suggested), `options-invalid`, `dimension-not-positive`, `not-a-number`, `not-finite`.
 * @example
 * ```ts
 * sectionProperties(circle({ diameter: 50 })).secondMomentZ; // pi d^4 / 64
 * ```
 */
export function circle(dims: CircleDimensions, options?: ShapeOptions): Section {
  const { found } = checkDimensions(dims, ["diameter"]);
  checkShapeOptions(found, options);
  found.throwIfAny();
  return section([withExtras({ kind: "circle", centre: { y: 0, z: 0 }, radius: dims.diameter / 2 }, options?.material)]);
}

/**
 * A hollow circle (pipe, round tube) centred on the origin, exact.
 *
 * @param dims - {@link PipeDimensions}.
 * @param options - {@link ShapeOptions}.
 * @throws FlexuraError `unknown-field` (a misspelt dimension or option, with the closest name suggested), `options-invalid`, `dimension-not-positive`, `wall-too-thick` (wall at least half the
 *   diameter: use {@link circle}), `not-a-number`, `not-finite`.
 * @example
 * ```ts
 * sectionProperties(pipe({ outsideDiameter: 100, wallThickness: 5 })).area; // pi (100^2 - 90^2) / 4
 * ```
 */
export function pipe(dims: PipeDimensions, options?: ShapeOptions): Section {
  const { found, ok } = checkDimensions(dims, ["outsideDiameter", "wallThickness"]);
  checkShapeOptions(found, options);
  if (!ok) found.throwIfAny();
  if (dims.wallThickness * 2 >= dims.outsideDiameter) {
    found.add("wall-too-thick", ["wallThickness"], `The wall (${dims.wallThickness}) must be thinner than half the outside diameter (${dims.outsideDiameter}); for a solid bar use circle().`, {
      wallThickness: dims.wallThickness,
      outsideDiameter: dims.outsideDiameter,
    });
  }
  found.throwIfAny();
  const r = dims.outsideDiameter / 2;
  const m = options?.material;
  return section([
    withExtras({ kind: "circle", centre: { y: 0, z: 0 }, radius: r }, m),
    withExtras({ kind: "circle", centre: { y: 0, z: 0 }, radius: r - dims.wallThickness }, m, true),
  ]);
}

/**
 * The non-throwing form of {@link circle}.
 *
 * @example
 * ```ts
 * const r = tryCircle({ diameter: 0 });
 * if (!r.ok) console.log(r.error.code); // "dimension-not-positive"
 * ```
 */
export function tryCircle(dims: CircleDimensions, options?: ShapeOptions): Result<Section> {
  return attempt(() => circle(dims, options));
}

/**
 * The non-throwing form of {@link pipe}.
 *
 * @example
 * ```ts
 * const r = tryPipe({ outsideDiameter: 10, wallThickness: 5 });
 * if (!r.ok) console.log(r.error.code); // "wall-too-thick"
 * ```
 */
export function tryPipe(dims: PipeDimensions, options?: ShapeOptions): Result<Section> {
  return attempt(() => pipe(dims, options));
}
