import { attempt, type Result } from "../../errors/index.js";
import { section } from "../construct.js";
import type { Material, Section, SectionPart } from "../types.js";
import { box, checkDimensions, checkShapeOptions, withExtras, type ShapeOptions } from "./dimensions.js";

/**
 * Dimensions of an I-section (rolled or welded), in the words of steel tables.
 *
 * @example
 * ```ts
 * const d: ISectionDimensions = { depth: 310, flangeWidth: 165, flangeThickness: 9.7, webThickness: 5.8, rootRadius: 8.9 };
 * ```
 */
export interface ISectionDimensions {
  /** Overall depth d, > 0 (length). */
  readonly depth: number;
  /** Width of the (top) flange b_f, > 0 (length). */
  readonly flangeWidth: number;
  /** Thickness of the (top) flange t_f, > 0 (length). */
  readonly flangeThickness: number;
  /** Web thickness t_w, > 0, at most the flange widths (length). */
  readonly webThickness: number;
  /** Root fillet radius r where web meets flange, >= 0 (length); default 0 (sharp corners). Modelled exactly as circular fillets. */
  readonly rootRadius?: number;
  /** Width of the bottom flange, > 0 (length); default: `flangeWidth`. */
  readonly bottomFlangeWidth?: number;
  /** Thickness of the bottom flange, > 0 (length); default: `flangeThickness`. */
  readonly bottomFlangeThickness?: number;
}

/** The four root fillets (or two, for a tee) at the web-to-flange corners; internal. */
export function rootFillets(
  halfWeb: number,
  r: number,
  topInner: number | undefined,
  bottomInner: number | undefined,
  material: Material | undefined,
): SectionPart[] {
  if (!(r > 0)) return [];
  const out: SectionPart[] = [];
  if (topInner !== undefined) {
    out.push(withExtras({ kind: "fillet", corner: { y: topInner, z: halfWeb }, radius: r, orientation: -Math.PI / 2 }, material));
    out.push(withExtras({ kind: "fillet", corner: { y: topInner, z: -halfWeb }, radius: r, orientation: Math.PI }, material));
  }
  if (bottomInner !== undefined) {
    out.push(withExtras({ kind: "fillet", corner: { y: bottomInner, z: halfWeb }, radius: r, orientation: 0 }, material));
    out.push(withExtras({ kind: "fillet", corner: { y: bottomInner, z: -halfWeb }, radius: r, orientation: Math.PI / 2 }, material));
  }
  return out;
}

/**
 * An I-section (rolled beam, column or welded I) with equal or unequal flanges and optional
 * root fillets, symmetric about the y axis, with its bounding box centred on the origin: y from
 * -depth/2 (underside of the bottom flange) to depth/2, web centred on z = 0. Parts: top flange,
 * web, bottom flange (rectangles), then the fillets.
 *
 * @param dims - {@link ISectionDimensions}.
 * @param options - {@link ShapeOptions}.
 * @throws FlexuraError `unknown-field` (a misspelt dimension or option, with the closest name suggested), `options-invalid`, `dimension-not-positive`, `dimension-negative`, `flange-too-thick`
 *   (flanges together at least the depth), `web-too-thick` (web wider than a flange),
 *   `root-radius-too-large` (fillets do not fit between web, flange tips and the other flange),
 *   `not-a-number`, `not-finite`.
 * @example
 * ```ts
 * const beam = iSection({ depth: 310, flangeWidth: 165, flangeThickness: 9.7, webThickness: 5.8, rootRadius: 8.9 });
 * sectionProperties(beam).secondMomentZ;
 * ```
 */
export function iSection(dims: ISectionDimensions, options?: ShapeOptions): Section {
  const { found, ok } = checkDimensions(dims, ["depth", "flangeWidth", "flangeThickness", "webThickness"], ["rootRadius"], ["bottomFlangeWidth", "bottomFlangeThickness"]);
  checkShapeOptions(found, options);
  if (!ok) found.throwIfAny();
  const d = dims.depth;
  const bt = dims.flangeWidth;
  const tt = dims.flangeThickness;
  const bb = dims.bottomFlangeWidth ?? bt;
  const tb = dims.bottomFlangeThickness ?? tt;
  const tw = dims.webThickness;
  const r = dims.rootRadius ?? 0;
  {
    if (tt + tb >= d) {
      found.add("flange-too-thick", ["flangeThickness"], `The flanges (${tt} + ${tb}) must together be thinner than the depth (${d}).`, { flangeThickness: tt, bottomFlangeThickness: tb, depth: d });
    }
    if (tw > Math.min(bt, bb)) {
      found.add("web-too-thick", ["webThickness"], `The web (${tw}) must not be wider than the flanges (${Math.min(bt, bb)}).`, { webThickness: tw });
    }
    if (found.empty && r > 0 && (tw + 2 * r > Math.min(bt, bb) || 2 * r > d - tt - tb)) {
      found.add("root-radius-too-large", ["rootRadius"], `The root radius (${r}) must fit between the web and the flange tips and within the clear depth of the web.`, { rootRadius: r });
    }
  }
  found.throwIfAny();
  const m = options?.material;
  const top = d / 2;
  const bottom = -d / 2;
  return section([
    box(-bt / 2, bt / 2, top - tt, top, m),
    box(-tw / 2, tw / 2, bottom + tb, top - tt, m),
    box(-bb / 2, bb / 2, bottom, bottom + tb, m),
    ...rootFillets(tw / 2, r, top - tt, bottom + tb, m),
  ]);
}

/**
 * The non-throwing form of {@link iSection}.
 *
 * @example
 * ```ts
 * const r = tryISection({ depth: 20, flangeWidth: 100, flangeThickness: 10, webThickness: 6 });
 * if (!r.ok) console.log(r.error.code); // "flange-too-thick"
 * ```
 */
export function tryISection(dims: ISectionDimensions, options?: ShapeOptions): Result<Section> {
  return attempt(() => iSection(dims, options));
}
