import type { CatalogUnit } from "./catalog.js";
import { lookupUnit } from "./catalog.js";

/**
 * The unit grammar (docs/units.md has it in full):
 *
 * ```
 * unit    := term (product term)* ("/" term)?      at most one "/" per level; use ( ) for more
 * product := "*" | "·" | "⋅" | "×" | "-"
 * term    := symbol power? | "(" unit ")" power?
 * power   := "^" integer | "^(" integer ")" | superscript digits | digits right after a symbol
 * ```
 * Whitespace may stand between any two tokens.
 */

/** One symbol or parenthesised group raised to an integer power. */
export type UnitTerm =
  | { readonly kind: "symbol"; readonly spelling: string; readonly unit: CatalogUnit | undefined; readonly power: number; readonly at: number }
  | { readonly kind: "group"; readonly body: UnitExpression; readonly power: number };

/** A product of terms, optionally divided by one term. */
export interface UnitExpression {
  readonly numerator: readonly UnitTerm[];
  readonly denominator: UnitTerm | undefined;
}

/** A syntax problem: what is wrong, and the character offset where it was found. */
export interface UnitSyntaxProblem {
  readonly message: string;
  readonly at: number;
}

/** The result of reading a unit: the tree, or the first syntax problem. */
export type UnitParse = { readonly ok: true; readonly expression: UnitExpression } | { readonly ok: false; readonly problem: UnitSyntaxProblem };

const PRODUCT = new Set(["*", "·", "⋅", "×", "-"]);
const SUPERSCRIPT: Readonly<Record<string, number>> = { "⁰": 0, "¹": 1, "²": 2, "³": 3, "⁴": 4, "⁵": 5, "⁶": 6, "⁷": 7, "⁸": 8, "⁹": 9 };
/** The largest power, in absolute value, of any symbol, after powers of groups are multiplied out. */
export const MAX_POWER = 12;
const MAX_DEPTH = 8;
/** Longest unit text read; longer text is refused rather than parsed. */
export const MAX_UNIT_LENGTH = 120;

class SyntaxStop extends Error {
  constructor(readonly problem: UnitSyntaxProblem) {
    super(problem.message);
  }
}

const isLetter = (c: string | undefined): boolean => c !== undefined && /[A-Za-zµμ]/.test(c);
const isDigit = (c: string | undefined): boolean => c !== undefined && c >= "0" && c <= "9";
const isSpace = (c: string | undefined): boolean => c !== undefined && /\s/.test(c);

/**
 * Reads a unit expression such as `"kip*ft/rad"` or `"N/mm²"`. Symbols are looked up but not
 * judged: an unknown symbol is left for the caller to report (so that all are reported at once).
 */
export function parseUnitExpression(text: string): UnitParse {
  if (text.length > MAX_UNIT_LENGTH) {
    return { ok: false, problem: { message: `the unit is longer than ${MAX_UNIT_LENGTH} characters`, at: MAX_UNIT_LENGTH } };
  }
  let i = 0;
  const stop = (message: string, at = i): never => {
    throw new SyntaxStop({ message, at });
  };
  const skip = (): void => {
    while (isSpace(text[i])) i++;
  };
  const show = (c: string): string => JSON.stringify(c);

  function readInteger(): number {
    let sign = 1;
    const c = text[i];
    if (c === "+" || c === "-" || c === "−") {
      if (c !== "+") sign = -1;
      i++;
    }
    const start = i;
    while (isDigit(text[i])) i++;
    if (i === start) stop("a power needs an integer after ^, as in m^2 or m^-1");
    return sign * Number(text.slice(start, i));
  }

  function readPower(bareDigits: boolean): number {
    let power: number;
    const at = i;
    if (bareDigits && isDigit(text[i])) {
      power = readInteger();
    } else if (text[i] === "⁻" || (text[i] ?? "") in SUPERSCRIPT) {
      const negative = text[i] === "⁻";
      if (negative) i++;
      let digits = "";
      while ((text[i] ?? "") in SUPERSCRIPT) digits += String(SUPERSCRIPT[text[i++] ?? ""]);
      if (digits === "") stop("a superscript minus needs superscript digits after it, as in m⁻¹");
      power = (negative ? -1 : 1) * Number(digits);
    } else {
      const before = i;
      skip();
      if (text[i] !== "^") {
        i = before;
        return 1;
      }
      i++;
      skip();
      if (text[i] === "(") {
        i++;
        skip();
        power = readInteger();
        skip();
        if (text[i] !== ")") stop("a power in parentheses needs its closing )");
        i++;
      } else {
        power = readInteger();
      }
    }
    if (Math.abs(power) > MAX_POWER) stop(`a power must lie between -${MAX_POWER} and ${MAX_POWER}`, at);
    return power;
  }

  function readTerm(depth: number): UnitTerm {
    skip();
    const c = text[i];
    if (c === undefined) stop(i === 0 ? "no unit was given" : "the unit ends with an operator; a unit must follow it");
    if (c === "(") {
      if (depth >= MAX_DEPTH) stop(`parentheses nest deeper than ${MAX_DEPTH}`);
      const open = i;
      i++;
      const body = readExpression(depth + 1);
      skip();
      if (text[i] !== ")") stop("a ( has no matching )", open);
      i++;
      return { kind: "group", body, power: readPower(false) };
    }
    if (isLetter(c)) {
      const at = i;
      while (isLetter(text[i])) i++;
      const spelling = text.slice(at, i);
      return { kind: "symbol", spelling, unit: lookupUnit(spelling), power: readPower(true), at };
    }
    if (c === ",") stop("a comma is not part of a number or a unit (write 1000 kN, not 1,000 kN)");
    if (c !== undefined && (PRODUCT.has(c) || c === "/")) stop(`expected a unit before ${show(c)}`);
    return stop(`unexpected ${show(c ?? "")}; a unit symbol such as m, kN or psi was expected`);
  }

  function readExpression(depth: number): UnitExpression {
    const numerator: UnitTerm[] = [readTerm(depth)];
    let denominator: UnitTerm | undefined;
    for (;;) {
      skip();
      const c = text[i];
      if (c === undefined) break;
      if (PRODUCT.has(c) || c === "/") {
        if (denominator !== undefined) {
          stop(`${show(c)} after a division is ambiguous; group the divisor in parentheses, as in kN/(m*m), or divide once, as in kN*m/rad`);
        }
        i++;
        if (c === "/") denominator = readTerm(depth);
        else numerator.push(readTerm(depth));
        continue;
      }
      break;
    }
    return { numerator, denominator };
  }

  try {
    const expression = readExpression(0);
    skip();
    const c = text[i];
    if (c !== undefined) {
      if (c === ")") stop("a ) has no matching (");
      if (isLetter(c) || c === "(") stop("two units stand side by side; join them with * or /, as in kN*m");
      if (c === ",") stop("a comma is not part of a number or a unit (write 1000 kN, not 1,000 kN)");
      stop(`unexpected ${show(c)}`);
    }
    return { ok: true, expression };
  } catch (e) {
    if (e instanceof SyntaxStop) return { ok: false, problem: e.problem };
    throw e;
  }
}

/** Every symbol in an expression, in reading order. */
export function symbolsOf(expression: UnitExpression): Extract<UnitTerm, { kind: "symbol" }>[] {
  const out: Extract<UnitTerm, { kind: "symbol" }>[] = [];
  const visit = (t: UnitTerm): void => {
    if (t.kind === "symbol") out.push(t);
    else walk(t.body);
  };
  const walk = (e: UnitExpression): void => {
    e.numerator.forEach(visit);
    if (e.denominator) visit(e.denominator);
  };
  walk(expression);
  return out;
}

/** Prints an expression with canonical symbols, `*`, `/` and `^`: `"kip*ft/rad"`, `"N/mm^2"`. */
export function printUnitExpression(expression: UnitExpression): string {
  const term = (t: UnitTerm): string => {
    const power = t.power === 1 ? "" : `^${t.power}`;
    if (t.kind === "symbol") return `${t.unit?.symbol ?? t.spelling}${power}`;
    const body = t.body;
    if (body.denominator === undefined && body.numerator.length === 1 && t.power === 1) return term(body.numerator[0] as UnitTerm);
    return `(${printUnitExpression(body)})${power}`;
  };
  const top = expression.numerator.map(term).join("*");
  return expression.denominator === undefined ? top : `${top}/${term(expression.denominator)}`;
}
