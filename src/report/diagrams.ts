import type { ModelAnalysis, ModelDiagram, ModelPeaks } from "../model/index.js";
import { formatReportQuantity, snapToZero } from "./format.js";
import { envelopeDiagramSvg } from "./envelope-svg.js";
import { lineDiagramSvg } from "./line-diagram.js";
import type { DrawnLoad, MemberDrawing } from "./member-drawing.js";
import { memberSvg } from "./member-svg.js";
import { diagramValueAt, sampleDiagram } from "./sample.js";
import { outlines } from "../section/index.js";
import { sectionSvg, type DrawnSectionPart, type SectionDrawing } from "./section-svg.js";

/** Which picture a {@link ReportDiagram} is. */
export type ReportDiagramName = "member" | "shear" | "moment" | "deflection" | "section" | "shear-envelope" | "moment-envelope" | "deflection-envelope";

/** One SVG drawing of a report, with a name that suits a file name (`moment.svg`). */
export interface ReportDiagram {
  /** Short name, also the suggested file name without `.svg`. */
  readonly name: ReportDiagramName;
  /** The drawing's title. */
  readonly title: string;
  /** The SVG document. */
  readonly svg: string;
}

/** What to add to the drawings of {@link reportDiagrams}. */
export interface ReportDiagramsOptions {
  /**
   * Outlines of the cross-section, `[z, y]` points in the model's section-length unit. By
   * default they are drawn from the analysis's own section (`sectionGeometry`); give them to
   * draw something else.
   */
  readonly sectionOutline?: readonly DrawnSectionPart[];
}

/**
 * Every diagram of an analysed model, as SVG strings: the member with its supports and loads to
 * scale; shear, bending moment and deflection along the member with their peaks labelled; and,
 * when the model has a section, the cross-section with its centroid, neutral axis and
 * bending-stress profile at the governing stress; and, when the model has combinations, the
 * envelopes of shear, moment and deflection (both bounds, each change of governing combination
 * marked and named, the peaks labelled with their combinations). Pure: no I/O.
 *
 * @param analysis - What `analyzeModel` returned.
 * @param options - Extra drawings.
 * @returns The drawings, in the order listed above.
 * @example
 * ```ts
 * for (const d of reportDiagrams(analyzeModel(parseModel(json)))) console.log(d.name, d.svg.length);
 * ```
 */
export function reportDiagrams(analysis: ModelAnalysis, options: ReportDiagramsOptions = {}): readonly ReportDiagram[] {
  const u = analysis.units;
  const model = analysis.model;
  const name = model.name ?? "Member";
  const out: ReportDiagram[] = [];
  const member = memberDrawing(analysis, name);
  out.push({ name: "member", title: member.title, svg: memberSvg(member) });
  const line = (key: "shear" | "moment" | "deflection", title: string, diagram: ModelDiagram, peaks: ModelPeaks, colour: string): ReportDiagram => {
    const full = `${name}: ${title}`;
    const reference = Math.max(Math.abs(peaks.max.value), Math.abs(peaks.min.value));
    const svg = lineDiagramSvg({
      title: full,
      length: model.length,
      lengthUnit: u.length,
      valueUnit: diagram.unit,
      points: sampleDiagram(diagram),
      peaks: [
        { name: "max", at: peaks.max.at, value: snapToZero(peaks.max.value, reference) },
        { name: "min", at: peaks.min.at, value: snapToZero(peaks.min.value, reference) },
      ],
      colour,
    });
    return { name: key, title: full, svg };
  };
  out.push(line("shear", "shear force", analysis.diagrams.shear, analysis.shear, "#1f4e8c"));
  out.push(line("moment", "bending moment (positive = sagging)", analysis.diagrams.moment, analysis.moment, "#7a3e9d"));
  out.push(line("deflection", "deflection (positive = upward)", analysis.diagrams.deflection, analysis.deflection, "#2e7d32"));
  const section = sectionDrawing(analysis, name, options.sectionOutline ?? sectionOutlineOf(analysis));
  if (section !== undefined) out.push({ name: "section", title: section.title, svg: sectionSvg(section) });
  const env = analysis.combinations?.envelopes;
  if (env !== undefined) {
    const count = analysis.combinations?.arrangements ?? 0;
    for (const [key, title, e] of [
      ["shear-envelope", "shear force envelope", env.shear],
      ["moment-envelope", "bending moment envelope (positive = sagging)", env.moment],
      ["deflection-envelope", "deflection envelope (positive = upward)", env.deflection],
    ] as const) {
      const full = `${name}: ${title} over ${count} arrangements`;
      out.push({ name: key, title: full, svg: envelopeDiagramSvg({ title: full, length: model.length, lengthUnit: u.length, envelope: e }) });
    }
  }
  return out;
}

/** The analysis's own cross-section as outlines in the model's section-length unit. */
function sectionOutlineOf(analysis: ModelAnalysis): readonly DrawnSectionPart[] | undefined {
  const geometry = analysis.sectionGeometry;
  if (geometry === undefined) return undefined;
  const k = 1 / analysis.scale.sectionLength;
  const fallback = analysis.model.material?.name ?? "material";
  return outlines(geometry).map((o) => ({
    points: o.points.map((p) => [p.z * k, p.y * k] as const),
    hole: o.hole,
    material: geometry.parts[o.part]?.material?.name ?? fallback,
  }));
}

function memberDrawing(analysis: ModelAnalysis, name: string): MemberDrawing {
  const model = analysis.model;
  const u = analysis.units;
  const loads: DrawnLoad[] = model.loads.map((l): DrawnLoad => {
    switch (l.kind) {
      case "point":
        return { kind: "point", at: l.at, value: l.value };
      case "couple":
        return { kind: "moment", at: l.at, value: l.value };
      case "distributed":
        return { kind: "distributed", from: l.from, to: l.to, start: l.start, end: l.end };
    }
  });
  return {
    title: `${name}: supports and loads`,
    length: model.length,
    lengthUnit: u.length,
    forceUnit: u.force,
    momentUnit: u.moment,
    distributedUnit: u.forcePerLength,
    supports: model.supports.map((s) => ({ at: s.at, type: s.kind })),
    hinges: model.hinges,
    loads,
  };
}

/**
 * The section drawing's data: the profile is linear over the depth, sigma = -(M / I) y, with
 * M / I taken from the governing extreme stress (the larger magnitude of tension and
 * compression), so that it needs no unit conversion; for a section of several materials, from
 * the moment and the transformed I_z, in the model's material.
 */
function sectionDrawing(analysis: ModelAnalysis, name: string, outline: readonly DrawnSectionPart[] | undefined): SectionDrawing | undefined {
  const s = analysis.section;
  const st = analysis.stress;
  if (outline === undefined || s === undefined || st === undefined) return undefined;
  const u = analysis.units;
  const governing = Math.abs(st.tension.value) >= Math.abs(st.compression.value) ? st.tension : st.compression;
  const bottom = s.extremes.bottom;
  const top = s.extremes.top;
  const left = diagramValueAt(analysis.diagrams.moment, governing.at, "left");
  const right = diagramValueAt(analysis.diagrams.moment, governing.at, "right");
  const moment = Math.abs(left) > Math.abs(right) ? left : right;
  // Several materials: the governing stress carries its part's modular ratio, so draw -M y / I_t of
  // the reference material (the model's) from the moment itself, converted through the scale.
  const multi = governing.part !== undefined;
  const sc = analysis.scale;
  const curvature = multi
    ? (moment * sc.moment * sc.sectionLength) / (s.secondMomentZ * sc.secondMoment * sc.stress)
    : governing.y === 0
      ? 0
      : -governing.value / governing.y;
  return {
    title: `${name}: cross-section (${s.shape})`,
    lengthUnit: u.sectionLength,
    stressUnit: u.stress,
    parts: outline,
    centroid: s.centroid,
    stress: [
      [s.centroid.y + bottom, -curvature * bottom],
      [s.centroid.y + top, -curvature * top],
    ],
    stressNote: `at x = ${formatReportQuantity(governing.at, u.length)}, M = ${formatReportQuantity(moment, u.moment)}${multi ? ", reference material" : ""}`,
  };
}
