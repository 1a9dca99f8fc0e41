import { attempt, type Result } from "../../errors/index.js";
import { section } from "../construct.js";
import type { Section } from "../types.js";
import { box, checkDimensions, checkShapeOptions, type ShapeOptions } from "./dimensions.js";

/**
 * Dimensions of a solid rectangle.
 *
 * @example
 * ```ts
 * const d: RectangleDimensions = { width: 100, depth: 200 };
 * ```
 */
export interface RectangleDimensions {
  /** Horizontal size b (along z), > 0 (length). */
  readonly width: number;
  /** Vertical size d (along y), > 0 (length). */
  readonly depth: number;
}

/**
 * A solid rectangle (a plate, a timber joist), centred on the origin: z from -width/2 to
 * width/2, y from -depth/2 to depth/2.
 *
 * @param dims - {@link RectangleDimensions}.
 * @param options - {@link ShapeOptions} (a material for the part).
 * @throws FlexuraError `unknown-field` (a misspelt dimension or option, with the closest name suggested), `options-invalid`, `dimension-not-positive`, `not-a-number`, `not-finite`.
 * @example
 * ```ts
 * const joist = rectangle({ width: 45, depth: 240 });
 * sectionProperties(joist).secondMomentZ; // 45 * 240^3 / 12
 * ```
 */
export function rectangle(dims: RectangleDimensions, options?: ShapeOptions): Section {
  const { found } = checkDimensions(dims, ["width", "depth"]);
  checkShapeOptions(found, options);
  found.throwIfAny();
  const { width: b, depth: d } = dims;
  return section([box(-b / 2, b / 2, -d / 2, d / 2, options?.material)]);
}

/**
 * The non-throwing form of {@link rectangle}.
 *
 * @example
 * ```ts
 * const r = tryRectangle({ width: -1, depth: 200 });
 * if (!r.ok) console.log(r.error.code); // "dimension-not-positive"
 * ```
 */
export function tryRectangle(dims: RectangleDimensions, options?: ShapeOptions): Result<Section> {
  return attempt(() => rectangle(dims, options));
}
