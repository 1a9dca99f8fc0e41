import { describeValue, fail, type IssuePath } from "../errors/index.js";

/**
 * The options object of a units entry point as a record: `undefined` or `null` mean none;
 * anything else that is not a plain object is refused with `options-invalid`.
 */
export function readOptions(options: unknown): Readonly<Record<string, unknown>> | undefined {
  if (options === undefined || options === null) return undefined;
  if (typeof options !== "object" || Array.isArray(options))
    fail("options-invalid", ["options"], `The options must be an object such as { path: ["loads", 0] }; got ${describeValue(options)}.`);
  return options as Readonly<Record<string, unknown>>;
}

/**
 * The `path` option (default `[]`): a list of property names and whole-number indices, checked
 * so that a malformed one is a typed error (`options-invalid`) rather than a raw `TypeError`.
 */
export function optionsPath(options: unknown): IssuePath {
  const path = readOptions(options)?.["path"];
  if (path === undefined) return [];
  if (!Array.isArray(path) || !path.every((p) => typeof p === "string" || (typeof p === "number" && Number.isInteger(p) && p >= 0)))
    fail("options-invalid", ["options", "path"], `The path must be a list of names and indices such as ["loads", 2, "value"]; got ${describeValue(path)}.`);
  return path as IssuePath;
}
