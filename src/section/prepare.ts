// Validation and compilation of a whole section into flat edge arrays, relative to the centre
// of its bounding box (so that sections far from the origin keep their precision).
import { IssueCollector, describeValue } from "../errors/index.js";
import { checkHoles } from "./holes.js";
import { ARC, STRIDE, pushPartBoundary } from "./edges.js";
import { sinExact, cosExact } from "./angles.js";
import { addMoments } from "./integrals.js";
import { RATIO_LIMIT, SIZE_FLOOR } from "./limits.js";
import { checkOverlaps } from "./overlap.js";
import { validatePart } from "./validatePart.js";
import { fillWeights, type Weights } from "./weights.js";
import type { Section, SectionPart } from "./types.js";

/** A checked section in the compiled form the property functions integrate over. */
export interface PreparedSection {
  /** The section it was made from. */
  readonly section: Section;
  /** Number of parts. */
  readonly count: number;
  /** Edges (see edges.ts), coordinates relative to (refZ, refY). */
  readonly edges: Float64Array;
  /** Part i owns edges [edgeStart[i], edgeStart[i + 1]). */
  readonly edgeStart: Int32Array;
  /** +1 for a solid part, -1 for a hole. */
  readonly sign: Float64Array;
  /** Elastic modulus of each part (a hole takes its host's unless it has its own); NaN when none. */
  readonly modulus: Float64Array;
  /** Yield strength of each part (as for modulus); NaN when none. */
  readonly yieldStrength: Float64Array;
  /** Bounding box of each part, relative: zMin, zMax, yMin, yMax (stride 4). */
  readonly partBox: Float64Array;
  /** Bounding box of the solid parts, relative: zMin, zMax, yMin, yMax. */
  readonly box: Float64Array;
  /** Absolute z of the local origin. */
  readonly refZ: number;
  /** Absolute y of the local origin. */
  readonly refY: number;
  /** True when the parts carry materials. */
  readonly hasMaterial: boolean;
  /** Geometric (untransformed) net area. */
  readonly netArea: number;
  /** Each part's own moments (area, \int y, \int z, \int y^2, \int z^2, \int y z; relative coordinates, unsigned), stride 6. */
  readonly partMoments: Float64Array;
  /** The weights for the default reference modulus (see weights.ts). */
  readonly defaultWeights: Weights;
}

const cache = new WeakMap<Section, PreparedSection>();

function edgeBox(edges: number[], from: number, to: number, box: Float64Array, at: number): void {
  let zMin = Infinity, zMax = -Infinity, yMin = Infinity, yMax = -Infinity;
  for (let e = from; e < to; e++) {
    const o = e * STRIDE;
    let za: number, ya: number, zb: number, yb: number;
    if (edges[o] === ARC) {
      const zc = edges[o + 1]!, yc = edges[o + 2]!, r = edges[o + 3]!;
      za = zc + r * cosExact(edges[o + 4]!);
      ya = yc + r * sinExact(edges[o + 4]!);
      zb = zc + r * cosExact(edges[o + 5]!);
      yb = yc + r * sinExact(edges[o + 5]!);
    } else {
      za = edges[o + 1]!;
      ya = edges[o + 2]!;
      zb = edges[o + 3]!;
      yb = edges[o + 4]!;
    }
    zMin = Math.min(zMin, za, zb);
    zMax = Math.max(zMax, za, zb);
    yMin = Math.min(yMin, ya, yb);
    yMax = Math.max(yMax, ya, yb);
  }
  box[at] = zMin;
  box[at + 1] = zMax;
  box[at + 2] = yMin;
  box[at + 3] = yMax;
}

/**
 * Typed arrays larger than 64 bytes live outside the V8 heap and cost about a microsecond each
 * to allocate, so every typed array of a compiled section is a view on one stretch of memory,
 * and small sections' stretches are carved from shared blocks of BLOCK doubles (as Node carves
 * small Buffers from a pool). Each section owns its stretch, which starts zeroed and is never
 * handed out again; a block lives while any section cut from it does. A section needing more
 * than a quarter of a block gets a buffer of its own.
 */
const BLOCK = 4096;
let block = new ArrayBuffer(0);
let blockUsed = BLOCK;
let carvedAt = 0;

/** A buffer with `doubles` zeroed doubles free from byte `carvedAt`. */
function carve(doubles: number): ArrayBuffer {
  if (doubles > BLOCK / 4) {
    carvedAt = 0;
    return new ArrayBuffer(doubles * 8);
  }
  if (blockUsed + doubles > BLOCK) {
    block = new ArrayBuffer(BLOCK * 8);
    blockUsed = 0;
  }
  carvedAt = blockUsed * 8;
  blockUsed += doubles;
  return block;
}

/** Records `modular-ratio-out-of-range` when the solid parts' moduli differ by more than RATIO_LIMIT. */
function checkModuli(found: IssueCollector, modulus: Float64Array, sign: Float64Array, count: number): void {
  let lo = -1;
  let hi = -1;
  for (let i = 0; i < count; i++) {
    if (sign[i] !== 1 || Number.isNaN(modulus[i]!)) continue;
    if (lo < 0 || modulus[i]! < modulus[lo]!) lo = i;
    if (hi < 0 || modulus[i]! > modulus[hi]!) hi = i;
  }
  if (lo >= 0 && modulus[hi]! / modulus[lo]! > RATIO_LIMIT) {
    found.add(
      "modular-ratio-out-of-range",
      ["parts", hi, "material", "elasticModulus"],
      `Parts ${lo} and ${hi} have moduli ${modulus[lo]} and ${modulus[hi]}, a ratio beyond ${RATIO_LIMIT}; no transformed section carries that (check the units of the moduli).`,
      { parts: [lo, hi], limit: RATIO_LIMIT },
    );
  }
}

function compile(section: Section, found: IssueCollector): PreparedSection | undefined {
  const parts = section.parts;
  const count = parts.length;
  const list: number[] = [];
  const starts: number[] = [];
  for (let i = 0; i < count; i++) {
    starts.push(list.length / STRIDE);
    pushPartBoundary(list, parts[i] as SectionPart);
  }
  starts.push(list.length / STRIDE);
  const doubles = list.length + 4 + count * 15;
  const buffer = carve(doubles + Math.ceil((count + 1) / 2));
  let at = carvedAt;
  const take = (n: number): Float64Array => {
    const view = new Float64Array(buffer, at, n);
    at += n * 8;
    return view;
  };
  const edges = take(list.length);
  const partBox = take(count * 4);
  const box = take(4);
  const sign = take(count);
  const modulus = take(count);
  const yieldStrength = take(count);
  const partMoments = take(count * 6);
  const ratios = take(count);
  const weights = take(count);
  const edgeStart = new Int32Array(buffer, at, count + 1);
  edgeStart.set(starts);
  box.set([Infinity, -Infinity, Infinity, -Infinity]);
  for (let i = 0; i < count; i++) {
    edgeBox(list, edgeStart[i]!, edgeStart[i + 1]!, partBox, i * 4);
    const hole = parts[i]?.hole === true;
    sign[i] = hole ? -1 : 1;
    if (hole) continue;
    box[0] = Math.min(box[0]!, partBox[i * 4]!);
    box[1] = Math.max(box[1]!, partBox[i * 4 + 1]!);
    box[2] = Math.min(box[2]!, partBox[i * 4 + 2]!);
    box[3] = Math.max(box[3]!, partBox[i * 4 + 3]!);
  }
  if (!(box[0]! < box[1]!)) {
    found.add("section-no-solid", ["parts"], "The section has no solid part (every part is a hole); add the solid parts the holes are cut from.");
    return undefined;
  }
  if (!(Math.max(box[1]! - box[0]!, box[3]! - box[2]!) >= SIZE_FLOOR)) {
    const size = Math.max(box[1]! - box[0]!, box[3]! - box[2]!);
    found.add("section-too-small", ["parts"], `The section is ${size} across; it must be at least ${SIZE_FLOOR} (its second moments would underflow to zero): use a smaller unit of length.`, { size, floor: SIZE_FLOOR });
    return undefined;
  }
  const refZ = (box[0]! + box[1]!) / 2;
  const refY = (box[2]! + box[3]!) / 2;
  edges.set(list);
  for (let e = 0; e < list.length; e += STRIDE) {
    edges[e + 1]! -= refZ;
    edges[e + 2]! -= refY;
    if (list[e] !== ARC) {
      edges[e + 3]! -= refZ;
      edges[e + 4]! -= refY;
    }
  }
  for (let i = 0; i < count; i++) {
    partBox[i * 4]! -= refZ;
    partBox[i * 4 + 1]! -= refZ;
    partBox[i * 4 + 2]! -= refY;
    partBox[i * 4 + 3]! -= refY;
  }
  box[0]! -= refZ;
  box[1]! -= refZ;
  box[2]! -= refY;
  box[3]! -= refY;
  const tolerance = 1e-9 * Math.max(box[1]! - box[0]!, box[3]! - box[2]!);

  // materials: all solid parts have one, or none does
  modulus.fill(Number.NaN);
  yieldStrength.fill(Number.NaN);
  let withMaterial = 0;
  let solids = 0;
  for (let i = 0; i < count; i++) {
    const m = parts[i]?.material;
    if (m) {
      modulus[i] = m.elasticModulus;
      yieldStrength[i] = m.yieldStrength ?? Number.NaN;
    }
    if (sign[i] === 1) {
      solids++;
      if (m) withMaterial++;
    }
  }
  const hasMaterial = withMaterial > 0;
  if (hasMaterial) checkModuli(found, modulus, sign, count);
  if (hasMaterial && withMaterial < solids) {
    for (let i = 0; i < count; i++) {
      if (sign[i] === 1 && !parts[i]?.material) {
        found.add("material-missing", ["parts", i, "material"], "Some parts have a material and this one does not; give every solid part a material, or none.");
      }
    }
  }

  // each part's own moments, integrated once: they do not depend on the reference modulus
  let netArea = 0;
  for (let i = 0; i < count; i++) {
    addMoments(partMoments, edges, edgeStart[i]!, edgeStart[i + 1]!, 1, i * 6);
    netArea += sign[i]! * partMoments[i * 6]!;
  }

  // holes inside solids and apart; a hole without a material takes its host's
  checkHoles(found, { count, edges, edgeStart, sign, partBox, partMoments, modulus, yieldStrength }, tolerance, Math.max(box[1]! - box[0]!, box[3]! - box[2]!), { y: refY, z: refZ });

  checkOverlaps(found, { count, edges, edgeStart, sign, partBox, partMoments }, tolerance);
  if (found.empty && !(netArea > 1e-12 * (box[1]! - box[0]!) * (box[3]! - box[2]!))) {
    found.add("section-area-not-positive", ["parts"], `The holes take away all of the solid area (net area ${netArea}); holes must not overlap one another or cover the solids.`, { area: netArea });
  }
  if (!found.empty) return undefined;
  const defaultWeights = fillWeights({ count, sign, modulus, hasMaterial }, undefined, ratios, weights);
  return { section, count, edges, edgeStart, sign, modulus, yieldStrength, partBox, box, refZ, refY, hasMaterial, netArea, partMoments, defaultWeights };
}

/** Records every problem with the section; returns the compiled form when there is none. */
export function checkSection(section: unknown, found: IssueCollector): PreparedSection | undefined {
  if (typeof section !== "object" || section === null || !Array.isArray((section as { parts?: unknown }).parts)) {
    found.add("section-invalid", [], `A section must be an object { parts: [...] }; got ${describeValue(section)}.`);
    return undefined;
  }
  const parts = (section as Section).parts;
  if (parts.length === 0) {
    found.add("section-empty", ["parts"], "The section has no parts; give at least one solid part.");
    return undefined;
  }
  let ok = true;
  parts.forEach((p, i) => {
    if (!validatePart(found, p, ["parts", i])) ok = false;
  });
  if (!ok) return undefined;
  return compile(section as Section, found);
}

/**
 * The compiled form of a section: from the cache for sections built by flexura's own
 * functions (which are frozen), otherwise checked and compiled now.
 *
 * @throws FlexuraError with every problem found in the section.
 */
export function prepareSection(section: Section): PreparedSection {
  const hit = cache.get(section);
  if (hit) return hit;
  const found = new IssueCollector();
  const prepared = checkSection(section, found);
  found.throwIfAny();
  return prepared as PreparedSection;
}

/** Remembers the compiled form of a frozen section built by flexura. */
export function remember(prepared: PreparedSection): void {
  cache.set(prepared.section, prepared);
}
