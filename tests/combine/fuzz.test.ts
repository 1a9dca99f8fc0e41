// Bad input to the combine entry points: whatever is given, the answer is a result or a
// FlexuraError with codes and paths, never a raw TypeError, and the input is left unchanged.
import { describe, expect } from "vitest";
import { fc, test } from "@fast-check/vitest";
import { isFlexuraError } from "../../src/errors/index.js";
import { arrangementsOf, combineCases, envelopes, presetCombinations, solveCases, type LoadCase } from "../../src/combine/index.js";

const hostile = fc.oneof(fc.constant(null), fc.constant(undefined), fc.constant(Number.NaN), fc.constant(Infinity), fc.constant(-1), fc.constant(""), fc.constant("x"), fc.constant([]), fc.constant({}), fc.constant(1e308), fc.constant(true));
const beam = () => ({
  length: 10,
  stiffness: 1000,
  supports: [{ kind: "pin", at: 0 }, { kind: "roller", at: 5 }, { kind: "roller", at: 10 }],
  loads: [{ kind: "distributed", from: 0, to: 10, start: 1, end: 1, case: "D" }, { kind: "point", at: 3, value: 2, case: "L" }],
});
const cases = (): LoadCase[] => [{ name: "D", category: "dead" }, { name: "L", category: "live", patterned: true }];

/** Replaces the leaf at `path` of `root` by `value` (a copy). */
function corrupt(root: unknown, path: readonly (string | number)[], value: unknown): unknown {
  if (path.length === 0) return value;
  const [head, ...rest] = path;
  const copy: Record<string | number, unknown> = Array.isArray(root) ? [...(root as unknown[])] as never : { ...(root as object) };
  copy[head as string] = corrupt((root as Record<string | number, unknown>)[head as string], rest, value);
  return copy;
}

const PATHS: (string | number)[][] = [[], ["supports"], ["supports", 1], ["supports", 1, "at"], ["loads"], ["loads", 0], ["loads", 0, "case"], ["loads", 1, "value"], ["length"]];
const CASE_PATHS: (string | number)[][] = [[], [0], [0, "name"], [0, "category"], [1, "patterned"]];

function expectTyped(f: () => unknown): void {
  try {
    f();
  } catch (e) {
    expect(isFlexuraError(e), String(e)).toBe(true);
    if (isFlexuraError(e)) for (const i of e.issues) expect(typeof i.code).toBe("string");
  }
}

describe("combine on hostile input", () => {
  test.prop([fc.constantFrom(...PATHS), hostile, fc.constantFrom(...CASE_PATHS), hostile, fc.boolean()], { numRuns: 150 })("solveCases gives a result or a FlexuraError", (path, value, casePath, caseValue, which) => {
    const b = which ? corrupt(beam(), path, value) : beam();
    const c = which ? cases() : corrupt(cases(), casePath, caseValue);
    const before = JSON.stringify([b, c]);
    expectTyped(() => solveCases(b as never, c as never));
    expect(JSON.stringify([b, c])).toBe(before);
  });

  test.prop([hostile, hostile, hostile], { numRuns: 100 })("combineCases, arrangementsOf, envelopes and presetCombinations give a result or a FlexuraError", (a, b, c) => {
    const solved = solveCases(beam() as never, cases());
    expectTyped(() => combineCases(solved, a as never, b as never));
    expectTyped(() => combineCases(solved, { D: a } as never));
    expectTyped(() => arrangementsOf(solved, [{ name: "x", purpose: "strength", factors: { D: a } }] as never, b as never));
    expectTyped(() => envelopes(solved, a as never, c as never));
    expectTyped(() => envelopes(solved, [{ name: a, purpose: b, factors: c }] as never));
    expectTyped(() => presetCombinations(a as never, cases(), b as never));
    expectTyped(() => presetCombinations("en1990-strength", cases(), { imposedCategory: a, snowSite: b, map: c } as never));
  });
});
