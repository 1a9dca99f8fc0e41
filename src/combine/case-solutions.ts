import { solveBeam, type BeamInput, type BeamSolution, type BeamSpan } from "../beam/index.js";
import { attempt, describeValue, IssueCollector, unknownKeyHint, type Result } from "../errors/index.js";
import { DEFAULT_LOAD_CASE, type Load } from "../loads/index.js";
import { restrainsDeflection, type Support } from "../supports/index.js";
import { unionOfBreaks, writeOnBreaks } from "./common-breaks.js";
import type { LoadCase } from "./types.js";
import { checkCases } from "./validate.js";

/** Options for {@link solveCases}. */
export interface SolveCasesOptions {
  /**
   * The case that holds the supports' settlements and prescribed rotations. A settlement does not
   * scale with a load factor, so it is a case of its own that combinations name with the factor
   * the user chooses (often 1.0). Required when a support has a settlement or rotation.
   */
  readonly settlementCase?: string;
}

/** One part of a case that is solved on its own: the whole case, or a patterned case's loads on one span. */
export interface CasePart {
  /** The case's name. */
  readonly case: string;
  /** For a patterned case: the index of the span in {@link CaseSolutions.spans}; absent for a whole case. */
  readonly span?: number;
}

/** Something noticed that does not stop the work. */
export interface CombineWarning {
  /** Stable code, for example `"pattern-single-span"`. */
  readonly code: string;
  /** Where in the input. */
  readonly path: readonly (string | number)[];
  /** A plain sentence. */
  readonly message: string;
}

/** Coefficients of each part's diagrams on the shared breakpoints (see {@link CaseSolutions.coefficients}). */
export interface DiagramCoefficients {
  /** Shear, degree 2 (3 coefficients per piece). */
  readonly shear: Float64Array;
  /** Moment, degree 3. */
  readonly moment: Float64Array;
  /** Slope, degree 4. */
  readonly slope: Float64Array;
  /** Deflection, degree 5. */
  readonly deflection: Float64Array;
}

/**
 * Every case of a member solved once (a patterned case once per span it loads), with the four
 * diagrams of every part re-expressed on one set of breakpoints so that any combination is a sum
 * of coefficients. Treat as immutable; the typed arrays belong to this value alone.
 */
export interface CaseSolutions {
  /** Tag. */
  readonly kind: "case-solutions";
  /** Member length (length units). */
  readonly length: number;
  /** The load cases (a frozen copy). */
  readonly cases: readonly LoadCase[];
  /** The spans and cantilevers, left to right, as {@link BeamSolution.spans}. */
  readonly spans: readonly BeamSpan[];
  /** A name for each span a user reads: `"span 1"`, `"left cantilever"`. */
  readonly spanNames: readonly string[];
  /** The parts solved, in order: the cases in their order, a patterned case's spans left to right. */
  readonly parts: readonly CasePart[];
  /** The solution of each part, with factor 1. */
  readonly solutions: readonly BeamSolution[];
  /** Position of each support, in the order of the member's supports (length units). */
  readonly supportsAt: readonly number[];
  /** The breakpoints shared by every part's diagrams. */
  readonly breaks: Float64Array;
  /**
   * Coefficients of each diagram of each part on {@link breaks}: part-major, then piece, then
   * power (local basis). Degrees: shear 2, moment 3, slope 4, deflection 5.
   */
  readonly coefficients: DiagramCoefficients;
  /** Reaction force of each part at each support (part-major), up positive (force units). */
  readonly reactionForces: Float64Array;
  /** Reaction moment of each part at each support (part-major), counterclockwise positive (force * length). */
  readonly reactionMoments: Float64Array;
  /** Warnings, for example `pattern-single-span`. */
  readonly warnings: readonly CombineWarning[];
}

/** The degree of each diagram. */
export const DEGREES: Readonly<Record<DiagramName, number>> = Object.freeze({ shear: 2, moment: 3, slope: 4, deflection: 5 });

/** The four diagrams, by name. */
export type DiagramName = "shear" | "moment" | "slope" | "deflection";

/** Spans and cantilevers of a member, from the supports that hold deflection (as the beam engine finds them). */
function spansOf(length: number, supports: readonly Support[]): BeamSpan[] {
  const at = supports.filter((s) => restrainsDeflection(s)).map((s) => s.at).sort((a, b) => a - b);
  const out: BeamSpan[] = [];
  if (at.length === 0) return [{ from: 0, to: length, kind: "cantilever" }];
  const tiny = 1e-10 * length;
  const first = at[0] as number;
  const last = at[at.length - 1] as number;
  if (first > tiny) out.push({ from: 0, to: first, kind: "cantilever" });
  for (let i = 1; i < at.length; i++) out.push({ from: at[i - 1] as number, to: at[i] as number, kind: "span" });
  if (last < length - tiny) out.push({ from: last, to: length, kind: "cantilever" });
  return out;
}

function spanNamesOf(spans: readonly BeamSpan[]): string[] {
  let n = 0;
  return spans.map((s, i) => (s.kind === "span" ? `span ${++n}` : i === 0 ? "left cantilever" : "right cantilever"));
}

/** The part of `load` on [from, to] (null when none), with its intensity interpolated at the cuts. */
function loadOn(load: Load, from: number, to: number, lastSpan: boolean): Load | null {
  switch (load.kind) {
    case "point":
    case "couple":
      return load.at >= from && (load.at < to || (lastSpan && load.at <= to)) ? load : null;
    case "distributed": {
      const a = Math.max(load.from, from);
      const b = Math.min(load.to, to);
      if (!(b > a)) return null;
      if (a === load.from && b === load.to) return load;
      const w = (x: number): number => (x === load.from ? load.start : x === load.to ? load.end : load.start + ((load.end - load.start) * (x - load.from)) / (load.to - load.from));
      return { kind: "distributed", from: a, to: b, start: w(a), end: w(b) };
    }
    default:
      return load satisfies never;
  }
}

/**
 * Solves every load case of a member once, with the beam engine ({@link solveBeam}), a patterned
 * case once per span it loads, and a settlement case (the supports' settlements and rotations)
 * once; the other cases are solved with the supports held still. Any combination of these is
 * then a sum (see {@link combineCases}); nothing is solved again.
 *
 * Each load names its case in `case` (`"default"` when it has none); every case must carry a load
 * (or, the settlement case, a settlement).
 *
 * @throws FlexuraError `unknown-case` (a load naming a case not listed), `case-no-loads`,
 *   `settlement-case-missing`, the case checks (`case-duplicate`, `category-unknown`, ...), and
 *   every problem of the member itself, with paths under `beam` (see {@link solveBeam}).
 * @example
 * ```ts
 * const cases = solveCases(
 *   {
 *     length: 12, stiffness: 20000,
 *     supports: [{ kind: "pin", at: 0 }, { kind: "roller", at: 6 }, { kind: "roller", at: 12 }],
 *     loads: [uniformLoad(0, 12, 3, "D"), uniformLoad(0, 12, 5, "L")],
 *   },
 *   [{ name: "D", category: "dead" }, { name: "L", category: "live", patterned: true }],
 * );
 * cases.parts; // [{ case: "D" }, { case: "L", span: 0 }, { case: "L", span: 1 }]
 * ```
 */
export function solveCases(beam: BeamInput, cases: readonly LoadCase[], options?: SolveCasesOptions): CaseSolutions {
  const found = new IssueCollector();
  if (typeof beam !== "object" || beam === null) found.add("beam-invalid", ["beam"], `The member is an object { length, stiffness, supports, loads }; got ${describeValue(beam)}.`);
  const casesOk = checkCases(found, cases, ["cases"]);
  found.throwIfAny();
  const b = beam as unknown as Record<string, unknown>;
  const isObject = (x: unknown): boolean => typeof x === "object" && x !== null;
  if (!Array.isArray(b["supports"]) || !(b["loads"] === undefined || Array.isArray(b["loads"])) || !(b["supports"] as unknown[]).every(isObject) || !((b["loads"] ?? []) as unknown[]).every(isObject))
    memberProblems(beam);
  if (!casesOk) found.throwIfAny();
  const names = cases.map((c) => c.name);
  const settlementCase = options?.settlementCase;
  if (settlementCase !== undefined && !names.includes(settlementCase))
    found.add("unknown-case", ["options", "settlementCase"], `The settlement case "${String(settlementCase)}" is not among the load cases.${unknownKeyHint(String(settlementCase), names)}`, { name: settlementCase });
  const loads = beam.loads ?? [];
  const byCase = new Map<string, Load[]>(names.map((n) => [n, []]));
  loads.forEach((l, i) => {
    const name = l.case ?? DEFAULT_LOAD_CASE;
    const list = typeof name === "string" ? byCase.get(name) : undefined;
    if (list === undefined) found.add("unknown-case", ["beam", "loads", i, "case"], `The load names the case ${describeValue(name)}, which is not among the load cases.${typeof name === "string" ? unknownKeyHint(name, names) : ""}`, { name: describeValue(name) });
    else list.push(l);
  });
  const moves = beam.supports.some((s) => (s.settlement ?? 0) !== 0 || (s.rotation ?? 0) !== 0);
  if (moves && settlementCase === undefined)
    found.add("settlement-case-missing", ["options", "settlementCase"], "A support has a settlement or a prescribed rotation: name the load case that holds it with options.settlementCase (a settlement does not scale with a load factor, so it is a case of its own).");
  cases.forEach((c, i) => {
    if (c.name === settlementCase) {
      if (!moves && (byCase.get(c.name)?.length ?? 0) === 0) found.add("case-no-loads", ["cases", i], `The settlement case "${c.name}" has neither a settlement nor a load.`, { name: c.name });
    } else if ((byCase.get(c.name)?.length ?? 0) === 0) found.add("case-no-loads", ["cases", i], `The case "${c.name}" has no loads: give a load with case "${c.name}", or leave the case out.`, { name: c.name });
  });
  found.throwIfAny();
  const still = beam.supports.map((s): Support => {
    if (s.settlement === undefined && s.rotation === undefined) return s;
    const { settlement: _s, rotation: _r, ...rest } = s;
    return rest;
  });
  const spans = spansOf(beam.length, beam.supports);
  const warnings: { code: string; path: (string | number)[]; message: string }[] = [];
  const parts: CasePart[] = [];
  const solutions: BeamSolution[] = [];
  try {
    cases.forEach((c, ci) => {
    const own = byCase.get(c.name) ?? [];
    const supports = c.name === settlementCase ? beam.supports : still;
    if (c.patterned === true && spans.length < 2)
      warnings.push({ code: "pattern-single-span", path: ["cases", ci, "patterned"], message: `The case "${c.name}" is patterned but the member has one span: it is applied whole.` });
    if (c.patterned === true && spans.length >= 2) {
      spans.forEach((s, si) => {
        const on = own.map((l) => loadOn(l, s.from, s.to, si === spans.length - 1)).filter((l): l is Load => l !== null);
        if (on.length === 0) return;
        parts.push({ case: c.name, span: si });
        solutions.push(solveBeam({ ...beam, supports, loads: on }));
      });
    } else {
      parts.push({ case: c.name });
      solutions.push(solveBeam({ ...beam, supports, loads: own }));
    }
    });
  } catch (e) {
    memberProblems(beam);
    throw e;
  }
  return assemble(beam.length, Object.freeze(cases.map((c) => Object.freeze({ ...c }))), spans, parts, solutions, beam.supports, warnings);
}

/** Throws the member's own problems, with their paths under `beam` (when the whole member solves, returns). */
function memberProblems(beam: BeamInput): void {
  const whole = attempt(() => solveBeam(beam));
  if (!whole.ok) {
    const found = new IssueCollector();
    found.addAll(whole.error.issues, ["beam"]);
    found.throwIfAny();
  }
}

function assemble(length: number, cases: readonly LoadCase[], spans: readonly BeamSpan[], parts: readonly CasePart[], solutions: readonly BeamSolution[], supports: readonly Support[], warnings: readonly CombineWarning[]): CaseSolutions {
  const all = solutions.flatMap((s) => [s.shear, s.moment, s.slope, s.deflection]);
  const breaks = unionOfBreaks(all, 1e-12 * length);
  const pieces = breaks.length - 1;
  const coefficients: { -readonly [K in keyof DiagramCoefficients]: Float64Array } = { shear: new Float64Array(0), moment: new Float64Array(0), slope: new Float64Array(0), deflection: new Float64Array(0) };
  for (const name of ["shear", "moment", "slope", "deflection"] as const) {
    const d = DEGREES[name];
    const out = new Float64Array(parts.length * pieces * (d + 1));
    solutions.forEach((s, p) => writeOnBreaks(s[name], breaks, d, out, p * pieces * (d + 1)));
    coefficients[name] = out;
  }
  const n = supports.length;
  const reactionForces = new Float64Array(parts.length * n);
  const reactionMoments = new Float64Array(parts.length * n);
  solutions.forEach((s, p) => {
    for (const r of s.reactions) {
      reactionForces[p * n + r.support] = r.force;
      reactionMoments[p * n + r.support] = r.moment;
    }
  });
  return Object.freeze({
    kind: "case-solutions",
    length,
    cases,
    spans: Object.freeze(spans.map((s) => Object.freeze({ ...s }))),
    spanNames: Object.freeze(spanNamesOf(spans)),
    parts: Object.freeze(parts.map((p) => Object.freeze(p))),
    solutions: Object.freeze([...solutions]),
    supportsAt: Object.freeze(supports.map((s) => s.at)),
    breaks,
    coefficients: Object.freeze(coefficients),
    reactionForces,
    reactionMoments,
    warnings: Object.freeze(warnings.map((w) => Object.freeze({ ...w, path: Object.freeze(w.path) }))),
  });
}

/**
 * The non-throwing form of {@link solveCases}.
 *
 * @example
 * ```ts
 * trySolveCases({ length: 6, stiffness: 1, supports: [] }, []).ok; // false
 * ```
 */
export function trySolveCases(beam: BeamInput, cases: readonly LoadCase[], options?: SolveCasesOptions): Result<CaseSolutions> {
  return attempt(() => solveCases(beam, cases, options));
}
