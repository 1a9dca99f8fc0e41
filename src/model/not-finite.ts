import { fail, formatPath, type IssuePath } from "../errors/index.js";
import type { Model } from "./model.js";

/** Where the member's stiffness comes from in the model. */
export const stiffnessPath = (model: Model): IssuePath => (model.segments === undefined ? (model.I === undefined ? ["section"] : ["I"]) : ["segments"]);

const STIFFNESS = { cause: "stiffness", hint: "the member is too flexible for the loads: check the units and size of E and I" } as const;
const SECTION = { cause: "section", hint: "check the section's dimensions and units" } as const;
const LOADS = { cause: "loads", hint: "check the sizes and units of the loads and supports" } as const;

/** The input most likely behind a result field that is not finite, and what to check. */
const CAUSES: Readonly<Record<string, { readonly cause: "stiffness" | "section" | "loads" | "limits"; readonly hint: string }>> = {
  slope: STIFFNESS,
  deflection: STIFFNESS,
  section: SECTION,
  stress: SECTION,
  checks: { cause: "limits", hint: "check the sizes and units of the limits" },
};

/**
 * Refuses a result that double precision cannot hold (a member so flexible, or loads so large,
 * that a deflection or moment overflows), pointing at the input that most likely caused it.
 *
 * @throws FlexuraError `result-not-finite`, always.
 */
export function refuseNotFinite(model: Model, where: IssuePath, value: number): never {
  const [head, second] = where;
  const field = String(head === "diagrams" ? second : head);
  const { cause, hint } = Object.hasOwn(CAUSES, field) ? (CAUSES[field] ?? LOADS) : LOADS;
  const path: IssuePath = cause === "stiffness" ? stiffnessPath(model) : [cause];
  fail("result-not-finite", path, `The result ${formatPath(where)} is ${value}, beyond what double precision can hold: ${hint}.`, { result: formatPath(where), value: String(value) });
}
