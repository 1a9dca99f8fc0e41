// The fully plastic moments of a section whose parts have different yield strengths (a flitch
// beam, a hybrid girder, a steel beam with a stronger cover plate): rigid-plastic stress blocks.
import { IssueCollector, attempt, type Result } from "../errors/index.js";
import { plasticAxes } from "./plastic.js";
import { prepareSection } from "./prepare.js";
import type { Section } from "./types.js";

/**
 * Fully plastic moments of a section of one or more materials.
 *
 * @example
 * ```ts
 * const m: FullyPlasticMoments = fullyPlasticMoments(hybrid);
 * ```
 */
export interface FullyPlasticMoments {
  /** Absolute y of the plastic neutral axis for bending about z: the horizontal line with equal yield forces above and below (length). */
  readonly neutralAxisY: number;
  /** M_p about the horizontal (z) axis: sum over parts of f_y,i times the first moment of its area about the plastic neutral axis, on both sides (force times length). */
  readonly z: number;
  /** Absolute z of the plastic neutral axis for bending about y (length). */
  readonly neutralAxisZ: number;
  /** M_p about the vertical (y) axis (force times length). */
  readonly y: number;
  /** The squash load sum of f_y,i A_i: the force that yields the whole section (force). */
  readonly yieldForce: number;
}

/**
 * The fully plastic moments of a section whose solid parts may have different yield strengths:
 * every fibre at its own yield strength, in tension on one side of the plastic neutral axis and
 * in compression on the other; the axis is where the yield forces balance, sum f_y,i A_i above =
 * sum f_y,i A_i below, and M_p = sum f_y,i |integral of (y - y_p) dA_i| (the rigid-plastic stress
 * blocks of plastic design; for one material it is f_y Z of {@link plasticProperties}). Found
 * to machine precision on the exact area-above function. Holes take the yield strength of the
 * part they are cut from.
 *
 * Valid where every material yields at the same stress in tension and compression and has the
 * ductility to reach its plastic stress block (steel, aluminium); not for concrete or timber in
 * compression, nor for slender plates that buckle before they yield.
 *
 * @param section - A section whose every solid part has a material with a `yieldStrength`.
 * @returns The plastic neutral axes, M_p about both axes and the yield force.
 * @throws FlexuraError any code of `section()`; `yield-strength-missing` for a solid part without one;
 *   `result-out-of-range` when a moment overflows.
 * @example
 * ```ts
 * // a 300 x 10 steel plate (f_y 355) with a 300 x 10 plate of f_y 235 on top of it
 * const s = builtUp([
 *   rectangle({ width: 300, depth: 10 }, { material: { elasticModulus: 210e3, yieldStrength: 355 } }),
 *   translateSection(rectangle({ width: 300, depth: 10 }, { material: { elasticModulus: 210e3, yieldStrength: 235 } }), { y: 10, z: 0 }),
 * ]);
 * fullyPlasticMoments(s).z; // N mm
 * ```
 */
export function fullyPlasticMoments(section: Section): FullyPlasticMoments {
  const p = prepareSection(section);
  const found = new IssueCollector();
  const weight = new Float64Array(p.count);
  for (let i = 0; i < p.count; i++) {
    const fy = p.yieldStrength[i]!;
    if (Number.isNaN(fy)) {
      if (p.sign[i]! > 0) found.add("yield-strength-missing", ["parts", i, "material", "yieldStrength"], "Every solid part needs a material with a yield strength for its plastic moment; this part has none.");
      continue;
    }
    weight[i] = p.sign[i]! * fy;
  }
  found.throwIfAny();
  const { aboutZ, aboutY } = plasticAxes(p, weight);
  let yieldForce = 0;
  for (let i = 0; i < p.count; i++) yieldForce += weight[i]! * p.partMoments[i * 6]!;
  if (!Number.isFinite(aboutZ.modulus) || !Number.isFinite(aboutY.modulus) || !Number.isFinite(yieldForce)) {
    found.add("result-out-of-range", ["parts"], "The plastic moment is beyond what a number holds; check the units of the yield strengths and lengths.");
    found.throwIfAny();
  }
  return Object.freeze({ neutralAxisY: aboutZ.axis + p.refY, z: aboutZ.modulus, neutralAxisZ: aboutY.axis + p.refZ, y: aboutY.modulus, yieldForce });
}

/**
 * The non-throwing form of {@link fullyPlasticMoments}.
 *
 * @example
 * ```ts
 * const r = tryFullyPlasticMoments(rectangle({ width: 100, depth: 200 }));
 * if (!r.ok) console.log(r.error.code); // "yield-strength-missing"
 * ```
 */
export function tryFullyPlasticMoments(section: Section): Result<FullyPlasticMoments> {
  return attempt(() => fullyPlasticMoments(section));
}
