import { attempt, type Result } from "../errors/index.js";
import { M_AREA, M_Y, M_YY, M_YZ, M_Z, M_ZZ } from "./integrals.js";
import { prepareSection } from "./prepare.js";
import { principalAxes } from "./principal.js";
import type { SectionPropertiesOptions, SectionProperties, PartProperties } from "./propertyTypes.js";
import type { Section } from "./types.js";
import { partWeights } from "./weights.js";

const total = new Float64Array(6);

/**
 * Elastic properties of a section about its centroid: area, centroid, second moments, product
 * moment, principal axes, extreme fibres, section moduli, radii of gyration and bounding box.
 * For a multi-material section every property is that of the transformed section: each part's
 * widths scaled by its modular ratio n_i = E_i / E_ref (areas and second moments are in units of
 * the reference material).
 *
 * Polygons are integrated exactly by Green's theorem and circular arcs in closed form; the
 * second moments about the centroid follow from the parallel-axis theorem (Gere and Goodno,
 * Mechanics of Materials, chapter 12).
 *
 * @param section - The section.
 * @param options - Optional {@link SectionPropertiesOptions}.
 * @returns The properties (readonly).
 * @throws FlexuraError any code of `section()`, and `reference-modulus-not-positive`.
 * @example
 * ```ts
 * const p = sectionProperties(rectangle({ width: 100, depth: 200 }));
 * p.secondMomentZ; // 100 * 200^3 / 12 = 66.7e6
 * p.sectionModulus.top; // 666.7e3
 * ```
 */
export function sectionProperties(section: Section, options?: SectionPropertiesOptions): SectionProperties {
  const p = prepareSection(section);
  const { referenceModulus, ratios, weights } = partWeights(p, options?.referenceModulus);
  total.fill(0);
  const parts: PartProperties[] = [];
  const m = p.partMoments;
  for (let i = 0; i < p.count; i++) {
    const w = weights[i]!;
    for (let k = 0; k < 6; k++) total[k]! += w * m[i * 6 + k]!;
    parts.push({ area: m[i * 6 + M_AREA]!, modularRatio: ratios[i]!, hole: p.sign[i]! < 0, extremes: { top: p.partBox[i * 4 + 3]!, bottom: p.partBox[i * 4 + 2]!, left: p.partBox[i * 4]!, right: p.partBox[i * 4 + 1]! } });
  }
  const area = total[M_AREA]!;
  const yc = total[M_Y]! / area;
  const zc = total[M_Z]! / area;
  const secondMomentZ = total[M_YY]! - area * yc * yc;
  const secondMomentY = total[M_ZZ]! - area * zc * zc;
  const productMoment = total[M_YZ]! - area * yc * zc;
  for (const part of parts) {
    const e = part.extremes as { top: number; bottom: number; left: number; right: number };
    e.top -= yc;
    e.bottom -= yc;
    e.left -= zc;
    e.right -= zc;
  }
  const b = p.box;
  const top = b[3]! - yc;
  const bottom = b[2]! - yc;
  const left = b[0]! - zc;
  const right = b[1]! - zc;
  return {
    area,
    centroid: { y: yc + p.refY, z: zc + p.refZ },
    secondMomentZ,
    secondMomentY,
    productMoment,
    principal: principalAxes(secondMomentZ, secondMomentY, productMoment),
    extremes: { top, bottom, left, right },
    sectionModulus: { top: secondMomentZ / top, bottom: -secondMomentZ / bottom, left: -secondMomentY / left, right: secondMomentY / right },
    radiusOfGyration: { z: Math.sqrt(secondMomentZ / area), y: Math.sqrt(secondMomentY / area) },
    boundingBox: { zMin: b[0]! + p.refZ, zMax: b[1]! + p.refZ, yMin: b[2]! + p.refY, yMax: b[3]! + p.refY },
    transformed: { referenceModulus, modularRatios: Array.from(ratios) },
    parts,
  };
}

/**
 * The non-throwing form of {@link sectionProperties}.
 *
 * @example
 * ```ts
 * const r = trySectionProperties({ parts: [] });
 * if (!r.ok) console.log(r.error.code); // "section-empty"
 * ```
 */
export function trySectionProperties(section: Section, options?: SectionPropertiesOptions): Result<SectionProperties> {
  return attempt(() => sectionProperties(section, options));
}
