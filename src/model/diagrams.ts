import type { BeamSolution } from "../beam/index.js";
import { describeValue, fail } from "../errors/index.js";
import { coincidenceTolerance } from "../math/index.js";
import type { Extremes, PiecewisePolynomial } from "../math/index.js";
import type { ModelDiagram, ModelDiagramPiece, ModelDiagrams, ModelPeaks, ModelScale } from "./analysis.js";
import type { ModelUnits } from "./model.js";

/**
 * Re-expresses a piecewise polynomial of x in SI as one of x in the model's length unit, values
 * in the model's unit: with x_SI = s_x x and value = v_SI / s_v, the coefficient of
 * (x - from)^k becomes c_k s_x^k / s_v (exact up to one rounding per coefficient).
 */
export function diagramInModelUnits(pp: PiecewisePolynomial, lengthScale: number, valueScale: number, unit: string): ModelDiagram {
  const stride = pp.degree + 1;
  const pieces: ModelDiagramPiece[] = [];
  for (let i = 0; i + 1 < pp.breaks.length; i++) {
    const coefficients: number[] = [];
    let power = 1;
    for (let k = 0; k < stride; k++) {
      coefficients.push(((pp.coefficients[i * stride + k] ?? 0) * power) / valueScale);
      power *= lengthScale;
    }
    pieces.push({ from: (pp.breaks[i] ?? 0) / lengthScale, to: (pp.breaks[i + 1] ?? 0) / lengthScale, coefficients });
  }
  return { unit, pieces };
}

/** Shear, moment, slope and deflection of a solution in the model's units. */
export function diagramsOf(solution: BeamSolution, scale: ModelScale, units: ModelUnits): ModelDiagrams {
  return {
    shear: diagramInModelUnits(solution.shear, scale.length, scale.force, units.force),
    moment: diagramInModelUnits(solution.moment, scale.length, scale.moment, units.moment),
    slope: diagramInModelUnits(solution.slope, scale.length, scale.rotation, units.rotation),
    deflection: diagramInModelUnits(solution.deflection, scale.length, scale.deflection, units.deflection),
  };
}

/** Peaks in SI converted to the model's units (positions in the length unit). */
export function peaksInModelUnits(peaks: Extremes, lengthScale: number, valueScale: number): ModelPeaks {
  return {
    max: { value: peaks.max.value / valueScale, at: peaks.max.at / lengthScale },
    min: { value: peaks.min.value / valueScale, at: peaks.min.at / lengthScale },
  };
}

/**
 * Evaluates a diagram of {@link analyzeModel}'s results at `x` (length unit), with the reading
 * rules of the math layer's `evaluatePiecewise` (docs/tolerances.md): at a break where the diagram
 * jumps (shear under a point load), `side` picks the limit from the left or the right; without a
 * side, the right limit, except at the last break, where it is the left one (the value on the
 * member at each end). A side pointing off the member (`"left"` at the first break, `"right"` at
 * the last) gives 0: a diagram is zero off its member, so the jump at an end is the end's
 * reaction. A position within the coincidence tolerance (1e-9 of the diagram's length) past an
 * end is at that end; further out is refused.
 *
 * @param diagram - A diagram from `ModelAnalysis.diagrams`.
 * @param x - Position from the left end, in the model's length unit, within the member.
 * @param side - `"left"` or `"right"` limit at a break; default as above.
 * @returns The value in `diagram.unit`.
 * @throws FlexuraError `outside-domain` (x NaN, or outside the member by more than the tolerance),
 *   `not-a-number` (x not a number), `unknown-side`, `diagram-invalid` (no pieces, or pieces whose
 *   ends are not finite and increasing).
 * @example
 * ```ts
 * const a = analyzeModel(parseModel(file));
 * evaluateDiagram(a.diagrams.moment, 2.5); // bending moment at x = 2.5, in a.units.moment
 * evaluateDiagram(a.diagrams.shear, 0, "left"); // 0: off the member
 * ```
 */
export function evaluateDiagram(diagram: ModelDiagram, x: number, side?: "left" | "right"): number {
  const pieces: readonly ModelDiagramPiece[] = typeof diagram === "object" && diagram !== null && Array.isArray(diagram.pieces) ? diagram.pieces : [];
  const first = pieces[0];
  const last = pieces[pieces.length - 1];
  if (first === undefined || last === undefined || !(Number.isFinite(first.from) && Number.isFinite(last.to) && last.to >= first.from))
    fail("diagram-invalid", ["diagram"], `A diagram is { unit, pieces: [{ from, to, coefficients }] } with at least one piece, its ends finite and increasing; got ${describeValue(diagram)}.`);
  if (side !== undefined && side !== "left" && side !== "right") fail("unknown-side", ["side"], `The side is "left" or "right"; got ${describeValue(side)}.`);
  if (typeof x !== "number") fail("not-a-number", ["x"], `The position x is a number in the model's length unit; got ${describeValue(x)}.`);
  const x0 = first.from;
  const x1 = last.to;
  const slack = coincidenceTolerance(x1 - x0);
  if (!(x >= x0 - slack && x <= x1 + slack)) fail("outside-domain", ["x"], `x = ${x} lies outside the member, [${x0}, ${x1}].`, { x });
  if (x <= x0) {
    if (side === "left") return 0;
    return polynomialValue(first.coefficients, 0);
  }
  if (x >= x1) {
    if (side === "right") return 0;
    return polynomialValue(last.coefficients, x1 - last.from);
  }
  // the piece holding x: the last that starts before x (at x itself for the right limit)
  let index = 0;
  for (let i = 1; i < pieces.length; i++) {
    const p = pieces[i] as ModelDiagramPiece;
    if (side === "left" ? x > p.from : x >= p.from) index = i;
    else break;
  }
  const piece = pieces[index] as ModelDiagramPiece;
  return polynomialValue(piece.coefficients, Math.min(Math.max(x, piece.from), piece.to) - piece.from);
}

/** sum c_k t^k by Horner's rule. */
function polynomialValue(coefficients: readonly number[], t: number): number {
  let value = 0;
  for (let k = coefficients.length - 1; k >= 0; k--) value = value * t + (coefficients[k] ?? 0);
  return value;
}
