import type { IssueCollector } from "../errors/index.js";
import type { ShearStressPoint } from "./shear-profile.js";

/**
 * A section seen through horizontal cuts: what the shear-stress profile needs. Internal: the
 * depth bands and the section module's sections both provide one.
 */
export interface CutSource {
  /** Sorted heights (from the centroid) where the width may change abruptly, bottom and top included. */
  readonly levels: readonly number[];
  /** First moment about the centroidal axis of the (transformed) area above y. */
  firstMoment(y: number): number;
  /** Width of material at y, the one-sided limit from `side`. */
  width(y: number, side: "above" | "below"): number;
}

/** The stress point at a cut of the given width. */
export function pointAt(shear: number, source: CutSource, inertia: number, y: number, width: number): ShearStressPoint {
  const q = source.firstMoment(y) + 0;
  const stress = width > 0 ? (shear * q) / (inertia * width) + 0 : 0;
  return { y, stress, firstMoment: q, width };
}

const GOLDEN = (Math.sqrt(5) - 1) / 2;

/** Maximises f on [a, b] by golden-section search to near machine precision. */
function maximise(f: (y: number) => number, a: number, b: number): number {
  let lo = a;
  let hi = b;
  let x1 = hi - GOLDEN * (hi - lo);
  let x2 = lo + GOLDEN * (hi - lo);
  let f1 = f(x1);
  let f2 = f(x2);
  for (let i = 0; i < 200 && hi - lo > 1e-13 * (Math.abs(lo) + Math.abs(hi) + 1e-300); i++) {
    if (f1 < f2) {
      lo = x1;
      x1 = x2;
      f1 = f2;
      x2 = lo + GOLDEN * (hi - lo);
      f2 = f(x2);
    } else {
      hi = x2;
      x2 = x1;
      f2 = f1;
      x1 = hi - GOLDEN * (hi - lo);
      f1 = f(x1);
    }
  }
  return f1 > f2 ? x1 : x2;
}

/** Points of the profile: band-interval ends on both sides of each level plus interior points. */
export function profilePoints(shear: number, source: CutSource, inertia: number, perBand: number): ShearStressPoint[] {
  const levels = source.levels;
  const out: ShearStressPoint[] = [];
  for (let i = 0; i < levels.length; i++) {
    const y = levels[i] as number;
    const below = source.width(y, "below");
    const above = source.width(y, "above");
    if (i > 0) out.push(pointAt(shear, source, inertia, y, below));
    if (i === 0 || (i < levels.length - 1 && above !== below)) out.push(pointAt(shear, source, inertia, y, above));
    const next = levels[i + 1];
    if (next === undefined) break;
    for (let k = 1; k < perBand; k++) {
      const yk = y + ((next - y) * k) / perBand;
      out.push(pointAt(shear, source, inertia, yk, source.width(yk, "above")));
    }
  }
  return out;
}

export function findPeak(shear: number, source: CutSource, inertia: number, samples: readonly ShearStressPoint[]): ShearStressPoint {
  const ratio = (y: number): number => {
    const w = source.width(y, "above");
    return w > 0 ? source.firstMoment(y) / w : 0;
  };
  let best = samples[0] as ShearStressPoint;
  let bestIndex = 0;
  samples.forEach((s, i) => {
    if (Math.abs(s.stress) > Math.abs(best.stress)) {
      best = s;
      bestIndex = i;
    }
  });
  const before = samples[bestIndex - 1];
  const after = samples[bestIndex + 1];
  if (before === undefined || after === undefined || before.y === best.y || after.y === best.y) return best;
  const y = maximise(ratio, before.y, after.y);
  const refined = pointAt(shear, source, inertia, y, source.width(y, "above"));
  return Math.abs(refined.stress) > Math.abs(best.stress) ? refined : best;
}


/** Validates `pointsPerBand` (16 when omitted) and returns it. */
export function checkPointsPerBand(found: IssueCollector, value: number | undefined): number {
  const perBand = value ?? 16;
  if (!Number.isInteger(perBand) || perBand < 1 || perBand > 1e5) {
    found.add("points-per-band-invalid", ["options", "pointsPerBand"], `pointsPerBand must be a whole number from 1 to 100000; got ${String(perBand)}.`);
  }
  return perBand;
}
