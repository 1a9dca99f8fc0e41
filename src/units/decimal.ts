import { Decimal } from "decimal.js";

/**
 * The number of significant digits kept when conversion factors are composed. Every factor in
 * the catalogue is a terminating decimal (the inch is 0.0254 m, the pound-force 4.4482216152605 N),
 * so products and powers of them stay exact within this many digits; the one division comes last.
 */
export const FACTOR_PRECISION = 64;

/**
 * flexura's own Decimal constructor: a clone at {@link FACTOR_PRECISION} digits, so the global
 * `Decimal` settings of the caller are neither read nor changed. No value made with it is ever
 * handed out (see {@link handOut}), so nobody can reach it to change its settings.
 */
export const ExactDecimal = Decimal.clone({ precision: FACTOR_PRECISION, rounding: Decimal.ROUND_HALF_EVEN });

/**
 * The constructor of the decimals flexura hands out (catalogue entries, unit factors): another
 * clone, so that a caller who changes its settings (`value.constructor.set(...)`) changes only how
 * those values behave in the caller's own arithmetic, never what flexura computes.
 */
const SharedDecimal = Decimal.clone({ precision: FACTOR_PRECISION, rounding: Decimal.ROUND_HALF_EVEN });

/** Freezes a decimal and its digit array (decimal.js keeps the digits in a plain array `d`). */
function freezeDeep(value: Decimal): Decimal {
  const digits = (value as unknown as { d?: number[] | null }).d;
  if (digits) Object.freeze(digits);
  return Object.freeze(value);
}

/**
 * A frozen decimal from a string or number, made with {@link ExactDecimal}, for flexura's own
 * arithmetic (never handed out; its digit array is left unfrozen because decimal.js copies
 * frozen arrays on a slow path).
 */
export function exact(value: string | number): Decimal {
  return Object.freeze(new ExactDecimal(value));
}

/** A frozen copy, digits and all, made with the shared constructor: what flexura hands out. */
export function handOut(value: Decimal): Decimal {
  return freezeDeep(new SharedDecimal(value));
}

export const ONE = exact(1);
