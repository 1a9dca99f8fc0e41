import { evaluateDiagram, type ModelDiagram } from "../model/index.js";

/** How densely to sample a diagram for drawing. */
export interface SampleDiagramOptions {
  /**
   * Points per polynomial piece, ends included (at least 2). Default 48, fewer when the diagram
   * has many pieces: about {@link SAMPLE_BUDGET} points in all, never fewer than the two ends of
   * each piece; then a straight piece (degree 0 or 1) is drawn exactly by its two ends alone.
   */
  readonly pointsPerPiece?: number;
}

/**
 * About how many points a diagram is sampled at by default, whatever its number of pieces: a
 * drawing 760 pixels wide shows no more, and the work (and the SVG's size) stays linear in the
 * number of pieces instead of 48 points for each.
 */
export const SAMPLE_BUDGET = 4000;

/** The degree of a piece, trailing zero coefficients aside. */
function degreeOf(coefficients: readonly number[]): number {
  let k = coefficients.length - 1;
  while (k > 0 && coefficients[k] === 0) k--;
  return k;
}

/**
 * Samples exact polynomial pieces densely for drawing: every piece contributes its two ends and
 * evenly spaced points between, so that breakpoints are always drawn and a jump between pieces
 * (the value at the end of one piece differing from the start of the next) appears as two points
 * at the same x. Values are those of the pieces, unchanged; this is for pictures only (peaks come
 * exactly from the analysis, not from these samples).
 *
 * @param diagram - Contiguous pieces; on `[from, to]` the value is sum c_k (x - from)^k.
 * @param options - Sampling density.
 * @returns Points `[x, value]` in order of x, in the diagram's units.
 * @example
 * ```ts
 * sampleDiagram({ unit: "kN", pieces: [{ from: 0, to: 2, coefficients: [5] }, { from: 2, to: 4, coefficients: [-5] }] });
 * // [[0, 5], ..., [2, 5], [2, -5], ..., [4, -5]]
 * ```
 */
export function sampleDiagram(diagram: ModelDiagram, options: SampleDiagramOptions = {}): readonly (readonly [number, number])[] {
  const pieces = diagram.pieces;
  const given = options.pointsPerPiece;
  const n = Math.max(2, Math.floor(given ?? Math.min(48, SAMPLE_BUDGET / Math.max(1, pieces.length))));
  const out: (readonly [number, number])[] = [];
  for (const piece of pieces) {
    const width = piece.to - piece.from;
    const count = width > 0 ? (given === undefined && degreeOf(piece.coefficients) <= 1 ? 2 : n) : 1;
    for (let i = 0; i < count; i++) {
      const t = count === 1 ? 0 : i / (count - 1);
      const x = i === count - 1 ? piece.to : piece.from + t * width;
      out.push([x, evaluatePolynomial(piece.coefficients, x - piece.from)]);
    }
  }
  return dropRepeats(out);
}

/**
 * Evaluates sum c_k u^k by Horner's rule.
 *
 * @example
 * ```ts
 * evaluatePolynomial([1, 0, 2], 3); // 19
 * ```
 */
export function evaluatePolynomial(coefficients: readonly number[], u: number): number {
  let value = 0;
  for (let k = coefficients.length - 1; k >= 0; k--) value = value * u + (coefficients[k] ?? 0);
  return value;
}

/**
 * The value of a diagram at `x`: the model's `evaluateDiagram` (one reading rule for the whole
 * library, docs/tolerances.md): the left (`side: "left"`) or right (`"right"`) limit at a
 * breakpoint; without a side the right limit, except at the last breakpoint (the value on the
 * member); a side pointing off the member at an end gives 0; a position within the coincidence
 * tolerance past an end is at the end, and further out is refused.
 *
 * @throws FlexuraError `outside-domain`, `not-a-number`, `unknown-side`, `diagram-invalid` (see `evaluateDiagram`).
 * @example
 * ```ts
 * const d = { unit: "kN", pieces: [{ from: 0, to: 2, coefficients: [5] }, { from: 2, to: 4, coefficients: [-5] }] };
 * diagramValueAt(d, 2, "left"); // 5
 * diagramValueAt(d, 2);         // -5
 * diagramValueAt(d, 4, "right"); // 0 (off the member)
 * ```
 */
export function diagramValueAt(diagram: ModelDiagram, x: number, side?: "left" | "right"): number {
  return evaluateDiagram(diagram, x, side);
}

function dropRepeats(points: readonly (readonly [number, number])[]): readonly (readonly [number, number])[] {
  const out: (readonly [number, number])[] = [];
  for (const p of points) {
    const last = out[out.length - 1];
    if (last !== undefined && last[0] === p[0] && last[1] === p[1]) continue;
    out.push(p);
  }
  return out;
}
