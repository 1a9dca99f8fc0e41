import { attempt, type Result } from "../../errors/index.js";
import { section } from "../construct.js";
import type { Section, SectionPart } from "../types.js";
import { box, checkDimensions, checkShapeOptions, withExtras, type ShapeOptions } from "./dimensions.js";

/**
 * Dimensions of an angle (L-section), equal or unequal legs.
 *
 * @example
 * ```ts
 * const d: AngleDimensions = { verticalLeg: 100, horizontalLeg: 75, thickness: 8 };
 * ```
 */
export interface AngleDimensions {
  /** Overall length of the vertical leg (along y), > 0 (length). */
  readonly verticalLeg: number;
  /** Overall length of the horizontal leg (along z), > 0 (length); default: equal to `verticalLeg`. */
  readonly horizontalLeg?: number;
  /** Thickness of both legs, > 0 and less than either leg (length). */
  readonly thickness: number;
  /** Root fillet radius, >= 0 (length); default 0. Toe radii are not modelled. */
  readonly rootRadius?: number;
}

/**
 * An angle with its heel at the bottom left, vertical leg up the left side and horizontal leg
 * along the bottom, bounding box centred on the origin. Parts: the vertical leg (full height),
 * the rest of the horizontal leg, then the root fillet. Its principal axes are inclined:
 * see `principal` in {@link sectionProperties}.
 *
 * @param dims - {@link AngleDimensions}.
 * @param options - {@link ShapeOptions}.
 * @throws FlexuraError `unknown-field` (a misspelt dimension or option, with the closest name suggested), `options-invalid`, `dimension-not-positive`, `dimension-negative`, `thickness-too-large`,
 *   `root-radius-too-large`, `not-a-number`, `not-finite`.
 * @example
 * ```ts
 * const l = angle({ verticalLeg: 100, horizontalLeg: 75, thickness: 8 });
 * sectionProperties(l).principal.angle; // not zero: the principal axes are inclined
 * ```
 */
export function angle(dims: AngleDimensions, options?: ShapeOptions): Section {
  const { found, ok } = checkDimensions(dims, ["verticalLeg", "thickness"], ["rootRadius"], ["horizontalLeg"]);
  checkShapeOptions(found, options);
  if (!ok) found.throwIfAny();
  const h = dims.verticalLeg;
  const w = dims.horizontalLeg ?? h;
  const t = dims.thickness;
  const r = dims.rootRadius ?? 0;
  if (t >= Math.min(h, w)) {
    found.add("thickness-too-large", ["thickness"], `The thickness (${t}) must be less than both legs (${Math.min(h, w)}).`, { thickness: t });
  } else if (r > Math.min(h, w) - t) {
    found.add("root-radius-too-large", ["rootRadius"], `The root radius (${r}) must fit along both legs (at most ${Math.min(h, w) - t}).`, { rootRadius: r });
  }
  found.throwIfAny();
  const m = options?.material;
  const left = -w / 2;
  const bottom = -h / 2;
  const parts: SectionPart[] = [box(left, left + t, bottom, h / 2, m), box(left + t, w / 2, bottom, bottom + t, m)];
  if (r > 0) parts.push(withExtras({ kind: "fillet", corner: { y: bottom + t, z: left + t }, radius: r, orientation: 0 }, m));
  return section(parts);
}

/**
 * The non-throwing form of {@link angle}.
 *
 * @example
 * ```ts
 * const r = tryAngle({ verticalLeg: 50, thickness: 60 });
 * if (!r.ok) console.log(r.error.code); // "thickness-too-large"
 * ```
 */
export function tryAngle(dims: AngleDimensions, options?: ShapeOptions): Result<Section> {
  return attempt(() => angle(dims, options));
}
