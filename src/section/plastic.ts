import { IssueCollector, attempt, type Result } from "../errors/index.js";
import { ARC, STRIDE } from "./edges.js";
import { addMomentsAbove, chordAt, M_AREA, M_Y, M_Z } from "./integrals.js";
import { prepareSection, type PreparedSection } from "./prepare.js";
import { sectionProperties } from "./properties.js";
import type { Section } from "./types.js";

/**
 * Plastic properties of a section of one material, about its centroidal axes' directions.
 *
 * @example
 * ```ts
 * const p: PlasticProperties = plasticProperties(rectangle({ width: 100, depth: 200 }));
 * ```
 */
export interface PlasticProperties {
  /** Absolute y of the plastic neutral axis for bending about z: the horizontal line with equal areas above and below (length). */
  readonly neutralAxisY: number;
  /** Plastic section modulus about the horizontal axis, Z_z = first moment of the areas above and below the plastic neutral axis about it (length^3). */
  readonly plasticModulusZ: number;
  /** Absolute z of the plastic neutral axis for bending about y: the vertical line with equal areas on either side (length). */
  readonly neutralAxisZ: number;
  /** Plastic section modulus about the vertical axis, Z_y (length^3). */
  readonly plasticModulusY: number;
  /** Z_z over the smaller elastic section modulus about z (1.5 for a rectangle). */
  readonly shapeFactorZ: number;
  /** Z_y over the smaller elastic section modulus about y. */
  readonly shapeFactorY: number;
  /** The yield strength shared by every solid part, or null when not given. */
  readonly yieldStrength: number | null;
  /** Plastic moments f_y Z_z and f_y Z_y (force times length), or null without a yield strength. */
  readonly plasticMoment: PlasticMoments | null;
}

/**
 * Plastic moments of a section of one material with a yield strength.
 *
 * @example
 * ```ts
 * const m = plasticProperties(rectangle({ width: 10, depth: 20 }, { material: { elasticModulus: 200e3, yieldStrength: 355 } })).plasticMoment;
 * ```
 */
export interface PlasticMoments {
  /** f_y Z_z: bending about the horizontal axis (force times length). */
  readonly z: number;
  /** f_y Z_y: bending about the vertical axis (force times length). */
  readonly y: number;
}

const above = new Float64Array(6);

/** Area (and \int y) above the cut; `box` holds each part's yMin, yMax at offsets 2 and 3 (stride 4), `moments` its own moments. */
function areaAbove(edges: Float64Array, p: PreparedSection, box: Float64Array, moments: Float64Array, cut: number, weight: Float64Array): number {
  above.fill(0);
  for (let i = 0; i < p.count; i++) {
    const s = weight[i]!;
    if (cut >= box[i * 4 + 3]!) continue;
    if (cut <= box[i * 4 + 2]!) {
      above[M_AREA]! += s * moments[i * 6 + M_AREA]!;
      above[M_Y]! += s * moments[i * 6 + M_Y]!;
    } else addMomentsAbove(above, edges, p.edgeStart[i]!, p.edgeStart[i + 1]!, s, cut);
  }
  return above[M_AREA]!;
}

function widthAt(edges: Float64Array, p: PreparedSection, box: Float64Array, cut: number, weight: Float64Array): number {
  let b = 0;
  for (let i = 0; i < p.count; i++) {
    if (cut < box[i * 4 + 2]! || cut > box[i * 4 + 3]!) continue;
    b += weight[i]! * chordAt(edges, p.edgeStart[i]!, p.edgeStart[i + 1]!, cut, true);
  }
  return b;
}

/**
 * The plastic neutral axis (local y) and plastic modulus for bending about the local horizontal
 * axis; each part's area counts with its `weight` (its sign for one material, sign times yield
 * strength for several, when the "modulus" is the plastic moment itself).
 */
function plasticAboutHorizontal(edges: Float64Array, p: PreparedSection, box: Float64Array, moments: Float64Array, yMin: number, yMax: number, weight: Float64Array): { axis: number; modulus: number } {
  let area = 0;
  let firstMoment = 0;
  for (let i = 0; i < p.count; i++) {
    area += weight[i]! * moments[i * 6 + M_AREA]!;
    firstMoment += weight[i]! * moments[i * 6 + M_Y]!;
  }
  const half = area / 2;
  let lo = yMin;
  let hi = yMax;
  let c = (lo + hi) / 2;
  const span = yMax - yMin;
  // Newton on A_above(c) = A / 2 (its derivative is minus the width), kept inside a bracket
  for (let iter = 0; iter < 200; iter++) {
    const f = areaAbove(edges, p, box, moments, c, weight) - half;
    if (f > 0) lo = c;
    else hi = c;
    if (Math.abs(f) <= 1e-15 * area || hi - lo <= 1e-15 * span) break;
    const b = widthAt(edges, p, box, c, weight);
    let next = b > 0 ? c + f / b : Number.NaN;
    if (!(next > lo && next < hi)) next = (lo + hi) / 2;
    c = next;
  }
  const aAbove = areaAbove(edges, p, box, moments, c, weight);
  const myAbove = above[M_Y]!;
  const myBelow = firstMoment - myAbove;
  const aBelow = area - aAbove;
  return { axis: c, modulus: myAbove - c * aAbove + (c * aBelow - myBelow) };
}

/** Writes into `out` the edges turned a quarter turn counterclockwise: (z, y) -> (-y, z), so vertical cuts become horizontal. */
function quarterTurn(edges: Float64Array, out: Float64Array): Float64Array {
  for (let o = 0; o < edges.length; o += STRIDE) {
    out[o] = edges[o]!;
    out[o + 1] = -edges[o + 2]!;
    out[o + 2] = edges[o + 1]!;
    if (edges[o] === ARC) {
      out[o + 3] = edges[o + 3]!;
      let a = edges[o + 4]! + Math.PI / 2;
      let b = edges[o + 5]! + Math.PI / 2;
      if (a + b >= 3 * Math.PI) {
        a -= 2 * Math.PI;
        b -= 2 * Math.PI;
      }
      out[o + 4] = a;
      out[o + 5] = b;
    } else {
      out[o + 3] = -edges[o + 4]!;
      out[o + 4] = edges[o + 3]!;
    }
  }
  return out;
}

/**
 * @internal Plastic neutral axes (local coordinates) and the weighted plastic moduli about the
 * horizontal and vertical directions of a prepared section, each part weighted by `weight`.
 */
export function plasticAxes(p: PreparedSection, weight: Float64Array): { aboutZ: { axis: number; modulus: number }; aboutY: { axis: number; modulus: number } } {
  const b = p.box;
  const aboutZ = plasticAboutHorizontal(p.edges, p, p.partBox, p.partMoments, b[2]!, b[3]!, weight);
  // a quarter turn (z, y) -> (-y, z) makes vertical cuts horizontal: boxes and moments follow
  // one allocation for all three (typed arrays over 64 bytes cost microseconds each)
  const turned = new Float64Array(p.count * 10 + p.edges.length);
  const turnedBox = turned.subarray(0, p.count * 4);
  const turnedMoments = turned.subarray(p.count * 4, p.count * 10);
  for (let i = 0; i < p.count; i++) {
    turnedBox[i * 4] = -p.partBox[i * 4 + 3]!;
    turnedBox[i * 4 + 1] = -p.partBox[i * 4 + 2]!;
    turnedBox[i * 4 + 2] = p.partBox[i * 4]!;
    turnedBox[i * 4 + 3] = p.partBox[i * 4 + 1]!;
    turnedMoments[i * 6 + M_AREA] = p.partMoments[i * 6 + M_AREA]!;
    turnedMoments[i * 6 + M_Y] = p.partMoments[i * 6 + M_Z]!;
  }
  const aboutY = plasticAboutHorizontal(quarterTurn(p.edges, turned.subarray(p.count * 10)), p, turnedBox, turnedMoments, b[0]!, b[1]!, weight);
  return { aboutZ, aboutY };
}

/**
 * Plastic neutral axes and plastic section moduli about the horizontal (z) and vertical (y)
 * directions, for a section of one material. The plastic neutral axis divides the area into
 * equal halves; Z is the sum of the first moments of the two halves about it (Gere and
 * Goodno, Mechanics of Materials, chapter on inelastic bending: plastic modulus). The axis is
 * found by Newton's method on the exact area-above function (safeguarded by bisection), to
 * machine precision.
 *
 * @param section - A section whose solid parts all have the same material (or none).
 * @throws FlexuraError any code of `section()`, and `plastic-needs-one-material` when the
 *   solid parts have different elastic moduli or yield strengths; `result-out-of-range` when the
 *   plastic moment would overflow.
 * @example
 * ```ts
 * plasticProperties(rectangle({ width: 100, depth: 200 })).plasticModulusZ; // b d^2 / 4 = 1e6
 * ```
 */
export function plasticProperties(section: Section): PlasticProperties {
  const p = prepareSection(section);
  let E = Number.NaN;
  let fy = Number.NaN;
  let first = true;
  const found = new IssueCollector();
  for (let i = 0; i < p.count; i++) {
    if (p.sign[i]! < 0) continue;
    const e = p.modulus[i]!;
    const f = p.yieldStrength[i]!;
    if (first) {
      E = e;
      fy = f;
      first = false;
    } else if (!Object.is(e, E) || !Object.is(f, fy)) {
      found.add("plastic-needs-one-material", ["parts", i, "material"], "Plastic properties need a section of one material (the same elastic modulus and yield strength in every solid part); this part differs from the first.");
    }
  }
  found.throwIfAny();
  const { aboutZ, aboutY } = plasticAxes(p, p.sign);
  const elastic = sectionProperties(section);
  const zz = aboutZ.modulus;
  const zy = aboutY.modulus;
  const s = elastic.sectionModulus;
  const yieldStrength = Number.isNaN(fy) ? null : fy;
  if (yieldStrength !== null && !Number.isFinite(yieldStrength * Math.max(zz, zy))) {
    found.add("result-out-of-range", ["parts", 0, "material", "yieldStrength"], `The plastic moment f_y Z (${yieldStrength} times ${Math.max(zz, zy)}) is beyond what a number holds; check the units of the yield strength.`, { yieldStrength });
    found.throwIfAny();
  }
  return {
    neutralAxisY: aboutZ.axis + p.refY,
    plasticModulusZ: zz,
    neutralAxisZ: aboutY.axis + p.refZ,
    plasticModulusY: zy,
    shapeFactorZ: zz / Math.min(s.top, s.bottom),
    shapeFactorY: zy / Math.min(s.left, s.right),
    yieldStrength,
    plasticMoment: yieldStrength === null ? null : { z: yieldStrength * zz, y: yieldStrength * zy },
  };
}

/**
 * The non-throwing form of {@link plasticProperties}.
 *
 * @example
 * ```ts
 * const r = tryPlasticProperties(rectangle({ width: 100, depth: 200 }));
 * if (r.ok) console.log(r.value.shapeFactorZ); // 1.5
 * ```
 */
export function tryPlasticProperties(section: Section): Result<PlasticProperties> {
  return attempt(() => plasticProperties(section));
}
