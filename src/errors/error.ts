import { formatPath, type FlexuraIssue, type IssuePath } from "./issue.js";

const BRAND = Symbol.for("flexura.error");

/**
 * The one error type flexura throws. It carries every problem found (validation collects all
 * of them before failing), each with a stable `code`, a `path` and a message.
 *
 * Test for it with {@link isFlexuraError} rather than `instanceof`, which fails when two copies
 * of the package are loaded.
 *
 * The issues also ride in the standard `cause` field (`{ flexuraIssues: [...] }`), the one field
 * besides `message` and `stack` that `structuredClone` and `postMessage` keep on an error, so an
 * error sent from a worker arrives with its issues; {@link reviveFlexuraError} turns such a copy
 * back into a FlexuraError.
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
    Object.defineProperty(this, "cause", { value: Object.freeze({ flexuraIssues: this.issues }), writable: true, configurable: true, enumerable: false });
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

function isIssue(value: unknown): value is FlexuraIssue {
  if (typeof value !== "object" || value === null) return false;
  const i = value as Record<string, unknown>;
  const path = i["path"];
  return (
    typeof i["code"] === "string" &&
    typeof i["message"] === "string" &&
    Array.isArray(path) &&
    path.every((p) => typeof p === "string" || (typeof p === "number" && Number.isInteger(p)))
  );
}

/**
 * A {@link FlexuraError} again from what a structured clone made of one (an error received with
 * `postMessage` from a worker, or copied by `structuredClone`): the clone is a plain `Error` that
 * has lost the class but kept its issues in `cause.flexuraIssues`. A FlexuraError is returned as
 * it is.
 *
 * @param value - Anything, typically an error received from a worker.
 * @returns The FlexuraError with every issue, or undefined when `value` is not a FlexuraError or
 *   a clone of one.
 * @example
 * ```ts
 * worker.on("message", (m) => { const e = reviveFlexuraError(m.error); if (e) show(e.issues); });
 * reviveFlexuraError(structuredClone(new FlexuraError([issue("x", [], "X.")])))?.code; // "x"
 * ```
 */
export function reviveFlexuraError(value: unknown): FlexuraError | undefined {
  if (isFlexuraError(value)) return value;
  if (typeof value !== "object" || value === null) return undefined;
  const cause: unknown = (value as { cause?: unknown }).cause;
  if (typeof cause !== "object" || cause === null) return undefined;
  const issues: unknown = (cause as { flexuraIssues?: unknown }).flexuraIssues;
  if (!Array.isArray(issues) || issues.length === 0 || !issues.every(isIssue)) return undefined;
  return new FlexuraError(issues);
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
