// Shared machinery of the fuzz suites: a run budget (short and seed-fixed in `npm test`, long with
// `npm run fuzz`), hostile values, corruption of valid input at a random leaf, and the assertions every entry
// point must satisfy: only typed errors (each issue with a code and a path), no NaN or Infinity anywhere in a
// result, the input unchanged, Object.prototype untouched.
import { fc } from "@fast-check/vitest";
import { expect } from "vitest";
import { isFlexuraError } from "../../src/errors/index.js";

/** Runs per property: `FLEXURA_FUZZ_RUNS` (set by `npm run fuzz`), else a short budget for `npm test`. */
export const FUZZ_RUNS = ((): number => {
  const n = Number.parseInt(process.env["FLEXURA_FUZZ_RUNS"] ?? "", 10);
  return Number.isFinite(n) && n > 0 ? n : 40;
})();

/** Counts of what the fuzzers saw, printed at the end of a suite (`npm run fuzz` reports them). */
export const tally = { calls: 0, typedErrors: 0, results: 0 };

/** An object whose prototype is not Object.prototype, as JSON.parse makes for a `__proto__` key. */
const protoKey = (): unknown => JSON.parse('{"__proto__": {"polluted": true}, "constructor": {"prototype": {"polluted": true}}}');

/** Values that break careless code: non-finite and extreme numbers, wrong types, hostile keys, deep nesting. */
export const hostile: fc.Arbitrary<unknown> = fc.oneof(
  fc.constantFrom(NaN, Infinity, -Infinity, 1e308, -1e308, 1e-300, -1e-300, 0, -0, Number.MAX_SAFE_INTEGER + 2, 5e-324),
  fc.constantFrom("", " ", "\t", "12", "1e999", "NaN", "constructor", "__proto__", "prototype", "hasOwnProperty", "toString"),
  fc.constantFrom(null, undefined, true, false, [], {}, Symbol.iterator.description),
  fc.constant(0).map(() => protoKey()),
  fc.constant(0).map(() => Object.freeze({ value: 1, at: 0 })),
  fc.constant(0).map(() => new Proxy({ kind: "point", at: 1, value: 1 }, {})),
  fc.integer({ min: 1, max: 64 }).map((depth) => {
    let v: unknown = 1;
    for (let i = 0; i < depth; i++) v = [v];
    return v;
  }),
  fc.array(fc.double(), { maxLength: 4 }),
  fc.double(),
  fc.string({ maxLength: 6 }),
);

/** Every leaf path of a plain value (arrays and plain objects are walked). */
export function leafPaths(value: unknown, prefix: readonly (string | number)[] = []): (string | number)[][] {
  if (Array.isArray(value)) return value.length === 0 ? [[...prefix]] : value.flatMap((v, i) => leafPaths(v, [...prefix, i]));
  if (value !== null && typeof value === "object") {
    const keys = Object.keys(value);
    return keys.length === 0 ? [[...prefix]] : keys.flatMap((k) => leafPaths((value as Record<string, unknown>)[k], [...prefix, k]));
  }
  return [[...prefix]];
}

/** A deep copy of `value` with the leaf at `path` replaced (or a key added next to it when `extraKey` is given). */
export function corrupt(value: unknown, path: readonly (string | number)[], replacement: unknown, extraKey?: string): unknown {
  const copy: unknown = structuredClone(value);
  if (path.length === 0) return replacement;
  let parent = copy as Record<string | number, unknown>;
  for (const key of path.slice(0, -1)) parent = parent[key] as Record<string | number, unknown>;
  const last = path[path.length - 1]!;
  if (extraKey !== undefined && parent !== null && typeof parent === "object" && !Array.isArray(parent)) {
    Object.defineProperty(parent, extraKey, { value: replacement, enumerable: true, configurable: true, writable: true });
  } else {
    parent[last] = replacement;
  }
  return copy;
}

/** An arbitrary corruption of a valid input: one leaf replaced by a hostile value, or a stray key added. */
export function corrupted(valid: fc.Arbitrary<unknown>): fc.Arbitrary<unknown> {
  return valid.chain((v) => {
    const paths = leafPaths(v);
    return fc
      .tuple(fc.constantFrom(...paths), hostile, fc.option(fc.constantFrom("__proto__", "constructor", "prototype", "colour", "At", "vaule"), { nil: undefined }))
      .map(([path, bad, extra]) => corrupt(v, path, bad, extra));
  });
}

/** Finds a NaN or an infinity anywhere in a value (typed arrays included); returns its path or undefined. */
export function findNonFinite(value: unknown, seen = new Set<unknown>(), path = "result"): string | undefined {
  if (typeof value === "number") return Number.isFinite(value) ? undefined : `${path} = ${value}`;
  if (value === null || typeof value !== "object" || seen.has(value)) return undefined;
  seen.add(value);
  if (ArrayBuffer.isView(value) && !(value instanceof DataView)) {
    const arr = value as unknown as ArrayLike<number | bigint>;
    for (let i = 0; i < arr.length; i++) {
      const x = arr[i];
      if (typeof x === "number" && !Number.isFinite(x)) return `${path}[${i}] = ${x}`;
    }
    return undefined;
  }
  for (const key of Object.keys(value)) {
    const found = findNonFinite((value as Record<string, unknown>)[key], seen, `${path}.${key}`);
    if (found !== undefined) return found;
  }
  return undefined;
}

/**
 * Deep equality of plain data (objects, arrays, primitives, typed arrays) by an explicit stack, so that inputs
 * nested 20,000 deep are compared without the recursion of `toEqual`, which can overflow the stack under
 * coverage instrumentation.
 */
export function sameValue(a: unknown, b: unknown): boolean {
  const stack: [unknown, unknown][] = [[a, b]];
  const seen = new Set<unknown>();
  while (stack.length > 0) {
    const [x, y] = stack.pop() as [unknown, unknown];
    if (Object.is(x, y)) continue;
    if (typeof x !== "object" || typeof y !== "object" || x === null || y === null) return false;
    if (seen.has(x)) continue;
    seen.add(x);
    if (Array.isArray(x) !== Array.isArray(y) || Object.getPrototypeOf(x) !== Object.getPrototypeOf(y)) return false;
    const kx = Reflect.ownKeys(x);
    const ky = Reflect.ownKeys(y);
    if (kx.length !== ky.length) return false;
    for (const k of kx) {
      if (!Object.prototype.hasOwnProperty.call(y, k)) return false;
      stack.push([(x as Record<PropertyKey, unknown>)[k], (y as Record<PropertyKey, unknown>)[k]]);
    }
  }
  return true;
}

const prototypeKeys = (): string[] => Object.getOwnPropertyNames(Object.prototype).sort();
const PROTOTYPE_KEYS = prototypeKeys();

/**
 * Calls an entry point on `input` and asserts the contract: it returns a result free of NaN and Infinity, or
 * throws a FlexuraError whose every issue has a kebab-case code and an array path; the input is not changed;
 * Object.prototype gains nothing.
 */
export function expectContract(input: unknown, call: (input: unknown) => unknown): void {
  let before: unknown;
  try {
    before = structuredClone(input);
  } catch {
    before = undefined;
  }
  tally.calls += 1;
  let result: unknown;
  let thrown: unknown;
  let threw = false;
  try {
    result = call(input);
  } catch (e) {
    thrown = e;
    threw = true;
  }
  if (threw) {
    if (!isFlexuraError(thrown)) throw new Error(`threw a raw ${(thrown as Error)?.constructor?.name ?? typeof thrown}: ${String(thrown)}`);
    expect(thrown.issues.length).toBeGreaterThan(0);
    for (const issue of thrown.issues) {
      expect(issue.code).toMatch(/^[a-z0-9]+(-[a-z0-9]+)*$/);
      expect(Array.isArray(issue.path)).toBe(true);
      expect(typeof issue.message).toBe("string");
    }
    tally.typedErrors += 1;
  } else {
    const bad = findNonFinite(result);
    if (bad !== undefined) throw new Error(`a result holds a non-finite number: ${bad}`);
    tally.results += 1;
  }
  if (before !== undefined) expect(sameValue(input, before), "the input was changed").toBe(true);
  expect(prototypeKeys()).toEqual(PROTOTYPE_KEYS);
  expect(({} as Record<string, unknown>)["polluted"]).toBeUndefined();
}
