import { attempt, FlexuraError, issue, type Result } from "../errors/index.js";
import { buildModel } from "./model.js";
import { recoverDiagrams, recoverReactions } from "./recover.js";
import { acquireScratch, releaseScratch } from "./scratch.js";
import { peaksOf } from "./peaks.js";
import { BALANCE_REFUSAL, balanceWarnings, conditioningWarnings, spansOf } from "./results.js";
import { checkStability } from "./stability.js";
import { solveStiffness } from "./stiffness.js";
import { refuseOverflow } from "./overflow.js";
import { residualOf } from "./residual.js";
import { refuseShortFreePieces } from "./conditioning.js";
import { mergeNotes, narrowLoadsAsPoints } from "./coincidence.js";
import type { BeamInput, BeamNote, BeamSolution, SolveOptions } from "./types.js";
import { validateBeam } from "./validate.js";

/**
 * Solves a straight member, determinate or not, by the direct stiffness method (two degrees of
 * freedom per node, exact fixed-end actions, a banded O(n) solve), then recovers shear, moment,
 * slope and deflection exactly on every element as piecewise polynomials, with their peaks.
 *
 * Conventions: x from the left end; loads down positive, couples counterclockwise positive;
 * reactions up and counterclockwise positive; moment positive sagging; shear V = dM/dx; slope
 * counterclockwise positive; deflection up positive; settlements down positive. Units: any
 * consistent set (force F, length L): E I in F L^2, distributed loads in F / L, spring stiffness
 * in F / L and F L per radian.
 *
 * Method: the stiffness and fixed-end actions of a prismatic Euler-Bernoulli element (for
 * example Weaver & Gere, Matrix Analysis of Framed Structures, 3rd ed., ch. 4 and appendix B;
 * McGuire, Gallagher & Ziemian, Matrix Structural Analysis, 2nd ed., ch. 4 and 7).
 *
 * @throws FlexuraError with every input problem at once (`length-not-positive`,
 *   `stiffness-not-positive`, `stiffness-not-tiling`, `load-outside-member`, `support-duplicate`,
 *   `not-finite`, ...; see docs/errors.md), a `mechanism` for a member its supports cannot hold,
 *   or `result-not-finite` for loads, factors or settlements too large for double precision. A
 *   member held only by rollers and springs is solved, with a `no-horizontal-restraint` warning.
 * @example
 * ```ts
 * // 6 m simple span, uniform 5 kN/m, E I = 20,000 kN m^2
 * const s = solveBeam({
 *   length: 6,
 *   stiffness: 20000,
 *   supports: [{ kind: "pin", at: 0 }, { kind: "roller", at: 6 }],
 *   loads: [{ kind: "distributed", from: 0, to: 6, start: 5, end: 5 }],
 * });
 * s.reactions[0].force;        // 15 (kN, up)
 * s.peaks.moment.max;          // { value: 22.5, at: 3 } (kN m, sagging)
 * s.peaks.deflection.min.value; // -5 * 5 * 6^4 / (384 * 20000) = -0.00421875 m
 * ```
 */
export function solveBeam(beam: BeamInput, options?: SolveOptions): BeamSolution {
  validateBeam(beam, options);
  const axial = checkStability(beam.length, beam.supports, beam.hinges ?? []);
  const notes: BeamNote[] = [];
  const given = beam.loads ?? [];
  const loads = narrowLoadsAsPoints(given, beam.length, notes);
  const input = loads === given ? beam : { ...beam, loads };
  const scratch = acquireScratch();
  try {
    const model = buildModel(input, options, scratch);
    if (model.merged) for (const note of mergeNotes(beam)) notes.push(note);
    refuseShortFreePieces(model, beam.supports, beam.hinges ?? [], scratch.mark);
    const result = solveStiffness(model, beam.supports, beam.hinges ?? [], scratch);
    const diagrams = recoverDiagrams(model, result);
    const reactions = recoverReactions(model, result, beam.supports);
    const warnings = conditioningWarnings(model, beam.supports, result.pivotRatio);
    for (const w of balanceWarnings(model, result, beam.supports, scratch)) {
      // an imbalance this far above rounding is a wrong answer, not a less accurate one: refuse it
      if ((w["imbalance"] as number) > BALANCE_REFUSAL)
        throw new FlexuraError([issue("ill-conditioned", ["supports"], `${w.message.split(". The results")[0]}: the results cannot be trusted, so none are given. Stiffen very soft springs, or move hinges and supports that are very close together apart or onto each other.`, { imbalance: w["imbalance"] })]);
      warnings.push(w);
    }
    for (const w of axial) warnings.push(w);
    const residual = residualOf(model.loads, reactions);
    const { peaks, contraflexure } = peaksOf(diagrams);
    refuseOverflow(beam, options, { reactions, residual, peaks, diagrams: [diagrams.shear, diagrams.moment, diagrams.slope, diagrams.deflection] });
    return Object.freeze({
      length: beam.length,
      reactions: Object.freeze(reactions),
      shear: diagrams.shear,
      moment: diagrams.moment,
      slope: diagrams.slope,
      deflection: diagrams.deflection,
      peaks,
      contraflexure,
      residual,
      warnings: Object.freeze(warnings),
      notes: Object.freeze(notes),
      spans: Object.freeze(spansOf(beam.length, beam.supports)),
    });
  } finally {
    releaseScratch(scratch);
  }
}

/**
 * The non-throwing form of {@link solveBeam}: `{ ok: true, value }` with the solution, or
 * `{ ok: false, error }` with every problem found.
 *
 * @example
 * ```ts
 * const r = trySolveBeam({ length: 0, stiffness: 1, supports: [] });
 * if (!r.ok) console.log(r.error.issues.map((i) => i.code)); // ["length-not-positive"]
 * ```
 */
export function trySolveBeam(beam: BeamInput, options?: SolveOptions): Result<BeamSolution> {
  return attempt(() => solveBeam(beam, options));
}
