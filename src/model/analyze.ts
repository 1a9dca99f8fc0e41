import { solveBeam, type BeamInput, type BeamSolution } from "../beam/index.js";
import { attempt, FlexuraError, isFlexuraError, type FlexuraIssue, type Result } from "../errors/index.js";
import type { ModelAnalysis, ModelScale, ModelWarning } from "./analysis.js";
import { combinationResults, withSelfWeight } from "./analyze-combinations.js";
import { beamInputInSI } from "./beam-input.js";
import { modelVerdicts } from "./checks.js";
import { diagramsOf, peaksInModelUnits } from "./diagrams.js";
import type { Model } from "./model.js";
import { sectionInSI, sectionResult, withDeprecatedNames, type SectionInSI } from "./model-section.js";
import { plainResults } from "./plain.js";
import { refuseNotFinite, stiffnessPath } from "./not-finite.js";
import { resolveCombinations } from "./resolve-combinations.js";
import { checkTypedModel } from "./typed-check.js";
import { scaleOfUnits } from "./units.js";

function fullScale(model: Model): ModelScale {
  const found: FlexuraIssue[] = [];
  const scale = scaleOfUnits(model.units, found);
  if (found.length > 0) throw new FlexuraError(found);
  return scale as ModelScale;
}

/** Beam issues point at the solver's input; point them at the model's fields instead. */
function toModelPath(i: FlexuraIssue, model: Model): FlexuraIssue {
  const [head, ...rest] = i.path;
  if (head === "stiffness") return { ...i, path: model.segments === undefined ? stiffnessPath(model) : ["segments", ...rest] };
  if (head === "length") return { ...i, path: ["length"] };
  return i;
}

function inputOf(model: Model, scale: ModelScale, section: SectionInSI | undefined): BeamInput {
  const input = beamInputInSI(model, scale, section?.properties.secondMomentZ);
  if (input === undefined) {
    throw new FlexuraError([{ code: "stiffness-missing", path: ["I"], message: 'Give the member\'s stiffness: "E" and "I", or "segments", or a "section" with a "material".' }]);
  }
  return input;
}

function solve(model: Model, input: BeamInput): BeamSolution {
  try {
    return solveBeam(input);
  } catch (e) {
    if (!isFlexuraError(e)) throw e;
    throw new FlexuraError(e.issues.map((i) => toModelPath(i, model)));
  }
}

/** True when the section's product moment of area is not negligible (its principal axes are not y and z). */
function axesInclined(section: SectionInSI): boolean {
  const p = section.properties;
  return Math.abs(p.productMoment) > 1e-9 * Math.sqrt(p.secondMomentY * p.secondMomentZ);
}

/**
 * Analyses a model: converts it to SI, solves the member, and when the model has a section,
 * computes its properties and the extreme bending and shear stresses; checks the member against
 * the model's limits. Stresses and checks come from the member-check module (`checkMember` of
 * `flexura/check`, run on the member in SI), so a model and a direct call give the same verdicts. The main results have every load acting with factor 1 (the self-weight
 * included); with `cases`, `combinations` holds each case solved once, the combinations formed by
 * superposition with their envelopes over every pattern (each peak naming its governing
 * combination), the reaction envelopes and the utilisation table of the check groups (see
 * docs/combinations.md). Results are in the model's own units, named in `units`.
 *
 * Sign conventions: reactions positive upward and counterclockwise; moment positive sagging;
 * shear V = dM/dx; slope positive counterclockwise; deflection positive upward; stress positive
 * in tension, sigma = -M y / I_z (y up from the centroid); shear stress tau = V Q / (I b) at the
 * height where it peaks.
 *
 * @param model - A model from {@link parseModel}. It is not changed.
 * @returns Reactions, peaks, diagrams, section properties, stresses and checks.
 * @throws FlexuraError `wrong-type`, `not-finite`, `not-an-option`, `too-many-items` for a model built in code whose
 *   fields are not of their types (`length: "6"`, a load's `value: [3]`); `result-not-finite` when a result (a deflection, a moment, a stress, a
 *   utilisation) would be NaN or infinite in double precision, with the path of the input that
 *   caused it (`I`, `section`, `loads`, `limits.bendingStress`); the solver's codes (`mechanism`, `support-duplicate`, `stiffness-not-tiling`,
 *   ...; see docs/errors.md) with paths into the model; the section builders' codes under `section`;
 *   unit codes under `units` for a hand-made model with bad units; `stiffness-missing`.
 * @example
 * ```ts
 * const analysis = analyzeModel(parseModel({
 *   length: 6, E: "200 GPa", I: "8.5e7 mm^4",
 *   supports: [{ at: 0, type: "pin" }, { at: 6, type: "roller" }],
 *   loads: [{ type: "distributed", start: 12 }],
 * }));
 * analysis.moment.max; // { value: 54, at: 3 } (kN*m, m): w L^2 / 8
 * ```
 */
export function analyzeModel(model: Model): ModelAnalysis {
  checkTypedModel(model);
  const scale = fullScale(model);
  const section = sectionInSI(model, scale);
  const found: FlexuraIssue[] = [];
  resolveCombinations(model, found);
  if (found.length > 0) throw new FlexuraError(found);
  const input = withSelfWeight(model, scale, section, inputOf(model, scale, section));
  const solution = solve(model, input);
  const combinations = combinationResults(model, scale, section, input);
  const warnings: ModelWarning[] = solution.warnings.map((w) => ({ code: w.code, message: w.message }));
  if (section !== undefined && axesInclined(section)) {
    warnings.push({
      code: "section-axes-inclined",
      message: "The section's principal axes are inclined (I_yz is not 0, as for an angle): the stresses and deflections are for bending about the horizontal axis, which holds only when the member is restrained from deflecting sideways.",
    });
  }
  const { checks, stress } = modelVerdicts(model, solution, section, scale, warnings);
  const peaks = solution.peaks;
  const plain = plainResults({
    reactions: solution.reactions.map((r) => ({
      support: r.support,
      kind: model.supports[r.support]?.kind ?? "pin",
      at: r.at / scale.length,
      force: r.force / scale.force,
      moment: r.moment / scale.moment,
    })),
    shear: peaksInModelUnits(peaks.shear, scale.length, scale.force),
    moment: peaksInModelUnits(peaks.moment, scale.length, scale.moment),
    slope: peaksInModelUnits(peaks.slope, scale.length, scale.rotation),
    deflection: peaksInModelUnits(peaks.deflection, scale.length, scale.deflection),
    ...(section === undefined || model.section === undefined ? {} : { section: sectionResult(model.section.shape, section.properties, scale) }),
    ...(stress === undefined ? {} : { stress }),
    checks,
    pass: (checks.length > 0 || (combinations?.checks.length ?? 0) > 0) && checks.every((c) => c.pass) && combinations?.pass !== false,
    diagrams: diagramsOf(solution, scale, model.units),
    warnings,
    ...(combinations === undefined ? {} : { combinations }),
  });
  if (plain.notFinite !== undefined) refuseNotFinite(model, plain.notFinite, plain.bad);
  const results = plain.value;
  return {
    model,
    units: model.units,
    scale,
    ...results,
    ...(results.section === undefined ? {} : { section: withDeprecatedNames(results.section) }),
    solution,
    ...(section === undefined ? {} : { sectionGeometry: section.geometry }),
  };
}

/**
 * The non-throwing form of {@link analyzeModel}.
 *
 * @example
 * ```ts
 * const r = tryAnalyzeModel(model);
 * if (!r.ok) console.log(r.error.issues.map((i) => i.message));
 * ```
 */
export function tryAnalyzeModel(model: Model): Result<ModelAnalysis> {
  return attempt(() => analyzeModel(model));
}
