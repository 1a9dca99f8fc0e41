import { attempt, type Result } from "../../errors/index.js";
import { section } from "../construct.js";
import type { Section, SectionPart } from "../types.js";
import { box, checkDimensions, checkShapeOptions, withExtras, type ShapeOptions } from "./dimensions.js";

/**
 * Dimensions of a channel with parallel flanges.
 *
 * @example
 * ```ts
 * const d: ChannelDimensions = { depth: 200, flangeWidth: 75, flangeThickness: 11, webThickness: 7, rootRadius: 12 };
 * ```
 */
export interface ChannelDimensions {
  /** Overall depth, > 0 (length). */
  readonly depth: number;
  /** Flange width, back of web to flange tip, > 0 (length). */
  readonly flangeWidth: number;
  /** Flange thickness, > 0, the two together less than the depth (length). */
  readonly flangeThickness: number;
  /** Web thickness, > 0 and less than the flange width (length). */
  readonly webThickness: number;
  /** Root fillet radius, >= 0 (length); default 0. */
  readonly rootRadius?: number;
}

/**
 * A channel with parallel flanges, web on the left and flanges pointing right (+z), bounding
 * box centred on the origin. Parts: top flange, web, bottom flange, then the two root fillets.
 * Sloping flanges of some rolled channels are not modelled: use the mean flange thickness.
 *
 * @param dims - {@link ChannelDimensions}.
 * @param options - {@link ShapeOptions}.
 * @throws FlexuraError `unknown-field` (a misspelt dimension or option, with the closest name suggested), `options-invalid`, `dimension-not-positive`, `dimension-negative`, `flange-too-thick`,
 *   `web-too-thick`, `root-radius-too-large`, `not-a-number`, `not-finite`.
 * @example
 * ```ts
 * const c = channel({ depth: 200, flangeWidth: 75, flangeThickness: 11, webThickness: 7 });
 * sectionProperties(c).centroid.z; // left of 0: the web pulls it back
 * ```
 */
export function channel(dims: ChannelDimensions, options?: ShapeOptions): Section {
  const { found, ok } = checkDimensions(dims, ["depth", "flangeWidth", "flangeThickness", "webThickness"], ["rootRadius"]);
  checkShapeOptions(found, options);
  if (!ok) found.throwIfAny();
  const { depth: d, flangeWidth: b, flangeThickness: tf, webThickness: tw } = dims;
  const r = dims.rootRadius ?? 0;
  if (2 * tf >= d) found.add("flange-too-thick", ["flangeThickness"], `The two flanges (2 x ${tf}) must together be thinner than the depth (${d}).`, { flangeThickness: tf, depth: d });
  if (tw >= b) found.add("web-too-thick", ["webThickness"], `The web (${tw}) must be thinner than the flange width (${b}).`, { webThickness: tw });
  if (found.empty && (tw + r > b || 2 * r > d - 2 * tf)) {
    found.add("root-radius-too-large", ["rootRadius"], `The root radius (${r}) must fit along the flanges and within the clear depth of the web.`, { rootRadius: r });
  }
  found.throwIfAny();
  const m = options?.material;
  const left = -b / 2;
  const inner = left + tw;
  const top = d / 2;
  const parts: SectionPart[] = [box(left, b / 2, top - tf, top, m), box(left, inner, -top + tf, top - tf, m), box(left, b / 2, -top, -top + tf, m)];
  if (r > 0) {
    parts.push(
      withExtras({ kind: "fillet", corner: { y: top - tf, z: inner }, radius: r, orientation: -Math.PI / 2 }, m),
      withExtras({ kind: "fillet", corner: { y: -top + tf, z: inner }, radius: r, orientation: 0 }, m),
    );
  }
  return section(parts);
}

/**
 * The non-throwing form of {@link channel}.
 *
 * @example
 * ```ts
 * const r = tryChannel({ depth: 200, flangeWidth: 75, flangeThickness: 11, webThickness: 80 });
 * if (!r.ok) console.log(r.error.code); // "web-too-thick"
 * ```
 */
export function tryChannel(dims: ChannelDimensions, options?: ShapeOptions): Result<Section> {
  return attempt(() => channel(dims, options));
}
