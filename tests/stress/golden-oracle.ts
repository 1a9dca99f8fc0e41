// An independent oracle for the peak shear stress: the search the library used before it found
// the peak from roots. Samples 16 points per band between the width-change heights, takes the
// largest and refines it by golden-section search between its neighbours. Tests only.
import { firstMomentAbove as sectionFirstMoment, sectionProperties, type Section } from "../../src/section/index.js";
import { bandLevels, firstMomentAbove, widthAt, type DepthBand } from "../../src/stress/bands.js";
import { sectionLevels } from "../../src/stress/section-points.js";

/** A section seen through horizontal cuts (y from the centroid). */
export interface OracleSource {
  readonly levels: readonly number[];
  firstMoment(y: number): number;
  width(y: number, side: "above" | "below"): number;
}

/** The peak found by the search: height and Q / b there (tau = V / I times this). */
export interface OraclePeak {
  readonly y: number;
  readonly ratio: number;
}

const GOLDEN = (Math.sqrt(5) - 1) / 2;

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

/** Q / b at y for a width (0 where there is no material). */
function ratioAt(source: OracleSource, y: number, width: number): number {
  return width > 0 ? source.firstMoment(y) / width : 0;
}

/**
 * The old search: 16 samples per band, then golden-section refinement around the best. As the
 * old search did, a best sample at a level is not refined (`exact`); with `exact` false the
 * refinement always runs, between the nearest samples below and above.
 */
export function goldenPeak(source: OracleSource, perBand = 16, exact = true): OraclePeak {
  const levels = source.levels;
  const samples: OraclePeak[] = [];
  for (let i = 0; i < levels.length; i++) {
    const y = levels[i]!;
    const below = source.width(y, "below");
    const above = source.width(y, "above");
    if (i > 0) samples.push({ y, ratio: ratioAt(source, y, below) });
    if (i === 0 || (i < levels.length - 1 && above !== below)) samples.push({ y, ratio: ratioAt(source, y, above) });
    const next = levels[i + 1];
    if (next === undefined) break;
    for (let k = 1; k < perBand; k++) {
      const yk = y + ((next - y) * k) / perBand;
      samples.push({ y: yk, ratio: ratioAt(source, yk, source.width(yk, "above")) });
    }
  }
  let bestIndex = 0;
  samples.forEach((s, i) => {
    if (Math.abs(s.ratio) > Math.abs(samples[bestIndex]!.ratio)) bestIndex = i;
  });
  const best = samples[bestIndex]!;
  let before = samples[bestIndex - 1];
  let after = samples[bestIndex + 1];
  if (!exact) {
    before = samples.slice(0, bestIndex).reverse().find((s) => s.y < best.y);
    after = samples.slice(bestIndex + 1).find((s) => s.y > best.y);
  }
  if (before === undefined || after === undefined || before.y === best.y || after.y === best.y) return best;
  const y = maximise((t) => ratioAt(source, t, source.width(t, "above")), before.y, after.y);
  const ratio = ratioAt(source, y, source.width(y, "above"));
  return Math.abs(ratio) > Math.abs(best.ratio) ? { y, ratio } : best;
}

/** Depth bands as an oracle source. */
export function bandOracle(bands: readonly DepthBand[]): OracleSource {
  return { levels: bandLevels(bands), firstMoment: (y) => firstMomentAbove(bands, y), width: (y, side) => widthAt(bands, y, side) };
}

/** A section from the section module as an oracle source (y from its transformed centroid). */
export function sectionOracle(section: Section): OracleSource {
  const cy = sectionProperties(section).centroid.y;
  return {
    levels: sectionLevels(section, cy),
    firstMoment: (y) => sectionFirstMoment(section, y + cy).firstMoment,
    width: (y, side) => {
      const r = sectionFirstMoment(section, y + cy);
      // the transformed width b* (the actual width for one material): tau = V Q* / (I* b*) on the transformed section
      return side === "above" ? r.transformedWidthAbove : r.transformedWidthBelow;
    },
  };
}

/** Every level on both sides and `perBand` evenly spaced heights inside each band: a dense check set of (y, Q / b). */
export function denseRatios(source: OracleSource, perBand: number): OraclePeak[] {
  const out: OraclePeak[] = [];
  const levels = source.levels;
  levels.forEach((y, i) => {
    out.push({ y, ratio: ratioAt(source, y, source.width(y, "below")) }, { y, ratio: ratioAt(source, y, source.width(y, "above")) });
    const next = levels[i + 1];
    if (next === undefined) return;
    for (let k = 1; k < perBand; k++) {
      const yk = y + ((next - y) * k) / perBand;
      out.push({ y: yk, ratio: ratioAt(source, yk, source.width(yk, "above")) });
    }
  });
  return out;
}
