import { attempt, type Result } from "../errors/index.js";
import { M_AREA, M_Y, M_YY, M_YZ, M_Z, M_ZZ } from "./integrals.js";
import { prepareSection } from "./prepare.js";
import { principalAxes } from "./principal.js";
import type { SectionPropertiesOptions, SectionProperties, PartProperties } from "./propertyTypes.js";
import type { Section } from "./types.js";
import { partWeights } from "./weights.js";

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
  const m = p.partMoments;
  const count = p.count;
  let area = 0, my = 0, mz = 0, myy = 0, mzz = 0, myz = 0;
  for (let i = 0, o = 0; i < count; i++, o += 6) {
    const w = weights[i]!;
    area += w * m[o + M_AREA]!;
    my += w * m[o + M_Y]!;
    mz += w * m[o + M_Z]!;
    myy += w * m[o + M_YY]!;
    mzz += w * m[o + M_ZZ]!;
    myz += w * m[o + M_YZ]!;
  }
  const yc = my / area;
  const zc = mz / area;
  const secondMomentZ = myy - area * yc * yc;
  const secondMomentY = mzz - area * zc * zc;
  const productMoment = myz - area * yc * zc;
  const parts: PartProperties[] = [];
  const modularRatios: number[] = [];
  const pb = p.partBox;
  for (let i = 0, o = 0; i < count; i++, o += 4) {
    const n = ratios[i]!;
    modularRatios.push(n);
    parts.push({ area: m[i * 6 + M_AREA]!, modularRatio: n, hole: p.sign[i]! < 0, extremes: { top: pb[o + 3]! - yc, bottom: pb[o + 2]! - yc, left: pb[o]! - zc, right: pb[o + 1]! - zc } });
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
    transformed: { referenceModulus, modularRatios },
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
