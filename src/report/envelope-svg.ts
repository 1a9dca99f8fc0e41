import type { ModelEnvelope } from "../model/index.js";
import { formatReportNumber } from "./format.js";
import { sampleDiagram } from "./sample.js";
import { linearScale, niceTicks, valueExtent } from "./scale.js";
import { svgDocument, svgElement, svgPolygon, svgPolyline, svgText } from "./svg.js";

/** What an envelope drawing shows: both bounds of one quantity over the combinations and patterns. */
export interface EnvelopeDiagramData {
  /** Heading drawn above the diagram. */
  readonly title: string;
  /** Member length, in `lengthUnit`. */
  readonly length: number;
  /** Name of the length unit. */
  readonly lengthUnit: string;
  /** The envelope (from `analysis.combinations.envelopes`), in its diagrams' units. */
  readonly envelope: ModelEnvelope;
  /** Colour of the upper bound; default a dark blue. */
  readonly upperColour?: string;
  /** Colour of the lower bound; default a dark red. */
  readonly lowerColour?: string;
}

/** Where along a bound the governing combination changes, and the combination from there on. */
export interface GoverningChange {
  /** Position, in the length unit. */
  readonly at: number;
  /** The combination (and pattern) governing from here. */
  readonly combination: string;
}

/**
 * The points where the governing combination of a bound changes: the start of every piece whose
 * governing combination differs from the piece before it (the first piece's start included).
 *
 * @example
 * ```ts
 * governingChanges(analysis.combinations!.envelopes!.moment.upper); // [{ at: 0, combination: "1.2D + 1.6L, L on span 1" }, ...]
 * ```
 */
export function governingChanges(bound: ModelEnvelope["upper"]): readonly GoverningChange[] {
  const out: GoverningChange[] = [];
  bound.diagram.pieces.forEach((p, i) => {
    const name = bound.governing[i] ?? "";
    if (i === 0 || name !== bound.governing[i - 1]) out.push({ at: p.from, combination: name });
  });
  return out;
}

const MARGIN = { left: 78, right: 28, top: 40, bottom: 46 } as const;

/**
 * Draws the envelope of one quantity along the member as a standalone SVG document: the upper
 * and lower bounds, the band between them shaded, the zero line, a short tick on each bound where
 * its governing combination changes (numbered, with a legend below naming each combination), and
 * each bound's peak labelled with its value, location and governing combination.
 *
 * @param data - The envelope to draw.
 * @param width - Width in pixels; default 760.
 * @returns SVG markup (UTF-8 XML).
 * @example
 * ```ts
 * const e = analysis.combinations!.envelopes!.moment;
 * envelopeDiagramSvg({ title: "Moment envelope", length: 12, lengthUnit: "m", envelope: e });
 * ```
 */
export function envelopeDiagramSvg(data: EnvelopeDiagramData, width = 760): string {
  const up = data.upperColour ?? "#1f4e8c";
  const low = data.lowerColour ?? "#a23b2a";
  const e = data.envelope;
  const upper = sampleDiagram(e.upper.diagram);
  const lower = sampleDiagram(e.lower.diagram);
  const changes = [...governingChanges(e.upper).map((c) => ({ ...c, bound: "upper" as const })), ...governingChanges(e.lower).map((c) => ({ ...c, bound: "lower" as const }))];
  const names = [...new Set(changes.map((c) => c.combination))];
  const legend = names.length;
  const height = 300 + 16 * legend;
  const plot = { x0: MARGIN.left, x1: width - MARGIN.right, y0: MARGIN.top, y1: 300 - MARGIN.bottom };
  const [lo, hi] = valueExtent([...upper.map((p) => p[1]), ...lower.map((p) => p[1])].filter(Number.isFinite));
  const pad = (hi - lo) * 0.12;
  const sx = linearScale([0, data.length], [plot.x0, plot.x1]);
  const sy = linearScale([lo - pad, hi + pad], [plot.y1, plot.y0]);
  const unit = e.upper.diagram.unit;
  const parts: string[] = [];
  parts.push(svgText(width / 2, 22, data.title, { "text-anchor": "middle", "font-size": 15, "font-weight": "bold" }));
  const grid = { stroke: "#d8d8d8", "stroke-width": 1 };
  for (const t of niceTicks(0, data.length, 8)) {
    parts.push(svgElement("line", { x1: sx(t), y1: plot.y0, x2: sx(t), y2: plot.y1, ...grid }));
    parts.push(svgText(sx(t), plot.y1 + 16, formatReportNumber(t), { "text-anchor": "middle", fill: "#444" }));
  }
  for (const t of niceTicks(lo, hi, 5)) {
    parts.push(svgElement("line", { x1: plot.x0, y1: sy(t), x2: plot.x1, y2: sy(t), ...grid }));
    parts.push(svgText(plot.x0 - 6, sy(t) + 4, formatReportNumber(t), { "text-anchor": "end", fill: "#444" }));
  }
  parts.push(svgElement("rect", { x: plot.x0, y: plot.y0, width: plot.x1 - plot.x0, height: plot.y1 - plot.y0, fill: "none", stroke: "#888" }));
  parts.push(svgText((plot.x0 + plot.x1) / 2, plot.y1 + 36, `x (${data.lengthUnit})`, { "text-anchor": "middle" }));
  const yMid = (plot.y0 + plot.y1) / 2;
  parts.push(svgText(18, yMid, unit, { "text-anchor": "middle", transform: `rotate(-90 18 ${yMid.toFixed(2)})` }));
  if (upper.length > 0 && lower.length > 0) {
    const band = [...upper.map(([x, v]) => [sx(x), sy(v)] as const), ...[...lower].reverse().map(([x, v]) => [sx(x), sy(v)] as const)];
    parts.push(svgPolygon(band, { fill: "#888", "fill-opacity": 0.15, stroke: "none" }));
  }
  parts.push(svgPolyline(upper.map(([x, v]) => [sx(x), sy(v)] as const), { fill: "none", stroke: up, "stroke-width": 2, "stroke-linejoin": "round", class: "upper" }));
  parts.push(svgPolyline(lower.map(([x, v]) => [sx(x), sy(v)] as const), { fill: "none", stroke: low, "stroke-width": 2, "stroke-linejoin": "round", class: "lower" }));
  parts.push(svgElement("line", { x1: plot.x0, y1: sy(0), x2: plot.x1, y2: sy(0), stroke: "#222", "stroke-width": 1.2 }));
  // where the governing combination changes: a tick across the bound, numbered as in the legend
  for (const c of changes) {
    const b = c.bound === "upper" ? e.upper.diagram : e.lower.diagram;
    const piece = b.pieces.find((p) => p.from === c.at);
    const v = piece?.coefficients[0] ?? 0;
    const x = sx(c.at);
    const y = sy(v);
    const n = names.indexOf(c.combination) + 1;
    parts.push(svgElement("line", { x1: x, y1: y - 6, x2: x, y2: y + 6, stroke: c.bound === "upper" ? up : low, "stroke-width": 1.5, class: "governing-change" }));
    parts.push(svgText(x + 3, c.bound === "upper" ? y - 8 : y + 16, String(n), { "font-size": 10, fill: c.bound === "upper" ? up : low }));
  }
  const label = (peak: ModelEnvelope["upper"]["peak"], colour: string, below: boolean): string => {
    if (!Number.isFinite(peak.value) || peak.value === 0) return "";
    const x = sx(peak.at);
    const y = sy(peak.value);
    const anchor = x < plot.x0 + 160 ? "start" : x > plot.x1 - 160 ? "end" : "middle";
    const ly = Math.min(plot.y1 - 4, Math.max(plot.y0 + 12, below ? y + 18 : y - 9));
    const text = `${formatReportNumber(peak.value)} ${unit} at x = ${formatReportNumber(peak.at)} ${data.lengthUnit}: ${peak.combination}`;
    return svgElement("circle", { cx: x, cy: y, r: 4, fill: colour, stroke: "white", "stroke-width": 1 }) + svgText(x, ly, text, { "text-anchor": anchor, "font-weight": "bold", fill: "#111", stroke: "white", "stroke-width": 3, "paint-order": "stroke" });
  };
  parts.push(label(e.upper.peak, up, false), label(e.lower.peak, low, true));
  names.forEach((name, i) => parts.push(svgText(plot.x0, 300 + 16 * i, `${i + 1}: ${name}`, { "font-size": 11, fill: "#333" })));
  return svgDocument(width, height, data.title, parts.join(""));
}
