import type { BeamSolution } from "../beam/index.js";
import { evaluatePiecewise, extremesOf, piecewisePolynomial, type PiecewisePolynomial } from "../math/index.js";
import type { ModelCheck, ModelScale, ModelStress, ModelWarning } from "./analysis.js";
import type { Model } from "./model.js";

function check(kind: ModelCheck["kind"], demand: number, capacity: number, at: number, unit: string, description: string): ModelCheck {
  const utilisation = demand / capacity;
  return { kind, demand, capacity, utilisation, pass: demand <= capacity, at, unit, description };
}

const fmt = (x: number): string => String(Number(x.toPrecision(6)));

/** Re-expands sum c_k t^k (t = x - a) about a + h: the Taylor shift, exact in the coefficients. */
function shift(c: readonly number[], h: number): number[] {
  return c.map((_, k) => {
    let sum = 0;
    let binomial = 1; // C(j, k) for j = k upward
    let power = 1; // h^(j - k)
    for (let j = k; j < c.length; j++) {
      sum += binomial * (c[j] ?? 0) * power;
      binomial = (binomial * (j + 1)) / (j + 1 - k);
      power *= h;
    }
    return sum;
  });
}

/**
 * The deflection on [from, to] less the straight line through its values at `chordFrom` and
 * `chordTo` (the same point for a cantilever: less its support's deflection), as a new piecewise
 * polynomial on [from, to]. Rigid movement of the span on settling or springy supports drops out.
 */
function relativeDeflection(pp: PiecewisePolynomial, from: number, to: number, chordFrom: number, chordTo: number): PiecewisePolynomial {
  const a = evaluatePiecewise(pp, chordFrom);
  const b = evaluatePiecewise(pp, chordTo);
  const slope = chordTo === chordFrom ? 0 : (b - a) / (chordTo - chordFrom);
  const stride = pp.degree + 1;
  const breaks: number[] = [from];
  const coefficients: number[] = [];
  for (let i = 0; i + 1 < pp.breaks.length; i++) {
    const lo = Math.max(pp.breaks[i] ?? 0, from);
    const hi = Math.min(pp.breaks[i + 1] ?? 0, to);
    if (!(hi > lo)) continue;
    const local = shift(Array.from(pp.coefficients.subarray(i * stride, (i + 1) * stride)), lo - (pp.breaks[i] ?? 0));
    local[0] = (local[0] ?? 0) - (a + slope * (lo - chordFrom));
    if (stride > 1) local[1] = (local[1] ?? 0) - slope;
    coefficients.push(...local);
    breaks.push(hi);
  }
  return piecewisePolynomial(breaks, coefficients, pp.degree);
}

/**
 * Deflection checks: with a ratio limit (span/N), one per span and cantilever of the solution,
 * against its own length / N, the deflection taken relative to the span's supports (the chord
 * between them; for a cantilever, its support's deflection); with a length limit, one for the
 * whole member, on the deflection as computed.
 */
export function deflectionChecks(model: Model, solution: BeamSolution, scale: ModelScale): ModelCheck[] {
  const limit = model.limits.deflection;
  if (limit === undefined) return [];
  const { length: unit, deflection: unitD } = model.units;
  const worst = (pp: PiecewisePolynomial, from: number, to: number): { demand: number; at: number } => {
    const e = extremesOf(pp, from, to);
    const down = -e.min.value;
    const up = e.max.value;
    return down >= up ? { demand: down / scale.deflection, at: e.min.at / scale.length } : { demand: up / scale.deflection, at: e.max.at / scale.length };
  };
  if (limit.kind === "length") {
    const w = worst(solution.deflection, 0, solution.length);
    return [check("deflection", w.demand, limit.value, w.at, unitD, `deflection of the member against ${fmt(limit.value)} ${unitD}`)];
  }
  return solution.spans.map((span, i) => {
    const [chordFrom, chordTo] = span.kind === "span" ? [span.from, span.to] : span.from === 0 ? [span.to, span.to] : [span.from, span.from];
    const w = worst(relativeDeflection(solution.deflection, span.from, span.to, chordFrom, chordTo), span.from, span.to);
    const from = span.from / scale.length;
    const to = span.to / scale.length;
    const capacity = (span.to - span.from) / limit.ratio / scale.deflection;
    const what = span.kind === "span" ? `span ${i + 1}` : `cantilever ${i + 1}`;
    return check("deflection", w.demand, capacity, w.at, unitD, `deflection of ${what} (${fmt(from)} to ${fmt(to)} ${unit}) against its length/${fmt(limit.ratio)}`);
  });
}

/** Stress checks against the allowable stresses, for a model with a section. */
export function stressChecks(model: Model, stress: ModelStress | undefined, warnings: ModelWarning[]): ModelCheck[] {
  const out: ModelCheck[] = [];
  const unit = model.units.stress;
  const { bendingStress, shearStress } = model.limits;
  if (stress === undefined) {
    if (bendingStress !== undefined || shearStress !== undefined) {
      warnings.push({ code: "stress-limit-without-section", message: 'The stress limits are not checked: give a "section" so that stresses can be computed.' });
    }
    return out;
  }
  if (bendingStress !== undefined) {
    const t = stress.tension;
    const c = stress.compression;
    const governing = t.value >= -c.value ? { demand: t.value, at: t.at, what: "tension" } : { demand: -c.value, at: c.at, what: "compression" };
    out.push(check("bending-stress", governing.demand, bendingStress, governing.at, unit, `extreme-fibre bending stress (${governing.what}) against ${fmt(bendingStress)} ${unit}`));
  }
  if (shearStress !== undefined && stress.shear !== undefined) {
    out.push(check("shear-stress", Math.abs(stress.shear.value), shearStress, stress.shear.at, unit, `peak shear stress against ${fmt(shearStress)} ${unit}`));
  }
  return out;
}
