import type { ModelAnalysis, ModelDiagram, ModelPeaks, ModelSupport } from "../../model/index.js";
import { polynomialRootsIn } from "../../math/index.js";
import { formatReportNumber, snapToZero } from "../format.js";
import { sampleDiagram } from "../sample.js";
import { svgElement, svgNumber, svgPolygon, svgPolyline } from "../svg.js";
import { escapeXml } from "../escape.js";
import { LABEL_FONT, placeLabels, textBox, type LabelAnchor, type LabelBox, type LabelCandidate, type LabelRequest, type PlacedLabel } from "./labels.js";
import { printedUnit } from "./units.js";

/** How the calculation figure is drawn. */
export interface CalculationFigureOptions {
  /** Width in SVG units (pixels at 96 per inch); default 760. */
  readonly width?: number;
  /** Write units in plain text (`kN*m`) instead of print form (`kN·m`); default false. */
  readonly plainUnits?: boolean;
  /**
   * Above this many supports, hinges and loads in all, the figure is simplified: no dimension
   * chain, no guides, no labels at jumps and zero crossings (peaks only), and `simplified` is set
   * so the caller can say so. Default 150.
   */
  readonly simplifyAbove?: number;
}

/** The calculation figure and what was placed on it. */
export interface CalculationFigure {
  /** The figure as an SVG element (no XML declaration), to inline in HTML or wrap as a file. */
  readonly svg: string;
  /** Width and height in SVG units. */
  readonly width: number;
  /** Height in SVG units. */
  readonly height: number;
  /** Every label the placer put on the figure. */
  readonly labels: readonly PlacedLabel[];
  /** Boxes the labels avoid: fixed texts, arrows, support symbols, the member, the dimension chain. */
  readonly obstacles: readonly LabelBox[];
  /** Labels that found no room, as plain text, for a list beside the figure. */
  readonly unplaced: readonly string[];
  /** True when the figure was simplified because the member has too many items to label. */
  readonly simplified: boolean;
}

const INK = "#111";
const FAINT = "#8a8a8a";
const FS = 9;
const TITLE_FS = 10;
const MEMBER_H = 160;
const PANEL_H = 112;
const BEAM_TOP = 96;
const BEAM_BOTTOM = 102;

/**
 * One figure for a calculation sheet: the member with its supports, hinges and loads, and below it
 * the shear force, bending moment and deflection, all on one shared x axis, so that a position
 * reads straight down through every plot. Supports, hinges and load positions are carried down as
 * faint guides and marked on each plot's zero line; a chain of dimensions gives every load and
 * support position; peaks, the values either side of every jump and the points of zero moment are
 * labelled, by a placer that lets no two labels, and no label and arrow, overlap (labels with no
 * room are returned in `unplaced`). Linear loads that meet are drawn as one outline (their sum).
 * Plots are drawn from the exact pieces sampled for the picture only; every labelled value is exact.
 *
 * Sign conventions as in the analysis: loads drawn in the sense they act (positive downward);
 * shear positive where dM/dx > 0; moment positive sagging, drawn upward; deflection positive upward.
 *
 * @param analysis - What `analyzeModel` returned.
 * @param options - Size, unit spelling and simplification threshold.
 * @returns The figure, its labels and obstacles (for tests), and what could not be labelled.
 * @example
 * ```ts
 * const figure = calculationFigure(analyzeModel(parseModel(json)));
 * writeFileSync("figure.svg", figureDocument(figure));
 * ```
 */
export function calculationFigure(analysis: ModelAnalysis, options: CalculationFigureOptions = {}): CalculationFigure {
  const width = Math.max(320, options.width ?? 760);
  const plain = options.plainUnits === true;
  const model = analysis.model;
  const u = analysis.units;
  const length = model.length;
  const left = 96;
  const right = width - 28;
  const X = (x: number): number => left + (x / length) * (right - left);
  const items = model.supports.length + model.hinges.length + model.loads.length;
  const simplified = items > (options.simplifyAbove ?? 150);
  const height = MEMBER_H + 3 * PANEL_H + 8;
  const d = new Drawing();

  // ---- member ----
  d.text(8, 12, "Member, supports and loads (to scale along x; loads positive downward)", TITLE_FS, "start", "bold");
  d.rect(X(0), BEAM_TOP, X(length) - X(0), BEAM_BOTTOM - BEAM_TOP, { fill: "#d9d9d9", stroke: INK, "stroke-width": 1 });
  const guides = new Set<number>();
  distributed(analysis, X, d, simplified, plain);
  for (const load of model.loads) {
    if (load.kind === "point") {
      pointArrow(d, X(load.at), load.value);
      guides.add(load.at);
      if (!simplified) d.request(`load-${d.requests.length}`, `${fmt(Math.abs(load.value))} ${printedUnit(u.force, plain)}${load.value < 0 ? " up" : ""}`, X(load.at), 36, above());
    } else if (load.kind === "couple") {
      couple(d, X(load.at), load.value);
      guides.add(load.at);
      if (!simplified) d.request(`couple-${d.requests.length}`, `${fmt(Math.abs(load.value))} ${printedUnit(u.moment, plain)} ${load.value >= 0 ? "ccw" : "cw"}`, X(load.at), 72, above());
    } else {
      guides.add(load.from);
      guides.add(load.to);
    }
  }
  model.supports.forEach((s, i) => {
    support(d, X(s.at), s, s.at <= 0 ? -1 : s.at >= length ? 1 : 0);
    guides.add(s.at);
    const note = supportNote(s, u, plain);
    if (!simplified) d.request(`support-${i}`, `${i + 1}${note === "" ? "" : ` ${note}`}`, X(s.at), 124, belowFirst());
  });
  for (const h of model.hinges) {
    d.raw(svgElement("circle", { cx: X(h), cy: (BEAM_TOP + BEAM_BOTTOM) / 2, r: 4, fill: "white", stroke: INK, "stroke-width": 1.2 }));
    d.obstacle({ x: X(h) - 5, y: BEAM_TOP - 2, width: 10, height: 10 });
    guides.add(h);
    if (!simplified) d.request(`hinge-${h}`, "hinge", X(h), (BEAM_TOP + BEAM_BOTTOM) / 2, belowFirst());
  }
  if (!simplified) dimensionChain(d, [0, length, ...guides], X, u.length, plain);

  // ---- plots ----
  const panels: readonly { key: "shear" | "moment" | "deflection"; title: string; diagram: ModelDiagram; peaks: ModelPeaks; dash?: string }[] = [
    { key: "shear", title: `Shear force V (${printedUnit(analysis.diagrams.shear.unit, plain)}), V = dM/dx`, diagram: analysis.diagrams.shear, peaks: analysis.shear },
    { key: "moment", title: `Bending moment M (${printedUnit(analysis.diagrams.moment.unit, plain)}), positive sagging, drawn up`, diagram: analysis.diagrams.moment, peaks: analysis.moment },
    { key: "deflection", title: `Deflection (${printedUnit(analysis.diagrams.deflection.unit, plain)}), positive upward`, diagram: analysis.diagrams.deflection, peaks: analysis.deflection, dash: "5 2" },
  ];
  panels.forEach((p, i) => plot(d, p, MEMBER_H + i * PANEL_H, X, analysis, simplified));

  if (!simplified) {
    for (const g of guides) {
      d.under(svgElement("line", { x1: X(g), y1: BEAM_BOTTOM, x2: X(g), y2: height - 10, stroke: FAINT, "stroke-width": 0.6, "stroke-dasharray": "2 3" }));
    }
  }
  d.text(8, height - 2, `x in ${printedUnit(u.length, plain)} from the left end`, FS, "start");
  const { placed, unplaced } = placeLabels(d.requests, d.obstacles, { x: 2, y: 2, width: width - 4, height: height - 4 });
  for (const l of placed) {
    d.raw(svgElement("circle", { cx: l.point[0], cy: l.point[1], r: 1.6, fill: INK }));
    d.raw(textElement(l.x, l.baseline, l.text, l.fontSize, l.anchor));
  }
  const svg =
    `<svg xmlns="http://www.w3.org/2000/svg" width="${width}" height="${height}" viewBox="0 0 ${width} ${height}" font-family="${escapeXml(LABEL_FONT)}" role="img">` +
    `<title>${escapeXml(`${model.name ?? "Member"}: loads, shear, moment and deflection`)}</title>` +
    d.underParts.join("") +
    d.parts.join("") +
    `</svg>`;
  return { svg, width, height, labels: placed, obstacles: d.obstacles, unplaced: unplaced.map((r) => r.text), simplified };
}

/**
 * The figure as a standalone SVG file (with the XML declaration).
 *
 * @param figure - What {@link calculationFigure} returned.
 * @example
 * ```ts
 * writeFileSync("figure.svg", figureDocument(calculationFigure(analysis)));
 * ```
 */
export function figureDocument(figure: CalculationFigure): string {
  return `<?xml version="1.0" encoding="UTF-8"?>\n${figure.svg}\n`;
}

type Scale = (x: number) => number;

/** Collects SVG parts, fixed-text and symbol obstacles, and label requests. */
class Drawing {
  readonly parts: string[] = [];
  readonly underParts: string[] = [];
  readonly obstacles: LabelBox[] = [];
  readonly requests: LabelRequest[] = [];

  raw(s: string): void {
    this.parts.push(s);
  }
  under(s: string): void {
    this.underParts.push(s);
  }
  obstacle(b: LabelBox): void {
    this.obstacles.push(b);
  }
  rect(x: number, y: number, w: number, h: number, attrs: Record<string, string | number>): void {
    this.raw(svgElement("rect", { x, y, width: w, height: h, ...attrs }));
    this.obstacle({ x, y, width: w, height: h });
  }
  /** A fixed text (title, axis value): drawn, and its box kept clear of labels. */
  text(x: number, baseline: number, text: string, fontSize: number, anchor: LabelAnchor, weight?: string): void {
    this.raw(textElement(x, baseline, text, fontSize, anchor, weight));
    this.obstacle(textBox(text, fontSize, x, baseline - 0.35 * fontSize, anchor));
  }
  request(id: string, text: string, x: number, y: number, candidates: readonly LabelCandidate[]): void {
    this.requests.push({ id, text, x, y, fontSize: FS, candidates });
    // The point itself is marked, so no other label may cover it.
    this.obstacle({ x: x - 2, y: y - 2, width: 4, height: 4 });
  }
}

function textElement(x: number, baseline: number, text: string, fontSize: number, anchor: LabelAnchor, weight?: string): string {
  return svgElement("text", { x, y: baseline, "font-size": fontSize, "text-anchor": anchor, "font-weight": weight, fill: INK }, escapeXml(text));
}

function fmt(v: number): string {
  return formatReportNumber(v, 4);
}

function above(): readonly LabelCandidate[] {
  const h = 1.2 * FS;
  return [
    { dx: 0, dy: -0.8 * h, anchor: "middle" },
    { dx: 6, dy: -0.8 * h, anchor: "start" },
    { dx: -6, dy: -0.8 * h, anchor: "end" },
    { dx: 0, dy: -1.8 * h, anchor: "middle" },
    { dx: 6, dy: -1.8 * h, anchor: "start" },
    { dx: -6, dy: -1.8 * h, anchor: "end" },
    { dx: 6, dy: 0.6 * h, anchor: "start" },
    { dx: -6, dy: 0.6 * h, anchor: "end" },
  ];
}

function belowFirst(): readonly LabelCandidate[] {
  const h = 1.2 * FS;
  return [
    { dx: 0, dy: 1.1 * h, anchor: "middle" },
    { dx: 0, dy: 2.2 * h, anchor: "middle" },
    { dx: 6, dy: 1.1 * h, anchor: "start" },
    { dx: -6, dy: 1.1 * h, anchor: "end" },
    { dx: 6, dy: 2.2 * h, anchor: "start" },
    { dx: -6, dy: 2.2 * h, anchor: "end" },
  ];
}

function around(side: -1 | 0 | 1): readonly LabelCandidate[] {
  const h = 1.2 * FS;
  const out: LabelCandidate[] = [];
  for (const k of [1, 2, 3]) {
    if (side <= 0) out.push({ dx: -4, dy: -k * h, anchor: "end" }, { dx: -4, dy: k * h, anchor: "end" });
    if (side >= 0) out.push({ dx: 4, dy: -k * h, anchor: "start" }, { dx: 4, dy: k * h, anchor: "start" });
    if (side === 0) out.push({ dx: 0, dy: -k * h, anchor: "middle" }, { dx: 0, dy: k * h, anchor: "middle" });
  }
  return out;
}

function pointArrow(d: Drawing, x: number, value: number): void {
  const top = 36;
  const tip = value >= 0 ? BEAM_TOP - 1 : top;
  const tail = value >= 0 ? top : BEAM_TOP - 1;
  const dir = tip > tail ? 1 : -1;
  d.raw(svgElement("line", { x1: x, y1: tail, x2: x, y2: tip - dir * 6, stroke: INK, "stroke-width": 1.6 }));
  d.raw(svgPolygon([[x, tip], [x - 4, tip - dir * 8], [x + 4, tip - dir * 8]], { fill: INK }));
  d.obstacle({ x: x - 5, y: top, width: 10, height: BEAM_TOP - top });
}

function couple(d: Drawing, x: number, value: number): void {
  const cy = (BEAM_TOP + BEAM_BOTTOM) / 2;
  const r = 14;
  // An arc over the top of the member, its head showing the sense (counterclockwise for positive).
  const ccw = value >= 0;
  const sx = ccw ? x + r : x - r;
  const ex = ccw ? x - r : x + r;
  d.raw(svgElement("path", { d: `M ${svgNumber(sx)} ${svgNumber(cy)} A ${r} ${r} 0 0 ${ccw ? 0 : 1} ${svgNumber(ex)} ${svgNumber(cy)}`, fill: "none", stroke: INK, "stroke-width": 1.4 }));
  d.raw(svgPolygon([[ex, cy + 2], [ex - 4, cy - 5], [ex + 4, cy - 5]], { fill: INK }));
  d.obstacle({ x: x - r - 5, y: cy - r - 2, width: 2 * r + 10, height: r + 8 });
}

function supportNote(s: ModelSupport, u: ModelAnalysis["units"], plain: boolean): string {
  const out: string[] = [];
  if (s.stiffness !== undefined) out.push(`k = ${fmt(s.stiffness)} ${printedUnit(u.translationalStiffness, plain)}`);
  if (s.rotationalStiffness !== undefined) out.push(`kr = ${fmt(s.rotationalStiffness)} ${printedUnit(u.rotationalStiffness, plain)}`);
  if (s.settlement !== undefined && s.settlement !== 0) out.push(`settles ${fmt(s.settlement)} ${printedUnit(u.deflection, plain)}`);
  if (s.rotation !== undefined && s.rotation !== 0) out.push(`turns ${fmt(s.rotation)} ${printedUnit(u.rotation, plain)}`);
  return out.join(", ");
}

function support(d: Drawing, x: number, s: ModelSupport, end: -1 | 0 | 1): void {
  const y = BEAM_BOTTOM;
  const parts: string[] = [];
  const groundLine = (gy: number): void => {
    parts.push(svgElement("line", { x1: x - 10, y1: gy, x2: x + 10, y2: gy, stroke: INK, "stroke-width": 1.2 }));
    for (let k = -10; k < 10; k += 4) parts.push(svgElement("line", { x1: x + k, y1: gy + 4, x2: x + k + 4, y2: gy, stroke: INK, "stroke-width": 0.7 }));
  };
  switch (s.kind) {
    case "pin":
      parts.push(svgPolygon([[x, y], [x - 8, y + 13], [x + 8, y + 13]], { fill: "white", stroke: INK, "stroke-width": 1.2 }));
      groundLine(y + 13);
      break;
    case "roller":
      parts.push(svgPolygon([[x, y], [x - 8, y + 10], [x + 8, y + 10]], { fill: "white", stroke: INK, "stroke-width": 1.2 }));
      parts.push(svgElement("circle", { cx: x - 4, cy: y + 12.5, r: 2.5, fill: "white", stroke: INK, "stroke-width": 1 }));
      parts.push(svgElement("circle", { cx: x + 4, cy: y + 12.5, r: 2.5, fill: "white", stroke: INK, "stroke-width": 1 }));
      groundLine(y + 15);
      break;
    case "fixed":
    case "guided": {
      // A wall across the member's end (or a plate under an interior point), hatched on its far side.
      const side = end === 0 ? 0 : end;
      const wx = x + side * 2;
      parts.push(svgElement("line", { x1: wx, y1: BEAM_TOP - 12, x2: wx, y2: y + 12, stroke: INK, "stroke-width": 2 }));
      for (let k = BEAM_TOP - 12; k < y + 12; k += 4) parts.push(svgElement("line", { x1: wx, y1: k + 4, x2: wx + (side === 0 ? 5 : side * 5), y2: k, stroke: INK, "stroke-width": 0.7 }));
      if (s.kind === "guided") {
        parts.push(svgElement("circle", { cx: wx - (side === 0 ? 5 : side * 5), cy: BEAM_TOP - 6, r: 2.5, fill: "white", stroke: INK }));
        parts.push(svgElement("circle", { cx: wx - (side === 0 ? 5 : side * 5), cy: y + 6, r: 2.5, fill: "white", stroke: INK }));
      }
      break;
    }
    case "spring": {
      const pts: [number, number][] = [[x, y]];
      for (let k = 1; k <= 6; k++) pts.push([x + (k % 2 === 0 ? -5 : 5), y + 2 * k]);
      pts.push([x, y + 14]);
      parts.push(svgPolyline(pts, { fill: "none", stroke: INK, "stroke-width": 1.1 }));
      groundLine(y + 14);
      break;
    }
  }
  d.raw(parts.join(""));
  d.obstacle({ x: x - 11, y: s.kind === "fixed" || s.kind === "guided" ? BEAM_TOP - 13 : y, width: 22, height: s.kind === "fixed" || s.kind === "guided" ? y + 13 - (BEAM_TOP - 13) : 20 });
}

/** The sum of every distributed load as one piecewise-linear outline: loads that meet read as one shape. */
function distributed(analysis: ModelAnalysis, X: Scale, d: Drawing, simplified: boolean, plain: boolean): void {
  const loads = analysis.model.loads.filter((l) => l.kind === "distributed");
  if (loads.length === 0) return;
  const cuts = [...new Set(loads.flatMap((l) => [l.from, l.to]))].sort((a, b) => a - b);
  const at = (x: number, side: "left" | "right"): number => {
    let w = 0;
    for (const l of loads) {
      const inRange = side === "right" ? x >= l.from && x < l.to : x > l.from && x <= l.to;
      if (inRange) w += l.start + ((l.end - l.start) * (x - l.from)) / (l.to - l.from);
    }
    return w;
  };
  const values = cuts.flatMap((c) => [at(c, "left"), at(c, "right")]);
  const biggest = Math.max(...values.map(Math.abs));
  if (biggest === 0) return;
  const mixed = values.some((v) => v < 0) && values.some((v) => v > 0);
  const base = mixed ? 68 : BEAM_TOP - 2;
  const span = mixed ? 24 : 40;
  const Y = (w: number): number => base - (w / biggest) * span;
  const outline: [number, number][] = [[X(cuts[0] as number), base]];
  for (let i = 0; i < cuts.length; i++) {
    const c = cuts[i] as number;
    outline.push([X(c), Y(at(c, "left"))], [X(c), Y(at(c, "right"))]);
  }
  outline.push([X(cuts[cuts.length - 1] as number), base]);
  d.under(svgPolygon(outline, { fill: "#efefef", stroke: INK, "stroke-width": 1.1 }));
  // Arrows at even spacing show the sense; they and the outline are obstacles for labels.
  for (let i = 0; i + 1 < cuts.length; i++) {
    const a = cuts[i] as number;
    const b = cuts[i + 1] as number;
    const wa = at(a, "right");
    const wb = at(b, "left");
    if (wa === 0 && wb === 0) continue;
    const n = Math.max(1, Math.floor((X(b) - X(a)) / 22));
    for (let k = 0; k <= n; k++) {
      const x = a + ((b - a) * k) / n;
      const w = wa + ((wb - wa) * k) / n;
      if (Math.abs(w) < 0.08 * biggest) continue;
      const y0 = Y(w);
      const dir = w > 0 ? 1 : -1;
      const tip = dir > 0 ? base : y0;
      const tail = dir > 0 ? y0 : base;
      d.under(svgElement("line", { x1: X(x), y1: tail, x2: X(x), y2: tip - dir * 3, stroke: INK, "stroke-width": 0.7 }));
      d.under(svgPolygon([[X(x), tip], [X(x) - 2, tip - dir * 4], [X(x) + 2, tip - dir * 4]], { fill: INK }));
    }
    const top = Math.min(Y(wa), Y(wb), base);
    const bottom = Math.max(Y(wa), Y(wb), base);
    d.obstacle({ x: X(a), y: top, width: X(b) - X(a), height: bottom - top });
  }
  if (simplified) return;
  const unit = printedUnit(analysis.units.forcePerLength, plain);
  cuts.forEach((c, i) => {
    const wl = at(c, "left");
    const wr = at(c, "right");
    if (wl !== 0 && wl !== wr) d.request(`w-left-${i}`, `${fmt(wl)} ${unit}`, X(c), Y(wl), around(-1));
    if (wr !== 0) d.request(`w-right-${i}`, `${fmt(wr)} ${unit}`, X(c), Y(wr), wl === wr ? around(0) : around(1));
  });
}

function dimensionChain(d: Drawing, positions: readonly number[], X: Scale, unit: string, plain: boolean): void {
  const y = 146;
  const ticks = [...new Set(positions)].sort((a, b) => a - b);
  const first = ticks[0] as number;
  const last = ticks[ticks.length - 1] as number;
  d.raw(svgElement("line", { x1: X(first), y1: y, x2: X(last), y2: y, stroke: INK, "stroke-width": 0.8 }));
  d.obstacle({ x: X(first), y: y - 1, width: X(last) - X(first), height: 2 });
  for (const t of ticks) {
    d.raw(svgElement("line", { x1: X(t) - 3, y1: y + 3, x2: X(t) + 3, y2: y - 3, stroke: INK, "stroke-width": 1 }));
    d.raw(svgElement("line", { x1: X(t), y1: y - 5, x2: X(t), y2: y + 5, stroke: INK, "stroke-width": 0.6 }));
    d.obstacle({ x: X(t) - 3.5, y: y - 5, width: 7, height: 10 });
  }
  const h = 1.2 * FS;
  for (let i = 0; i + 1 < ticks.length; i++) {
    const a = ticks[i] as number;
    const b = ticks[i + 1] as number;
    const mid = (X(a) + X(b)) / 2;
    d.requests.push({
      id: `dim-${i}`,
      text: `${fmt(b - a)}`,
      x: mid,
      y,
      fontSize: FS,
      candidates: [
        { dx: 0, dy: -0.75 * h, anchor: "middle" },
        { dx: 0, dy: 0.85 * h, anchor: "middle" },
      ],
    });
  }
  d.text(8, y + 3, `(${printedUnit(unit, plain)})`, FS, "start");
}

interface Panel {
  readonly key: "shear" | "moment" | "deflection";
  readonly title: string;
  readonly diagram: ModelDiagram;
  readonly peaks: ModelPeaks;
  readonly dash?: string;
}

function evaluate(c: readonly number[], t: number): number {
  let v = 0;
  for (let k = c.length - 1; k >= 0; k--) v = v * t + (c[k] as number);
  return v;
}

function plot(d: Drawing, p: Panel, top: number, X: Scale, analysis: ModelAnalysis, simplified: boolean): void {
  const model = analysis.model;
  const length = model.length;
  d.text(8, top + 13, p.title, TITLE_FS, "start", "bold");
  const reference = Math.max(Math.abs(p.peaks.max.value), Math.abs(p.peaks.min.value));
  const hi0 = Math.max(0, snapToZero(p.peaks.max.value, reference));
  const lo0 = Math.min(0, snapToZero(p.peaks.min.value, reference));
  const flat = hi0 === lo0;
  const hi = flat ? 1 : hi0;
  const lo = flat ? -1 : lo0;
  const yTop = top + 24;
  const yBottom = top + PANEL_H - 12;
  const Y = (v: number): number => yBottom - ((v - lo) / (hi - lo)) * (yBottom - yTop);
  const zero = Y(0);
  d.raw(svgElement("line", { x1: X(0), y1: zero, x2: X(length), y2: zero, stroke: INK, "stroke-width": 0.8 }));
  d.obstacle({ x: X(0), y: zero - 0.5, width: X(length) - X(0), height: 1 });
  d.text(X(0) - 6, zero + 3, "0", FS, "end");
  if (!flat) {
    // Axis values at the extremes of the scale, left out where they would touch the "0".
    if (hi0 > 0 && zero - Y(hi0) >= 1.4 * FS) d.text(X(0) - 6, Y(hi0) + 3, fmt(hi0), FS, "end");
    if (lo0 < 0 && Y(lo0) - zero >= 1.4 * FS) d.text(X(0) - 6, Y(lo0) + 3, fmt(lo0), FS, "end");
  }
  const points = sampleDiagram(p.diagram).map(([x, v]) => [X(x), Y(snapToZero(v, reference))] as const);
  d.under(svgPolygon([[X(0), zero], ...points, [X(length), zero]], { fill: "#ececec", stroke: "none" }));
  d.raw(svgPolyline(points, { fill: "none", stroke: INK, "stroke-width": 1.5, "stroke-dasharray": p.dash }));
  // Supports and hinges on the zero line.
  for (const s of model.supports) {
    const x = X(s.at);
    d.raw(svgPolygon([[x, zero], [x - 4, zero + 7], [x + 4, zero + 7]], { fill: "white", stroke: INK, "stroke-width": 0.9 }));
    d.obstacle({ x: x - 5, y: zero, width: 10, height: 8 });
  }
  for (const h of model.hinges) {
    d.raw(svgElement("circle", { cx: X(h), cy: zero, r: 3, fill: "white", stroke: INK, "stroke-width": 0.9 }));
    d.obstacle({ x: X(h) - 3.5, y: zero - 3.5, width: 7, height: 7 });
  }
  const peakLabel = (which: "max" | "min"): void => {
    const e = p.peaks[which];
    const v = snapToZero(e.value, reference);
    d.request(`${p.key}-${which}`, `${which} ${fmt(v)} at x = ${fmt(e.at)}`, X(e.at), Y(v), which === "max" ? peakCandidates(-1) : peakCandidates(1));
  };
  if (flat) d.request(`${p.key}-zero`, "0 everywhere", X(length / 2), zero, peakCandidates(-1));
  else {
    if (hi0 > 0) peakLabel("max");
    if (lo0 < 0) peakLabel("min");
  }
  if (simplified || flat) return;
  const pieces = p.diagram.pieces;
  const tolerance = 1e-9 * reference;
  if (p.key !== "deflection") {
    // Values either side of each jump, and at the ends where the diagram starts or ends off zero.
    for (let i = 0; i <= pieces.length; i++) {
      const before = i > 0 ? pieces[i - 1] : undefined;
      const after = i < pieces.length ? pieces[i] : undefined;
      const x = after?.from ?? before?.to ?? 0;
      const vl = before === undefined ? 0 : evaluate(before.coefficients, before.to - before.from);
      const vr = after === undefined ? 0 : evaluate(after.coefficients, 0);
      if (Math.abs(vl - vr) <= tolerance) continue;
      if (before !== undefined && Math.abs(vl) > tolerance) d.request(`${p.key}-jl-${i}`, fmt(snapToZero(vl, reference)), X(x), Y(vl), around(-1));
      if (after !== undefined && Math.abs(vr) > tolerance) d.request(`${p.key}-jr-${i}`, fmt(snapToZero(vr, reference)), X(x), Y(vr), around(1));
    }
  }
  if (p.key === "moment") {
    const roots: number[] = [];
    const out: number[] = [];
    for (const piece of pieces) {
      const w = piece.to - piece.from;
      if (!(w > 0)) continue;
      let deg = piece.coefficients.length - 1;
      while (deg > 0 && Math.abs(piece.coefficients[deg] as number) === 0) deg--;
      if (deg === 0) continue;
      out.length = 0;
      polynomialRootsIn(piece.coefficients, 0, deg, 0, w, out);
      for (const r of out) roots.push(piece.from + r);
    }
    const near = 1e-6 * length;
    const kept: number[] = [];
    for (const r of roots.sort((a, b) => a - b)) {
      if (r < near || r > length - near) continue;
      if (model.supports.some((s) => Math.abs(s.at - r) < near) || model.hinges.some((h) => Math.abs(h - r) < near)) continue;
      if (kept.length > 0 && r - (kept[kept.length - 1] as number) < near) continue;
      kept.push(r);
    }
    kept.forEach((r, i) => d.request(`moment-zero-${i}`, `0 at x = ${fmt(r)}`, X(r), zero, around(0)));
  }
}

function peakCandidates(sense: -1 | 1): readonly LabelCandidate[] {
  const h = 1.2 * FS;
  const out: LabelCandidate[] = [];
  for (const k of [0.9, 1.9, 2.9]) {
    out.push({ dx: 0, dy: sense * k * h, anchor: "middle" }, { dx: 5, dy: sense * k * h, anchor: "start" }, { dx: -5, dy: sense * k * h, anchor: "end" });
  }
  for (const k of [0.9, 1.9]) out.push({ dx: 0, dy: -sense * k * h, anchor: "middle" }, { dx: 6, dy: 0, anchor: "start" }, { dx: -6, dy: 0, anchor: "end" });
  return out;
}
