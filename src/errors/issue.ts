/**
 * A path from the root of an input to the offending field: property names and array indices,
 * for example `["loads", 2, "at"]` for `loads[2].at`.
 */
export type IssuePath = readonly (string | number)[];

/**
 * One problem found in an input. `code` is stable (renaming one is a breaking change), `path`
 * points at the offending field, `message` is a plain sentence a user can act on, and any
 * other fields carry the values involved (for example `at` and `length` for a load placed
 * outside the member).
 */
export interface FlexuraIssue {
  /** Stable, kebab-case code such as `"load-outside-member"`. */
  readonly code: string;
  /** Where in the input the problem is; empty for the input as a whole. */
  readonly path: IssuePath;
  /** A plain-English sentence saying what is wrong and how to fix it. */
  readonly message: string;
  /** The values involved, by name. */
  readonly [detail: string]: unknown;
}

/**
 * Formats a path as a user reads it: `loads[2].at`. An empty path formats as `(input)`.
 *
 * @example
 * ```ts
 * formatPath(["loads", 2, "at"]); // "loads[2].at"
 * ```
 */
export function formatPath(path: IssuePath): string {
  if (path.length === 0) return "(input)";
  let out = "";
  for (const part of path) {
    if (typeof part === "number") out += `[${part}]`;
    else out += out === "" ? part : `.${part}`;
  }
  return out === "" ? "(input)" : out;
}
