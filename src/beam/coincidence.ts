import type { Load } from "../loads/index.js";
import type { BeamInput, BeamNote } from "./types.js";
import { SAME_POINT } from "./validate.js";

/** A structural point of the input: a support, a hinge or the start of a stiffness stretch. */
interface Point {
  readonly at: number;
  readonly path: readonly (string | number)[];
  readonly what: string;
}

/**
 * Notes for the structural points (supports, hinges, stiffness steps, the ends) that lie within
 * the coincidence tolerance of each other without being equal: the solver treats them as one
 * point, and the note says so. (Two supports, or two hinges, that close are refused by validation
 * as duplicates before this runs.)
 */
export function mergeNotes(beam: BeamInput): BeamNote[] {
  const tol = SAME_POINT * beam.length;
  const points: Point[] = [
    { at: 0, path: ["length"], what: "the left end" },
    { at: beam.length, path: ["length"], what: "the right end" },
  ];
  beam.supports.forEach((s, i) => points.push({ at: s.at, path: ["supports", i], what: `the ${s.kind} support` }));
  (beam.hinges ?? []).forEach((h, i) => points.push({ at: h, path: ["hinges", i], what: "the hinge" }));
  if (typeof beam.stiffness !== "number")
    beam.stiffness.forEach((s, i) => {
      if (i > 0) points.push({ at: s.from, path: ["stiffness", i, "from"], what: "the stiffness step" });
    });
  points.sort((a, b) => a.at - b.at);
  const out: BeamNote[] = [];
  for (let i = 1; i < points.length; i++) {
    const a = points[i - 1] as Point;
    const b = points[i] as Point;
    const gap = b.at - a.at;
    if (gap > 0 && gap <= tol)
      out.push(
        Object.freeze({
          code: "points-merged",
          message: `${cap(b.what)} at x = ${b.at} is ${gap.toExponential(2)} from ${a.what} at x = ${a.at}, closer than the coincidence tolerance (${SAME_POINT} of the length): they are solved as one point.`,
          at: a.at,
          path: Object.freeze([...b.path]),
        }),
      );
  }
  return out;
}

function cap(s: string): string {
  return s.charAt(0).toUpperCase() + s.slice(1);
}

/**
 * The loads with every distributed load narrower than the coincidence tolerance replaced by its
 * resultant, a point load at its centroid (the breakpoints could not resolve it, and it would be
 * lost), with a note for each. Returns the loads unchanged (the same array) when none is that narrow.
 */
export function narrowLoadsAsPoints(loads: readonly Load[], length: number, notes: BeamNote[], indices?: readonly number[]): readonly Load[] {
  const tol = SAME_POINT * length;
  let out: Load[] | undefined;
  for (let i = 0; i < loads.length; i++) {
    const l = loads[i] as Load;
    if (l.kind !== "distributed" || l.to - l.from > tol) {
      out?.push(l);
      continue;
    }
    out ??= loads.slice(0, i);
    const h = l.to - l.from;
    const force = 0.5 * (l.start + l.end) * h;
    // centroid of a trapezoid from its start: h (start + 2 end) / (3 (start + end)); the middle when the resultant vanishes
    const sum = l.start + l.end;
    const at = sum === 0 ? l.from + h / 2 : Math.min(Math.max(l.from + (h * (l.start + 2 * l.end)) / (3 * sum), l.from), l.to);
    const point: Load = l.case === undefined ? { kind: "point", at, value: force } : { kind: "point", at, value: force, case: l.case };
    out.push(point);
    notes.push(
      Object.freeze({
        code: "load-as-point",
        message: `The distributed load from x = ${l.from} to x = ${l.to} is narrower than the coincidence tolerance (${SAME_POINT} of the length): it acts as its resultant, a point load of ${force} at x = ${at}.`,
        at,
        path: Object.freeze(["loads", indices?.[i] ?? i]),
      }),
    );
  }
  return out ?? loads;
}
