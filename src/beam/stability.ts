import { FlexuraError, issue } from "../errors/index.js";
import { restrainsAxis, restrainsDeflection, restrainsRotation, type Support } from "../supports/index.js";
import type { BeamWarning } from "./types.js";
import { SAME_POINT } from "./validate.js";

/** A rigid-body motion of one part: deflection at its left end and rotation times its length. */
type Motion = readonly [number, number];

/** Two rigid-body motions are independent unless their dot product is below this fraction of their sizes (a property of 2-vectors, not a position). */
const TOL = 1e-9;

function mechanism(reason: string, path: readonly (string | number)[], message: string, details: Record<string, unknown>): never {
  throw new FlexuraError([issue("mechanism", path, message, { reason, ...details })]);
}

/**
 * Checks, before any arithmetic on stiffness, that the supports and hinges hold the member in
 * bending: no part between hinges may move as a rigid body. The member is a chain of rigid parts
 * joined at hinges; each support removes motions of its part, and a hinge passes on only the
 * deflection of its point. Springs count as supports.
 *
 * A member that no support holds along its axis (rollers and springs only) is not a bending
 * mechanism: first-order bending carries no axial force, so it is solved, with a
 * `no-horizontal-restraint` warning (returned), after the bending checks, so that a real
 * mechanism is always reported by its own cause.
 *
 * @returns the warnings (none, or `no-horizontal-restraint`).
 * @throws FlexuraError `mechanism` (with `reason`, `from`, `to`).
 */
export function checkStability(length: number, supports: readonly Support[], hinges: readonly number[]): BeamWarning[] {
  if (supports.length === 0)
    mechanism("no-supports", ["supports"], "The member has no supports and would move freely: add a pin and a roller, or one fixed support.", { from: 0, to: length });
  if (!supports.some(restrainsDeflection))
    mechanism(
      "no-deflection-restraint",
      ["supports"],
      "No support holds deflection (guided supports and rotational springs let the member move up and down): add a pin, roller, fixed support or translational spring.",
      { from: 0, to: length },
    );
  const order = hinges.length === 0 ? [] : hinges.map((at, index) => ({ at, index })).sort((a, b) => a.at - b.at);
  const sorted = inOrder(supports) ? supports : [...supports].sort((a, b) => a.at - b.at);
  const close = SAME_POINT * length;
  let allowed: Motion[] = [
    [1, 0],
    [0, 1],
  ];
  let s = 0;
  // where the chain of parts whose motions are linked begins
  let chainStart = 0;
  for (let p = 0; p <= order.length; p++) {
    const a = p === 0 ? 0 : (order[p - 1] as { at: number }).at;
    const b = p === order.length ? length : (order[p] as { at: number }).at;
    const span = b - a;
    const last = p === order.length;
    // supports within the part: deflection up to and including the hinge at b, rotation before it
    while (s < sorted.length && (sorted[s] as Support).at <= b + close) {
      const sup = sorted[s] as Support;
      const atHinge = !last && Math.abs(sup.at - b) <= close;
      if (restrainsDeflection(sup)) allowed = restrict(allowed, [1, (sup.at - a) / span]);
      if (restrainsRotation(sup) && !atHinge) allowed = restrict(allowed, [0, 1]);
      if (atHinge) break; // its rotational restraint belongs to the next part
      s++;
    }
    if (last) {
      if (allowed.length > 0) {
        const why =
          order.length === 0
            ? `The member can turn about its only support that holds deflection: add a second support or make one of them fixed.`
            : `The part between x = ${chainStart} and x = ${b} can move, turning at its hinges: add a support to it, or remove a hinge.`;
        mechanism(order.length === 0 ? "free-to-rotate" : "hinge", order.length === 0 ? ["supports"] : ["hinges", (order[p - 1] as { index: number }).index], why, {
          from: chainStart,
          to: b,
        });
      }
      return axialWarnings(supports);
    }
    // the hinge at b passes on only the deflection of its point: (v, theta*span) -> v + theta*span
    const hingeIndex = (order[p] as { index: number }).index;
    if (allowed.length === 2 || (allowed.length === 1 && Math.abs(dot(allowed[0] as Motion, [1, 1])) <= TOL * norm(allowed[0] as Motion)))
      mechanism("hinge", ["hinges", hingeIndex], `The part between x = ${chainStart} and the hinge at x = ${b} can turn about the hinge: add a support to it, or remove the hinge.`, {
        from: chainStart,
        to: b,
      });
    if (allowed.length === 0) chainStart = b;
    allowed =
      allowed.length === 0
        ? [[0, 1]]
        : [
            [1, 0],
            [0, 1],
          ];
  }
  return axialWarnings(supports);
}

/** The `no-horizontal-restraint` warning when no support holds the member along its axis. */
function axialWarnings(supports: readonly Support[]): BeamWarning[] {
  if (supports.some(restrainsAxis)) return [];
  return [
    Object.freeze({
      code: "no-horizontal-restraint",
      message:
        "No support holds the member along its axis (rollers and springs only). The bending results stand, since first-order bending carries no axial force, but any axial load or friction would need a pin, fixed or guided support.",
    }),
  ];
}

/** True when the supports come sorted by position (the usual case: no copy or sort needed). */
function inOrder(supports: readonly Support[]): boolean {
  for (let i = 1; i < supports.length; i++) if ((supports[i] as Support).at < (supports[i - 1] as Support).at) return false;
  return true;
}

function dot(u: Motion, f: Motion): number {
  return u[0] * f[0] + u[1] * f[1];
}

function norm(u: Motion): number {
  return Math.sqrt(u[0] * u[0] + u[1] * u[1]);
}

/** The motions in `allowed` that satisfy f . u = 0. */
function restrict(allowed: Motion[], f: Motion): Motion[] {
  if (allowed.length === 2) return [[-f[1], f[0]]];
  if (allowed.length === 1) {
    const u = allowed[0] as Motion;
    return Math.abs(dot(u, f)) <= TOL * norm(u) * norm(f) ? allowed : [];
  }
  return allowed;
}
