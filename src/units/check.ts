import { describeValue, issue, type FlexuraIssue, type IssuePath } from "../errors/index.js";
import { describeDimension, dimensionOfKind, fitsDimension, isQuantityKind, quantityKinds, type QuantityKind } from "./kinds.js";
import type { UnitFactor } from "./unit.js";
import { KIND_WORDS, kindExamples } from "./words.js";

/** An issue (at `path` + `"kind"`) when `kind` is not a {@link QuantityKind}, else undefined. */
export function checkKind(kind: unknown, path: IssuePath): FlexuraIssue | undefined {
  if (isQuantityKind(kind)) return undefined;
  return issue("unknown-quantity-kind", [...path, "kind"], `${describeValue(kind)} is not a kind of quantity; use one of ${quantityKinds.join(", ")}.`, {
    value: describeValue(kind),
  });
}

/** An issue when `unit` cannot express a quantity of `kind`, else undefined. */
export function checkFits(unit: UnitFactor, kind: QuantityKind, path: IssuePath, shown: () => string): FlexuraIssue | undefined {
  if (fitsDimension(unit.dimension, dimensionOfKind(kind))) return undefined;
  const found = unit.kinds[0];
  const is = found === undefined ? `has dimension ${describeDimension(unit.dimension)}` : `is ${KIND_WORDS[found]}`;
  const advice = kind === "dimensionless" ? "give the number alone" : `use a unit such as ${kindExamples(kind)}`;
  return issue("wrong-dimension", path, `${shown()} ${is}, but ${KIND_WORDS[kind]} is due here; ${advice}.`, {
    unit: unit.unit,
    expected: kind,
    found: unit.kinds,
    dimension: describeDimension(unit.dimension),
  });
}
