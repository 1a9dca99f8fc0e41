import type { Model, ModelLoad, ModelSection, ModelSupport } from "../model/index.js";
import { formatReportNumber, formatReportQuantity, textTable } from "./format.js";

/**
 * The inputs section of the text report: units, length, stiffness, section and material,
 * supports, hinges, loads and limits, each value with its unit.
 *
 * @param model - A parsed model (every number in its own units).
 * @returns Plain text, lines joined with `\n`.
 * @example
 * ```ts
 * console.log(reportInputs(parseModel(json)));
 * ```
 */
export function reportInputs(model: Model): string {
  const u = model.units;
  const out: string[] = ["INPUTS", ""];
  out.push(
    `  Units: length ${u.length}, force ${u.force}, moment ${u.moment}, distributed load ${u.forcePerLength}, ` +
      `deflection ${u.deflection}, stress ${u.stress}, section ${u.sectionLength}`,
  );
  out.push(`  Member length: ${formatReportQuantity(model.length, u.length)}`);
  out.push(...stiffnessLines(model));
  out.push("", "  Supports:");
  out.push(indent(textTable([["#", "type", "at", "stiffness", "settlement"], ...model.supports.map((s, i) => supportRow(model, s, i))])));
  if (model.hinges.length > 0) out.push("", `  Hinges at: ${model.hinges.map((h) => formatReportQuantity(h, u.length)).join(", ")}`);
  out.push("", "  Loads (forces positive downward, couples positive counterclockwise):");
  if (model.loads.length === 0) out.push("    none");
  else out.push(indent(textTable([["#", "type", "position", "value", "case"], ...model.loads.map((l, i) => loadRow(model, l, i))])));
  out.push("", `  Limits: ${limitsLine(model)}`);
  return out.join("\n");
}

function indent(text: string): string {
  return text
    .split("\n")
    .map((l) => `    ${l}`)
    .join("\n");
}

function stiffnessLines(model: Model): string[] {
  const u = model.units;
  const lines: string[] = [];
  if (model.E !== undefined) lines.push(`  Modulus of elasticity E: ${formatReportQuantity(model.E, u.modulus)}`);
  if (model.I !== undefined) lines.push(`  Second moment of area I: ${formatReportQuantity(model.I, u.secondMoment)}`);
  if (model.segments !== undefined && model.segments.length > 0) {
    lines.push("  Segments of constant stiffness:");
    lines.push(
      indent(
        textTable([
          ["from", "to", "E", "I"],
          ...model.segments.map((s) => [
            formatReportQuantity(s.from, u.length),
            formatReportQuantity(s.to, u.length),
            formatReportQuantity(s.E, u.modulus),
            formatReportQuantity(s.I, u.secondMoment),
          ]),
        ]),
      ),
    );
  }
  if (model.section !== undefined) {
    const dims = sectionDimensions(model.section, u.sectionLength);
    lines.push(`  Section: ${model.section.shape}${dims === "" ? "" : ` (${dims})`}`);
  }
  if (model.material !== undefined) {
    const m = model.material;
    const name = m.name === undefined ? "" : `${m.name}, `;
    const fy = m.yieldStrength === undefined ? "" : `, yield strength ${formatReportQuantity(m.yieldStrength, u.stress)}`;
    lines.push(`  Material: ${name}E ${formatReportQuantity(m.E, u.modulus)}${fy}`);
  }
  return lines;
}

function supportRow(model: Model, s: ModelSupport, i: number): string[] {
  const u = model.units;
  const stiffness: string[] = [];
  if (s.stiffness !== undefined) stiffness.push(formatReportQuantity(s.stiffness, u.translationalStiffness));
  if (s.rotationalStiffness !== undefined) stiffness.push(formatReportQuantity(s.rotationalStiffness, u.rotationalStiffness));
  const settlement: string[] = [];
  if (s.settlement !== undefined) settlement.push(`${formatReportQuantity(s.settlement, u.deflection)} down`);
  if (s.rotation !== undefined) settlement.push(`rotation ${formatReportQuantity(s.rotation, u.rotation)}`);
  return [String(i + 1), s.kind, formatReportQuantity(s.at, u.length), stiffness.join(", ") || "-", settlement.join(", ") || "-"];
}

function loadRow(model: Model, l: ModelLoad, i: number): string[] {
  const u = model.units;
  const n = String(i + 1);
  const c = l.case ?? "-";
  switch (l.kind) {
    case "point":
      return [n, "point", `at ${formatReportQuantity(l.at, u.length)}`, formatReportQuantity(l.value, u.force), c];
    case "couple":
      return [n, "couple", `at ${formatReportQuantity(l.at, u.length)}`, formatReportQuantity(l.value, u.moment), c];
    case "distributed": {
      const value =
        l.start === l.end
          ? formatReportQuantity(l.start, u.forcePerLength)
          : `${formatReportNumber(l.start)} to ${formatReportQuantity(l.end, u.forcePerLength)}`;
      return [n, "distributed", `${formatReportNumber(l.from)} to ${formatReportQuantity(l.to, u.length)}`, value, c];
    }
  }
}

function limitsLine(model: Model): string {
  const u = model.units;
  const parts: string[] = [];
  const d = model.limits.deflection;
  if (d !== undefined) {
    switch (d.kind) {
      case "ratio":
        parts.push(`deflection span/${formatReportNumber(d.ratio)}`);
        break;
      case "length":
        parts.push(`deflection ${formatReportQuantity(d.value, u.deflection)}`);
        break;
    }
  }
  if (model.limits.bendingStress !== undefined) parts.push(`bending stress ${formatReportQuantity(model.limits.bendingStress, u.stress)}`);
  if (model.limits.shearStress !== undefined) parts.push(`shear stress ${formatReportQuantity(model.limits.shearStress, u.stress)}`);
  return parts.length === 0 ? "none given" : parts.join("; ");
}

/** The section's dimensions as one line: named dimensions, plates, or the count of parts. */
function sectionDimensions(section: ModelSection, unit: string): string {
  const q = (v: number): string => formatReportQuantity(v, unit);
  switch (section.shape) {
    case "plate-girder": {
      const plate = (name: string, p: { width: number; thickness: number } | undefined): string => (p === undefined ? "" : `, ${name} ${q(p.width)} x ${q(p.thickness)}`);
      return `top flange ${q(section.topFlange.width)} x ${q(section.topFlange.thickness)}, web ${q(section.web.depth)} x ${q(section.web.thickness)}${plate("bottom flange", section.bottomFlange)}`;
    }
    case "built-up": {
      const holes = section.parts.filter((p) => p.hole).length;
      const n = section.parts.length;
      return `${n} part${n === 1 ? "" : "s"}${holes === 0 ? "" : `, ${holes} of them hole${holes === 1 ? "" : "s"}`}`;
    }
    default:
      return Object.entries(section.dimensions)
        .map(([k, v]) => `${k} ${q(v)}`)
        .join(", ");
  }
}
