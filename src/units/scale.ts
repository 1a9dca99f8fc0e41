import { issue, type FlexuraIssue, type IssuePath } from "../errors/index.js";
import { ExactDecimal } from "./decimal.js";
import { exactPartsOf, smallRatioOf, type UnitFactor } from "./unit.js";


/**
 * `amount` in unit `from` expressed in unit `to` (either may be `undefined`, meaning the SI base
 * unit), computed exactly as amount * from / to and rounded once to the nearest JavaScript number.
 * `amount` is decimal text, or a number taken as the shortest decimal that names it.
 * Returns an issue when the result overflows or a non-zero amount underflows to zero.
 */
export function rescale(amount: string | number, from: UnitFactor | undefined, to: UnitFactor | undefined, path: IssuePath, shown: () => string): number | FlexuraIssue {
  const value = exactRescale(typeof amount === "number" ? String(amount) : amount, from, to);
  if (Number.isFinite(value) && value !== 0) return value;
  if (value === 0 && !/[1-9]/.test(String(amount).split(/[eE]/)[0] ?? "")) return 0;
  const where = to === undefined ? "SI base units" : to.unit;
  const size = value === 0 ? "too small" : "too large";
  return issue("number-out-of-range", path, `${shown()} is ${size} to hold as a JavaScript number in ${where} (magnitudes from about 5e-324 to 1.8e308).`, { size });
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
    const r = smallRatioOf(from);
    p *= r.num;
    q *= r.den;
  }
  if (to !== undefined) {
    const r = smallRatioOf(to);
    p *= r.den;
    q *= r.num;
  }
  if (exponent >= 0) p *= 10 ** exponent;
  else q *= 10 ** -exponent;
  // A double product below 2^53 means the exact product is below 2^53 too, and so was exact.
  if (!(p < SAFE && q < SAFE)) return undefined;
  const value = p / q;
  return m[1] === "-" ? -value : value;
}

/**
 * `text` (decimal) in `from` expressed in `to`: exactly when every integer involved is below 2^53
 * (all in doubles), else through decimal.js at 64 significant digits; rounded once either way.
 */
export function exactRescale(text: string, from: UnitFactor | undefined, to: UnitFactor | undefined): number {
  const small = smallRescale(text, from, to);
  if (small !== undefined) return small;
  let top = new ExactDecimal(text);
  let bottom = new ExactDecimal(1);
  if (from !== undefined) {
    const [n, d] = exactPartsOf(from);
    top = top.times(n);
    bottom = bottom.times(d);
  }
  if (to !== undefined) {
    const [n, d] = exactPartsOf(to);
    top = top.times(d);
    bottom = bottom.times(n);
  }
  return top.div(bottom).toNumber();
}
