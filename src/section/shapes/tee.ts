import { attempt, type Result } from "../../errors/index.js";
import { section } from "../construct.js";
import type { Section } from "../types.js";
import { box, checkDimensions, checkShapeOptions, type ShapeOptions } from "./dimensions.js";
import { rootFillets } from "./iSection.js";

/**
 * Dimensions of a tee (flange on top, stem below).
 *
 * @example
 * ```ts
 * const d: TeeDimensions = { depth: 150, flangeWidth: 150, flangeThickness: 12, webThickness: 8 };
 * ```
 */
export interface TeeDimensions {
  /** Overall depth, flange included, > 0 (length). */
  readonly depth: number;
  /** Flange width, > 0 (length). */
  readonly flangeWidth: number;
  /** Flange thickness, > 0 and less than the depth (length). */
  readonly flangeThickness: number;
  /** Stem (web) thickness, > 0 and at most the flange width (length). */
  readonly webThickness: number;
  /** Root fillet radius, >= 0 (length); default 0. */
  readonly rootRadius?: number;
}

/**
 * A tee with the flange on top, symmetric about the y axis, bounding box centred on the
 * origin (y from -depth/2 at the stem's tip to depth/2 at the top of the flange). Parts:
 * flange, stem, then any fillets. Turn it over with {@link mirrorSection}.
 *
 * @param dims - {@link TeeDimensions}.
 * @param options - {@link ShapeOptions}.
 * @throws FlexuraError `unknown-field` (a misspelt dimension or option, with the closest name suggested), `options-invalid`, `dimension-not-positive`, `dimension-negative`, `flange-too-thick`,
 *   `web-too-thick`, `root-radius-too-large`, `not-a-number`, `not-finite`.
 * @example
 * ```ts
 * const t = tee({ depth: 150, flangeWidth: 150, flangeThickness: 12, webThickness: 8 });
 * sectionProperties(t).centroid.y; // above 0: the flange pulls it up
 * ```
 */
export function tee(dims: TeeDimensions, options?: ShapeOptions): Section {
  const { found, ok } = checkDimensions(dims, ["depth", "flangeWidth", "flangeThickness", "webThickness"], ["rootRadius"]);
  checkShapeOptions(found, options);
  if (!ok) found.throwIfAny();
  const { depth: d, flangeWidth: b, flangeThickness: tf, webThickness: tw } = dims;
  const r = dims.rootRadius ?? 0;
  {
    if (tf >= d) found.add("flange-too-thick", ["flangeThickness"], `The flange (${tf}) must be thinner than the depth (${d}).`, { flangeThickness: tf, depth: d });
    if (tw > b) found.add("web-too-thick", ["webThickness"], `The stem (${tw}) must not be wider than the flange (${b}).`, { webThickness: tw });
    if (found.empty && r > 0 && (tw + 2 * r > b || r > d - tf)) {
      found.add("root-radius-too-large", ["rootRadius"], `The root radius (${r}) must fit between the stem and the flange tips and within the stem's length.`, { rootRadius: r });
    }
  }
  found.throwIfAny();
  const m = options?.material;
  return section([box(-b / 2, b / 2, d / 2 - tf, d / 2, m), box(-tw / 2, tw / 2, -d / 2, d / 2 - tf, m), ...rootFillets(tw / 2, r, d / 2 - tf, undefined, m)]);
}

/**
 * The non-throwing form of {@link tee}.
 *
 * @example
 * ```ts
 * const r = tryTee({ depth: 10, flangeWidth: 100, flangeThickness: 10, webThickness: 6 });
 * if (!r.ok) console.log(r.error.code); // "flange-too-thick"
 * ```
 */
export function tryTee(dims: TeeDimensions, options?: ShapeOptions): Result<Section> {
  return attempt(() => tee(dims, options));
}
