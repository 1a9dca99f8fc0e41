import { describeValue, requireFinite, type IssueCollector } from "../errors/index.js";

import { COINCIDENCE } from "../math/tolerance.js";

/**
 * How far past an end of the member a position may sit and still count as on it (relative to the
 * length): the coincidence tolerance of docs/tolerances.md, {@link COINCIDENCE}.
 */
export const POSITION_TOLERANCE = COINCIDENCE;

function inside(x: number, length: number): boolean {
  const slack = POSITION_TOLERANCE * length;
  return x >= -slack && x <= length + slack;
}

/**
 * Checks a list of loads against a member of the given length and records every problem:
 * `not-an-array`, `load-not-an-object`, `load-kind-unknown`, `not-a-number` / `not-finite` for
 * a bad number, `load-outside-member` for a position off the member, `load-extent-not-positive`
 * for a distributed load whose `to` is not after its `from`, and `load-case-not-a-string`.
 * Paths are `["loads", i, field]`. Pass a length that is not positive to skip position checks.
 *
 * @returns true when no problem was found.
 * @example
 * ```ts
 * const found = new IssueCollector();
 * validateLoads([{ kind: "point", at: 7, value: 1 }], 6, found); // false: load-outside-member
 * ```
 */
export function validateLoads(loads: unknown, length: number, found: IssueCollector): boolean {
  if (loads === undefined) return true;
  if (!Array.isArray(loads)) {
    found.add("not-an-array", ["loads"], `The loads must be a list; got ${describeValue(loads)}.`);
    return false;
  }
  const before = found.issues.length;
  const checkPositions = length > 0 && Number.isFinite(length);
  // Numbers that are fine are checked inline, so the usual, valid input allocates no paths or messages.
  for (let i = 0; i < loads.length; i++) {
    const l: unknown = loads[i];
    if (typeof l !== "object" || l === null) {
      found.add("load-not-an-object", ["loads", i], `Each load must be an object with a kind; got ${describeValue(l)}.`);
      continue;
    }
    const load = l as Record<string, unknown>;
    const kind = load["kind"];
    if (load["case"] !== undefined && typeof load["case"] !== "string")
      found.add("load-case-not-a-string", ["loads", i, "case"], `A load case must be a name (a string); got ${describeValue(load["case"])}.`);
    if (kind === "point" || kind === "couple") {
      const what = kind === "point" ? "point load" : "couple";
      const at = load["at"];
      const atOk = Number.isFinite(at) || requireFinite(found, at, ["loads", i, "at"], `${what} position`);
      if (!Number.isFinite(load["value"])) requireFinite(found, load["value"], ["loads", i, "value"], `${what} value`);
      if (atOk && checkPositions && !inside(at as number, length))
        found.add("load-outside-member", ["loads", i, "at"], `The ${what} at x = ${String(at)} lies off the member, which runs from 0 to ${length}.`, {
          at,
          length,
        });
    } else if (kind === "distributed") {
      const from = load["from"];
      const to = load["to"];
      const fromOk = Number.isFinite(from) || requireFinite(found, from, ["loads", i, "from"], "start position of the distributed load");
      const toOk = Number.isFinite(to) || requireFinite(found, to, ["loads", i, "to"], "end position of the distributed load");
      if (!Number.isFinite(load["start"])) requireFinite(found, load["start"], ["loads", i, "start"], "intensity at the start of the distributed load");
      if (!Number.isFinite(load["end"])) requireFinite(found, load["end"], ["loads", i, "end"], "intensity at the end of the distributed load");
      if (fromOk && toOk && !((to as number) > (from as number)))
        found.add("load-extent-not-positive", ["loads", i, "to"], `A distributed load must end after it starts; got from = ${from as number}, to = ${to as number}.`, { from, to });
      if (fromOk && checkPositions && !inside(from as number, length))
        found.add("load-outside-member", ["loads", i, "from"], `The distributed load starts at x = ${from as number}, off the member, which runs from 0 to ${length}.`, { at: from, length });
      if (toOk && checkPositions && !inside(to as number, length))
        found.add("load-outside-member", ["loads", i, "to"], `The distributed load ends at x = ${to as number}, off the member, which runs from 0 to ${length}.`, { at: to, length });
    } else {
      found.add("load-kind-unknown", ["loads", i, "kind"], `Unknown load kind ${describeValue(kind)}; use "point", "couple" or "distributed".`, { kind: describeValue(kind) });
    }
  }
  return found.issues.length === before;
}
