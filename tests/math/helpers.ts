import { isFlexuraError } from "../../src/errors/index.js";

/** The issues thrown by `f`, as "code path" lines; "raw <name>" for an error that is not a FlexuraError; [] when it returns. */
export function issuesOf(f: () => unknown): string[] {
  try {
    f();
  } catch (e) {
    if (isFlexuraError(e)) return e.issues.map((i) => `${i.code} ${i.path.join(".")}`);
    return [`raw ${e instanceof Error ? `${e.name}: ${e.message}` : String(e)}`];
  }
  return [];
}

/**
 * A read-only view of `values` that throws after `limit` element reads: a deterministic stand-in
 * for "this call never returns" (a loop that reads coefficients forever fails here instead of hanging).
 */
export function budgeted(values: ArrayLike<number>, limit = 10_000): Float64Array {
  let reads = 0;
  const target = Float64Array.from(values);
  return new Proxy(target, {
    get(t, key, receiver) {
      if (typeof key === "string" && /^\d+$|^Infinity$|^NaN$/.test(key) && ++reads > limit) throw new Error("work budget exceeded: the call does not terminate");
      const v: unknown = Reflect.get(t, key, receiver === t ? t : t);
      return typeof v === "function" ? (v as (...a: unknown[]) => unknown).bind(t) : v;
    },
  });
}

/** As {@link budgeted}, over a plain array (which `Array.isArray` still recognises through the proxy). */
export function budgetedList(values: readonly number[], limit = 10_000): number[] {
  let reads = 0;
  return new Proxy([...values], {
    get(t, key) {
      if (typeof key === "string" && /^\d+$|^Infinity$|^NaN$/.test(key) && ++reads > limit) throw new Error("work budget exceeded: the call does not terminate");
      return Reflect.get(t, key) as unknown;
    },
  });
}
