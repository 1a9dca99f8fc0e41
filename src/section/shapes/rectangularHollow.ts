import { attempt, type Result } from "../../errors/index.js";
import { section } from "../construct.js";
import type { Section } from "../types.js";
import { cornerFillets } from "./corners.js";
import { box, checkDimensions, checkShapeOptions, type ShapeOptions } from "./dimensions.js";

/**
 * Dimensions of a rectangular (or square) hollow section.
 *
 * @example
 * ```ts
 * const d: RectangularHollowDimensions = { width: 100, depth: 200, wallThickness: 8, cornerRadius: 16 };
 * ```
 */
export interface RectangularHollowDimensions {
  /** Outside width (along z), > 0 (length). */
  readonly width: number;
  /** Outside depth (along y), > 0 (length). */
  readonly depth: number;
  /** Wall thickness, > 0 and less than half the width and the depth (length). */
  readonly wallThickness: number;
  /** Outside corner radius, >= 0 (length); default 0 (square corners). */
  readonly cornerRadius?: number;
  /** Inside corner radius, >= 0 (length); default: the outside radius less the wall thickness, or 0. */
  readonly innerCornerRadius?: number;
}

/**
 * A rectangular hollow section (box, tube), centred on the origin, with optional rounded
 * corners modelled exactly as circular arcs. Parts: the outer rectangle, four fillet holes
 * rounding its corners, the inner rectangle as a hole, four fillets rounding the hole's corners.
 *
 * @param dims - {@link RectangularHollowDimensions}.
 * @param options - {@link ShapeOptions}.
 * @throws FlexuraError `unknown-field` (a misspelt dimension or option, with the closest name suggested), `options-invalid`, `dimension-not-positive`, `dimension-negative`, `wall-too-thick`,
 *   `corner-radius-too-large`, `not-a-number`, `not-finite`.
 * @example
 * ```ts
 * const box = rectangularHollow({ width: 100, depth: 200, wallThickness: 8, cornerRadius: 16 });
 * sectionProperties(box).secondMomentZ;
 * ```
 */
export function rectangularHollow(dims: RectangularHollowDimensions, options?: ShapeOptions): Section {
  const { found, ok } = checkDimensions(dims, ["width", "depth", "wallThickness"], ["cornerRadius", "innerCornerRadius"]);
  checkShapeOptions(found, options);
  if (!ok) found.throwIfAny();
  const { width: b, depth: d, wallThickness: t } = dims;
  const ro = dims.cornerRadius ?? 0;
  const ri = dims.innerCornerRadius ?? Math.max(0, ro - t);
  if (2 * t >= Math.min(b, d)) {
    found.add("wall-too-thick", ["wallThickness"], `The wall (${t}) must be thinner than half the width and half the depth (${Math.min(b, d) / 2}).`, { wallThickness: t });
  } else if (2 * ri > Math.min(b, d) - 2 * t) {
    found.add("corner-radius-too-large", ["innerCornerRadius"], `The inside corner radius (${ri}) must be at most half the inside width and depth (${(Math.min(b, d) - 2 * t) / 2}).`, { innerCornerRadius: ri });
  }
  if (2 * ro > Math.min(b, d)) {
    found.add("corner-radius-too-large", ["cornerRadius"], `The outside corner radius (${ro}) must be at most half the width and depth (${Math.min(b, d) / 2}).`, { cornerRadius: ro });
  }
  found.throwIfAny();
  const m = options?.material;
  return section([
    box(-b / 2, b / 2, -d / 2, d / 2, m),
    ...cornerFillets(b / 2, d / 2, ro, m, true),
    box(-b / 2 + t, b / 2 - t, -d / 2 + t, d / 2 - t, m, true),
    ...cornerFillets(b / 2 - t, d / 2 - t, ri, m, false),
  ]);
}

/**
 * The non-throwing form of {@link rectangularHollow}.
 *
 * @example
 * ```ts
 * const r = tryRectangularHollow({ width: 10, depth: 20, wallThickness: 5 });
 * if (!r.ok) console.log(r.error.code); // "wall-too-thick"
 * ```
 */
export function tryRectangularHollow(dims: RectangularHollowDimensions, options?: ShapeOptions): Result<Section> {
  return attempt(() => rectangularHollow(dims, options));
}
