import { describeValue, requireFinite, type IssueCollector } from "../errors/index.js";

import { COINCIDENCE } from "../math/tolerance.js";

/** How far past an end of the member a support may sit and still count as on it, and how close two supports may be (relative to the length). */
const POSITION_TOLERANCE = COINCIDENCE;

const KINDS = new Set(["pin", "roller", "fixed", "guided", "spring"]);

function positive(found: IssueCollector, value: unknown, path: readonly (string | number)[], what: string, code: string): void {
  if (requireFinite(found, value, path, what) && !(value > 0))
    found.add(code, path, `The ${what} must be positive; got ${value}.`, { value });
}

/**
 * Checks a list of supports on a member of the given length and records every problem:
 * `not-an-array`, `support-not-an-object`, `support-kind-unknown`, `not-a-number` / `not-finite`,
 * `support-outside-member`, `spring-stiffness-not-positive`, `spring-without-stiffness`,
 * `support-field-not-applicable` (stiffness on a rigid support, settlement where deflection is
 * free, rotation where rotation is free), and `support-duplicate` for two supports at the same point.
 * Paths are `["supports", i, field]`. Pass a length that is not positive to skip position checks.
 *
 * @returns true when no problem was found.
 * @example
 * ```ts
 * const found = new IssueCollector();
 * validateSupports([{ kind: "pin", at: 0 }, { kind: "roller", at: 0 }], 6, found); // false: support-duplicate
 * ```
 */
export function validateSupports(supports: unknown, length: number, found: IssueCollector): boolean {
  if (supports === undefined) return true;
  if (!Array.isArray(supports)) {
    found.add("not-an-array", ["supports"], `The supports must be a list; got ${describeValue(supports)}.`);
    return false;
  }
  const before = found.issues.length;
  const checkPositions = length > 0 && Number.isFinite(length);
  // positions of the supports, in input order, and whether they come sorted (they usually do)
  const seen: { at: number; index: number }[] = [];
  let inOrder = true;
  let previous = -Infinity;
  for (let i = 0; i < supports.length; i++) {
    const raw: unknown = supports[i];
    if (typeof raw !== "object" || raw === null) {
      found.add("support-not-an-object", ["supports", i], `Each support must be an object with a kind; got ${describeValue(raw)}.`);
      continue;
    }
    const s = raw as Record<string, unknown>;
    const kind = s["kind"];
    if (typeof kind !== "string" || !KINDS.has(kind)) {
      found.add("support-kind-unknown", ["supports", i, "kind"], `Unknown support kind ${describeValue(kind)}; use "pin", "roller", "fixed", "guided" or "spring".`, {
        kind: describeValue(kind),
      });
      continue;
    }
    const at = s["at"];
    if (Number.isFinite(at) || requireFinite(found, at, ["supports", i, "at"], "support position")) {
      const x = at as number;
      if (checkPositions && !(x >= -POSITION_TOLERANCE * length && x <= length * (1 + POSITION_TOLERANCE)))
        found.add("support-outside-member", ["supports", i, "at"], `The ${kind} support at x = ${x} lies off the member, which runs from 0 to ${length}.`, { at: x, length });
      if (x < previous) inOrder = false;
      previous = x;
      seen.push({ at: x, index: i });
    }
    const hasK = s["stiffness"] !== undefined;
    const hasKr = s["rotationalStiffness"] !== undefined;
    if (kind === "spring") {
      if (hasK) positive(found, s["stiffness"], ["supports", i, "stiffness"], "spring stiffness", "spring-stiffness-not-positive");
      if (hasKr) positive(found, s["rotationalStiffness"], ["supports", i, "rotationalStiffness"], "rotational spring stiffness", "spring-stiffness-not-positive");
      if (!hasK && !hasKr)
        found.add("spring-without-stiffness", ["supports", i], "A spring support needs a stiffness (force per length), a rotationalStiffness (moment per radian), or both.");
    } else if (hasK || hasKr) {
      for (const field of ["stiffness", "rotationalStiffness"] as const)
        if (s[field] !== undefined)
          found.add("support-field-not-applicable", ["supports", i, field], `A ${kind} support is rigid and takes no ${field}; use a spring support for an elastic one.`);
    }
    const holdsDeflection = kind === "pin" || kind === "roller" || kind === "fixed" || (kind === "spring" && hasK);
    const holdsRotation = kind === "fixed" || kind === "guided" || (kind === "spring" && hasKr);
    if (s["settlement"] !== undefined) {
      if (!holdsDeflection)
        found.add("support-field-not-applicable", ["supports", i, "settlement"], `A ${kind} support${kind === "spring" ? " without a stiffness" : ""} does not hold deflection, so it cannot settle.`);
      else if (!Number.isFinite(s["settlement"])) requireFinite(found, s["settlement"], ["supports", i, "settlement"], "settlement");
    }
    if (s["rotation"] !== undefined) {
      if (!holdsRotation)
        found.add("support-field-not-applicable", ["supports", i, "rotation"], `A ${kind} support${kind === "spring" ? " without a rotationalStiffness" : ""} does not hold rotation, so it cannot impose one.`);
      else if (!Number.isFinite(s["rotation"])) requireFinite(found, s["rotation"], ["supports", i, "rotation"], "prescribed rotation");
    }
  }
  // duplicates: sort by position (already so when the input is in order), compare neighbours
  if (!inOrder) seen.sort((a, b) => a.at - b.at || a.index - b.index);
  const close = POSITION_TOLERANCE * (checkPositions ? length : 1);
  for (let k = 1; k < seen.length; k++) {
    const a = seen[k - 1] as { at: number; index: number };
    const b = seen[k] as { at: number; index: number };
    if (Math.abs(b.at - a.at) <= close) {
      const [first, second] = a.index < b.index ? [a, b] : [b, a];
      found.add("support-duplicate", ["supports", second.index, "at"], `Supports ${first.index} and ${second.index} are at the same point, x = ${second.at} (closer than ${POSITION_TOLERANCE} of the length, the coincidence tolerance); combine them into one support.`, {
        at: second.at,
        other: first.index,
      });
    }
  }
  return found.issues.length === before;
}
