// What the flexure chapters beyond F2 and F3 return (F7, F8, F9, F11), and the available strength
// by LRFD or ASD (F1: phi_b = 0.90, Omega_b = 1.67), shared by them.
import { fail } from "../../errors/index.js";

/** The limit states of AISC 360-16 Chapter F that flexura evaluates. */
export type ChapterLimitState = "yielding" | "lateral-torsional-buckling" | "flange-local-buckling" | "web-local-buckling" | "local-buckling" | "stem-local-buckling";

/** One limit state's nominal strength and the equation it came from. */
export interface LimitStateStrength {
  /** The limit state. */
  readonly limitState: ChapterLimitState;
  /** M_n by this limit state (force * length). */
  readonly nominal: number;
  /** The equation used, for example `"F7-2"`. */
  readonly equation: string;
}

/** A nominal flexural strength by one section of AISC 360-16 Chapter F other than F2 and F3. */
export interface ChapterFlexure {
  /** The section of Chapter F applied. */
  readonly section: "F7" | "F8" | "F9" | "F11";
  /** M_n (force * length): the least of the limit states that apply. */
  readonly nominal: number;
  /** The limit state that governs M_n. */
  readonly governs: ChapterLimitState;
  /** The equation of the governing limit state. */
  readonly equation: string;
  /** M_p as the section defines it (force * length). */
  readonly plasticMoment: number;
  /** Every limit state that applies, in the order of the section's clauses. */
  readonly limitStates: readonly LimitStateStrength[];
}

/** @internal Builds the frozen result from the limit states that apply (the first is yielding). */
export function chapterResult(section: ChapterFlexure["section"], plasticMoment: number, limitStates: LimitStateStrength[]): ChapterFlexure {
  let best = limitStates[0]!;
  for (const s of limitStates) if (s.nominal < best.nominal) best = s;
  return Object.freeze({ section, nominal: best.nominal, governs: best.limitState, equation: best.equation, plasticMoment, limitStates: Object.freeze(limitStates.map((s) => Object.freeze(s))) });
}

/** @internal Refuses an unbraced length or C_b that is not a positive finite number. */
export function checkLengthAndGradient(unbracedLength: unknown, momentGradient: unknown): void {
  if (typeof unbracedLength !== "number" || !(unbracedLength > 0) || !Number.isFinite(unbracedLength))
    fail("value-not-positive", ["unbracedLength"], `The unbraced length must be a positive finite length; got ${String(unbracedLength)}.`, { value: unbracedLength });
  if (typeof momentGradient !== "number" || !(momentGradient > 0) || !Number.isFinite(momentGradient))
    fail("value-not-positive", ["momentGradient"], `C_b must be a positive finite number; got ${String(momentGradient)}.`, { value: momentGradient });
}

/**
 * The available flexural strength of a nominal strength M_n by AISC 360-16 F1: phi_b M_n with
 * phi_b = 0.90 (LRFD) or M_n / Omega_b with Omega_b = 1.67 (ASD).
 *
 * @param nominal - M_n (force * length), finite and not negative.
 * @param method - `"lrfd"` or `"asd"`.
 * @throws FlexuraError `value-not-positive` for a nominal strength that is negative or not a finite number; `options-invalid` for another method.
 * @example
 * ```ts
 * availableFlexuralStrength(100, "lrfd"); // 90
 * availableFlexuralStrength(100, "asd"); // 59.9
 * ```
 */
export function availableFlexuralStrength(nominal: number, method: "lrfd" | "asd"): number {
  if (typeof nominal !== "number" || !(nominal >= 0) || !Number.isFinite(nominal)) fail("value-not-positive", ["nominal"], `The nominal strength must be a finite number of zero or more; got ${String(nominal)}.`, { value: nominal });
  if (method === "lrfd") return 0.9 * nominal;
  if (method === "asd") return nominal / 1.67;
  return fail("options-invalid", ["method"], `The method must be "lrfd" or "asd"; got ${String(method)}.`);
}
