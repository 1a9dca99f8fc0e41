import type { ModelAnalysis, ModelCombinationResults, ModelEnvelope } from "../model/index.js";
import { formatReportNumber, formatReportQuantity, snapToZero, textTable } from "./format.js";

function indent(text: string): string {
  return text
    .split("\n")
    .map((l) => `  ${l}`)
    .join("\n");
}

/** "1.2 x D, 1.6 x L": the factors of a combination as printed. */
function factorsInWords(factors: Readonly<Record<string, number>>): string {
  return Object.entries(factors)
    .map(([name, f]) => `${formatReportNumber(f, 4)} x ${name}`)
    .join(", ");
}

function envelopeRows(c: ModelCombinationResults, units: ModelAnalysis["units"]): string[][] {
  const e = c.envelopes;
  if (e === undefined) return [];
  const row = (name: string, env: ModelEnvelope, unit: string): string[] => {
    const reference = Math.max(Math.abs(env.upper.peak.value), Math.abs(env.lower.peak.value));
    return [
      name,
      formatReportQuantity(snapToZero(env.upper.peak.value, reference), unit),
      `x = ${formatReportQuantity(env.upper.peak.at, units.length)}`,
      env.upper.peak.combination,
      formatReportQuantity(snapToZero(env.lower.peak.value, reference), unit),
      `x = ${formatReportQuantity(env.lower.peak.at, units.length)}`,
      env.lower.peak.combination,
    ];
  };
  return [
    ["quantity", "largest", "at", "governing", "smallest", "at", "governing"],
    row("shear force", e.shear, units.force),
    row("bending moment (sagging +)", e.moment, units.moment),
    row("slope (counterclockwise +)", e.slope, units.rotation),
    row("deflection (upward +)", e.deflection, units.deflection),
  ];
}

/**
 * The load cases, the combinations applied (name, purpose, clause and every factor, so the user
 * can read exactly what is applied), the presets' notes, the envelopes' peaks each naming its
 * governing combination and pattern, the reaction envelopes (uplift visible), and the utilisation
 * table of the checks per combination, as plain text; empty when the model has no cases.
 *
 * @param analysis - What `analyzeModel` returned.
 * @returns Plain text, lines joined with `\n`, or `""`.
 * @example
 * ```ts
 * console.log(reportCombinations(analyzeModel(parseModel(json))));
 * ```
 */
export function reportCombinations(analysis: ModelAnalysis): string {
  const c = analysis.combinations;
  if (c === undefined) return "";
  const u = analysis.units;
  const out: string[] = ["LOAD CASES", ""];
  out.push(
    indent(
      textTable([
        ["case", "category", "acts"],
        ...c.cases.map((k) => [k.name, k.category, [k.reversible === true ? "both senses" : "", k.patterned === true ? "span by span" : ""].filter((s) => s !== "").join(", ") || "as given"]),
      ]),
    ),
  );
  out.push("", `LOAD COMBINATIONS (${c.combinations.length}; factors applied to each case)`, "");
  if (c.combinations.length === 0) out.push("  None: only the check groups of cases below.");
  else
    out.push(
      indent(
        textTable([
          ["#", "combination", "purpose", "factors", "clause"],
          ...c.combinations.map((k, i) => [String(i + 1), k.name, k.purpose, factorsInWords(k.factors), k.clause ?? ""]),
        ]),
      ),
    );
  for (const n of c.notes) out.push(`  - ${n}`);
  const env = envelopeRows(c, u);
  if (env.length > 0) {
    out.push("", `ENVELOPES OVER ${c.arrangements} ARRANGEMENTS (combinations and patterns; exact, with the governing combination)`, "");
    out.push(indent(textTable(env)));
    out.push("", "REACTION ENVELOPES (force positive upward; a negative smallest force is uplift)", "");
    const scale = (c.reactions ?? []).reduce((s, r) => Math.max(s, Math.abs(r.force.max.value), Math.abs(r.force.min.value)), 0);
    out.push(
      indent(
        textTable([
          ["support", "at", "largest force", "governing", "smallest force", "governing"],
          ...(c.reactions ?? []).map((r) => [
            String(r.support + 1),
            formatReportQuantity(r.at, u.length),
            formatReportQuantity(snapToZero(r.force.max.value, scale), u.force),
            r.force.max.combination,
            formatReportQuantity(snapToZero(r.force.min.value, scale), u.force),
            r.force.min.combination,
          ]),
        ]),
      ),
    );
  }
  if (c.checks.length > 0) {
    out.push("", "CHECKS PER COMBINATION (each at its worst pattern)", "");
    out.push(
      indent(
        textTable([
          ["group", "combination", "governing check", "pattern", "demand", "limit", "utilisation", "result"],
          ...c.checks.map((r) => {
            const g = r.checks[r.governing];
            return [r.group, r.combination, g?.description ?? "", g?.pattern ?? "", formatReportQuantity(g?.demand ?? 0, g?.unit ?? ""), formatReportQuantity(g?.capacity ?? 0, g?.unit ?? ""), formatReportNumber(r.utilisation, 3), r.pass ? "PASS" : "FAIL"];
          }),
        ]),
      ),
    );
    const governing = c.governing === undefined ? undefined : c.checks[c.governing];
    const failed = c.checks.filter((r) => !r.pass).length;
    if (governing !== undefined) {
      const g = governing.checks[governing.governing];
      out.push(
        "",
        `  Governing: ${governing.group}, ${governing.combination}${g === undefined || g.pattern === "" ? "" : `, ${g.pattern}`}: ${g?.description ?? ""}, utilisation ${formatReportNumber(governing.utilisation, 3)}`,
        failed === 0 ? `  Overall per combination: PASS (all ${c.checks.length} rows pass)` : `  Overall per combination: FAIL (${failed} of ${c.checks.length} rows fail)`,
      );
    }
  }
  return out.join("\n");
}
