import type { ModelAnalysis, ModelResults } from "./analysis.js";
import type { ModelFile } from "./file.js";
import { MODEL_FORMAT_VERSION } from "./model.js";
import { modelToJson } from "./to-json.js";

/**
 * The JSON form of a {@link ModelAnalysis} (what `flexura analyze --json` prints): the same
 * results, value for value, as plain data, with the model echoed as a model file. Everything is
 * in the model's units, named in `units`.
 */
export interface ModelAnalysisJson extends ModelResults {
  /** The model-file format version the results belong to. */
  readonly format: number;
  /** The model's name, when it has one. */
  readonly name?: string;
  /** The model analysed, as a model file with every unit named. */
  readonly model: ModelFile;
}

/**
 * The results of {@link analyzeModel} as plain JSON-ready data: exactly the typed values (no
 * rounding), without the solver's SI internals and section geometry. `JSON.stringify` of it is
 * what the command line's `--json` prints.
 *
 * @param analysis - From `analyzeModel`. It is not changed.
 * @returns A plain object; `JSON.parse(JSON.stringify(result))` equals it.
 * @example
 * ```ts
 * console.log(JSON.stringify(analysisToJson(analyzeModel(parseModel(file))), null, 2));
 * ```
 */
export function analysisToJson(analysis: ModelAnalysis): ModelAnalysisJson {
  const plain = <T>(value: T): T => JSON.parse(JSON.stringify(value)) as T;
  return plain({
    format: MODEL_FORMAT_VERSION,
    ...(analysis.model.name === undefined ? {} : { name: analysis.model.name }),
    units: analysis.units,
    model: modelToJson(analysis.model),
    reactions: analysis.reactions,
    shear: analysis.shear,
    moment: analysis.moment,
    slope: analysis.slope,
    deflection: analysis.deflection,
    ...(analysis.section === undefined ? {} : { section: analysis.section }),
    ...(analysis.stress === undefined ? {} : { stress: analysis.stress }),
    checks: analysis.checks,
    pass: analysis.pass,
    warnings: analysis.warnings,
    diagrams: analysis.diagrams,
    ...(analysis.combinations === undefined ? {} : { combinations: analysis.combinations }),
  });
}
