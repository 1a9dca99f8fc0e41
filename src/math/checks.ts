import { describeValue, fail, type IssuePath } from "../errors/index.js";
import type { PiecewisePolynomial, PiecewiseSide } from "./piecewise.js";

/** The highest degree flexura's kernels take (their scratch storage is sized for it). */
export const MAX_DEGREE = 8;

/**
 * Carried (not enumerable, so neither spread nor structuredClone copies it) by the piecewise
 * polynomials flexura built or checked.
 */
const CHECKED = Symbol("flexura.checked-piecewise");
/** Hand-made piecewise polynomials already checked, each mapped to its checked copy. */
const checked = new WeakMap<object, PiecewisePolynomial>();

/** Freezes a piecewise polynomial built by flexura's own kernels, marked as checked. */
export function trusted(pp: { kind: "piecewise-polynomial"; degree: number; breaks: Float64Array; coefficients: Float64Array }): PiecewisePolynomial {
  Object.defineProperty(pp, CHECKED, { value: true });
  return Object.freeze(pp);
}

/** True for a Float64Array from any realm (a structured clone, a worker). */
function isFloat64Array(value: unknown): value is Float64Array {
  return Object.prototype.toString.call(value) === "[object Float64Array]";
}

/** True for an array or a typed array (not a DataView): the lists the math functions take. */
export function isNumberList(value: unknown): value is ArrayLike<unknown> {
  return Array.isArray(value) || (ArrayBuffer.isView(value) && !(value instanceof DataView));
}

/**
 * `pp` as a checked piecewise polynomial: one built by flexura is returned as it is; anything
 * else (a hand-made object, a structured clone) is checked once, as {@link piecewisePolynomial}
 * checks its input, and a frozen copy of its fields (the typed arrays themselves are not copied)
 * is remembered for it, so that getters cannot change what was checked.
 *
 * @throws FlexuraError `piecewise-invalid` at `name` when it is not a valid piecewise polynomial.
 */
export function checkPiecewise(pp: unknown, name: string): PiecewisePolynomial {
  if (typeof pp === "object" && pp !== null && (pp as { [CHECKED]?: boolean })[CHECKED] === true) return pp as PiecewisePolynomial;
  return checkHandMade(pp, name);
}

function checkHandMade(pp: unknown, name: string): PiecewisePolynomial {
  if (typeof pp === "object" && pp !== null) {
    const hit = checked.get(pp);
    if (hit !== undefined) return hit;
  } else {
    fail("piecewise-invalid", [name], `Expected a piecewise polynomial (built by piecewisePolynomial); got ${describeValue(pp)}.`);
  }
  const p = pp as Record<string, unknown>;
  const kind = p["kind"];
  const degree = p["degree"];
  const breaks = p["breaks"];
  const coefficients = p["coefficients"];
  if (kind !== "piecewise-polynomial") fail("piecewise-invalid", [name, "kind"], `A piecewise polynomial has kind "piecewise-polynomial"; got ${describeValue(kind)}.`);
  if (typeof degree !== "number" || !Number.isInteger(degree) || degree < 0 || degree > MAX_DEGREE)
    fail("piecewise-invalid", [name, "degree"], `The degree must be an integer from 0 to ${MAX_DEGREE}; got ${describeValue(degree)}.`);
  if (!isFloat64Array(breaks) || breaks.length < 2) fail("piecewise-invalid", [name, "breaks"], "The breakpoints must be a Float64Array of at least two values.");
  if (!isFloat64Array(coefficients) || coefficients.length !== (breaks.length - 1) * (degree + 1))
    fail("piecewise-invalid", [name, "coefficients"], `The coefficients must be a Float64Array of ${(breaks.length - 1) * (degree + 1)} values (${degree + 1} per piece).`);
  checkBreaks(breaks, [name, "breaks"]);
  checkCoefficients(coefficients, [name, "coefficients"]);
  const copy = trusted({ kind: "piecewise-polynomial", degree, breaks, coefficients });
  checked.set(pp, copy);
  return copy;
}

/** Breakpoints must be finite and strictly increasing. */
export function checkBreaks(breaks: ArrayLike<unknown>, path: IssuePath): void {
  let previous = -Infinity;
  for (let i = 0; i < breaks.length; i++) {
    const b = breaks[i];
    if (typeof b !== "number" || !Number.isFinite(b) || !(b > previous)) fail("piecewise-invalid", [...path, i], "Breakpoints must be finite numbers in strictly increasing order.");
    previous = b;
  }
}

/** Coefficients must be finite numbers. */
export function checkCoefficients(coefficients: ArrayLike<unknown>, path: IssuePath): void {
  for (let i = 0; i < coefficients.length; i++) {
    const c = coefficients[i];
    if (typeof c !== "number" || !Number.isFinite(c)) fail("piecewise-invalid", [...path, i], "Coefficients must be finite numbers.");
  }
}

/** `value` when it is a number (NaN included: callers decide what NaN means), else `not-a-number`. */
export function checkNumber(value: unknown, name: string): number {
  if (typeof value !== "number") fail("not-a-number", [name], `The ${name} must be a number; got ${describeValue(value)}.`);
  return value;
}

/** `value` when it is a finite number, else `not-a-number` or `not-finite`. */
export function checkFinite(value: unknown, name: string, what: string): number {
  if (typeof value !== "number") fail("not-a-number", [name], `The ${what} must be a number; got ${describeValue(value)}.`);
  if (!Number.isFinite(value)) fail("not-finite", [name], `The ${what} must be a finite number; got ${value}.`);
  return value;
}

/** `"right"` when not given, else `side` when it is `"left"` or `"right"`, else `unknown-side`. */
export function checkSide(side: unknown): PiecewiseSide {
  if (side === undefined || side === "right") return "right";
  if (side === "left") return "left";
  return fail("unknown-side", ["side"], `The side must be "left" or "right"; got ${describeValue(side)}.`);
}

/** Throws `piecewise-overflow` when any value of `values` is not finite. */
export function checkNoOverflow(values: Float64Array, path: IssuePath, what: string): void {
  for (let i = 0; i < values.length; i++) {
    const v = values[i] as number;
    if (v - v !== 0) overflow(path, what);
  }
}

/** Throws `piecewise-overflow`. */
export function overflow(path: IssuePath, what: string): never {
  return fail("piecewise-overflow", path, `${what} exceeds what a JavaScript number can hold (about 1.8e308); rescale the input (other units).`);
}

/** Points must be an array or typed array of numbers. */
export function checkPoints(xs: unknown): asserts xs is ArrayLike<number> {
  if (!isNumberList(xs)) fail("not-an-array", ["xs"], `The points must be an array of numbers; got ${describeValue(xs)}.`);
  if (xs instanceof Float64Array) return;
  for (let j = 0; j < xs.length; j++) if (typeof xs[j] !== "number") fail("not-a-number", ["xs", j], `Each point must be a number; got ${describeValue(xs[j])}.`);
}
