// St Venant torsion constant of rolled I-shapes and tees with their root fillets: the formula of
// El Darwish and Johnston (1965), as given by AISC Design Guide 9 (Seaburg and Carter, 1997).
import { attempt, fail, type Result } from "../errors/index.js";
import { iSection, type ISectionDimensions } from "./shapes/iSection.js";
import { tee, type TeeDimensions } from "./shapes/tee.js";

/** The fillet terms alpha and D of El Darwish and Johnston for flange t_f, web t_w, fillet radius R. */
function filletTerms(tf: number, tw: number, r: number): { alpha: number; d: number } {
  const alpha = -0.042 + 0.2204 * (tw / tf) + 0.1355 * (r / tf) - 0.0865 * ((r * tw) / (tf * tf)) - 0.0725 * ((tw * tw) / (tf * tf));
  const d = ((tf + r) ** 2 + tw * (r + tw / 4)) / (2 * r + tf);
  return { alpha, d };
}

function needsRootRadius(r: number | undefined): number {
  if (!(r !== undefined && r > 0))
    fail("torsion-rolled-needs-root-radius", ["rootRadius"], "The fillet formula is for rolled shapes, which have root fillets: give rootRadius (for a shape without fillets use torsionConstantThinWalled).");
  return r;
}

/**
 * The St Venant torsion constant J of a rolled I-shape with equal parallel flanges and root
 * fillets, by El Darwish and Johnston, "Torsion of structural shapes", ASCE Journal of the
 * Structural Division 91 (ST1), 1965, as given in AISC Design Guide 9 (Seaburg and Carter,
 * Torsional Analysis of Structural Steel Members, 1997), appendix A:
 * J = (2/3) b t_f^3 + (1/3)(d - 2 t_f) t_w^3 + 2 alpha D^4 - 0.420 t_f^4, with
 * alpha = -0.042 + 0.2204 t_w/t_f + 0.1355 R/t_f - 0.0865 R t_w/t_f^2 - 0.0725 t_w^2/t_f^2 and
 * D = ((t_f + R)^2 + t_w (R + t_w/4)) / (2R + t_f), the diameter of the circle inscribed at the
 * web-flange junction. It counts the stiffening of the junctions that sum of b t^3 / 3 leaves out.
 * The result is in the shape's length unit to the fourth power (the coefficients are dimensionless).
 *
 * Valid for rolled I-shapes with parallel flanges of constant thickness (W, HP, IPE, HE shapes):
 * a regression on such shapes, not a formula for arbitrary proportions.
 *
 * @param dims - The shape's dimensions, as for {@link iSection}; `rootRadius` is required.
 * @returns J (length^4).
 * @throws FlexuraError any code of {@link iSection}; `torsion-rolled-needs-root-radius`;
 *   `torsion-rolled-unequal-flanges` (the formula is for equal flanges).
 * @example
 * ```ts
 * // W18x35 (in): d 17.7, b_f 6.00, t_f 0.425, t_w 0.300, R = k_des - t_f = 0.402
 * torsionConstantRolledI({ depth: 17.7, flangeWidth: 6, flangeThickness: 0.425, webThickness: 0.3, rootRadius: 0.402 }); // 0.506 in^4
 * ```
 */
export function torsionConstantRolledI(dims: ISectionDimensions): number {
  iSection(dims);
  const r = needsRootRadius(dims.rootRadius);
  const { depth: d, flangeWidth: b, flangeThickness: tf, webThickness: tw } = dims;
  if ((dims.bottomFlangeWidth !== undefined && dims.bottomFlangeWidth !== b) || (dims.bottomFlangeThickness !== undefined && dims.bottomFlangeThickness !== tf))
    fail("torsion-rolled-unequal-flanges", ["bottomFlangeWidth"], "The fillet formula is for rolled I-shapes with equal flanges; for unequal flanges use torsionConstantThinWalled.");
  const { alpha, d: D } = filletTerms(tf, tw, r);
  return (2 / 3) * b * tf ** 3 + ((d - 2 * tf) * tw ** 3) / 3 + 2 * alpha * D ** 4 - 0.42 * tf ** 4;
}

/**
 * The St Venant torsion constant J of a rolled tee (a WT or split I) with root fillets, by the
 * formula of El Darwish and Johnston (1965) as given in AISC Design Guide 9 (Seaburg and Carter,
 * 1997), appendix A: J = (1/3) b t_f^3 + (1/3)(d - t_f) t_w^3 + alpha D^4 - 0.210 t_f^4 - 0.105 t_w^4,
 * with alpha and D as for {@link torsionConstantRolledI} (one junction; the flange's two free
 * edges and the stem's tip each take 0.105 t^4 off).
 *
 * Valid for rolled tees with a flange of constant thickness and a stem of constant thickness.
 *
 * @param dims - The tee's dimensions, as for {@link tee}; `rootRadius` is required.
 * @returns J (length^4).
 * @throws FlexuraError any code of {@link tee}; `torsion-rolled-needs-root-radius`.
 * @example
 * ```ts
 * torsionConstantRolledTee({ depth: 8.85, flangeWidth: 6, flangeThickness: 0.425, webThickness: 0.3, rootRadius: 0.402 }); // about half the W18x35's
 * ```
 */
export function torsionConstantRolledTee(dims: TeeDimensions): number {
  tee(dims);
  const r = needsRootRadius(dims.rootRadius);
  const { depth: d, flangeWidth: b, flangeThickness: tf, webThickness: tw } = dims;
  const { alpha, d: D } = filletTerms(tf, tw, r);
  return (b * tf ** 3) / 3 + ((d - tf) * tw ** 3) / 3 + alpha * D ** 4 - 0.21 * tf ** 4 - 0.105 * tw ** 4;
}

/**
 * The non-throwing form of {@link torsionConstantRolledI}.
 *
 * @example
 * ```ts
 * const r = tryTorsionConstantRolledI({ depth: 300, flangeWidth: 150, flangeThickness: 10, webThickness: 6 });
 * if (!r.ok) console.log(r.error.code); // "torsion-rolled-needs-root-radius"
 * ```
 */
export function tryTorsionConstantRolledI(dims: ISectionDimensions): Result<number> {
  return attempt(() => torsionConstantRolledI(dims));
}

/**
 * The non-throwing form of {@link torsionConstantRolledTee}.
 *
 * @example
 * ```ts
 * const r = tryTorsionConstantRolledTee({ depth: 150, flangeWidth: 150, flangeThickness: 12, webThickness: 8 });
 * if (!r.ok) console.log(r.error.code); // "torsion-rolled-needs-root-radius"
 * ```
 */
export function tryTorsionConstantRolledTee(dims: TeeDimensions): Result<number> {
  return attempt(() => torsionConstantRolledTee(dims));
}
