import type { LoadCase } from "../combine/index.js";
import { attempt, describeValue, IssueCollector, requireFinite, type IssuePath, type Result } from "../errors/index.js";
import type { DistributedLoad } from "../loads/index.js";
import { coincidenceTolerance } from "../math/index.js";

/** A stretch of a stepped member with its cross-section area, for {@link selfWeight}. */
export interface SelfWeightStretch {
  /** Start of the stretch (length). */
  readonly from: number;
  /** End of the stretch (length). */
  readonly to: number;
  /** Cross-section area over the stretch (length^2, > 0), for example `sectionProperties(s).area`. */
  readonly area: number;
}

/** Options for {@link selfWeight}. */
export interface SelfWeightOptions {
  /** The name of the dead case the loads belong to; default `"self-weight"`. */
  readonly case?: string;
}

/** The self-weight of a member as a dead load case. */
export interface SelfWeight {
  /** The case, category `dead`, to add to the member's cases. */
  readonly case: LoadCase;
  /** One uniform load per stretch (force per length, downward positive), naming the case. */
  readonly loads: readonly DistributedLoad[];
}

function positive(found: IssueCollector, value: unknown, path: IssuePath, what: string): value is number {
  if (!requireFinite(found, value, path, what)) return false;
  if (value > 0) return true;
  found.add("self-weight-not-positive", path, `The ${what} must be above zero; got ${value}.`, { value });
  return false;
}

/**
 * The self-weight of a member: a dead case of uniform loads, area times unit weight on each
 * stretch of constant section (w = A gamma, force per length, downward). Units must be
 * consistent: with the area in length^2 and the unit weight in force / length^3, w is in force /
 * length (units are converted at the edges: the model file takes `"77 kN/m^3"` and checks it). A
 * unit weight is weight per volume; from a mass density rho it is rho g, with the standard
 * acceleration of gravity g = 9.80665 m/s^2 (3rd CGPM, 1901). For a section of several materials,
 * give the weight per length yourself (sum of each part's area times its unit weight) as the area
 * with a unit weight of 1.
 *
 * @param length - Member length (length, > 0).
 * @param area - The cross-section area (length^2, > 0), or stretches `{ from, to, area }` tiling the member.
 * @param unitWeight - Weight per volume (force / length^3, > 0).
 * @param options - The case name.
 * @returns The case (category `dead`) and its loads.
 * @throws FlexuraError `self-weight-not-positive` (length, area or unit weight not above zero),
 *   `not-a-number` / `not-finite`, `self-weight-stretches-invalid` (stretches that do not tile the
 *   member, within the coincidence tolerance), `case-name-invalid`, `result-not-finite` (a weight
 *   per length that overflows).
 * @example
 * ```ts
 * // a 200 x 400 mm timber beam at 5 kN/m^3, in N and mm: 8e4 mm^2 x 5e-6 N/mm^3 = 0.4 N/mm
 * const sw = selfWeight(6000, 200 * 400, 5e-6);
 * sw.loads[0]?.start; // 0.4
 * solveCases({ ...beam, loads: [...beam.loads, ...sw.loads] }, [...cases, sw.case]);
 * ```
 */
export function selfWeight(length: number, area: number | readonly SelfWeightStretch[], unitWeight: number, options?: SelfWeightOptions): SelfWeight {
  const found = new IssueCollector();
  const lengthOk = positive(found, length, ["length"], "member length");
  positive(found, unitWeight, ["unitWeight"], "unit weight");
  const name = options?.case ?? "self-weight";
  if (typeof name !== "string" || name.length === 0) found.add("case-name-invalid", ["options", "case"], `The case name is a non-empty string; got ${describeValue(name)}.`);
  const stretches: SelfWeightStretch[] = [];
  if (Array.isArray(area)) {
    if (area.length === 0) found.add("self-weight-stretches-invalid", ["area"], "Give the area, or at least one stretch { from, to, area }.");
    const tol = lengthOk ? coincidenceTolerance(length) : 0;
    let at = 0;
    (area as readonly unknown[]).forEach((s, i) => {
      const path = ["area", i];
      if (typeof s !== "object" || s === null) return found.add("self-weight-stretches-invalid", path, `A stretch is { from, to, area }; got ${describeValue(s)}.`);
      const r = s as Readonly<Record<string, unknown>>;
      const ends = [requireFinite(found, r["from"], [...path, "from"], "start of the stretch"), requireFinite(found, r["to"], [...path, "to"], "end of the stretch")].every(Boolean);
      const areaOk = positive(found, r["area"], [...path, "area"], "cross-section area");
      if (!ends) return;
      const from = r["from"] as number;
      const to = r["to"] as number;
      const before = at;
      at = to;
      if (lengthOk && (Math.abs(from - before) > tol || !(to > from)))
        return found.add("self-weight-stretches-invalid", path, `The stretches tile the member from 0 to ${length} in order: this one runs from ${from} to ${to}, and the one before ended at ${before}.`, { from, to });
      if (areaOk) stretches.push({ from, to, area: r["area"] as number });
    });
    if (lengthOk && found.empty && Math.abs(at - length) > tol) found.add("self-weight-stretches-invalid", ["area"], `The stretches end at ${at}, not at the member's end, ${length}.`, { end: at, length });
  } else if (positive(found, area, ["area"], "cross-section area") && lengthOk) stretches.push({ from: 0, to: length, area });
  found.throwIfAny();
  const loads = stretches.map((s, i): DistributedLoad => {
    const w = s.area * unitWeight;
    if (!Number.isFinite(w)) {
      found.add("result-not-finite", Array.isArray(area) ? ["area", i, "area"] : ["area"], `The weight per length ${s.area} x ${unitWeight} overflows double precision: check the units of the area and the unit weight.`, { area: s.area, unitWeight });
      return { kind: "distributed", from: 0, to: 0, start: 0, end: 0 };
    }
    const from = i === 0 ? 0 : s.from;
    const to = i === stretches.length - 1 ? length : s.to;
    return Object.freeze({ kind: "distributed", from, to, start: w, end: w, case: name });
  });
  found.throwIfAny();
  return Object.freeze({ case: Object.freeze({ name, category: "dead" }), loads: Object.freeze(loads) });
}

/**
 * The non-throwing form of {@link selfWeight}.
 *
 * @example
 * ```ts
 * trySelfWeight(6, 0, 77).ok; // false: self-weight-not-positive
 * ```
 */
export function trySelfWeight(length: number, area: number | readonly SelfWeightStretch[], unitWeight: number, options?: SelfWeightOptions): Result<SelfWeight> {
  return attempt(() => selfWeight(length, area, unitWeight, options));
}
