import type { Decimal } from "decimal.js";
import { issue, type FlexuraIssue, type IssuePath } from "../errors/index.js";
import { ExactDecimal } from "./decimal.js";
import type { UnitFactor } from "./unit.js";

/**
 * `amount` in unit `from` expressed in unit `to` (either may be `undefined`, meaning the SI base
 * unit), computed exactly as amount * from.numerator * to.denominator / (from.denominator *
 * to.numerator) and rounded once to a JavaScript number. Returns an issue when the result
 * overflows to an infinity or a non-zero amount underflows to zero.
 */
export function rescale(amount: Decimal | number, from: UnitFactor | undefined, to: UnitFactor | undefined, path: IssuePath, shown: string): number | FlexuraIssue {
  let top: Decimal = new ExactDecimal(amount);
  let bottom: Decimal | undefined;
  if (from !== undefined) {
    top = top.times(from.numerator);
    bottom = from.denominator;
  }
  if (to !== undefined) {
    top = top.times(to.denominator);
    bottom = bottom === undefined ? to.numerator : bottom.times(to.numerator);
  }
  const exactValue = bottom === undefined ? top : top.div(bottom);
  const value = exactValue.toNumber();
  if (!Number.isFinite(value) || (value === 0 && !exactValue.isZero())) {
    const where = to === undefined ? "in SI base units" : `in ${to.unit}`;
    return issue("number-out-of-range", path, `${shown} is ${exactValue.toSignificantDigits(6).toString()} ${where}, which a JavaScript number cannot hold (about 1e-308 to 1e308).`, {
      value: exactValue.toSignificantDigits(17).toString(),
    });
  }
  return value === 0 ? 0 : value; // no negative zero
}
