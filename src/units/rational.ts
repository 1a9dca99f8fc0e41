/**
 * Exact rational arithmetic on BigInt, and the one rounding from an exact ratio to the nearest
 * JavaScript number. This is the fast path of every conversion; the decimal.js path in
 * scale.ts is the reference it is tested against, and the fallback for rare cases.
 */

/** An exact ratio `num / den` with `den > 0`, in lowest terms. */
export interface Rational {
  readonly num: bigint;
  readonly den: bigint;
}

/** A decimal number as an integer mantissa and a power of ten: `mantissa * 10^exponent`. */
export interface ScaledInteger {
  readonly mantissa: bigint;
  readonly exponent: number;
}

const DECIMAL = /^([+-]?)(\d*)(?:\.(\d*))?(?:[eE]([+-]?\d+))?$/;

function gcd(a: bigint, b: bigint): bigint {
  let x = a < 0n ? -a : a;
  let y = b;
  while (y !== 0n) [x, y] = [y, x % y];
  return x;
}

/** `num / den` in lowest terms with a positive denominator. */
export function rational(num: bigint, den: bigint): Rational {
  const sign = den < 0n ? -1n : 1n;
  const g = gcd(num, den) || 1n;
  return { num: (sign * num) / g, den: (sign * den) / g };
}

/** Reads decimal text (`"-1.5e3"`, `"0.0254"`) as an integer and a power of ten; undefined if it is not one. */
export function scaledInteger(text: string): ScaledInteger | undefined {
  const m = DECIMAL.exec(text);
  if (m === null) return undefined;
  const whole = m[2] ?? "";
  const fraction = m[3] ?? "";
  if (whole === "" && fraction === "") return undefined;
  const digits = `${m[1] ?? ""}${whole}${fraction}`;
  return { mantissa: BigInt(digits === "+" || digits === "-" ? "0" : digits), exponent: Number(m[4] ?? "0") - fraction.length };
}

/** Decimal text as an exact rational. */
export function rationalOf(text: string): Rational {
  const s = scaledInteger(text);
  if (s === undefined) throw new Error(`not a decimal: ${text}`);
  return s.exponent >= 0 ? rational(s.mantissa * 10n ** BigInt(s.exponent), 1n) : rational(s.mantissa, 10n ** BigInt(-s.exponent));
}

/** The product of two rationals. */
export function times(a: Rational, b: Rational): Rational {
  return rational(a.num * b.num, a.den * b.den);
}

/** A rational raised to an integer power. */
export function power(a: Rational, n: number): Rational {
  const k = BigInt(Math.abs(n));
  return n >= 0 ? { num: a.num ** k, den: a.den ** k } : rational(a.den ** k, a.num ** k);
}

const approximateBits = (x: bigint): number => x.toString(16).length * 4;
const SMALLEST_NORMAL = 2 ** -1022;

/**
 * The JavaScript number nearest `p / q` (ties to even), for `q > 0`; `undefined` when the
 * result would be subnormal or the scaling is extreme (the caller then takes the slow path).
 * Infinity when it overflows.
 *
 * The quotient is taken with at least 55 significant bits and a sticky bit for any remainder,
 * so that converting it to a number rounds exactly as the true ratio would.
 */
export function nearestNumber(p: bigint, q: bigint): number | undefined {
  if (p === 0n) return 0;
  const negative = p < 0n;
  const a = negative ? -p : p;
  const shift = 64 + approximateBits(q) - approximateBits(a);
  if (shift > 1000 || shift < -1000) return undefined;
  const num = shift >= 0 ? a << BigInt(shift) : a;
  const den = shift >= 0 ? q : q << BigInt(-shift);
  let quotient = num / den;
  if (quotient * den !== num) quotient |= 1n;
  const magnitude = Number(quotient) * 2 ** -shift;
  if (magnitude !== Infinity && magnitude < SMALLEST_NORMAL) return undefined;
  return negative ? -magnitude : magnitude;
}
