// Modular ratios and signed weights of the parts of a prepared section.
import { IssueCollector } from "../errors/index.js";
import { RATIO_LIMIT } from "./limits.js";
import type { PreparedSection } from "./prepare.js";

/** The transformed-section weights for one reference modulus. */
export interface Weights {
  /** Reference modulus, or null when no part has a material. */
  readonly referenceModulus: number | null;
  /** n_i = E_i / E_ref per part (1 when there are no materials). */
  readonly ratios: Float64Array;
  /** sign_i * n_i per part (holes negative). */
  readonly weights: Float64Array;
}

/** The parts' data the weights depend on. */
type WeightInput = Pick<PreparedSection, "count" | "sign" | "modulus" | "hasMaterial">;

/**
 * Weights for a reference modulus (default: that of the first solid part with a material),
 * written into `ratios` and `weights` (count numbers each).
 */
export function fillWeights(p: WeightInput, referenceModulus: number | undefined, ratios: Float64Array, weights: Float64Array): Weights {
  let ref: number | null = referenceModulus ?? null;
  if (ref === null && p.hasMaterial) {
    for (let i = 0; i < p.count; i++) {
      if (p.sign[i] === 1) {
        ref = p.modulus[i]!;
        break;
      }
    }
  }
  for (let i = 0; i < p.count; i++) {
    const n = p.hasMaterial && ref !== null ? p.modulus[i]! / ref : 1;
    ratios[i] = n;
    weights[i] = p.sign[i]! * n;
  }
  return { referenceModulus: ref, ratios, weights };
}

/**
 * Weights for a reference modulus (default: that of the first solid part with a material; the
 * default weights are part of the prepared section).
 *
 * @throws FlexuraError `reference-modulus-not-positive` (or `not-a-number` / `not-finite`), `modular-ratio-out-of-range`.
 */
export function partWeights(p: PreparedSection, referenceModulus: number | undefined): Weights {
  if (referenceModulus === undefined) return p.defaultWeights;
  if (typeof referenceModulus !== "number" || !Number.isFinite(referenceModulus) || !(referenceModulus > 0)) {
    const found = new IssueCollector();
    found.add("reference-modulus-not-positive", ["referenceModulus"], `The reference modulus must be a finite number greater than zero; got ${String(referenceModulus)}.`, { value: String(referenceModulus) });
    found.throwIfAny();
  }
  for (let i = 0; i < p.count; i++) {
    const n = p.modulus[i]! / referenceModulus;
    if (p.hasMaterial && (n > RATIO_LIMIT || n < 1 / RATIO_LIMIT)) {
      const found = new IssueCollector();
      found.add(
        "modular-ratio-out-of-range",
        ["referenceModulus"],
        `Against the reference modulus ${referenceModulus}, part ${i} has a modular ratio of ${n}, beyond ${RATIO_LIMIT} either way; use a reference modulus near the parts' moduli.`,
        { part: i, ratio: n, limit: RATIO_LIMIT },
      );
      found.throwIfAny();
    }
  }
  const both = new Float64Array(2 * p.count);
  return fillWeights(p, referenceModulus, both.subarray(0, p.count), both.subarray(p.count));
}
