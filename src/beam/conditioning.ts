import { FlexuraError, issue, type IssuePath } from "../errors/index.js";
import type { Support } from "../supports/index.js";
import type { BeamModel } from "./model.js";
import { SAME_POINT } from "./validate.js";

/**
 * A piece between structural nodes shorter than this fraction of the member is "short": its
 * stiffness grows as 1 / length^3, so float64 cannot add it to the rest of the member's without
 * losing the rest's digits when the deflection at one of its ends is free.
 */
export const SHORT_PIECE = 1e-3;

/**
 * A piece shorter than this fraction of the member, between two points whose deflections are not
 * both held by rigid supports (pin, roller, fixed), is refused before any arithmetic: float64
 * loses about (length / piece)^2 times its rounding there (measured: a hinge 1e-7 of the span
 * beside a roller moved a reaction by 2 %, one 1e-5 away by 1e-5).
 */
export const SHORT_FREE_PIECE = 1e-5;

/**
 * Refuses, before the solve, a member with a piece shorter than {@link SHORT_FREE_PIECE} of its
 * length whose end deflections are not both rigidly held (a hinge or spring a hair from a support,
 * a free end a hair beyond one). Points closer than the coincidence tolerance were merged already.
 *
 * @throws FlexuraError `ill-conditioned` with `from`, `to` and the path of the point to move.
 */
export function refuseShortFreePieces(model: BeamModel, supports: readonly Support[], hinges: readonly number[], held: Uint8Array): void {
  const length = (model.x[model.nodes - 1] as number) - (model.x[0] as number);
  for (let j = 0; j < model.joints; j++) held[j] = 0;
  for (let s = 0; s < supports.length; s++) {
    const kind = (supports[s] as Support).kind;
    if (kind === "pin" || kind === "roller" || kind === "fixed") held[model.supportNode[s] as number] = 1;
  }
  for (let e = 0; e + 1 < model.joints; e++) {
    const from = model.x[model.joint[e] as number] as number;
    const to = model.x[model.joint[e + 1] as number] as number;
    if (!(to - from < SHORT_FREE_PIECE * length) || (held[e] === 1 && held[e + 1] === 1)) continue;
    const [path, what] = pointAt(to, supports, hinges, length) ?? pointAt(from, supports, hinges, length) ?? [["supports"] as IssuePath, "the support"];
    throw new FlexuraError([
      issue(
        "ill-conditioned",
        path,
        `The piece from x = ${from} to x = ${to} is only ${((to - from) / length).toExponential(1)} of the length, and the deflection at one of its ends is not held by a rigid support: float64 cannot solve so short a piece together with the rest of the member (it would lose about ${Math.min(16, Math.round(2 * Math.log10(length / (to - from))))} of 16 digits). Move ${what} onto the point beside it (within ${SAME_POINT} of the length they are merged), or at least ${SHORT_FREE_PIECE} of the length from it.`,
        { from, to },
      ),
    ]);
  }
}

/**
 * When the factorisation lost nearly every digit at structural node `node`, and one of the
 * elements meeting there is short (below {@link SHORT_PIECE} of the length), refuses the member
 * with an `ill-conditioned` error naming that piece and the points at its ends: the cause is two
 * points too close together, not a mechanism. Returns when no short piece is there.
 *
 * @throws FlexuraError `ill-conditioned` with `from`, `to` and the path of the point to move.
 */
export function refuseShortPiece(model: BeamModel, supports: readonly Support[], hinges: readonly number[], node: number, pivotRatio: number): void {
  const length = (model.x[model.nodes - 1] as number) - (model.x[0] as number);
  let best = -1;
  let shortest = Infinity;
  for (const e of [node - 1, node]) {
    if (e < 0 || e >= model.joints - 1) continue;
    const h = (model.x[model.joint[e + 1] as number] as number) - (model.x[model.joint[e] as number] as number);
    if (h < shortest) {
      shortest = h;
      best = e;
    }
  }
  if (best < 0 || !(shortest < SHORT_PIECE * length)) return;
  const from = model.x[model.joint[best] as number] as number;
  const to = model.x[model.joint[best + 1] as number] as number;
  const [path, what] = pointAt(to, supports, hinges, length) ?? pointAt(from, supports, hinges, length) ?? [["supports"] as IssuePath, "a point"];
  throw new FlexuraError([
    issue(
      "ill-conditioned",
      path,
      `The piece from x = ${from} to x = ${to} is only ${(shortest / length).toExponential(1)} of the length, between points whose deflection is not both held: its stiffness is so much larger than the rest of the member's that float64 cannot solve them together (about ${Math.max(0, Math.round(-Math.log10(Math.max(pivotRatio, 1e-16))))} of 16 digits lost). Move ${what} onto the point beside it (within ${SAME_POINT} of the length they are merged), or further from it.`,
      { from, to, pivotRatio },
    ),
  ]);
}

/** The hinge or support at `x` (not an end), as a path and a name. */
function pointAt(x: number, supports: readonly Support[], hinges: readonly number[], length: number): [IssuePath, string] | undefined {
  const tol = SAME_POINT * length;
  const h = hinges.findIndex((at) => Math.abs(at - x) <= tol);
  if (h >= 0) return [["hinges", h], `the hinge at x = ${hinges[h] as number}`];
  const s = supports.findIndex((p) => Math.abs(p.at - x) <= tol);
  if (s >= 0 && x > tol && x < length - tol) return [["supports", s, "at"], `the ${(supports[s] as Support).kind} support at x = ${(supports[s] as Support).at}`];
  return undefined;
}
