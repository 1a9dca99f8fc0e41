import { IssueCollector, attempt, type Result } from "../../errors/index.js";
import { section } from "../construct.js";
import type { Section } from "../types.js";
import { box, checkDimensions, checkKnownKeys, checkShapeOptions, type ShapeOptions } from "./dimensions.js";

/**
 * One plate of a plate girder.
 *
 * @example
 * ```ts
 * const flange: PlateDimensions = { width: 400, thickness: 30 };
 * ```
 */
export interface PlateDimensions {
  /** Width of the plate across its face, > 0 (length): a flange's width, or a web's depth. */
  readonly width: number;
  /** Plate thickness, > 0 (length). */
  readonly thickness: number;
}

/**
 * Dimensions of a welded plate girder.
 *
 * @example
 * ```ts
 * const d: PlateGirderDimensions = { topFlange: { width: 400, thickness: 30 }, web: { width: 1500, thickness: 12 } };
 * ```
 */
export interface PlateGirderDimensions {
  /** Top flange plate. */
  readonly topFlange: PlateDimensions;
  /** Web plate: `width` is the web's depth between the flanges, `thickness` its thickness. */
  readonly web: PlateDimensions;
  /** Bottom flange plate; default: the same as the top flange. */
  readonly bottomFlange?: PlateDimensions;
}

/**
 * A welded plate girder from its flange and web plates (welds not modelled), web centred on
 * z = 0, bounding box centred on the origin: overall depth is the two flange thicknesses plus
 * the web's depth. Parts: top flange, web, bottom flange.
 *
 * @param dims - {@link PlateGirderDimensions}.
 * @param options - {@link ShapeOptions}.
 * @throws FlexuraError `unknown-field` (a misspelt dimension or option, with the closest name suggested), `options-invalid`, `dimension-not-positive`, `web-too-thick`, `dimensions-invalid`,
 *   `not-a-number`, `not-finite` (paths such as `topFlange.width`).
 * @example
 * ```ts
 * const g = plateGirder({ topFlange: { width: 400, thickness: 30 }, web: { width: 1500, thickness: 12 } });
 * sectionProperties(g).secondMomentZ;
 * ```
 */
export function plateGirder(dims: PlateGirderDimensions, options?: ShapeOptions): Section {
  const found = new IssueCollector();
  const plate = (value: unknown, name: string): boolean => {
    const r = checkDimensions(value, ["width", "thickness"]);
    found.addAll(r.found.issues, [name]);
    return r.ok;
  };
  if (typeof dims === "object" && dims !== null) checkKnownKeys(found, dims as unknown as Record<string, unknown>, ["topFlange", "web", "bottomFlange"], [], "dimension");
  checkShapeOptions(found, options);
  const okTop = plate(dims?.topFlange, "topFlange");
  const okWeb = plate(dims?.web, "web");
  const okBottom = dims?.bottomFlange === undefined || plate(dims.bottomFlange, "bottomFlange");
  if (!(okTop && okWeb && okBottom)) found.throwIfAny();
  found.throwIfAny();
  const top = dims.topFlange;
  const web = dims.web;
  const bottom = dims.bottomFlange ?? top;
  if (web.thickness > Math.min(top.width, bottom.width)) {
    found.add("web-too-thick", ["web", "thickness"], `The web (${web.thickness}) must not be wider than the flanges (${Math.min(top.width, bottom.width)}).`, { webThickness: web.thickness });
  }
  found.throwIfAny();
  const m = options?.material;
  const depth = top.thickness + web.width + bottom.thickness;
  const yTop = depth / 2;
  const yBottom = -depth / 2;
  return section([
    box(-top.width / 2, top.width / 2, yTop - top.thickness, yTop, m),
    box(-web.thickness / 2, web.thickness / 2, yBottom + bottom.thickness, yTop - top.thickness, m),
    box(-bottom.width / 2, bottom.width / 2, yBottom, yBottom + bottom.thickness, m),
  ]);
}

/**
 * The non-throwing form of {@link plateGirder}.
 *
 * @example
 * ```ts
 * const r = tryPlateGirder({ topFlange: { width: 0, thickness: 30 }, web: { width: 1500, thickness: 12 } });
 * if (!r.ok) console.log(r.error.code); // "dimension-not-positive"
 * ```
 */
export function tryPlateGirder(dims: PlateGirderDimensions, options?: ShapeOptions): Result<Section> {
  return attempt(() => plateGirder(dims, options));
}
