import { describeValue, requireFinite, type IssueCollector } from "../errors/index.js";

/** How far past an end of the member a position may sit and still count as on it (relative to the length). */
export const POSITION_TOLERANCE = 1e-12;

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
  for (let i = 0; i < loads.length; i++) {
    const l: unknown = loads[i];
    const path = ["loads", i] as const;
    if (typeof l !== "object" || l === null) {
      found.add("load-not-an-object", path, `Each load must be an object with a kind; got ${describeValue(l)}.`);
      continue;
    }
    const load = l as Record<string, unknown>;
    const kind = load["kind"];
    if (load["case"] !== undefined && typeof load["case"] !== "string")
      found.add("load-case-not-a-string", [...path, "case"], `A load case must be a name (a string); got ${describeValue(load["case"])}.`);
    if (kind === "point" || kind === "couple") {
      const what = kind === "point" ? "point load" : "couple";
      const atOk = requireFinite(found, load["at"], [...path, "at"], `${what} position`);
      requireFinite(found, load["value"], [...path, "value"], `${what} value`);
      if (atOk && checkPositions && !inside(load["at"] as number, length))
        found.add("load-outside-member", [...path, "at"], `The ${what} at x = ${String(load["at"])} lies off the member, which runs from 0 to ${length}.`, {
          at: load["at"],
          length,
        });
    } else if (kind === "distributed") {
      const fromOk = requireFinite(found, load["from"], [...path, "from"], "start position of the distributed load");
      const toOk = requireFinite(found, load["to"], [...path, "to"], "end position of the distributed load");
      requireFinite(found, load["start"], [...path, "start"], "intensity at the start of the distributed load");
      requireFinite(found, load["end"], [...path, "end"], "intensity at the end of the distributed load");
      const from = load["from"] as number;
      const to = load["to"] as number;
      if (fromOk && toOk && !(to > from))
        found.add("load-extent-not-positive", [...path, "to"], `A distributed load must end after it starts; got from = ${from}, to = ${to}.`, { from, to });
      if (fromOk && checkPositions && !inside(from, length))
        found.add("load-outside-member", [...path, "from"], `The distributed load starts at x = ${from}, off the member, which runs from 0 to ${length}.`, { at: from, length });
      if (toOk && checkPositions && !inside(to, length))
        found.add("load-outside-member", [...path, "to"], `The distributed load ends at x = ${to}, off the member, which runs from 0 to ${length}.`, { at: to, length });
    } else {
      found.add("load-kind-unknown", [...path, "kind"], `Unknown load kind ${describeValue(kind)}; use "point", "couple" or "distributed".`, { kind: describeValue(kind) });
    }
  }
  return found.issues.length === before;
}
