import { DEFAULT_LOAD_CASE, type Load } from "../loads/index.js";
import { ensureNodes, ensureRaw, takeOutput, type Scratch } from "./scratch.js";
import type { BeamInput, SolveOptions } from "./types.js";
import { SAME_POINT } from "./validate.js";

/**
 * The discretised member: nodes at the ends, supports, hinges, stiffness steps and load points,
 * joined by elements of constant E I each carrying one linearly varying distributed load.
 * Apart from `x` and `output`, the arrays are working storage that may be longer than needed
 * (index them by node, element or support; never read their length).
 */
export interface BeamModel {
  /** Number of nodes. */
  readonly nodes: number;
  /** Node positions, increasing; first 0, last the length. */
  readonly x: Float64Array;
  /**
   * Storage for the results, allocated once per solve: `x` (the breakpoints) at its start, then
   * the coefficients of shear, moment, slope and deflection, 3, 4, 5 and 6 per element.
   */
  readonly output: Float64Array;
  /** E I of each element. */
  readonly ei: Float64Array;
  /** Downward load intensity at the left and right end of each element. */
  readonly wLeft: Float64Array;
  readonly wRight: Float64Array;
  /** 1 where the element's right end is released (a hinge at its right node). */
  readonly released: Uint8Array;
  /** Downward point force and counterclockwise couple applied at each node. */
  readonly force: Float64Array;
  readonly couple: Float64Array;
  /** Node of each support, by support index. */
  readonly supportNode: Int32Array;
  /** The loads that act, with their factors applied. */
  readonly loads: readonly Load[];
}

/** Index of the node nearest to `x` (nodes sorted). */
export function nodeIndex(nodes: Float64Array, count: number, x: number): number {
  let lo = 0;
  let hi = count - 1;
  while (hi - lo > 1) {
    const mid = (lo + hi) >> 1;
    if ((nodes[mid] as number) <= x) lo = mid;
    else hi = mid;
  }
  return x - (nodes[lo] as number) <= (nodes[hi] as number) - x ? lo : hi;
}

/** Sorts `a[0 .. count - 1]` ascending in place (insertion sort when short, the built-in sort otherwise). */
function sortPrefix(a: Float64Array, count: number): void {
  if (count > 32) {
    a.subarray(0, count).sort();
    return;
  }
  for (let i = 1; i < count; i++) {
    const v = a[i] as number;
    let j = i - 1;
    while (j >= 0 && (a[j] as number) > v) {
      a[j + 1] = a[j] as number;
      j--;
    }
    a[j + 1] = v;
  }
}

function factored(loads: readonly Load[], options: SolveOptions | undefined): readonly Load[] {
  const factors = options?.factors;
  if (factors === undefined) return loads;
  const out: Load[] = [];
  for (const l of loads) {
    const f = factors[l.case ?? DEFAULT_LOAD_CASE] ?? 0;
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

/** Builds the nodes and elements of a validated member. */
export function buildModel(beam: BeamInput, options: SolveOptions | undefined, scratch: Scratch): BeamModel {
  const length = beam.length;
  const loads = factored(beam.loads ?? [], options);
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
  sortPrefix(raw, count);
  // merge points closer than the tolerance; the last node is exactly the length
  const tol = SAME_POINT * length;
  let n = 1;
  for (let i = 1; i < count; i++) if ((raw[i] as number) - (raw[n - 1] as number) > tol) raw[n++] = raw[i] as number;
  if (n === 1) n = 2;
  raw[n - 1] = length;
  const elements = n - 1;
  const output = takeOutput(n + 18 * elements);
  for (let i = 0; i < n; i++) output[i] = raw[i] as number;
  const x = output.subarray(0, n);

  ensureNodes(scratch, n, beam.supports.length);
  const ei = scratch.ei;
  if (typeof beam.stiffness === "number") ei.fill(beam.stiffness, 0, elements);
  else {
    let s = 0;
    for (let e = 0; e < elements; e++) {
      const mid = 0.5 * ((x[e] as number) + (x[e + 1] as number));
      while (s < steps.length - 1 && (steps[s] as { to: number }).to <= mid) s++;
      ei[e] = (steps[s] as { stiffness: number }).stiffness;
    }
  }

  const released = scratch.released;
  for (const h of hinges) {
    const node = nodeIndex(x, n, h);
    released[node - 1] = 1;
  }

  const wLeft = scratch.wLeft;
  const wRight = scratch.wRight;
  const force = scratch.force;
  const couple = scratch.couple;
  for (const l of loads) {
    switch (l.kind) {
      case "point":
        {
        const i = nodeIndex(x, n, l.at);
        force[i] = (force[i] as number) + l.value;
        }
        break;
      case "couple":
        {
        const i = nodeIndex(x, n, l.at);
        couple[i] = (couple[i] as number) + l.value;
        }
        break;
      case "distributed": {
        const a = nodeIndex(x, n, l.from);
        const b = nodeIndex(x, n, l.to);
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
  for (let i = 0; i < beam.supports.length; i++) supportNode[i] = nodeIndex(x, n, (beam.supports[i] as { at: number }).at);
  return { nodes: n, x, output, ei, wLeft, wRight, released, force, couple, supportNode, loads };
}
