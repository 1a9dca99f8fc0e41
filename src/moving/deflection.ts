import type { BeamInput, BeamSpan } from "../beam/index.js";
import { attempt, describeValue, fail, type Result } from "../errors/index.js";
import { coincidenceTolerance } from "../math/index.js";
import { influenceLine, prepared } from "./influence.js";
import { laidOutFor, worstOnLine, type TrainPlacement } from "./placement.js";
import type { Train, TrainOptions } from "./train.js";
import type { MemberInfluence } from "./types.js";

/**
 * The deflection limit under the moving load, given by the user (there is no default): `span / ratio`
 * (for example 600 for a light crane runway, 800 to 1000 for heavier cranes: common practice,
 * the governing specification decides), or an absolute value in length units.
 */
export type MovingDeflectionLimit = DeflectionRatioLimit | DeflectionAbsoluteLimit;

/** A deflection limit of span / ratio. */
export interface DeflectionRatioLimit {
  /** The ratio n of span / n, positive (600 for span / 600). */
  readonly ratio: number;
}

/** A deflection limit as a length. */
export interface DeflectionAbsoluteLimit {
  /** The limit (length units), positive. */
  readonly absolute: number;
}

/** The deflection check at one point under the moving load. */
export interface MovingDeflectionCheck {
  /** The point (length units). */
  readonly at: number;
  /** The span (or cantilever) holding the point, whose length `ratio` divides. */
  readonly span: BeamSpan;
  /** The largest deflection at the point as a magnitude (length units), downward or upward, whichever is larger. */
  readonly demand: number;
  /** Its sense: `"down"` or `"up"`. */
  readonly sense: "down" | "up";
  /** The limit (length units). */
  readonly limit: number;
  /** demand / limit. */
  readonly utilisation: number;
  /** utilisation <= 1. */
  readonly pass: boolean;
  /** Where the train stands for the demand. */
  readonly placement: TrainPlacement;
}

/**
 * The deflection at chosen points under a moving train against the user's limit, exact at each
 * point (the worst placement of the train on the point's deflection line). The points are the
 * user's choice (for example each span's middle, or the points of largest deflection under a
 * standing train).
 *
 * @throws FlexuraError `deflection-limit-missing` (no limit: there is no default),
 *   `deflection-limit-invalid` (a ratio or absolute value that is not a positive finite number),
 *   `deflection-points-invalid` (no points, or not an array), the codes of {@link influenceLine}
 *   for each point (paths under `points`), and those of {@link worstPlacements} for the train.
 * @example
 * ```ts
 * const beam = { length: 6, stiffness: 42000, supports: [{ kind: "pin", at: 0 }, { kind: "roller", at: 6 }] } as const;
 * movingDeflections(beam, { loads: [48, 48], spacings: [3.2] }, [3], { ratio: 600 })[0]; // demand 6.68 mm against 10 mm: utilisation 0.67
 * ```
 */
export function movingDeflections(member: MemberInfluence | BeamInput, train: Train, points: readonly number[], limit: MovingDeflectionLimit, options?: TrainOptions): readonly MovingDeflectionCheck[] {
  const m = prepared(member);
  const laid = laidOutFor(train, options, m.length);
  if (limit === undefined || limit === null) fail("deflection-limit-missing", ["limit"], "Give the deflection limit under the moving load, { ratio: 600 } for span / 600 or { absolute: value }: there is no default.");
  if (typeof limit !== "object") fail("deflection-limit-invalid", ["limit"], `The limit must be { ratio } or { absolute }; got ${describeValue(limit)}.`);
  const ratio = "ratio" in limit ? limit.ratio : undefined;
  const absolute = "absolute" in limit ? limit.absolute : undefined;
  const value = ratio ?? absolute;
  if (typeof value !== "number" || !Number.isFinite(value) || !(value > 0))
    fail("deflection-limit-invalid", ["limit", ratio !== undefined ? "ratio" : "absolute"], `The limit's ${ratio !== undefined ? "ratio" : "absolute value"} must be a positive finite number; got ${describeValue(value)}.`);
  if (!Array.isArray(points) || points.length === 0) fail("deflection-points-invalid", ["points"], "Give the points to check as a non-empty array of positions.");
  const slack = coincidenceTolerance(m.length);
  points.forEach((at: unknown, i) => {
    if (typeof at !== "number" || !Number.isFinite(at) || at < -slack || at > m.length + slack)
      fail("influence-point-outside-member", ["points", i], `Point ${i} (${describeValue(at)}) is not a position on the member [0, ${m.length}].`, { at: describeValue(at), length: m.length });
  });
  return (points as readonly number[]).map((given: number) => {
    const at = Math.min(Math.max(given, 0), m.length);
    const line = influenceLine(m, { kind: "deflection", at });
    const w = worstOnLine(line, laid, options, m.length, at);
    const down = -w.min.value;
    const up = w.max.value;
    const sense = down >= up ? "down" : "up";
    const demand = Math.max(down, up, 0);
    const span = m.spans.find((s) => at >= s.from && at <= s.to) ?? { from: 0, to: m.length, kind: "span" as const };
    const lim = ratio !== undefined ? (span.to - span.from) / ratio : (absolute as number);
    const utilisation = demand / lim;
    return { at, span, demand, sense, limit: lim, utilisation, pass: utilisation <= 1, placement: sense === "down" ? w.min : w.max };
  });
}

/**
 * The non-throwing form of {@link movingDeflections}.
 *
 * @example
 * ```ts
 * const r = tryMovingDeflections({ length: 6, stiffness: 1, supports: [{ kind: "fixed", at: 0 }] }, { loads: [1], spacings: [] }, [6], undefined as never);
 * if (!r.ok) console.log(r.error.issues[0]?.code); // "deflection-limit-missing"
 * ```
 */
export function tryMovingDeflections(member: MemberInfluence | BeamInput, train: Train, points: readonly number[], limit: MovingDeflectionLimit, options?: TrainOptions): Result<readonly MovingDeflectionCheck[]> {
  return attempt(() => movingDeflections(member, train, points, limit, options));
}
