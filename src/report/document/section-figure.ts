import type { ModelAnalysis } from "../../model/index.js";
import { outlines, sectionProperties, type Section, type SectionProperties } from "../../section/index.js";
import { sectionShearStressProfile } from "../../stress/index.js";
import { escapeXml } from "../escape.js";
import { formatReportNumber } from "../format.js";
import { diagramValueAt } from "../sample.js";
import { svgElement, svgPolygon, svgPolyline } from "../svg.js";
import type { CalculationFigure } from "./figure.js";
import { LABEL_FONT, textBox, type LabelAnchor, type LabelBox } from "./labels.js";
import { printedUnit } from "./units.js";

/** How {@link sectionStressFigure} draws. */
export interface SectionStressFigureOptions {
  /** Write units in plain text; default false. */
  readonly plainUnits?: boolean;
}

const INK = "#111";
const FS = 9;
const WIDTH = 440;
const TOP = 34;
const BOTTOM = 222;
const DASHES = [undefined, "5 2", "1.5 2", "7 2 1.5 2"] as const;
const FILLS = ["#f4f4f4", "#bfbfbf", "#8f8f8f", "#dedede"] as const;

/**
 * The cross-section with each material's own stresses, on one shared height axis: the section to
 * scale, the bending stress sigma_i = -n_i M y / I* of every part (so the jump at each material
 * boundary shows) at the position of the governing bending stress, and the shear stress
 * tau_i = n_i V Q* / (I* b*) of each material at the position of the largest shear force. Each
 * material's peak is labelled, with its allowable where the model checks that part. Materials are
 * told apart by line style and fill as well as by name, so a black-and-white print reads.
 *
 * @param analysis - What `analyzeModel` returned; needs a section.
 * @param options - Unit spelling.
 * @returns The figure, or undefined when the model has no section.
 * @example
 * ```ts
 * const f = sectionStressFigure(analyzeModel(parseModel(flitchJson)));
 * ```
 */
export function sectionStressFigure(analysis: ModelAnalysis, options: SectionStressFigureOptions = {}): CalculationFigure | undefined {
  const geometry = analysis.sectionGeometry;
  const st = analysis.stress;
  if (geometry === undefined || st === undefined || analysis.section === undefined) return undefined;
  const plain = options.plainUnits === true;
  const sc = analysis.scale;
  const u = analysis.units;
  const props = propertiesAsAnalysed(analysis, geometry);
  const reference = props.transformed.referenceModulus ?? undefined;
  const names = materialNames(analysis, geometry, props);
  const parts = props.parts.map((p, i) => ({ ...p, index: i })).filter((p) => !p.hole);
  // Heights: the section's extreme fibres about the centroid (m).
  const yTop = props.extremes.top;
  const yBottom = props.extremes.bottom;
  const Y = (y: number): number => BOTTOM - ((y - yBottom) / (yTop - yBottom)) * (BOTTOM - TOP);
  const parts_: string[] = [];
  const under: string[] = [];
  const obstacles: LabelBox[] = [];
  const text = (x: number, baseline: number, t: string, size: number, anchor: LabelAnchor, weight?: string): void => {
    parts_.push(svgElement("text", { x, y: baseline, "font-size": size, "text-anchor": anchor, "font-weight": weight, fill: INK }, escapeXml(t)));
    obstacles.push(textBox(t, size, x, baseline - 0.35 * size, anchor));
  };


  // ---- the section, to scale ----
  const box = { left: 8, right: 118 };
  const zs = outlines(geometry).flatMap((o) => o.points.map((p) => p.z));
  const zMin = Math.min(...zs);
  const zMax = Math.max(...zs);
  // Heights share the stress panels' scale; widths are to the same scale unless the section is too wide for its box.
  const k = Math.min((box.right - box.left) / Math.max(zMax - zMin, 1e-300), (BOTTOM - TOP) / (yTop - yBottom));
  const zMid = (zMin + zMax) / 2;
  const X0 = (box.left + box.right) / 2;
  const cy = props.centroid.y;
  text(4, 12, "Section and each material's own stress", 10, "start", "bold");
  const slot = new Map<number, number>();
  names.forEach((n, i) => slot.set(i, [...new Set(names)].indexOf(n)));
  for (const o of outlines(geometry)) {
    const pts = o.points.map((p) => [X0 + (p.z - zMid) * k, Y(p.y - cy)] as const);
    const fill = o.hole ? "white" : FILLS[(slot.get(o.part) ?? 0) % FILLS.length];
    under.push(svgPolygon(pts, { fill, stroke: INK, "stroke-width": 0.9 }));
  }
  parts_.push(svgElement("line", { x1: box.left - 2, y1: Y(0), x2: box.right + 2, y2: Y(0), stroke: INK, "stroke-width": 0.6, "stroke-dasharray": "6 2 1 2" }));
  obstacles.push({ x: box.left, y: TOP, width: box.right - box.left, height: BOTTOM - TOP });

  // ---- bending stress per part ----
  const governing = Math.abs(st.tension.value) >= Math.abs(st.compression.value) ? st.tension : st.compression;
  const ml = diagramValueAt(analysis.diagrams.moment, governing.at, "left");
  const mr = diagramValueAt(analysis.diagrams.moment, governing.at, "right");
  const moment = (Math.abs(ml) >= Math.abs(mr) ? ml : mr) * sc.moment;
  const sigma = (n: number, y: number): number => (-n * moment * y) / props.secondMomentZ / sc.stress;
  const bend = { left: 134, right: 278 };
  const shear = { left: 290, right: 434 };
  const panel = (p: { left: number; right: number }, title: string, values: readonly number[]): ((v: number) => number) => {
    const big = Math.max(1e-300, ...values.map(Math.abs));
    const mid = (p.left + p.right) / 2;
    const half = (p.right - p.left) / 2 - 4;
    const S = (v: number): number => mid + (v / big) * half;
    parts_.push(svgElement("line", { x1: mid, y1: TOP - 4, x2: mid, y2: BOTTOM + 4, stroke: INK, "stroke-width": 0.8 }));
    obstacles.push({ x: mid - 0.5, y: TOP - 4, width: 1, height: BOTTOM - TOP + 8 });
    text(p.left, 26, title, FS, "start");
    return S;
  };
  const bendingValues = parts.flatMap((p) => [sigma(p.modularRatio, p.extremes.top), sigma(p.modularRatio, p.extremes.bottom)]);
  const S = panel(bend, `sigma (${printedUnit(u.stress, plain)}) at x = ${formatReportNumber(governing.at)}`, bendingValues);
  const peakByMaterial = new Map<string, { value: number; x: number; y: number; part: number }>();
  for (const p of parts) {
    const name = names[p.index] as string;
    const top = sigma(p.modularRatio, p.extremes.top);
    const bottom = sigma(p.modularRatio, p.extremes.bottom);
    const dash = DASHES[(slot.get(p.index) ?? 0) % DASHES.length];
    under.push(svgPolygon([[S(0), Y(p.extremes.bottom)], [S(bottom), Y(p.extremes.bottom)], [S(top), Y(p.extremes.top)], [S(0), Y(p.extremes.top)]], { fill: FILLS[(slot.get(p.index) ?? 0) % FILLS.length], "fill-opacity": 0.6, stroke: "none" }));
    parts_.push(svgPolyline([[S(bottom), Y(p.extremes.bottom)], [S(top), Y(p.extremes.top)]], { fill: "none", stroke: INK, "stroke-width": 1.4, "stroke-dasharray": dash }));
    for (const [v, y] of [[top, p.extremes.top], [bottom, p.extremes.bottom]] as const) {
      const seen = peakByMaterial.get(name);
      if (seen === undefined || Math.abs(v) > Math.abs(seen.value)) peakByMaterial.set(name, { value: v, x: S(v), y: Y(y), part: p.index });
    }
  }
  const legend = new Map<string, { slot: number; bending?: string; shear?: string }>();
  const unit = printedUnit(u.stress, plain);
  for (const [name, peak] of peakByMaterial) {
    const allowed = analysis.checks.find((c) => (c.kind === "bending-tension" || c.kind === "bending-compression") && (c.part ?? -1) === peak.part);
    parts_.push(svgElement("circle", { cx: peak.x, cy: peak.y, r: 2, fill: INK }));
    legend.set(name, { slot: slot.get(peak.part) ?? 0, bending: `sigma ${formatReportNumber(peak.value, 3)} ${unit}${allowed === undefined ? "" : ` (allowable ${formatReportNumber(allowed.capacity, 3)})`}` });
  }

  // ---- shear stress per material ----
  const sh = st.shear;
  if (sh !== undefined) {
    const vl = diagramValueAt(analysis.diagrams.shear, sh.at, "left");
    const vr = diagramValueAt(analysis.diagrams.shear, sh.at, "right");
    const v = (Math.abs(vl) >= Math.abs(vr) ? vl : vr) * sc.force;
    const profile = sectionShearStressProfile(v, geometry, reference === undefined ? undefined : { referenceModulus: reference });
    const series = new Map<string, [number, number][]>();
    for (const pt of profile.points) {
      const mats = pt.materials;
      if (mats === undefined || mats.length === 0) {
        const list = series.get(names[0] as string) ?? [];
        list.push([Math.abs(pt.stress) / sc.stress, pt.y]);
        series.set(names[0] as string, list);
      } else {
        for (const m of mats) {
          const name = names[m.parts[0] ?? 0] as string;
          const list = series.get(name) ?? [];
          list.push([Math.abs(m.stress) / sc.stress, m.y]);
          series.set(name, list);
        }
      }
    }
    const all = [...series.values()].flat().map(([t]) => t);
    const T = panel(shear, `tau (${printedUnit(u.stress, plain)}) at x = ${formatReportNumber(sh.at)}`, [...all, ...all.map((t) => -t)]);
    for (const [name, pts] of series) {
      const part = names.indexOf(name);
      const dash = DASHES[(slot.get(part) ?? 0) % DASHES.length];
      parts_.push(svgPolyline(pts.map(([t, y]) => [T(t), Y(y)] as const), { fill: "none", stroke: INK, "stroke-width": 1.3, "stroke-dasharray": dash }));
      const peak = pts.reduce((a, b) => (b[0] > a[0] ? b : a));
      parts_.push(svgElement("circle", { cx: T(peak[0]), cy: Y(peak[1]), r: 2, fill: INK }));
      const allowed = analysis.checks.find((c) => c.kind === "shear-stress" && (c.part ?? -1) === part);
      const entry = legend.get(name) ?? { slot: slot.get(part) ?? 0 };
      legend.set(name, { ...entry, shear: `tau ${formatReportNumber(peak[0], 3)} ${unit}${allowed === undefined ? "" : ` (allowable ${formatReportNumber(allowed.capacity, 3)})`}` });
    }
  }
  // The legend: one row per material, its fill and line style, and its own peaks (marked by dots above).
  let row = BOTTOM + 18;
  for (const [name, e] of legend) {
    parts_.push(svgElement("rect", { x: 6, y: row - 7, width: 10, height: 8, fill: FILLS[e.slot % FILLS.length], stroke: INK, "stroke-width": 0.6 }));
    parts_.push(svgElement("line", { x1: 20, y1: row - 3, x2: 40, y2: row - 3, stroke: INK, "stroke-width": 1.4, "stroke-dasharray": DASHES[e.slot % DASHES.length] }));
    text(46, row, `${name}: ${[e.bending, e.shear].filter((t) => t !== undefined).join("; ")}`, 8.5, "start");
    row += 13;
  }
  const height = row + 6;
  text(4, height - 6, `heights to scale, widths ${k < (BOTTOM - TOP) / (yTop - yBottom) ? "compressed" : "to scale"}; materials by fill and line style; tension +`, 8, "start");
  const svg =
    `<svg xmlns="http://www.w3.org/2000/svg" width="${WIDTH}" height="${height}" viewBox="0 0 ${WIDTH} ${height}" font-family="${escapeXml(LABEL_FONT)}" role="img">` +
    `<title>${escapeXml(`${analysis.model.name ?? "Member"}: section and stresses by material`)}</title>${under.join("")}${parts_.join("")}</svg>`;
  return { svg, width: WIDTH, height, labels: [], obstacles, unplaced: [], simplified: false };
}


/** The section's properties with the reference modulus the analysis used (the one whose I_z matches). */
function propertiesAsAnalysed(analysis: ModelAnalysis, geometry: Section): SectionProperties {
  const target = (analysis.section?.secondMomentZ ?? 0) * analysis.scale.secondMoment;
  const e = analysis.model.material?.E;
  const candidates = e === undefined ? [undefined] : [e * analysis.scale.modulus, undefined];
  let best: SectionProperties | undefined;
  for (const r of candidates) {
    const p = sectionProperties(geometry, r === undefined ? undefined : { referenceModulus: r });
    if (best === undefined || Math.abs(p.secondMomentZ - target) < Math.abs(best.secondMomentZ - target)) best = p;
  }
  return best as SectionProperties;
}

/** A display name per part: its material's name, else "part n" (from 1), grouped by modular ratio. */
function materialNames(analysis: ModelAnalysis, geometry: Section, props: SectionProperties): readonly string[] {
  const fallback = analysis.model.material?.name;
  return props.parts.map((p, i) => {
    const own = geometry.parts[i]?.material?.name;
    if (own !== undefined) return own;
    if (p.modularRatio === 1 && fallback !== undefined) return fallback;
    return `n = ${formatReportNumber(p.modularRatio, 3)}`;
  });
}
