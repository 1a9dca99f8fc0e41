import type { BeamSolution } from "../beam/index.js";
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
 * Evaluates a diagram of {@link analyzeModel}'s results at `x` (length unit). At a break where
 * the diagram jumps (shear under a point load), `side` picks the limit from the left or the right.
 *
 * @param diagram - A diagram from `ModelAnalysis.diagrams`.
 * @param x - Position from the left end, in the model's length unit, within the member.
 * @param side - `"left"` or `"right"` (default) limit at a break.
 * @returns The value in `diagram.unit`; NaN is never returned: x outside the member gives the nearest end's value.
 * @example
 * ```ts
 * const a = analyzeModel(parseModel(file));
 * evaluateDiagram(a.diagrams.moment, 2.5); // bending moment at x = 2.5, in a.units.moment
 * ```
 */
export function evaluateDiagram(diagram: ModelDiagram, x: number, side: "left" | "right" = "right"): number {
  const pieces = diagram.pieces;
  let index = 0;
  for (let i = 0; i < pieces.length; i++) {
    const p = pieces[i] as ModelDiagramPiece;
    if (side === "right" ? x >= p.from : x > p.from) index = i;
  }
  const piece = pieces[index];
  if (piece === undefined) return 0;
  const t = Math.min(Math.max(x, piece.from), piece.to) - piece.from;
  let value = 0;
  for (let k = piece.coefficients.length - 1; k >= 0; k--) value = value * t + (piece.coefficients[k] ?? 0);
  return value;
}
