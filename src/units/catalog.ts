import type { Decimal } from "decimal.js";
import { exact, handOut } from "./decimal.js";
import type { Dimension } from "./kinds.js";

/**
 * One unit symbol that flexura knows, with its exact value in SI base units
 * (metre, newton, radian): one `symbol` equals `numerator / denominator` of the base unit
 * raised to the powers in `dimension`.
 */
export interface CatalogUnit {
  /** The canonical symbol, as flexura prints it: `"kip"`, `"MPa"`. Case matters (`mm` is not `Mm`). */
  readonly symbol: string;
  /** Other spellings accepted on input and printed as `symbol`: `"kips"` for `"kip"`. */
  readonly aliases: readonly string[];
  /** The unit's name in words. */
  readonly name: string;
  /** Its dimension: exponents of length, force and angle. */
  readonly dimension: Dimension;
  /** The SI value of one unit is `numerator / denominator` (both exact decimals). */
  readonly numerator: Decimal;
  /** See {@link CatalogUnit.numerator}. */
  readonly denominator: Decimal;
}

type Row = readonly [symbol: string, aliases: readonly string[], name: string, dimension: Dimension, numerator: string, denominator?: string];

const L: Dimension = { length: 1, force: 0, angle: 0 };
const F: Dimension = { length: 0, force: 1, angle: 0 };
const P: Dimension = { length: -2, force: 1, angle: 0 };
const W: Dimension = { length: -1, force: 1, angle: 0 };
const A: Dimension = { length: 0, force: 0, angle: 1 };

// Exact definitions. The inch and the pound-force are the international definitions
// (NIST SP 811 (2008) Appendix B.9: inch = 2.54 E-02 m exactly; pound-force = 4.448 222 E+00 N,
// defined as 0.45359237 kg x 9.80665 m/s^2 = 4.4482216152605 N exactly).
const LBF = "4.4482216152605";
const KIP = "4448.2216152605";
const IN2 = "0.00064516"; // 0.0254^2
const FT2 = "0.09290304"; // 0.3048^2

// Definitions in words, with sources: docs/units.md ("Units" table).
const ROWS: readonly Row[] = [
  ["m", ["metre", "meter"], "metre", L, "1"],
  ["mm", [], "millimetre", L, "0.001"],
  ["cm", [], "centimetre", L, "0.01"],
  ["km", [], "kilometre", L, "1000"],
  ["in", ["inch", "inches"], "inch", L, "0.0254"],
  ["ft", ["foot", "feet"], "foot", L, "0.3048"],
  ["yd", ["yard"], "yard", L, "0.9144"],
  ["N", ["newton"], "newton", F, "1"],
  ["kN", [], "kilonewton", F, "1000"],
  ["MN", [], "meganewton", F, "1000000"],
  ["lbf", ["lb", "lbs"], "pound-force", F, LBF],
  ["kip", ["kips"], "kip (kilopound-force)", F, KIP],
  ["Pa", [], "pascal", P, "1"],
  ["kPa", [], "kilopascal", P, "1000"],
  ["MPa", [], "megapascal", P, "1000000"],
  ["GPa", [], "gigapascal", P, "1000000000"],
  ["psi", [], "pound-force per square inch", P, LBF, IN2],
  ["ksi", [], "kip per square inch", P, KIP, IN2],
  ["psf", [], "pound-force per square foot", P, LBF, FT2],
  ["ksf", [], "kip per square foot", P, KIP, FT2],
  ["plf", [], "pound-force per linear foot", W, LBF, "0.3048"],
  ["klf", [], "kip per linear foot", W, KIP, "0.3048"],
  ["rad", ["radian", "radians"], "radian", A, "1"],
];

/** The catalogue as flexura computes with it (its decimals are never handed out). */
const OWN: readonly CatalogUnit[] = Object.freeze(
  ROWS.map(([symbol, aliases, name, dimension, numerator, denominator]) =>
    Object.freeze({
      symbol,
      aliases: Object.freeze([...aliases]),
      name,
      dimension: Object.freeze({ ...dimension }),
      numerator: exact(numerator),
      denominator: exact(denominator ?? "1"),
    }),
  ),
);

/**
 * Every unit symbol flexura knows, in the order documented in docs/units.md. Units built from
 * these by the grammar (`kN*m`, `N/mm^2`, `in^4`, `kip*ft/rad`) need no entry of their own.
 *
 * Frozen all the way down, digits of the decimals included; the decimals are copies made with
 * a Decimal constructor flexura does not compute with, so nothing done to them (or to their
 * constructor's settings) changes a conversion.
 *
 * @example
 * ```ts
 * unitCatalog.find((u) => u.symbol === "in")?.numerator.toString(); // "0.0254"
 * ```
 */
export const unitCatalog: readonly CatalogUnit[] = Object.freeze(
  OWN.map((u) =>
    Object.freeze({ ...u, numerator: handOut(u.numerator), denominator: handOut(u.denominator) }),
  ),
);

const BY_SPELLING: ReadonlyMap<string, CatalogUnit> = new Map(
  OWN.flatMap((u) => [[u.symbol, u] as const, ...u.aliases.map((a) => [a, u] as const)]),
);

/** The catalogue entry for a symbol or alias, if there is one (case-sensitive). */
export function lookupUnit(spelling: string): CatalogUnit | undefined {
  return BY_SPELLING.get(spelling);
}

/** Every accepted spelling (symbols and aliases). */
export function allSpellings(): readonly string[] {
  return [...BY_SPELLING.keys()];
}
