// Slenderness of the flanges and web of a doubly symmetric I-shape in flexure, AISC 360-16 Table B4.1b.
import { checkIShape, checkSteel, type IShapeForDesign, type SteelForDesign } from "./shape.js";

/** How an element of a section in flexure is classed by AISC 360-16 Table B4.1b. */
export type ElementClass = "compact" | "noncompact" | "slender";

/** One element's width-to-thickness ratio against its limits. */
export interface ElementSlenderness {
  /** The ratio lambda (b/t for a flange, h/t_w for a web), dimensionless. */
  readonly ratio: number;
  /** The compact limit lambda_p. */
  readonly compactLimit: number;
  /** The noncompact limit lambda_r. */
  readonly noncompactLimit: number;
  /** compact (lambda <= lambda_p), noncompact (lambda_p < lambda <= lambda_r) or slender. */
  readonly class: ElementClass;
  /** The row of Table B4.1b used, for example `"Table B4.1b case 10"`. */
  readonly clause: string;
}

/** Classification of an I-shape for major-axis flexure. */
export interface IShapeClassification {
  /** The flanges, b/t = b_f / (2 t_f). */
  readonly flange: ElementSlenderness;
  /** The web, h / t_w. */
  readonly web: ElementSlenderness;
}

/** @internal compact (ratio <= p), noncompact (p < ratio <= r) or slender. */
export function classOf(ratio: number, p: number, r: number): ElementClass {
  return ratio <= p ? "compact" : ratio <= r ? "noncompact" : "slender";
}

/**
 * The flange local buckling coefficient k_c = 4 / sqrt(h / t_w), kept between 0.35 and 0.76
 * (AISC 360-16 Table B4.1b note [a]).
 */
export function flangeBucklingCoefficient(shape: IShapeForDesign): number {
  return Math.min(0.76, Math.max(0.35, 4 / Math.sqrt(shape.webHeight / shape.webThickness)));
}

/**
 * Classes the flanges and web of a doubly symmetric I-shape bent about its major axis by AISC
 * 360-16 Table B4.1b: flanges of rolled shapes (case 10: lambda_p = 0.38 sqrt(E/F_y), lambda_r =
 * 1.0 sqrt(E/F_y)), flanges of welded shapes (case 11: lambda_r = 0.95 sqrt(k_c E / F_L) with F_L =
 * 0.7 F_y for a doubly symmetric shape, F4.2(c)), and webs (case 15: lambda_p = 3.76 sqrt(E/F_y),
 * lambda_r = 5.70 sqrt(E/F_y)).
 *
 * @param shape - The I-shape (checked as by `checkIShape`).
 * @param steel - The steel, in the shape's stress unit.
 * @example
 * ```ts
 * classifyIShape(w18x50, { elasticModulus: 29000, yieldStrength: 50 }).flange.class; // "compact"
 * ```
 */
export function classifyIShape(shape: IShapeForDesign, steel: SteelForDesign): IShapeClassification {
  return classifyCheckedIShape(checkIShape(shape), checkSteel(steel));
}

/** @internal {@link classifyIShape} on a shape and steel already checked. */
export function classifyCheckedIShape(shape: IShapeForDesign, steel: SteelForDesign): IShapeClassification {
  const root = Math.sqrt(steel.elasticModulus / steel.yieldStrength);
  // Table B4.1b note: b is half the flange width of an I, the full flange width of a channel
  const flangeRatio = shape.form === "channel" ? shape.flangeWidth / shape.flangeThickness : shape.flangeWidth / (2 * shape.flangeThickness);
  const fp = 0.38 * root;
  const fr = shape.rolled ? 1.0 * root : 0.95 * Math.sqrt((flangeBucklingCoefficient(shape) * steel.elasticModulus) / (0.7 * steel.yieldStrength));
  const webRatio = shape.webHeight / shape.webThickness;
  const wp = 3.76 * root;
  const wr = 5.7 * root;
  return Object.freeze({
    flange: Object.freeze({ ratio: flangeRatio, compactLimit: fp, noncompactLimit: fr, class: classOf(flangeRatio, fp, fr), clause: `Table B4.1b case ${shape.rolled ? 10 : 11}` }),
    web: Object.freeze({ ratio: webRatio, compactLimit: wp, noncompactLimit: wr, class: classOf(webRatio, wp, wr), clause: "Table B4.1b case 15" }),
  });
}
