import { Decimal } from "decimal.js";

/**
 * The number of significant digits kept when conversion factors are composed. Every factor in
 * the catalogue is a terminating decimal (the inch is 0.0254 m, the pound-force 4.4482216152605 N),
 * so products and powers of them stay exact within this many digits; the one division comes last.
 */
export const FACTOR_PRECISION = 64;

/**
 * flexura's own Decimal constructor: a clone at {@link FACTOR_PRECISION} digits, so the global
 * `Decimal` settings of the caller are neither read nor changed.
 */
export const ExactDecimal = Decimal.clone({ precision: FACTOR_PRECISION, rounding: Decimal.ROUND_HALF_EVEN });

/** A frozen decimal from a string or number, made with {@link ExactDecimal}. */
export function exact(value: string | number): Decimal {
  return Object.freeze(new ExactDecimal(value));
}

export const ONE = exact(1);
