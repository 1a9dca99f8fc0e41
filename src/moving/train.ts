import type { IssueCollector } from "../errors/index.js";
import { describeValue } from "../errors/index.js";

/**
 * A uniform load that travels with a train (a lane or trolley load), in the train's own
 * coordinate: from `start` (length units behind the first axle; negative is ahead of it) over
 * `length`.
 */
export interface TrainUniform {
  /** Intensity, down positive (force per length). */
  readonly intensity: number;
  /** Where it starts, measured from the first axle towards the last (length units). */
  readonly start: number;
  /** Its length (length units), positive. */
  readonly length: number;
}

/**
 * A train of moving loads: axle (wheel) loads at fixed spacings, with an optional uniform load
 * travelling with them. The first axle is the reference: a placement says where it stands.
 *
 * @example
 * ```ts
 * // an invented two-wheel end truck: 48 kN per wheel, 3.2 m apart
 * const truck: Train = { loads: [48, 48], spacings: [3.2] };
 * ```
 */
export interface Train {
  /** Axle loads, down positive (force units), from the first axle to the last. */
  readonly loads: readonly number[];
  /** Distances from each axle to the next (length units), finite and not negative: one fewer than `loads`. */
  readonly spacings: readonly number[];
  /** An optional uniform load travelling with the axles. */
  readonly uniform?: TrainUniform;
}

/**
 * The kinds of crane in the vertical impact table of ASCE 7-16 4.9.3 ({@link ASCE7_16_CRANE_IMPACT}).
 */
export type CraneImpactKind = "monorail-powered" | "bridge-cab-or-remote" | "bridge-pendant" | "hand-geared";

/** One row of a dynamic allowance table: the fraction added to the wheel loads, with its clause. */
export interface DynamicAllowanceRow {
  /** The kind of crane. */
  readonly kind: CraneImpactKind;
  /** What the row covers, in words. */
  readonly description: string;
  /** The fraction added to the maximum wheel loads (0.25 means wheel loads times 1.25). */
  readonly fraction: number;
  /** The clause. */
  readonly clause: string;
}

/**
 * Vertical impact on crane wheel loads, ASCE 7-16 4.9.3 (from memory: the standard was not at hand;
 * check the edition that governs): the maximum wheel loads are increased by these percentages.
 * Lateral and longitudinal crane forces (4.9.4, 4.9.5) are not applied by flexura.
 */
export const ASCE7_16_CRANE_IMPACT: readonly DynamicAllowanceRow[] = Object.freeze([
  Object.freeze({ kind: "monorail-powered", description: "monorail cranes (powered)", fraction: 0.25, clause: "ASCE 7-16 4.9.3" }),
  Object.freeze({ kind: "bridge-cab-or-remote", description: "cab-operated or remotely operated bridge cranes (powered)", fraction: 0.25, clause: "ASCE 7-16 4.9.3" }),
  Object.freeze({ kind: "bridge-pendant", description: "pendant-operated bridge cranes (powered)", fraction: 0.1, clause: "ASCE 7-16 4.9.3" }),
  Object.freeze({ kind: "hand-geared", description: "bridge cranes or monorail cranes with hand-geared bridge, trolley and hoist", fraction: 0, clause: "ASCE 7-16 4.9.3" }),
] as const);

/** Options for the moving-load functions. */
export interface TrainOptions {
  /** The train may stand partly on the member (axles off it carry nothing). Default true; false keeps the whole train on the member. */
  readonly partlyOn?: boolean;
  /** `"both"` (default): the train as given and reversed (it may run either way, entering from either end); `"as-given"`: the first axle nearest the left end only. */
  readonly directions?: "both" | "as-given";
  /**
   * Dynamic allowance on the axle loads (not on the uniform part): a fraction added (0.25 means
   * times 1.25), or a row of {@link ASCE7_16_CRANE_IMPACT} by its kind. Default 0.
   */
  readonly dynamic?: number | CraneImpactKind;
}

/** A train checked and laid out in its own coordinate t (the first axle at t = 0). */
export interface LaidOutTrain {
  /** Axle positions t (length units) and loads (dynamic allowance applied). */
  readonly axles: readonly { readonly t: number; readonly load: number }[];
  /** The uniform part: from t = u0 to t = u1 at intensity w. */
  readonly uniform?: { readonly u0: number; readonly u1: number; readonly w: number };
  /** The train's extent in t. */
  readonly tMin: number;
  /** The train's extent in t. */
  readonly tMax: number;
  /** The factor the axle loads were multiplied by (1 + dynamic allowance). */
  readonly factor: number;
}

const num = (found: IssueCollector, v: unknown, path: (string | number)[], what: string): v is number => {
  if (typeof v !== "number") {
    found.add("not-a-number", path, `The ${what} must be a number; got ${describeValue(v)}.`, { value: describeValue(v) });
    return false;
  }
  if (!Number.isFinite(v)) {
    found.add("not-finite", path, `The ${what} must be a finite number; got ${String(v)}.`, { value: String(v) });
    return false;
  }
  return true;
};

/** Checks a train and its options, collecting every problem (paths under `train` and `options`), and lays it out. */
export function layOutTrain(train: Train, options: TrainOptions | undefined, found: IssueCollector): LaidOutTrain | undefined {
  let factor = 1;
  if (options !== undefined && (typeof options !== "object" || options === null)) found.add("train-options-invalid", ["options"], `The options must be an object; got ${describeValue(options)}.`);
  else if (options !== undefined) {
    const d = options.dynamic;
    if (typeof d === "string") {
      const row = ASCE7_16_CRANE_IMPACT.find((r) => r.kind === d);
      if (row === undefined) found.add("dynamic-allowance-unknown", ["options", "dynamic"], `Unknown crane kind ${describeValue(d)}: use ${ASCE7_16_CRANE_IMPACT.map((r) => `"${r.kind}"`).join(", ")} or a fraction.`, { dynamic: d });
      else factor = 1 + row.fraction;
    } else if (d !== undefined && num(found, d, ["options", "dynamic"], "dynamic allowance")) {
      if (d < 0) found.add("dynamic-allowance-negative", ["options", "dynamic"], `The dynamic allowance is a fraction added to the wheel loads, 0 or more; got ${d}.`, { dynamic: d });
      else factor = 1 + d;
    }
    if (options.partlyOn !== undefined && typeof options.partlyOn !== "boolean") found.add("train-options-invalid", ["options", "partlyOn"], `partlyOn must be true or false; got ${describeValue(options.partlyOn)}.`);
    if (options.directions !== undefined && options.directions !== "both" && options.directions !== "as-given")
      found.add("train-options-invalid", ["options", "directions"], `directions must be "both" or "as-given"; got ${describeValue(options.directions)}.`);
  }
  if (typeof train !== "object" || train === null) {
    found.add("train-invalid", ["train"], `The train must be an object { loads, spacings }; got ${describeValue(train)}.`);
    return undefined;
  }
  const loads: unknown = train.loads;
  const spacings: unknown = train.spacings ?? [];
  if (!Array.isArray(loads)) found.add("train-invalid", ["train", "loads"], `The axle loads must be an array of numbers; got ${describeValue(loads)}.`);
  if (!Array.isArray(spacings)) found.add("train-invalid", ["train", "spacings"], `The spacings must be an array of numbers; got ${describeValue(spacings)}.`);
  if (!Array.isArray(loads) || !Array.isArray(spacings)) return undefined;
  if (loads.length === 0 && train.uniform === undefined) found.add("train-empty", ["train", "loads"], "The train has no axles and no uniform load: give at least one axle load.");
  if (loads.length > 0 && spacings.length !== loads.length - 1)
    found.add("train-spacings-count", ["train", "spacings"], `${loads.length} axles need ${loads.length - 1} spacings; got ${spacings.length}.`, { axles: loads.length, spacings: spacings.length });
  loads.forEach((p: unknown, i) => num(found, p, ["train", "loads", i], "axle load"));
  spacings.forEach((d: unknown, i) => {
    if (num(found, d, ["train", "spacings", i], "axle spacing") && d < 0) found.add("spacing-negative", ["train", "spacings", i], `An axle spacing must not be negative; got ${d}.`, { spacing: d });
  });
  let uniform: LaidOutTrain["uniform"];
  const u = train.uniform as unknown;
  if (u !== undefined) {
    if (typeof u !== "object" || u === null) found.add("train-invalid", ["train", "uniform"], `The uniform load must be an object { intensity, start, length }; got ${describeValue(u)}.`);
    else {
      const { intensity, start, length } = u as Record<string, unknown>;
      const ok = num(found, intensity, ["train", "uniform", "intensity"], "uniform intensity") && num(found, start, ["train", "uniform", "start"], "uniform start") && num(found, length, ["train", "uniform", "length"], "uniform length");
      if (ok && !((length) > 0)) found.add("uniform-length-not-positive", ["train", "uniform", "length"], `The uniform load's length must be positive; got ${String(length)}.`);
      else if (ok) uniform = { u0: start, u1: (start) + (length), w: intensity };
    }
  }
  if (!found.empty) return undefined;
  const axles: { t: number; load: number }[] = [];
  let t = 0;
  (loads as number[]).forEach((p, i) => {
    if (i > 0) t += spacings[i - 1] as number;
    axles.push({ t, load: p * factor });
  });
  let tMin = axles.length > 0 ? 0 : Infinity;
  let tMax = axles.length > 0 ? t : -Infinity;
  if (uniform !== undefined) {
    tMin = Math.min(tMin, uniform.u0);
    tMax = Math.max(tMax, uniform.u1);
  }
  if (!Number.isFinite(tMax - tMin)) {
    found.add("train-too-long", ["train", "spacings"], "The train's length is too large for double precision.");
    return undefined;
  }
  return uniform === undefined ? { axles, tMin, tMax, factor } : { axles, uniform, tMin, tMax, factor };
}
