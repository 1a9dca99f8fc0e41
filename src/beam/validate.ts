import { IssueCollector, describeValue, requireFinite } from "../errors/index.js";
import { validateLoads } from "../loads/index.js";
import { validateSupports } from "../supports/index.js";
import { restrainsRotation } from "../supports/index.js";
import type { BeamInput, SolveOptions } from "./types.js";

import { COINCIDENCE } from "../math/tolerance.js";

/** Positions closer than this (relative to the length) are the same point of the member: the coincidence tolerance of docs/tolerances.md. */
export const SAME_POINT = COINCIDENCE;

function validateStiffness(stiffness: unknown, length: number, found: IssueCollector): void {
  if (typeof stiffness === "number" || !Array.isArray(stiffness)) {
    if ((Number.isFinite(stiffness) || requireFinite(found, stiffness, ["stiffness"], "bending stiffness E I")) && !((stiffness as number) > 0))
      found.add("stiffness-not-positive", ["stiffness"], `The bending stiffness E I must be positive; got ${stiffness as number}.`, { value: stiffness });
    return;
  }
  if (stiffness.length === 0) {
    found.add("stiffness-not-tiling", ["stiffness"], "A stepped stiffness needs at least one stretch { from, to, stiffness }.");
    return;
  }
  const tol = SAME_POINT * (length > 0 ? length : 1);
  let previousEnd = 0;
  let ok = true;
  for (let i = 0; i < stiffness.length; i++) {
    const seg: unknown = stiffness[i];
    const path = ["stiffness", i] as const;
    if (typeof seg !== "object" || seg === null) {
      found.add("stiffness-not-tiling", path, `Each stretch must be an object { from, to, stiffness }; got ${describeValue(seg)}.`);
      ok = false;
      continue;
    }
    const s = seg as Record<string, unknown>;
    const fromOk = requireFinite(found, s["from"], [...path, "from"], "start of the stretch");
    const toOk = requireFinite(found, s["to"], [...path, "to"], "end of the stretch");
    if (requireFinite(found, s["stiffness"], [...path, "stiffness"], "bending stiffness E I") && !((s["stiffness"]) > 0))
      found.add("stiffness-not-positive", [...path, "stiffness"], `The bending stiffness E I must be positive; got ${String(s["stiffness"])}.`, { value: s["stiffness"] });
    if (!fromOk || !toOk) {
      ok = false;
      continue;
    }
    const from = s["from"] as number;
    const to = s["to"] as number;
    if (ok && Math.abs(from - previousEnd) > tol) {
      found.add("stiffness-not-tiling", [...path, "from"], `Stretch ${i} starts at x = ${from} but the previous one ends at x = ${previousEnd}; the stretches must cover the member in order without gaps or overlaps.`, {
        at: from,
        expected: previousEnd,
      });
      ok = false;
    }
    if (!(to > from)) {
      found.add("stiffness-not-tiling", [...path, "to"], `Stretch ${i} must end after it starts; got from = ${from}, to = ${to}.`, { from, to });
      ok = false;
    }
    previousEnd = to;
  }
  if (ok && length > 0 && Math.abs(previousEnd - length) > tol)
    found.add("stiffness-not-tiling", ["stiffness", stiffness.length - 1, "to"], `The last stretch ends at x = ${previousEnd} but the member is ${length} long.`, {
      at: previousEnd,
      length,
    });
}

function validateHinges(hinges: unknown, length: number, found: IssueCollector): void {
  if (hinges === undefined) return;
  if (!Array.isArray(hinges)) {
    found.add("not-an-array", ["hinges"], `The hinges must be a list of positions; got ${describeValue(hinges)}.`);
    return;
  }
  const tol = SAME_POINT * length;
  const seen: { at: number; index: number }[] = [];
  for (let i = 0; i < hinges.length; i++) {
    const at: unknown = hinges[i];
    if (!requireFinite(found, at, ["hinges", i], "hinge position") || !(length > 0)) continue;
    if (at < -tol || at > length + tol)
      found.add("hinge-outside-member", ["hinges", i], `The hinge at x = ${at} lies off the member, which runs from 0 to ${length}.`, { at, length });
    else if (at <= tol || at >= length - tol)
      found.add("hinge-at-member-end", ["hinges", i], `A hinge at the end of the member (x = ${at}) releases nothing; use a pin or roller support there, or leave the end free.`, { at });
    else seen.push({ at, index: i });
  }
  seen.sort((a, b) => a.at - b.at);
  for (let k = 1; k < seen.length; k++) {
    const a = seen[k - 1] as { at: number; index: number };
    const b = seen[k] as { at: number; index: number };
    if (b.at - a.at <= tol) found.add("hinge-duplicate", ["hinges", Math.max(a.index, b.index)], `Two hinges are at x = ${b.at}; list each hinge once.`, { at: b.at });
  }
}

/**
 * Checks a member and solve options, collecting every problem, and throws them all at once.
 *
 * @throws FlexuraError with the codes listed in docs/beam.md.
 */
export function validateBeam(beam: unknown, options: SolveOptions | undefined): void {
  const found = new IssueCollector();
  if (typeof beam !== "object" || beam === null) {
    found.add("beam-not-an-object", [], `The member must be an object { length, stiffness, supports, loads }; got ${describeValue(beam)}.`);
    found.throwIfAny();
    return;
  }
  const b = beam as Record<string, unknown>;
  let length = Number.NaN;
  if (Number.isFinite(b["length"]) || requireFinite(found, b["length"], ["length"], "member length")) {
    length = b["length"] as number;
    if (!(length > 0)) found.add("length-not-positive", ["length"], `The member length must be positive; got ${length}.`, { length });
  }
  validateStiffness(b["stiffness"], length, found);
  if (b["supports"] === undefined) found.add("not-an-array", ["supports"], "The member needs a list of supports.");
  else validateSupports(b["supports"], length, found);
  validateHinges(b["hinges"], length, found);
  validateLoads(b["loads"], length, found);
  const factors = options?.factors;
  if (factors !== undefined) {
    if (typeof factors !== "object" || factors === null) found.add("not-an-object", ["factors"], `The factors must map case names to numbers; got ${describeValue(factors)}.`);
    else for (const [name, value] of Object.entries(factors)) requireFinite(found, value, ["factors", name], `factor of load case "${name}"`);
  }
  if (found.empty) checkHingeNeighbours(beam as unknown as BeamInput, found);
  found.throwIfAny();
}

/**
 * A rotational restraint or a couple exactly at a hinge is ambiguous (which side does it act
 * on?): ask for it to be placed to one side.
 */
function checkHingeNeighbours(beam: BeamInput, found: IssueCollector): void {
  if (beam.hinges === undefined || beam.hinges.length === 0) return;
  const hinges = [...beam.hinges].sort((a, b) => a - b);
  const tol = SAME_POINT * beam.length;
  const atHinge = (x: number): boolean => {
    let lo = 0;
    let hi = hinges.length - 1;
    while (lo < hi) {
      const mid = (lo + hi) >> 1;
      if ((hinges[mid] as number) < x - tol) lo = mid + 1;
      else hi = mid;
    }
    return Math.abs((hinges[lo] as number) - x) <= tol;
  };
  beam.supports.forEach((s, i) => {
    if (restrainsRotation(s) && atHinge(s.at))
      found.add("hinge-at-rotational-support", ["supports", i, "at"], `The ${s.kind} support at x = ${s.at} holds rotation at a hinge, so it is unclear which side it holds: move the hinge or the support slightly to one side.`, { at: s.at });
  });
  (beam.loads ?? []).forEach((l, i) => {
    if (l.kind === "couple" && atHinge(l.at))
      found.add("couple-at-hinge", ["loads", i, "at"], `The couple at x = ${l.at} sits on a hinge, so it is unclear which side it turns: move it slightly to one side.`, { at: l.at });
  });
}
