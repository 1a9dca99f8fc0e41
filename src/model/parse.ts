import { attempt, FlexuraError, issue, type FlexuraIssue, type Result } from "../errors/index.js";
import { MODEL_FORMAT_VERSION, type Model } from "./model.js";
import { readCombinationFields } from "./read-combinations.js";
import { readHinges, readLimits, readLoads, readMaterial, readSegments, readSupports } from "./read-parts.js";
import { readSection } from "./read-section.js";
import { resolveCombinations } from "./resolve-combinations.js";
import { objectAt, readQuantity, requirePositive, type Reader } from "./reader.js";
import { resolveUnits, scaleOfUnits } from "./units.js";
import { structuralIssues } from "./validate.js";

function readStiffness(reader: Reader, file: Readonly<Record<string, unknown>>, materialE: number | undefined): Pick<Model, "E" | "I"> {
  const E = readQuantity(reader, file["E"], "modulus", ["E"]);
  const I = readQuantity(reader, file["I"], "secondMoment", ["I"]);
  requirePositive(reader, E, ["E"], "modulus of elasticity");
  requirePositive(reader, I, ["I"], "second moment of area");
  const given = (name: string): boolean => file[name] !== undefined;
  if (given("E") && materialE !== undefined) {
    reader.found.push(issue("stiffness-given-twice", ["E"], 'E is given both here and in "material"; give it once.'));
  }
  const sources = ["I", "segments", "section"].filter((name) => given(name));
  if (sources.length > 1) {
    reader.found.push(
      issue("stiffness-given-twice", [sources[1] ?? "I"], `The member's stiffness must come from one of "I", "segments" or "section"; this model gives ${sources.map((s) => `"${s}"`).join(" and ")}.`, {
        sources,
      }),
    );
  } else if (sources.length === 0) {
    reader.found.push(issue("stiffness-missing", ["I"], 'Give the member\'s stiffness: "E" and "I", or "segments", or a "section" with a "material".'));
  } else if (!given("segments") && !given("E") && materialE === undefined) {
    reader.found.push(issue("modulus-missing", ["E"], 'Give the modulus of elasticity: "E", or "material": { "E": ... }.'));
  }
  return { ...(E === undefined ? {} : { E }), ...(I === undefined ? {} : { I }) };
}

function buildModel(json: unknown): Model {
  const structure = structuralIssues(json);
  // A list over the size limit is refused before any of its items is read.
  if (structure.some((i) => i.code === "too-many-items")) throw new FlexuraError(structure);
  const file = objectAt(json);
  const givenUnits = objectAt(file["units"]);
  const units = resolveUnits(givenUnits);
  const found: FlexuraIssue[] = [];
  const reader: Reader = { units, scale: scaleOfUnits(units, found, (field) => typeof givenUnits[field] === "string"), found };
  if (typeof json !== "object" || json === null || Array.isArray(json)) throw new FlexuraError(structure);
  const length = readQuantity(reader, file["length"], "length", ["length"]);
  requirePositive(reader, length, ["length"], "member length");
  const memberLength = length !== undefined && length > 0 ? length : undefined;
  const material = readMaterial(reader, file["material"]);
  const section = file["section"] === undefined ? undefined : readSection(reader, file["section"]);
  const { E, I } = readStiffness(reader, file, material?.E);
  const segments = file["segments"] === undefined ? undefined : readSegments(reader, file["segments"], E ?? material?.E);
  const model: Model = {
    format: MODEL_FORMAT_VERSION,
    ...(typeof file["name"] === "string" ? { name: file["name"] } : {}),
    ...(typeof file["description"] === "string" ? { description: file["description"] } : {}),
    units,
    length: length ?? 0,
    ...(E === undefined ? {} : { E }),
    ...(I === undefined ? {} : { I }),
    ...(segments === undefined ? {} : { segments }),
    ...(section === undefined ? {} : { section }),
    ...(material === undefined ? {} : { material }),
    supports: readSupports(reader, file["supports"], memberLength),
    hinges: readHinges(reader, file["hinges"], memberLength),
    loads: readLoads(reader, file["loads"], memberLength),
    limits: readLimits(reader, file["limits"]),
    ...readCombinationFields(reader, file),
  };
  // the meaning of cases, combinations and check groups, when their structure is sound
  if (structure.length === 0) resolveCombinations(model, found);
  const all = [...structure, ...found];
  if (all.length > 0) throw new FlexuraError(all);
  return model;
}

/**
 * Reads a model file (already parsed from JSON text) into a typed {@link Model}: checks its
 * structure against {@link modelSchema}, then its meaning (units, positions inside the member, one
 * source of stiffness), reporting every problem at once with its path (`loads[2].at`). Quantities
 * written as strings with units are converted exactly to the model's units; defaults are filled
 * in; JSON `type` tags become `kind` (a `"moment"` load becomes a `"couple"`).
 *
 * Whether the member is stable, and other beam problems, are found by `analyzeModel`.
 *
 * @param json - The model file, such as `JSON.parse(text)`. It is not changed.
 * @returns The model, every number in its own units.
 * @throws FlexuraError structural: `wrong-type`, `missing-field`, `unknown-field`, `field-not-allowed`,
 *   `not-an-option`, `unsupported-format`, `empty-string`, `too-few-items`, `not-finite`,
 *   `too-many-items` (a list longer than {@link MODEL_LIST_LIMIT});
 *   units: `unit-syntax`, `unknown-unit`, `wrong-dimension`, `unit-missing`, `number-missing` and the
 *   other codes of `parseQuantity`; meaning: `value-not-positive`, `value-negative`,
 *   `support-outside-member`, `load-outside-member`, `load-range-empty`, `hinge-outside-member`,
 *   `deflection-limit-syntax`, `stiffness-missing`, `stiffness-given-twice`, `modulus-missing`.
 * @example
 * ```ts
 * const model = parseModel({
 *   length: "6 m", E: "200 GPa", I: "8.5e7 mm^4",
 *   supports: [{ at: 0, type: "pin" }, { at: 6, type: "roller" }],
 *   loads: [{ type: "distributed", start: 12 }],
 * });
 * model.loads[0]; // { kind: "distributed", from: 0, to: 6, start: 12, end: 12 }
 * ```
 */
export function parseModel(json: unknown): Model {
  return buildModel(json);
}

/**
 * The non-throwing form of {@link parseModel}.
 *
 * @example
 * ```ts
 * const r = tryParseModel({ length: -1, supports: [] });
 * if (!r.ok) for (const i of r.error.issues) console.log(formatPath(i.path), i.message);
 * ```
 */
export function tryParseModel(json: unknown): Result<Model> {
  return attempt(() => parseModel(json));
}
