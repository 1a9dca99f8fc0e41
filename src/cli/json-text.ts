/** Where and why a text is not valid JSON. */
export interface JsonSyntaxProblem {
  /** Line of the first error, from 1. */
  readonly line: number;
  /** Column of the first error, from 1 (in UTF-16 code units). */
  readonly column: number;
  /** A plain description, such as `expected "," or "}" after a property value`. */
  readonly message: string;
}

/** What {@link readJsonText} returns: the parsed value, or where the syntax first goes wrong. */
export type JsonTextResult = { readonly ok: true; readonly value: unknown } | { readonly ok: false; readonly problem: JsonSyntaxProblem };

/**
 * Parses JSON text (RFC 8259). On a syntax error it reports the line and column of the first
 * error and what was expected there, which `JSON.parse` does not reliably give. A leading byte
 * order mark is ignored.
 *
 * @example
 * ```ts
 * readJsonText('{\n  "length": 6,\n}'); // { ok: false, problem: { line: 3, column: 1, ... } }
 * ```
 */
export function readJsonText(text: string): JsonTextResult {
  const source = text.startsWith("\uFEFF") ? text.slice(1) : text;
  try {
    return { ok: true, value: JSON.parse(source) as unknown };
  } catch {
    const found = locate(source);
    return { ok: false, problem: { ...lineAndColumn(source, found.at), message: found.message } };
  }
}

function lineAndColumn(text: string, at: number): { line: number; column: number } {
  let line = 1;
  let start = 0;
  for (let i = 0; i < at && i < text.length; i++) {
    if (text[i] === "\n") {
      line++;
      start = i + 1;
    }
  }
  return { line, column: at - start + 1 };
}

interface Failure {
  readonly at: number;
  readonly message: string;
}

/** Thrown inside the scanner to unwind to its top at the first error; never escapes it. */
class Stop extends Error {
  constructor(readonly failure: Failure) {
    super(failure.message);
  }
}

/** A small recursive-descent JSON scanner that finds the first syntax error. */
function locate(text: string): Failure {
  let i = 0;
  const fail = (message: string): never => {
    throw new Stop({ at: i, message: i >= text.length ? `${message}, but the text ended` : `${message}; found ${JSON.stringify(text[i])}` });
  };
  const space = (): void => {
    while (i < text.length && " \t\n\r".includes(text[i] ?? "")) i++;
  };
  const literal = (word: string): void => {
    for (const ch of word) {
      if (text[i] !== ch) fail(`expected ${JSON.stringify(word)}`);
      i++;
    }
  };
  const string = (): void => {
    i++;
    for (;;) {
      const ch = text[i];
      if (ch === undefined) fail("unterminated string");
      else if (ch === '"') {
        i++;
        return;
      } else if (ch === "\\") {
        i++;
        const esc = text[i] ?? "";
        if (esc === "u") {
          i++;
          for (let k = 0; k < 4; k++) {
            if (!/[0-9a-fA-F]/.test(text[i] ?? "")) fail("expected four hexadecimal digits after \\u");
            i++;
          }
        } else if ('"\\/bfnrt'.includes(esc) && esc !== "") i++;
        else fail("invalid escape in string");
      } else if (ch < " ") fail("control character in string (escape it)");
      else i++;
    }
  };
  const number = (): void => {
    if (text[i] === "-") i++;
    if (text[i] === "0") i++;
    else if (/[1-9]/.test(text[i] ?? "")) while (/[0-9]/.test(text[i] ?? "")) i++;
    else fail("expected a digit");
    if (text[i] === ".") {
      i++;
      if (!/[0-9]/.test(text[i] ?? "")) fail("expected a digit after the decimal point");
      while (/[0-9]/.test(text[i] ?? "")) i++;
    }
    if (text[i] === "e" || text[i] === "E") {
      i++;
      if (text[i] === "+" || text[i] === "-") i++;
      if (!/[0-9]/.test(text[i] ?? "")) fail("expected a digit in the exponent");
      while (/[0-9]/.test(text[i] ?? "")) i++;
    }
  };
  const value = (): void => {
    space();
    const ch = text[i];
    if (ch === "{") object();
    else if (ch === "[") array();
    else if (ch === '"') string();
    else if (ch === "t") literal("true");
    else if (ch === "f") literal("false");
    else if (ch === "n") literal("null");
    else if (ch === "-" || /[0-9]/.test(ch ?? "")) number();
    else fail("expected a value (object, array, string, number, true, false or null)");
  };
  const object = (): void => {
    i++;
    space();
    if (text[i] === "}") {
      i++;
      return;
    }
    for (;;) {
      space();
      if (text[i] !== '"') fail('expected a property name in double quotes');
      string();
      space();
      if (text[i] !== ":") fail('expected ":" after the property name');
      i++;
      value();
      space();
      if (text[i] === ",") i++;
      else if (text[i] === "}") {
        i++;
        return;
      } else fail('expected "," or "}" after a property value');
    }
  };
  const array = (): void => {
    i++;
    space();
    if (text[i] === "]") {
      i++;
      return;
    }
    for (;;) {
      value();
      space();
      if (text[i] === ",") i++;
      else if (text[i] === "]") {
        i++;
        return;
      } else fail('expected "," or "]" after an array element');
    }
  };
  try {
    value();
    space();
    if (i < text.length) fail("unexpected text after the end of the JSON value");
  } catch (e) {
    if (e instanceof Stop) return e.failure;
    throw e;
  }
  // JSON.parse rejected what this scanner accepts (for example a lone surrogate); point at the start.
  return { at: 0, message: "the text is not valid JSON" };
}
