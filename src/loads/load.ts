/**
 * A concentrated force at one point of the member.
 *
 * @example
 * ```ts
 * const p: PointLoad = { kind: "point", at: 2.5, value: 10 }; // 10 force units down at x = 2.5
 * ```
 */
export interface PointLoad {
  /** Tag. */
  readonly kind: "point";
  /** Position from the left end (length units), within `[0, length]`. */
  readonly at: number;
  /** Force, positive downward (force units). */
  readonly value: number;
  /** Load-case name for combinations (see `SolveOptions.factors`); none means `"default"`. */
  readonly case?: string;
}

/**
 * A concentrated applied moment (couple) at one point of the member.
 *
 * @example
 * ```ts
 * const m: CoupleLoad = { kind: "couple", at: 4, value: 12 }; // 12 force*length, counterclockwise
 * ```
 */
export interface CoupleLoad {
  /** Tag. */
  readonly kind: "couple";
  /** Position from the left end (length units), within `[0, length]`. */
  readonly at: number;
  /** Moment, positive counterclockwise (force * length units). */
  readonly value: number;
  /** Load-case name for combinations (see `SolveOptions.factors`); none means `"default"`. */
  readonly case?: string;
}

/**
 * A distributed force varying linearly from `start` at `from` to `end` at `to`: uniform when
 * `start === end`, triangular when one of them is zero, trapezoidal otherwise, and over part
 * or all of the member.
 *
 * @example
 * ```ts
 * const w: DistributedLoad = { kind: "distributed", from: 0, to: 6, start: 2, end: 2 }; // uniform 2 force/length down
 * ```
 */
export interface DistributedLoad {
  /** Tag. */
  readonly kind: "distributed";
  /** Where the load starts (length units), `0 <= from < to`. */
  readonly from: number;
  /** Where the load ends (length units), `to <= length`. */
  readonly to: number;
  /** Intensity at `from`, positive downward (force per length). */
  readonly start: number;
  /** Intensity at `to`, positive downward (force per length). */
  readonly end: number;
  /** Load-case name for combinations (see `SolveOptions.factors`); none means `"default"`. */
  readonly case?: string;
}

/** Any load on a member, tagged by `kind`. */
export type Load = PointLoad | CoupleLoad | DistributedLoad;

/** The case name a load without one belongs to. */
export const DEFAULT_LOAD_CASE = "default";

/**
 * A point force, positive downward.
 *
 * @example
 * ```ts
 * pointLoad(2.5, 10); // { kind: "point", at: 2.5, value: 10 }
 * ```
 */
export function pointLoad(at: number, value: number, loadCase?: string): PointLoad {
  return loadCase === undefined ? { kind: "point", at, value } : { kind: "point", at, value, case: loadCase };
}

/**
 * An applied couple, positive counterclockwise.
 *
 * @example
 * ```ts
 * coupleLoad(4, 12); // { kind: "couple", at: 4, value: 12 }
 * ```
 */
export function coupleLoad(at: number, value: number, loadCase?: string): CoupleLoad {
  return loadCase === undefined ? { kind: "couple", at, value } : { kind: "couple", at, value, case: loadCase };
}

/**
 * A uniform distributed load `value` (force per length, down) from `from` to `to`.
 *
 * @example
 * ```ts
 * uniformLoad(0, 6, 2); // { kind: "distributed", from: 0, to: 6, start: 2, end: 2 }
 * ```
 */
export function uniformLoad(from: number, to: number, value: number, loadCase?: string): DistributedLoad {
  return linearLoad(from, to, value, value, loadCase);
}

/**
 * A linearly varying distributed load (force per length, down): `start` at `from`, `end` at `to`.
 *
 * @example
 * ```ts
 * linearLoad(0, 6, 0, 3); // triangular, rising to 3 at x = 6
 * ```
 */
export function linearLoad(from: number, to: number, start: number, end: number, loadCase?: string): DistributedLoad {
  return loadCase === undefined ? { kind: "distributed", from, to, start, end } : { kind: "distributed", from, to, start, end, case: loadCase };
}

/** Resultant of a set of loads. */
export interface LoadResultant {
  /** Total force, positive downward (force units). */
  readonly force: number;
  /** Total moment about x = 0, positive counterclockwise (force * length units). */
  readonly moment: number;
}

/**
 * The resultant of loads: total downward force and total counterclockwise moment about x = 0.
 *
 * @example
 * ```ts
 * loadResultant([pointLoad(2, 10)]); // { force: 10, moment: -20 }
 * ```
 */
export function loadResultant(loads: readonly Load[]): LoadResultant {
  let force = 0;
  let moment = 0;
  for (const l of loads) {
    switch (l.kind) {
      case "point":
        force += l.value;
        moment -= l.value * l.at;
        break;
      case "couple":
        moment += l.value;
        break;
      case "distributed": {
        const h = l.to - l.from;
        const total = 0.5 * (l.start + l.end) * h;
        // first moment of a trapezoid about its start: h^2 (start / 2 + (end - start) / 3)
        const first = h * h * (l.start / 6 + l.end / 3);
        force += total;
        moment -= total * l.from + first;
        break;
      }
      default:
        return l satisfies never;
    }
  }
  return { force, moment };
}
