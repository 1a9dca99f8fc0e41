import { FlexuraError, issue } from "./error.js";
import type { FlexuraIssue, IssuePath } from "./issue.js";

/**
 * Collects issues during validation so that every problem is reported at once.
 *
 * @example
 * ```ts
 * const found = new IssueCollector();
 * if (!(length > 0)) found.add("length-not-positive", ["length"], "The length must be positive.");
 * found.throwIfAny();
 * ```
 */
export class IssueCollector {
  readonly #issues: FlexuraIssue[] = [];

  /** Records one issue. */
  add(code: string, path: IssuePath, message: string, details?: Readonly<Record<string, unknown>>): void {
    this.#issues.push(issue(code, path, message, details));
  }

  /** Records issues found elsewhere, with `prefix` put before each path. */
  addAll(issues: readonly FlexuraIssue[], prefix: IssuePath = []): void {
    for (const i of issues) this.#issues.push({ ...i, path: [...prefix, ...i.path] });
  }

  /** True when nothing has been recorded. */
  get empty(): boolean {
    return this.#issues.length === 0;
  }

  /** The issues recorded so far (a copy). */
  get issues(): readonly FlexuraIssue[] {
    return [...this.#issues];
  }

  /**
   * Throws a {@link FlexuraError} holding every recorded issue, if there are any.
   *
   * @throws FlexuraError when at least one issue was recorded.
   */
  throwIfAny(): void {
    if (this.#issues.length > 0) throw new FlexuraError(this.#issues);
  }
}
