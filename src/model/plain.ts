import type { IssuePath } from "../errors/index.js";

/** What {@link plainResults} found: the copy, and where the first number that is not finite was. */
export interface PlainResults<T> {
  /** The copy, every -0 made 0. */
  readonly value: T;
  /** Path of the first NaN or infinity met, in the order the fields were written; undefined when there is none. */
  readonly notFinite: IssuePath | undefined;
  /** That value. */
  readonly bad: number;
}

/**
 * A copy of plain data (objects, arrays, numbers, strings, booleans) with every -0 made 0, so that
 * the typed results and their JSON form (which cannot hold -0) are equal value for value; it also
 * notes the first number that is not finite, so that no result carries NaN or an infinity silently.
 */
export function plainResults<T>(value: T): PlainResults<T> {
  const keys: (string | number)[] = [];
  let notFinite: IssuePath | undefined;
  let bad = 0;
  const copy = (v: unknown): unknown => {
    if (typeof v === "number") {
      if (notFinite === undefined && !Number.isFinite(v)) {
        notFinite = [...keys];
        bad = v;
      }
      return v + 0; // -0 + 0 is +0
    }
    if (Array.isArray(v)) {
      const out: unknown[] = new Array<unknown>(v.length);
      for (let i = 0; i < v.length; i++) {
        keys.push(i);
        out[i] = copy(v[i]);
        keys.pop();
      }
      return out;
    }
    if (typeof v === "object" && v !== null) {
      const out: Record<string, unknown> = {};
      for (const k of Object.keys(v)) {
        keys.push(k);
        out[k] = copy((v as Record<string, unknown>)[k]);
        keys.pop();
      }
      return out;
    }
    return v;
  };
  return { value: copy(value) as T, notFinite, bad };
}
