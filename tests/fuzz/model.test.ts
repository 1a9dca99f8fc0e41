// Fuzzing the model reader and the analysis: model files that satisfy the schema, sound members in every
// unit preset, each corrupted at one leaf (wrong types, non-finite numbers, 1e308 and 1e-300, misspelt
// units, __proto__/constructor/prototype keys at any depth, deep nesting, frozen objects, proxies) or given
// a stray key; wholly wrong arguments; and typed models built in code, corrupted the same way. Every call
// must satisfy the contract in harness.ts (only typed errors with codes and paths, no NaN or Infinity in a
// result, the input unchanged, Object.prototype untouched). Short and seed-fixed in `npm test`; long with
// `npm run fuzz`.
import { fc, test } from "@fast-check/vitest";
import { afterAll, describe } from "vitest";
import { analysisToJson, analyzeModel, parseModel, tryParseModel, type Model } from "../../src/model/index.js";
import { structurallyValidModel } from "../model/arbitraries.js";
import { physicalMember, writeMember, writeMemberWithUnits } from "../model/sound-models.js";
import { corrupted, expectContract, FUZZ_RUNS, hostile, tally } from "./harness.js";

const runs = { numRuns: FUZZ_RUNS };

/** Sound model files: a physical member written in a preset or with a unit on every number. */
const soundFile: fc.Arbitrary<unknown> = fc
  .tuple(physicalMember, fc.constantFrom("siNewtonMetre", "siKilonewtonMetre", "usKipFoot", "usKipInch", "own" as const))
  .map(([m, system]) => (system === "own" ? writeMemberWithUnits(m) : writeMember(m, system)));

/** Model files: sound, structurally valid, or hostile units and numbers at a random leaf. */
const modelFiles = fc.oneof(soundFile, structurallyValidModel as fc.Arbitrary<unknown>);

/** Reads, analyses and writes the JSON form of a model file: every step under the contract. */
const readAndAnalyse = (input: unknown): unknown => {
  const model = parseModel(input);
  const analysis = analyzeModel(model);
  return { analysis, json: analysisToJson(analysis) };
};

function deepFreeze<T>(value: T): T {
  if (typeof value === "object" && value !== null && !Object.isFrozen(value)) {
    Object.freeze(value);
    for (const child of Object.values(value)) deepFreeze(child);
  }
  return value;
}

/** A transparent proxy around every object of a value (reads pass through, writes are refused). */
function proxied(value: unknown): unknown {
  if (typeof value !== "object" || value === null) return value;
  const inner: unknown = Array.isArray(value) ? value.map(proxied) : Object.fromEntries(Object.entries(value).map(([k, v]) => [k, proxied(v)]));
  return new Proxy(inner as object, { set: () => false, deleteProperty: () => false, defineProperty: () => false });
}

/** A key that is an Object.prototype member, or a misspelling, added to one object at any depth. */
const hostileKey = fc.constantFrom("__proto__", "constructor", "prototype", "hasOwnProperty", "toString", "valueOf", "lenght", "Loads", "vaule");

function withKeyAtDepth(value: unknown, key: string, pick: number, extra: unknown): unknown {
  const copy = structuredClone(value);
  const objects: Record<string, unknown>[] = [];
  const visit = (v: unknown): void => {
    if (Array.isArray(v)) v.forEach(visit);
    else if (typeof v === "object" && v !== null) {
      objects.push(v as Record<string, unknown>);
      Object.values(v).forEach(visit);
    }
  };
  visit(copy);
  const target = objects[pick % Math.max(1, objects.length)];
  if (target !== undefined) Object.defineProperty(target, key, { value: extra, enumerable: true, configurable: true, writable: true });
  return copy;
}

describe("fuzz: model reader and analysis", () => {
  test.prop([corrupted(modelFiles)], runs)("parseModel + analyzeModel + analysisToJson on a corrupted model file: a finite result or a typed error", (input) => {
    expectContract(input, readAndAnalyse);
  });

  test.prop([modelFiles, hostileKey, fc.nat(), hostile], runs)("a hostile or misspelt key at any depth is refused as a typed error, never read", (file, key, pick, extra) => {
    const input = withKeyAtDepth(file, key, pick, extra);
    expectContract(input, readAndAnalyse);
    // A field whose value is undefined counts as absent (JSON cannot write one); any other value is refused.
    if (extra !== undefined && tryParseModel(input).ok) throw new Error(`a model with a stray "${key}" key was accepted`);
  });

  test.prop([hostile], runs)("parseModel and analyzeModel on a wholly wrong argument: a typed error", (input) => {
    expectContract(input, (i) => parseModel(i));
    expectContract(input, (i) => analyzeModel(i as Model));
  });

  test.prop([soundFile], runs)("a frozen model file and one behind proxies read as the plain one does", (file) => {
    expectContract(deepFreeze(structuredClone(file)), readAndAnalyse);
    expectContract(proxied(file), readAndAnalyse);
  });

  test.prop([corrupted(soundFile.map((f) => parseModel(f) as unknown))], runs)("analyzeModel on a corrupted typed model built in code: a finite result or a typed error", (model) => {
    expectContract(model, (m) => analysisToJson(analyzeModel(m as Model)));
  });

  test.prop([fc.integer({ min: 1, max: 20000 }), fc.constantFrom("length", "hinges", "loads", "units", "name")], { numRuns: Math.min(FUZZ_RUNS, 20) })(
    "nesting as deep as 20,000 levels anywhere: a typed error, never a stack overflow",
    (depth, field) => {
      let deep: unknown = 1;
      for (let i = 0; i < depth; i++) deep = [deep];
      const file = { length: 6, E: "200 GPa", I: "8.5e7 mm^4", supports: [{ at: 0, type: "pin" }, { at: 6, type: "roller" }], [field]: deep };
      expectContract(file, readAndAnalyse);
      const model = parseModel({ length: 6, E: "200 GPa", I: "8.5e7 mm^4", supports: [{ at: 0, type: "pin" }, { at: 6, type: "roller" }] });
      expectContract({ ...model, [field]: deep }, (m) => analyzeModel(m as Model));
    },
  );
});

afterAll(() => {
  console.log(`fuzz (model): ${tally.calls} calls, ${tally.typedErrors} typed errors, ${tally.results} finite results (${FUZZ_RUNS} runs per property)`);
});
