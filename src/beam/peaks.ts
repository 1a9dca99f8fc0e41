import type { Extremes, PiecewisePolynomial } from "../math/index.js";
import { clearOfZero, evaluatePolynomial, rootsToScratch, scratchRoots } from "../math/polynomial.js";
import { ROUNDING } from "../math/tolerance.js";
import type { Diagrams } from "./recover.js";
import type { BeamPeaks } from "./types.js";

/**
 * Running largest and smallest values with their locations, four numbers per diagram:
 * [max value, its x, min value, its x]; ties keep the leftmost.
 */
const running = new Float64Array(16);

function see(k: number, value: number, x: number): void {
  const v = value + 0; // reports 0, never -0
  if (v > (running[k] as number)) {
    running[k] = v;
    running[k + 1] = x;
  }
  if (v < (running[k + 2] as number)) {
    running[k + 2] = v;
    running[k + 3] = x;
  }
}

function extremes(k: number): Extremes {
  // a peak within rounding of zero (ROUNDING of the diagram's largest magnitude) is zero: a
  // moment that never goes negative reports a minimum of 0, not -1.4e-14
  const max = running[k] as number;
  const min = running[k + 2] as number;
  const floor = ROUNDING * Math.max(Math.abs(max), Math.abs(min));
  // frozen all the way down: a peak's value cannot be written
  return Object.freeze({
    max: Object.freeze({ value: Math.abs(max) <= floor ? 0 : max, at: running[k + 1] as number }),
    min: Object.freeze({ value: Math.abs(min) <= floor ? 0 : min, at: running[k + 3] as number }),
  });
}

const roots = new Float64Array(8);
/** Per piece: the number of moment roots, and the roots themselves (grown as needed). */
let momentRootCount = new Int32Array(64);
let momentRoots = new Float64Array(192);
const derivative = new Float64Array(2);

/**
 * Copies the roots of piece `i` of `pp` in [0, h] (skipping a piece clear of zero) from the
 * shared root scratch; returns their number.
 */
function pieceRoots(pp: PiecewisePolynomial, i: number, h: number): number {
  const d = pp.degree;
  const o = i * (d + 1);
  if (clearOfZero(pp.coefficients, o, d, h)) return 0;
  const count = rootsToScratch(pp.coefficients, o, d, 0, h);
  for (let r = 0; r < count; r++) roots[r] = scratchRoots[r] as number;
  return count;
}

/** Feeds a piece's values at its ends and at the interior points `roots[0 .. count - 1]` to diagram `k`'s running extremes. */
function scan(k: number, pp: PiecewisePolynomial, i: number, x0: number, x1: number, h: number, count: number): void {
  const c = pp.coefficients;
  const d = pp.degree;
  const o = i * (d + 1);
  see(k, c[o] as number, x0);
  for (let r = 0; r < count; r++) {
    const t = roots[r] as number;
    see(k, evaluatePolynomial(c, o, d, t), Math.min(t + x0, x1));
  }
  see(k, evaluatePolynomial(c, o, d, h), x1);
}

/**
 * True when the quintic `c[o] + ... + c[o+5] t^5` stays within diagram `k`'s running extremes
 * over 0 <= t <= h: its Bernstein coefficients on the piece bound it (the convex hull property;
 * Farouki & Rajan, "On the numerical condition of polynomials in Bernstein form", Computer Aided
 * Geometric Design 4 (1987)), so when they all lie within, no interior point can beat them. The
 * first and last Bernstein coefficients are the values at the piece's ends, already seen.
 */
function withinRunning(k: number, c: Float64Array, o: number, h: number): boolean {
  // a_j = c_j h^j / C(5, j); b_i = sum over j <= i of C(i, j) a_j
  const a0 = c[o] as number;
  const a1 = (c[o + 1] as number) * h * 0.2;
  const h2 = h * h;
  const a2 = (c[o + 2] as number) * h2 * 0.1;
  const a3 = (c[o + 3] as number) * h2 * h * 0.1;
  const a4 = (c[o + 4] as number) * h2 * h2 * 0.2;
  const max = running[k] as number;
  const min = running[k + 2] as number;
  const b1 = a0 + a1;
  const b2 = a0 + 2 * a1 + a2;
  const b3 = a0 + 3 * (a1 + a2) + a3;
  const b4 = a0 + 4 * (a1 + a3) + 6 * a2 + a4;
  return b1 <= max && b1 >= min && b2 <= max && b2 >= min && b3 <= max && b3 >= min && b4 <= max && b4 >= min;
}


/** The peaks of the four diagrams and the points of contraflexure, in one pass over the pieces. */
export interface PeaksAndContraflexure {
  readonly peaks: BeamPeaks;
  readonly contraflexure: readonly number[];
}

/**
 * The largest and smallest shear, moment, slope and deflection with their locations, and the
 * points of contraflexure, found exactly in one pass: each diagram's interior extremes lie at the
 * real roots of its derivative, and the derivative of each is the diagram before it (deflection'
 * = slope, slope' = M / E I, M' = V, V' = -w), so each piece's roots are found once and serve
 * twice: the roots of the moment give both the slope's extremes and the points of contraflexure.
 * A peak whose size is within rounding of zero (1e-10 of the diagram's largest magnitude) is
 * reported as 0, at the point where it was found.
 *
 * A point of contraflexure: on each piece the moment's roots split it into stretches of one sign
 * (judged at each stretch's midpoint); a sign change between neighbouring stretches is a point
 * of contraflexure. Stretches whose moment is zero to rounding (`ROUNDING`, 1e-10 of the largest moment) are
 * skipped, so an unloaded overhang, or a hinge where the moment only touches zero, gives none. A
 * jump across zero at an applied couple counts.
 */
export function peaksOf(diagrams: Diagrams): PeaksAndContraflexure {
  const { shear, moment, slope, deflection } = diagrams;
  const b = moment.breaks;
  const pieces = b.length - 1;
  for (let k = 0; k < 16; k += 4) {
    running[k] = -Infinity;
    running[k + 2] = Infinity;
  }
  // moment roots of every piece (at most three), kept for the contraflexure pass once the largest
  // moment is known; working storage reused from call to call
  if (momentRootCount.length < pieces) {
    momentRootCount = new Int32Array(2 * pieces);
    momentRoots = new Float64Array(6 * pieces);
  }
  let stored = 0;
  for (let i = 0; i < pieces; i++) {
    const x0 = b[i] as number;
    const x1 = b[i + 1] as number;
    const h = x1 - x0;
    // shear: its derivative -w is linear
    const so = 3 * i;
    derivative[0] = shear.coefficients[so + 1] as number;
    derivative[1] = 2 * (shear.coefficients[so + 2] as number);
    let count = rootsToScratch(derivative, 0, 1, 0, h);
    if (count > 0) roots[0] = scratchRoots[0] as number;
    scan(0, shear, i, x0, x1, h, count);
    // moment: at the roots of the shear
    count = pieceRoots(shear, i, h);
    scan(4, moment, i, x0, x1, h, count);
    // slope: at the roots of the moment (kept for contraflexure)
    count = pieceRoots(moment, i, h);
    momentRootCount[i] = count;
    for (let k = 0; k < count; k++) momentRoots[stored++] = roots[k] as number;
    scan(8, slope, i, x0, x1, h, count);
    // deflection: its ends now; its interior (the roots of the slope, the costliest) in a second pass
    const yo = 6 * i;
    see(12, deflection.coefficients[yo] as number, x0);
    see(12, evaluatePolynomial(deflection.coefficients, yo, 5, h), x1);
  }
  // a piece whose deflection provably stays within the extremes found so far cannot hold a new one
  for (let i = 0; i < pieces; i++) {
    const x0 = b[i] as number;
    const x1 = b[i + 1] as number;
    const h = x1 - x0;
    if (clearOfZero(slope.coefficients, 5 * i, 4, h) || withinRunning(12, deflection.coefficients, 6 * i, h)) continue;
    const count = pieceRoots(slope, i, h);
    scan(12, deflection, i, x0, x1, h, count);
  }
  const scale = Math.max(Math.abs(running[4] as number), Math.abs(running[6] as number));
  return {
    peaks: Object.freeze({ shear: extremes(0), moment: extremes(4), slope: extremes(8), deflection: extremes(12) }),
    contraflexure: Object.freeze(contraflexure(moment, momentRoots, momentRootCount, scale)),
  };
}

function contraflexure(moment: PiecewisePolynomial, momentRoots: Float64Array, counts: Int32Array, scale: number): number[] {
  const b = moment.breaks;
  const c = moment.coefficients;
  const zero = ROUNDING * scale;
  const gap = 1e-8 * ((b[b.length - 1] as number) - (b[0] as number));
  const out: number[] = [];
  let lastSign = 0;
  let lastEnd = 0;
  let k = 0;
  for (let i = 0; i + 1 < b.length; i++) {
    const x0 = b[i] as number;
    const h = (b[i + 1] as number) - x0;
    const count = counts[i] as number;
    let start = 0;
    for (let j = 0; j <= count; j++) {
      const end = j < count ? (momentRoots[k + j] as number) : h;
      if (end > start) {
        const value = evaluatePolynomial(c, i * 4, 3, 0.5 * (start + end));
        const sign = value > zero ? 1 : value < -zero ? -1 : 0;
        if (sign !== 0) {
          const here = x0 + start;
          if (lastSign !== 0 && sign !== lastSign && here - lastEnd <= gap) out.push(0.5 * (here + lastEnd));
          lastSign = sign;
          lastEnd = x0 + end;
        }
      }
      start = end;
    }
    k += count;
  }
  return out;
}
