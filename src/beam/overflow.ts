import { FlexuraError, issue, type IssuePath } from "../errors/index.js";
import type { PiecewisePolynomial } from "../math/index.js";
import type { Load } from "../loads/index.js";
import type { BeamInput, BeamPeaks, BeamResidual, Reaction, SolveOptions } from "./types.js";

/** True when `v` is a finite number (`v - v` is NaN for NaN and for either infinity). */
const finite = (v: number): boolean => v - v === 0;

function allFinite(values: Float64Array): boolean {
  for (let i = 0; i < values.length; i++) if (!finite(values[i] as number)) return false;
  return true;
}

/** The parts of a solution that must be finite. */
export interface SolvedNumbers {
  readonly reactions: readonly Reaction[];
  readonly residual: BeamResidual;
  readonly diagrams: readonly PiecewisePolynomial[];
  readonly peaks: BeamPeaks;
}

/**
 * Refuses a solution that double precision cannot carry: a load, a factor or a settlement so
 * large (near 1e308) that a reaction, a diagram coefficient or a peak overflows to Infinity or
 * NaN. Every number of the result is checked once, so no NaN or Infinity ever leaves the solver.
 *
 * @throws FlexuraError `result-not-finite`, with the path of the input most likely behind it:
 *   the factor of the largest factored load's case, that load's value, or the largest settlement.
 */
export function refuseOverflow(beam: BeamInput, options: SolveOptions | undefined, solved: SolvedNumbers): void {
  let ok = true;
  for (const r of solved.reactions) ok &&= finite(r.force) && finite(r.moment);
  ok &&= finite(solved.residual.force) && finite(solved.residual.moment);
  for (const d of solved.diagrams) ok &&= allFinite(d.coefficients);
  for (const e of [solved.peaks.shear, solved.peaks.moment, solved.peaks.slope, solved.peaks.deflection]) ok &&= finite(e.max.value) && finite(e.min.value);
  if (ok) return;
  const path = likelyCause(beam, options);
  throw new FlexuraError([
    issue(
      "result-not-finite",
      path,
      "The results of this member exceed what a double can hold (about 1.8e308): a load, a factor or a settlement is too large for the member's size and stiffness. Rescale the input (other units) or check its size.",
      {},
    ),
  ]);
}

/** The input with the largest magnitude among the factored loads and the settlements. */
function likelyCause(beam: BeamInput, options: SolveOptions | undefined): IssuePath {
  const factors = options?.factors;
  let path: IssuePath = ["loads"];
  let worst = -1;
  (beam.loads ?? []).forEach((l: Load, i) => {
    const name = l.case ?? "default";
    const own = factors !== undefined && Object.prototype.hasOwnProperty.call(factors, name);
    const f = factors === undefined ? 1 : own ? Math.abs(factors[name] as number) : 0;
    const size = l.kind === "distributed" ? Math.max(Math.abs(l.start), Math.abs(l.end)) * (l.to - l.from) : Math.abs(l.value);
    const scaled = size * f;
    if (scaled > worst) {
      worst = scaled;
      // a factor far larger than the load points at the factor
      path = own && f > size ? ["factors", name] : ["loads", i, l.kind === "distributed" ? "start" : "value"];
    }
  });
  beam.supports.forEach((s, i) => {
    const size = Math.abs(s.settlement ?? 0) * (typeof beam.stiffness === "number" ? beam.stiffness : 1);
    if (size > worst) {
      worst = size;
      path = ["supports", i, "settlement"];
    }
  });
  return path;
}
