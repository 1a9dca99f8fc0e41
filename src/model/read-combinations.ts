// Reads a model file's cases, combinations, patterns, self-weight and check groups into the typed
// model: quantities converted to the model's units; their meaning is checked by resolveCombinations.
import type { Combination, LoadCase, PresetName, PresetOptions } from "../combine/index.js";
import { isFlexuraError, issue, type IssuePath } from "../errors/index.js";
import { convert } from "../units/index.js";
import type { ModelCheckGroups, ModelCombinationEntry, ModelCombinationSelection, ModelDeflectionGroup, ModelSelfWeight, ModelStressGroup } from "./combination-types.js";
import type { Model, ModelDeflectionLimit } from "./model.js";
import { readDeflectionLimit } from "./read-parts.js";
import { arrayAt, objectAt, readQuantity, requirePositive, type Reader } from "./reader.js";

type Json = Readonly<Record<string, unknown>>;

const own = (o: Json, k: string): unknown => (Object.hasOwn(o, k) ? o[k] : undefined);

/** The unit weight in the model's force per length cubed: a plain number as is, a string with its unit converted (dimension checked). */
function readUnitWeight(reader: Reader, value: unknown, path: IssuePath): number | undefined {
  if (typeof value === "number") return Number.isFinite(value) ? value : undefined;
  if (typeof value !== "string") return undefined;
  const target = `${reader.units.force}/${reader.units.length}^3`;
  const m = /^\s*([-+]?(?:[0-9]+\.?[0-9]*|\.[0-9]+)(?:[eE][-+]?[0-9]+)?)\s*(.*?)\s*$/.exec(value);
  if (m === null || (m[2] ?? "") === "") {
    reader.found.push(issue("unit-weight-syntax", path, `Write the unit weight as a number and a weight per volume, such as "77 kN/m^3" or "490 lbf/ft^3"; got ${JSON.stringify(value)}.`, { value }));
    return undefined;
  }
  try {
    return convert(Number(m[1]), m[2] ?? "", target, { path });
  } catch (e) {
    if (!isFlexuraError(e)) throw e;
    reader.found.push(...e.issues.map((i) => ({ ...i, path })));
    return undefined;
  }
}

function readSelection(value: unknown): ModelCombinationSelection {
  return (Array.isArray(value) ? value.filter((x) => typeof x === "string") : value) as ModelCombinationSelection;
}

function readFactors(value: unknown): Readonly<Record<string, number>> {
  // copied key by key (own keys only): the values are checked by resolveCombinations
  const out: Record<string, number> = {};
  for (const [k, v] of Object.entries(objectAt(value))) Object.defineProperty(out, k, { value: v, enumerable: true, writable: false });
  return out;
}

function readLimitList(reader: Reader, value: unknown, path: IssuePath): ModelDeflectionLimit | ModelDeflectionLimit[] {
  if (!Array.isArray(value)) return readDeflectionLimit(reader, value, path) ?? { kind: "ratio", ratio: 1 };
  return value.map((v, i) => readDeflectionLimit(reader, v, [...path, i]) ?? { kind: "ratio", ratio: 1 });
}

/** The cases-and-combinations fields of a model file (absent fields left out). */
export function readCombinationFields(reader: Reader, file: Json): Pick<Model, "cases" | "settlementCase" | "selfWeight" | "combinations" | "patterns" | "checkGroups"> {
  const out: { -readonly [K in keyof Model]?: Model[K] } = {};
  if (own(file, "cases") !== undefined)
    out.cases = arrayAt(own(file, "cases")).map((c): LoadCase => {
      const o = objectAt(c);
      return { name: own(o, "name") as string, category: own(o, "category") as LoadCase["category"], ...(own(o, "reversible") === undefined ? {} : { reversible: own(o, "reversible") as boolean }), ...(own(o, "patterned") === undefined ? {} : { patterned: own(o, "patterned") as boolean }) };
    });
  if (typeof own(file, "settlementCase") === "string") out.settlementCase = own(file, "settlementCase") as string;
  if (own(file, "selfWeight") !== undefined) {
    const o = objectAt(own(file, "selfWeight"));
    const unitWeight = readUnitWeight(reader, own(o, "unitWeight"), ["selfWeight", "unitWeight"]);
    requirePositive(reader, unitWeight, ["selfWeight", "unitWeight"], "unit weight");
    const sw: ModelSelfWeight = { case: typeof own(o, "case") === "string" ? (own(o, "case") as string) : "self-weight", unitWeight: unitWeight ?? 1 };
    out.selfWeight = sw;
  }
  if (own(file, "combinations") !== undefined)
    out.combinations = arrayAt(own(file, "combinations")).map((c): ModelCombinationEntry => {
      const o = objectAt(c);
      if (Object.hasOwn(o, "preset")) return { preset: own(o, "preset") as PresetName, ...(own(o, "options") === undefined ? {} : { options: own(o, "options") as PresetOptions }) };
      const clause = own(o, "clause");
      const combination: Combination = { name: own(o, "name") as string, purpose: own(o, "purpose") as Combination["purpose"], factors: readFactors(own(o, "factors")), ...(typeof clause === "string" ? { clause } : {}) };
      return combination;
    });
  if (own(file, "patterns") !== undefined) {
    const cap = own(objectAt(own(file, "patterns")), "cap");
    out.patterns = typeof cap === "number" ? { cap } : {};
  }
  if (own(file, "checkGroups") !== undefined) {
    const g = objectAt(own(file, "checkGroups"));
    const groups: { -readonly [K in keyof ModelCheckGroups]: ModelCheckGroups[K] } = {};
    if (own(g, "stress") !== undefined)
      groups.stress = arrayAt(own(g, "stress")).map((x, i): ModelStressGroup => {
        const o = objectAt(x);
        const path = ["checkGroups", "stress", i];
        const bendingStress = readQuantity(reader, own(o, "bendingStress"), "stress", [...path, "bendingStress"]);
        const shearStress = readQuantity(reader, own(o, "shearStress"), "stress", [...path, "shearStress"]);
        requirePositive(reader, bendingStress, [...path, "bendingStress"], "allowable bending stress");
        requirePositive(reader, shearStress, [...path, "shearStress"], "allowable shear stress");
        return { name: own(o, "name") as string, combinations: readSelection(own(o, "combinations")), ...(bendingStress === undefined ? {} : { bendingStress }), ...(shearStress === undefined ? {} : { shearStress }) };
      });
    if (own(g, "deflection") !== undefined)
      groups.deflection = arrayAt(own(g, "deflection")).map((x, i): ModelDeflectionGroup => {
        const o = objectAt(x);
        const path = ["checkGroups", "deflection", i];
        return {
          name: own(o, "name") as string,
          ...(own(o, "factors") === undefined ? {} : { factors: readFactors(own(o, "factors")) }),
          ...(own(o, "combinations") === undefined ? {} : { combinations: readSelection(own(o, "combinations")) }),
          limit: readLimitList(reader, own(o, "limit"), [...path, "limit"]),
        };
      });
    out.checkGroups = groups;
  }
  return out;
}
