import type { ModelAnalysis, ModelPeaks } from "../model/index.js";
import { formatReportQuantity, snapToZero, textTable, utilisationText } from "./format.js";

function indent(text: string): string {
  return text
    .split("\n")
    .map((l) => `  ${l}`)
    .join("\n");
}

/**
 * The reactions and the peaks of shear, moment, slope and deflection, with their locations, as
 * plain text.
 *
 * @param analysis - What `analyzeModel` returned.
 * @returns Plain text, lines joined with `\n`.
 * @example
 * ```ts
 * console.log(reportForces(analyzeModel(parseModel(json))));
 * ```
 */
export function reportForces(analysis: ModelAnalysis): string {
  const u = analysis.units;
  const out: string[] = ["REACTIONS (force positive upward, moment positive counterclockwise)", ""];
  const forceScale = analysis.reactions.reduce((s, r) => s + Math.abs(r.force), 0);
  const momentScale = analysis.reactions.reduce((s, r) => s + Math.abs(r.moment), 0) + forceScale * analysis.model.length;
  out.push(
    indent(
      textTable([
        ["support", "type", "at", "force", "moment"],
        ...analysis.reactions.map((r) => [
          String(r.support + 1),
          r.kind,
          formatReportQuantity(r.at, u.length),
          formatReportQuantity(snapToZero(r.force, forceScale), u.force),
          formatReportQuantity(snapToZero(r.moment, momentScale), u.moment),
        ]),
      ]),
    ),
  );
  const sumUp = analysis.reactions.reduce((s, r) => s + r.force, 0);
  out.push(`  Sum of vertical reactions: ${formatReportQuantity(snapToZero(sumUp, forceScale), u.force)} upward`);
  out.push("", "PEAKS ALONG THE MEMBER", "");
  const row = (name: string, p: ModelPeaks, unit: string): string[] => {
    const reference = Math.max(Math.abs(p.max.value), Math.abs(p.min.value));
    return [
      name,
      formatReportQuantity(snapToZero(p.max.value, reference), unit),
      `x = ${formatReportQuantity(p.max.at, u.length)}`,
      formatReportQuantity(snapToZero(p.min.value, reference), unit),
      `x = ${formatReportQuantity(p.min.at, u.length)}`,
    ];
  };
  out.push(
    indent(
      textTable([
        ["quantity", "largest", "at", "smallest", "at"],
        row("shear force", analysis.shear, u.force),
        row("bending moment (sagging +)", analysis.moment, u.moment),
        row("slope (counterclockwise +)", analysis.slope, u.rotation),
        row("deflection (upward +)", analysis.deflection, u.deflection),
      ]),
    ),
  );
  const down = analysis.deflection.min;
  if (down.value < 0) out.push(`  Largest downward deflection: ${formatReportQuantity(-down.value, u.deflection)} at x = ${formatReportQuantity(down.at, u.length)}`);
  return out.join("\n");
}

/**
 * Section properties and extreme bending stresses as plain text; empty when the model has no
 * section.
 *
 * @param analysis - What `analyzeModel` returned.
 * @returns Plain text, lines joined with `\n`, or `""`.
 * @example
 * ```ts
 * console.log(reportSection(analyzeModel(parseModel(json))));
 * ```
 */
export function reportSection(analysis: ModelAnalysis): string {
  const s = analysis.section;
  if (s === undefined) return "";
  const u = analysis.units;
  const out: string[] = [`SECTION PROPERTIES (${s.shape}; y up, z across, about the centroid)`, ""];
  out.push(
    indent(
      textTable([
        ["property", "value"],
        ["area A", formatReportQuantity(s.area, u.area)],
        ["centroid y", formatReportQuantity(s.centroid.y, u.sectionLength)],
        ["centroid z", formatReportQuantity(s.centroid.z, u.sectionLength)],
        ["second moment I_z (bending axis)", formatReportQuantity(s.secondMomentZ, u.secondMoment)],
        ["second moment I_y", formatReportQuantity(s.secondMomentY, u.secondMoment)],
        ["product moment I_yz", formatReportQuantity(snapToZero(s.productMoment, Math.sqrt(Math.abs(s.secondMomentZ * s.secondMomentY))), u.secondMoment)],
        ["extreme fibre y, top (up from the centroid)", formatReportQuantity(s.extremes.top, u.sectionLength)],
        ["extreme fibre y, bottom", formatReportQuantity(s.extremes.bottom, u.sectionLength)],
        ["section modulus, top", formatReportQuantity(s.sectionModulus.top, u.sectionModulus)],
        ["section modulus, bottom", formatReportQuantity(s.sectionModulus.bottom, u.sectionModulus)],
      ]),
    ),
  );
  const st = analysis.stress;
  if (st !== undefined) {
    out.push("", "BENDING STRESS (sigma = -M y / I_z, tension positive)", "");
    const where = (at: number, y: number): string => `x = ${formatReportQuantity(at, u.length)}, y = ${formatReportQuantity(y, u.sectionLength)}`;
    const rows = [
      ["", "stress", "where"],
      ["largest tension", formatReportQuantity(st.tension.value, u.stress), where(st.tension.at, st.tension.y)],
      ["largest compression", formatReportQuantity(st.compression.value, u.stress), where(st.compression.at, st.compression.y)],
    ];
    if (st.shear !== undefined) rows.push(["largest shear stress", formatReportQuantity(st.shear.value, u.stress), `x = ${formatReportQuantity(st.shear.at, u.length)}`]);
    for (const p of st.shearByPart ?? []) rows.push([`largest shear stress, part ${p.part + 1}`, formatReportQuantity(p.value, u.stress), where(p.at, p.y)]);
    out.push(indent(textTable(rows)));
  }
  return out.join("\n");
}

/**
 * The checks against the model's limits, each with demand, limit, utilisation and PASS or
 * FAIL, then the overall verdict; and any warnings.
 *
 * @param analysis - What `analyzeModel` returned.
 * @returns Plain text, lines joined with `\n`.
 * @example
 * ```ts
 * console.log(reportChecks(analyzeModel(parseModel(json))));
 * ```
 */
export function reportChecks(analysis: ModelAnalysis): string {
  const out: string[] = ["CHECKS", ""];
  if (analysis.checks.length === 0) out.push("  No limits given, so nothing was checked.");
  else {
    out.push(
      indent(
        textTable([
          ["check", "demand", "limit", "utilisation", "result"],
          ...analysis.checks.map((c) => [
            c.description,
            formatReportQuantity(c.demand, c.unit),
            formatReportQuantity(c.capacity, c.unit),
            utilisationText(c.utilisation),
            c.pass ? "PASS" : "FAIL",
          ]),
        ]),
      ),
    );
    const failed = analysis.checks.filter((c) => !c.pass).length;
    out.push(
      "",
      failed === 0
        ? `  Overall: PASS (${analysis.checks.length === 1 ? "the one check passes" : `all ${analysis.checks.length} checks pass`})`
        : `  Overall: FAIL (${analysis.checks.length === 1 ? "the one check fails" : `${failed} of ${analysis.checks.length} checks fail`})`,
    );
  }
  if (analysis.warnings.length > 0) {
    out.push("", "WARNINGS", "");
    for (const w of analysis.warnings) out.push(`  - ${w.message} [${w.code}]`);
  }
  return out.join("\n");
}
