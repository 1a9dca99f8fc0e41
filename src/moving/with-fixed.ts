import type { DiagramEnvelope, EnvelopeBound } from "../combine/index.js";
import { attempt, fail, type Result } from "../errors/index.js";
import { addPiecewise, extremesOf, scalePiecewise, type PiecewisePolynomial } from "../math/index.js";
import { pieceAt } from "./shifted-sum.js";

function sum(bound: EnvelopeBound, fixed: PiecewisePolynomial, fixedFactor: number, movingFactor: number, upper: boolean, names: (i: number) => string): EnvelopeBound {
  const curve = addPiecewise(scalePiecewise(fixed, fixedFactor), scalePiecewise(bound.curve, movingFactor));
  const governing: number[] = [];
  const b = curve.breaks;
  for (let i = 0; i + 1 < b.length; i++) governing.push(bound.governing[pieceAt(bound.curve.breaks, 0.5 * ((b[i] as number) + (b[i + 1] as number)))] as number);
  const e = extremesOf(curve);
  const best = upper ? e.max : e.min;
  const piece = pieceAt(b, Math.min(best.at, b[b.length - 2] as number));
  const arrangement = governing[piece] as number;
  return { curve, governing, peak: { value: best.value, at: best.at, arrangement, name: names(arrangement) } };
}

/**
 * A moving-load envelope with a standing load added: the envelope of `fixedFactor` times a fixed
 * diagram (for example the dead-load moment of a combination from `combineCases`, or a solved
 * member's `moment`) plus `movingFactor` times the moving load's effect, exact (the fixed diagram
 * adds to every placement alike, so the bounds add; a negative moving factor swaps them). The
 * result has the shape of the combine module's `DiagramEnvelope`; `governing` and `peak.arrangement`
 * still index the moving envelope's `placements`, whose names `names` gives.
 *
 * Units: the diagram's own. Both must be on the same member (the same first and last breakpoint).
 *
 * @throws FlexuraError `domain-mismatch` when the diagram and the envelope are not on the same member,
 *   `not-finite` for a factor that is not a finite number, `piecewise-invalid` for a diagram that is not a piecewise polynomial.
 * @example
 * ```ts
 * const dead = solveBeam({ ...girder, loads: [{ kind: "distributed", from: 0, to: 12, start: 1.2, end: 1.2 }] });
 * const live = movingEnvelopes(girder, { loads: [48, 48], spacings: [3.2] });
 * const design = withFixedDiagram(live.moment, dead.moment, 1.2, 1.6, live.placements.map((p) => p.name));
 * design.upper.peak.value; // the largest 1.2 D + 1.6 (moving) moment
 * ```
 */
export function withFixedDiagram(envelope: DiagramEnvelope, fixed: PiecewisePolynomial, fixedFactor = 1, movingFactor = 1, names: readonly string[] = []): DiagramEnvelope {
  if (typeof fixedFactor !== "number" || !Number.isFinite(fixedFactor)) fail("not-finite", ["fixedFactor"], `The factor on the fixed diagram must be a finite number; got ${String(fixedFactor)}.`);
  if (typeof movingFactor !== "number" || !Number.isFinite(movingFactor)) fail("not-finite", ["movingFactor"], `The factor on the moving load must be a finite number; got ${String(movingFactor)}.`);
  const name = (i: number): string => names[i] ?? `placement ${i}`;
  const [hi, lo] = movingFactor >= 0 ? [envelope.upper, envelope.lower] : [envelope.lower, envelope.upper];
  return { diagram: envelope.diagram, upper: sum(hi, fixed, fixedFactor, movingFactor, true, name), lower: sum(lo, fixed, fixedFactor, movingFactor, false, name) };
}

/**
 * The non-throwing form of {@link withFixedDiagram}.
 *
 * @example
 * ```ts
 * const r = tryWithFixedDiagram(live.moment, dead.moment, Number.NaN);
 * if (!r.ok) console.log(r.error.issues[0]?.code); // "not-finite"
 * ```
 */
export function tryWithFixedDiagram(envelope: DiagramEnvelope, fixed: PiecewisePolynomial, fixedFactor = 1, movingFactor = 1, names: readonly string[] = []): Result<DiagramEnvelope> {
  return attempt(() => withFixedDiagram(envelope, fixed, fixedFactor, movingFactor, names));
}
