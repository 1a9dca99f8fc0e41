import { isFlexuraError, type FlexuraError } from "./error.js";

/**
 * What the non-throwing form of an entry point returns: the value, or the error that the
 * throwing form would have thrown.
 */
export type Result<T> =
  | {
      /** The call succeeded. */
      readonly ok: true;
      /** What the throwing form would have returned. */
      readonly value: T;
    }
  | {
      /** The call failed on bad input. */
      readonly ok: false;
      /** Every problem found. */
      readonly error: FlexuraError;
    };

/**
 * Runs `fn` and returns its value as a {@link Result}; a {@link FlexuraError} becomes
 * `{ ok: false, error }`. Any other exception is a bug in flexura and is rethrown.
 *
 * @example
 * ```ts
 * const r = attempt(() => parseQuantity("3 m", "length"));
 * if (r.ok) console.log(r.value);
 * ```
 */
export function attempt<T>(fn: () => T): Result<T> {
  try {
    return { ok: true, value: fn() };
  } catch (e) {
    if (isFlexuraError(e)) return { ok: false, error: e };
    throw e;
  }
}
