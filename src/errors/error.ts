import { formatPath, type FlexuraIssue, type IssuePath } from "./issue.js";

const BRAND = Symbol.for("flexura.error");

/**
 * The one error type flexura throws. It carries every problem found (validation collects all
 * of them before failing), each with a stable `code`, a `path` and a message.
 *
 * Test for it with {@link isFlexuraError} rather than `instanceof`, which fails when two copies
 * of the package are loaded.
 *
 * @example
 * ```ts
 * try { parseQuantity("12 kip/", "force"); }
 * catch (e) { if (isFlexuraError(e)) console.log(e.issues[0]?.code); }
 * ```
 */
export class FlexuraError extends Error {
  /** Every problem found, in the order found; never empty. */
  readonly issues: readonly FlexuraIssue[];

  /** Builds an error from one or more issues. */
  constructor(issues: readonly FlexuraIssue[]) {
    const list = issues.length > 0 ? issues : [{ code: "unknown", path: [], message: "Unknown error." }];
    super(summarise(list));
    this.name = "FlexuraError";
    this.issues = Object.freeze(list.map((i) => Object.freeze({ ...i, path: Object.freeze([...i.path]) })));
    Object.defineProperty(this, BRAND, { value: true });
  }

  /** The code of the first issue, for quick tests. */
  get code(): string {
    return this.issues[0]?.code ?? "unknown";
  }
}

function summarise(issues: readonly FlexuraIssue[]): string {
  const lines = issues.map((i) => `${formatPath(i.path)}: ${i.message} [${i.code}]`);
  if (lines.length === 1) return lines[0] ?? "";
  return `${lines.length} problems:\n  ${lines.join("\n  ")}`;
}

/**
 * True when `value` is a {@link FlexuraError} from any loaded copy of flexura.
 *
 * @example
 * ```ts
 * isFlexuraError(new Error("x")); // false
 * ```
 */
export function isFlexuraError(value: unknown): value is FlexuraError {
  return typeof value === "object" && value !== null && (value as Record<symbol, unknown>)[BRAND] === true;
}

/**
 * Builds a single issue. Extra values involved go in `details`.
 *
 * @example
 * ```ts
 * issue("length-not-positive", ["length"], "The member length must be positive.", { length: 0 });
 * ```
 */
export function issue(code: string, path: IssuePath, message: string, details?: Readonly<Record<string, unknown>>): FlexuraIssue {
  return { ...details, code, path, message };
}

/**
 * Throws a {@link FlexuraError} holding one issue.
 *
 * @throws FlexuraError always, with the given code.
 * @example
 * ```ts
 * fail("unknown-unit", ["unit"], 'Unknown unit "furlong".');
 * ```
 */
export function fail(code: string, path: IssuePath, message: string, details?: Readonly<Record<string, unknown>>): never {
  throw new FlexuraError([issue(code, path, message, details)]);
}
