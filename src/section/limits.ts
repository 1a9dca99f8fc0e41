// What the section arithmetic can carry. Second moments grow as a length to the fourth power and
// the transformed ones take a modular ratio too, so coordinates beyond 1e60 (1e240 to the fourth)
// or sections smaller than 1e-60 (1e-240) would overflow to Infinity or underflow to 0 in some
// property; they are refused instead, as are modular ratios beyond 1e15 either way.

/** The largest coordinate or size a section may have, in magnitude (any length unit). */
export const LENGTH_LIMIT = 1e60;
/** The smallest overall size (the larger side of the solid parts' bounding box) a section may have. */
export const SIZE_FLOOR = 1e-60;
/** The largest modular ratio E_i / E_ref, and the inverse of the smallest. */
export const RATIO_LIMIT = 1e15;

/** True for a number no larger than {@link LENGTH_LIMIT} in magnitude (false for NaN and infinities). */
export function isLength(value: unknown): value is number {
  return typeof value === "number" && Math.abs(value) <= LENGTH_LIMIT;
}
