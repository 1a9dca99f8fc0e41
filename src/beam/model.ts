import { DEFAULT_LOAD_CASE, type Load } from "../loads/index.js";
import { elementFlexibility } from "./flexibility.js";
import { ensureNodes, ensureRaw, type Scratch } from "./scratch.js";
import type { BeamInput, SolveOptions } from "./types.js";
import { SAME_POINT } from "./validate.js";

/**
 * The discretised member, on two levels.
 *
 * Pieces: breakpoints at the ends, supports, hinges, stiffness steps and load ends, so that the
 * load on each piece is one linear function and the diagrams are one polynomial per piece.
 *
 * Elements: the stretches between structural nodes only (the ends, supports and hinges), each
 * carrying all the loads inside it through its exact fixed-end actions. A stiffness step is not
 * a node: an element whose E I changes inside it works through its exact flexibility (see
 * `flexibility.ts`), so a short, very stiff piece adds a little flexibility instead of a huge
 * stiffness. The stiffness system is as small as the structure allows, however many loads and
 * steps there are, and neither a load nor a step makes a short, stiff element.
 *
 * Every array is working storage from the solve's {@link Scratch} that may be longer than needed
 * (index them; never read their length). None of them ends up in a result: the results copy what
 * they keep into storage of their own (see `recover.ts`).
 */
export interface BeamModel {
  /** Number of breakpoints (pieces + 1). */
  readonly nodes: number;
  /** Breakpoints, increasing; first 0, last the length (working storage: index it). */
  readonly x: Float64Array;
  /** Downward load intensity at the left and right end of each piece. */
  readonly wLeft: Float64Array;
  readonly wRight: Float64Array;
  /** Downward point force and counterclockwise couple applied at each breakpoint. */
  readonly force: Float64Array;
  readonly couple: Float64Array;
  /** E I of each piece. */
  readonly ei: Float64Array;
  /** Number of structural nodes (elements + 1). */
  readonly joints: number;
  /** Breakpoint index of each structural node, increasing; first 0, last `nodes - 1`. */
  readonly joint: Int32Array;
  /** 1 where the element's right end is released (a hinge at its right node). */
  readonly released: Uint8Array;
  /** 1 where the element has one E I throughout (closed-form stiffness); else its flexibility is in `flexibility`. */
  readonly uniform: Uint8Array;
  /** Per element, five numbers (see `elementFlexibility`); written only for elements that are not uniform. */
  readonly flexibility: Float64Array;
  /** Structural node of each support, by support index. */
  readonly supportNode: Int32Array;
  /** The loads that act, with their factors applied. */
  readonly loads: readonly Load[];
  /** True when two positions closer than the coincidence tolerance, but not equal, were merged into one breakpoint. */
  readonly merged: boolean;
}

/**
 * Index of the breakpoint nearest to `x` (breakpoints sorted), searching outwards from `hint`
 * (galloping, then bisection): O(1) when successive calls move forward in small steps, as
 * sorted loads and supports do, and O(log n) at worst.
 */
export function nodeIndex(nodes: Float64Array, count: number, x: number, hint = 0): number {
  let lo = hint < 0 ? 0 : hint > count - 2 ? Math.max(count - 2, 0) : hint;
  let hi: number;
  if ((nodes[lo] as number) <= x) {
    // gallop right until nodes[hi] > x
    let step = 1;
    hi = lo + 1;
    while (hi < count - 1 && (nodes[hi] as number) <= x) {
      lo = hi;
      hi = Math.min(hi + step, count - 1);
      step *= 2;
    }
  } else {
    // gallop left until nodes[lo] <= x
    let step = 1;
    hi = lo;
    lo = Math.max(lo - 1, 0);
    while (lo > 0 && (nodes[lo] as number) > x) {
      hi = lo;
      lo = Math.max(lo - step, 0);
      step *= 2;
    }
  }
  while (hi - lo > 1) {
    const mid = (lo + hi) >> 1;
    if ((nodes[mid] as number) <= x) lo = mid;
    else hi = mid;
  }
  return x - (nodes[lo] as number) <= (nodes[hi] as number) - x ? lo : hi;
}

/**
 * Sorts `a[0 .. count - 1]` ascending in place. Short lists by insertion; long ones by a natural
 * merge sort through `spare` (at least `count` long): the candidates arrive as a few sorted runs
 * (supports, hinges, steps, loads, each usually in order), so this is close to linear.
 */
function sortPrefix(a: Float64Array, count: number, spare: Float64Array): void {
  if (count <= 32) {
    for (let i = 1; i < count; i++) {
      const v = a[i] as number;
      let j = i - 1;
      while (j >= 0 && (a[j] as number) > v) {
        a[j + 1] = a[j] as number;
        j--;
      }
      a[j + 1] = v;
    }
    return;
  }
  let src = a;
  let dst = spare;
  for (;;) {
    // one pass: merge neighbouring ascending runs pairwise from src into dst
    let runs = 0;
    let i = 0;
    while (i < count) {
      let mid = i + 1;
      while (mid < count && (src[mid] as number) >= (src[mid - 1] as number)) mid++;
      let end = mid;
      if (mid < count) {
        end = mid + 1;
        while (end < count && (src[end] as number) >= (src[end - 1] as number)) end++;
      }
      let p = i;
      let q = mid;
      let k = i;
      while (p < mid && q < end) dst[k++] = (src[p] as number) <= (src[q] as number) ? (src[p++] as number) : (src[q++] as number);
      while (p < mid) dst[k++] = src[p++] as number;
      while (q < end) dst[k++] = src[q++] as number;
      runs++;
      i = end;
    }
    const t = src;
    src = dst;
    dst = t;
    if (runs <= 1) break;
  }
  if (src !== a) a.set(src.subarray(0, count));
}

function factored(loads: readonly Load[], options: SolveOptions | undefined): readonly Load[] {
  const factors = options?.factors;
  if (factors === undefined) return loads;
  const out: Load[] = [];
  for (const l of loads) {
    // own properties only: a case named "constructor" or "__proto__" is a case name, not Object.prototype's
    const name = l.case ?? DEFAULT_LOAD_CASE;
    const f = Object.prototype.hasOwnProperty.call(factors, name) ? (factors[name] as number) : 0;
    if (f === 0) continue;
    switch (l.kind) {
      case "point":
      case "couple":
        out.push({ ...l, value: l.value * f });
        break;
      case "distributed":
        out.push({ ...l, start: l.start * f, end: l.end * f });
        break;
      default:
        return l satisfies never;
    }
  }
  return out;
}

/** Set by {@link breakpoints}: true when it merged two positions that were close but not equal. */
let mergedInexact = false;

/** The sorted, merged breakpoints of a member: ends, supports, hinges, steps and load ends. */
function breakpoints(beam: BeamInput, loads: readonly Load[], scratch: Scratch): number {
  const length = beam.length;
  const hinges = beam.hinges ?? [];
  const steps = typeof beam.stiffness === "number" ? [] : beam.stiffness;
  let count = 2 + beam.supports.length + hinges.length + steps.length;
  for (const l of loads) count += l.kind === "distributed" ? 2 : 1;
  ensureRaw(scratch, count);
  const raw = scratch.raw;
  let k = 0;
  raw[k++] = 0;
  raw[k++] = length;
  for (const s of beam.supports) raw[k++] = s.at;
  for (const h of hinges) raw[k++] = h;
  for (const s of steps) raw[k++] = s.to;
  for (const l of loads) {
    if (l.kind === "distributed") {
      raw[k++] = l.from;
      raw[k++] = l.to;
    } else raw[k++] = l.at;
  }
  for (let i = 0; i < count; i++) raw[i] = Math.min(Math.max(raw[i] as number, 0), length);
  sortPrefix(raw, count, scratch.spare);
  // merge points closer than the tolerance; the last one is exactly the length
  const tol = SAME_POINT * length;
  let n = 1;
  mergedInexact = false;
  for (let i = 1; i < count; i++) {
    const gap = (raw[i] as number) - (raw[n - 1] as number);
    if (gap > tol) raw[n++] = raw[i] as number;
    else if (gap > 0) mergedInexact = true;
  }
  if (n === 1) n = 2;
  raw[n - 1] = length;
  return n;
}

/** Builds the pieces and elements of a validated member. */
export function buildModel(beam: BeamInput, options: SolveOptions | undefined, scratch: Scratch): BeamModel {
  const loads = factored(beam.loads ?? [], options);
  const hinges = beam.hinges ?? [];
  const steps = typeof beam.stiffness === "number" ? [] : beam.stiffness;
  const n = breakpoints(beam, loads, scratch);
  // the sorted, merged breakpoints stay in the scratch (the results copy them)
  const x = scratch.raw;
  ensureNodes(scratch, n, beam.supports.length);

  // structural nodes: mark them (2 = a hinge), then list them in order
  const mark = scratch.mark;
  mark[0] = 1;
  mark[n - 1] = 1;
  let hint = 0;
  const flag = (at: number, bit: number): void => {
    const i = (hint = nodeIndex(x, n, at, hint));
    mark[i] = (mark[i] as number) | bit;
  };
  for (const s of beam.supports) flag(s.at, 1);
  for (const h of hinges) flag(h, 2);
  const joint = scratch.joint;
  const jointOf = scratch.jointOf;
  let m = 0;
  for (let i = 0; i < n; i++) {
    if (mark[i] === 0) continue;
    jointOf[i] = m;
    joint[m++] = i;
  }
  const ei = scratch.ei;
  const released = scratch.released;
  for (let e = 0; e + 1 < m; e++) released[e] = ((mark[joint[e + 1] as number] as number) & 2) >> 1;
  if (typeof beam.stiffness === "number") for (let i = 0; i + 1 < n; i++) ei[i] = beam.stiffness;
  else {
    let s = 0;
    for (let i = 0; i + 1 < n; i++) {
      const mid = 0.5 * ((x[i] as number) + (x[i + 1] as number));
      while (s < steps.length - 1 && (steps[s] as { to: number }).to <= mid) s++;
      ei[i] = (steps[s] as { stiffness: number }).stiffness;
    }
  }

  const wLeft = scratch.wLeft;
  const wRight = scratch.wRight;
  const force = scratch.force;
  const couple = scratch.couple;
  for (const l of loads) {
    switch (l.kind) {
      case "point": {
        const i = (hint = nodeIndex(x, n, l.at, hint));
        force[i] = (force[i] as number) + l.value;
        break;
      }
      case "couple": {
        const i = (hint = nodeIndex(x, n, l.at, hint));
        couple[i] = (couple[i] as number) + l.value;
        break;
      }
      case "distributed": {
        const a = nodeIndex(x, n, l.from, hint);
        const b = (hint = nodeIndex(x, n, l.to, a));
        const slope = (l.end - l.start) / (l.to - l.from);
        for (let e = a; e < b; e++) {
          wLeft[e] = (wLeft[e] as number) + l.start + slope * ((x[e] as number) - l.from);
          wRight[e] = (wRight[e] as number) + (e + 1 === b ? l.end : l.start + slope * ((x[e + 1] as number) - l.from));
        }
        break;
      }
      default:
        return l satisfies never;
    }
  }

  const supportNode = scratch.supportNode;
  hint = 0;
  for (let i = 0; i < beam.supports.length; i++) {
    hint = nodeIndex(x, n, (beam.supports[i] as { at: number }).at, hint);
    supportNode[i] = jointOf[hint] as number;
  }
  const model = { nodes: n, x, wLeft, wRight, force, couple, ei, joints: m, joint, released, uniform: scratch.uniform, flexibility: scratch.flexibility, supportNode, loads, merged: mergedInexact };
  elementFlexibility(model);
  return model;
}
