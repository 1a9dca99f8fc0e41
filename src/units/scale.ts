import { issue, type FlexuraIssue, type IssuePath } from "../errors/index.js";
import { ExactDecimal } from "./decimal.js";
import { nearestNumber, scaledInteger } from "./rational.js";
import { ratioOf, type UnitFactor } from "./unit.js";

const FAST_DIGITS = 40;
const FAST_EXPONENT = 400;

/**
 * `amount` in unit `from` expressed in unit `to` (either may be `undefined`, meaning the SI base
 * unit), computed exactly as amount * from / to and rounded once to the nearest JavaScript number.
 * `amount` is decimal text, or a number taken as the shortest decimal that names it.
 * Returns an issue when the result overflows or a non-zero amount underflows to zero.
 */
export function rescale(amount: string | number, from: UnitFactor | undefined, to: UnitFactor | undefined, path: IssuePath, shown: () => string): number | FlexuraIssue {
  const text = typeof amount === "number" ? String(amount) : amount;
  const fast = text.length <= FAST_DIGITS ? exactRescale(text, from, to) : undefined;
  if (fast !== undefined && Number.isFinite(fast)) return fast === 0 ? 0 : fast;
  return decimalRescale(text, from, to, path, shown);
}

const NUMBER_PARTS = /^([+-]?)(\d*)(?:\.(\d*))?(?:[eE]([+-]?\d+))?$/;
const SAFE = 2 ** 53;

/**
 * The all-double path, taken when every integer involved is below 2^53, so that each product is
 * exact and the one division rounds once: `12 kN*m`, `1.5 kip/ft`, `350 in^4`.
 */
function smallRescale(text: string, from: UnitFactor | undefined, to: UnitFactor | undefined): number | undefined {
  const m = NUMBER_PARTS.exec(text);
  if (m === null) return undefined;
  const fraction = m[3] ?? "";
  const digits = (m[2] ?? "") + fraction;
  if (digits.length > 15) return undefined;
  const exponent = Number(m[4] ?? "0") - fraction.length;
  if (exponent > 22 || exponent < -22) return undefined;
  let p = Number(digits);
  let q = 1;
  if (from !== undefined) {
    const r = ratioOf(from);
    p *= r.small.num;
    q *= r.small.den;
  }
  if (to !== undefined) {
    const r = ratioOf(to);
    p *= r.small.den;
    q *= r.small.num;
  }
  if (exponent >= 0) p *= 10 ** exponent;
  else q *= 10 ** -exponent;
  // A double product below 2^53 means the exact product is below 2^53 too, and so was exact.
  if (!(p < SAFE && q < SAFE)) return undefined;
  const value = p / q;
  return m[1] === "-" ? -value : value;
}

/** The exact path: exact, one rounding; undefined for the rare cases it leaves to the decimal path. */
export function exactRescale(text: string, from: UnitFactor | undefined, to: UnitFactor | undefined): number | undefined {
  const small = smallRescale(text, from, to);
  if (small !== undefined) return small;
  const s = scaledInteger(text);
  if (s === undefined || Math.abs(s.exponent) > FAST_EXPONENT) return undefined;
  let p = s.mantissa;
  let q = 1n;
  if (from !== undefined) {
    const r = ratioOf(from);
    p *= r.num;
    q *= r.den;
  }
  if (to !== undefined) {
    const r = ratioOf(to);
    p *= r.den;
    q *= r.num;
  }
  if (q < 0n) [p, q] = [-p, -q];
  const ten = 10n ** BigInt(Math.abs(s.exponent));
  if (s.exponent >= 0) p *= ten;
  else q *= ten;
  return nearestNumber(p, q);
}

/** The decimal.js path: 64 significant digits, then one rounding; also words the range errors. */
export function decimalRescale(text: string, from: UnitFactor | undefined, to: UnitFactor | undefined, path: IssuePath, shown: () => string): number | FlexuraIssue {
  let top = new ExactDecimal(text);
  let bottom = new ExactDecimal(1);
  if (from !== undefined) {
    top = top.times(from.numerator);
    bottom = bottom.times(from.denominator);
  }
  if (to !== undefined) {
    top = top.times(to.denominator);
    bottom = bottom.times(to.numerator);
  }
  const exactValue = top.div(bottom);
  const value = exactValue.toNumber();
  if (!Number.isFinite(value) || (value === 0 && !exactValue.isZero())) {
    const where = to === undefined ? "in SI base units" : `in ${to.unit}`;
    return issue("number-out-of-range", path, `${shown()} is ${exactValue.toSignificantDigits(6).toString()} ${where}, which a JavaScript number cannot hold (about 1e-308 to 1e308).`, {
      value: exactValue.toSignificantDigits(17).toString(),
    });
  }
  return value === 0 ? 0 : value;
}
