import { formatReportNumber } from "./format.js";
import { linearScale, niceTicks, valueExtent } from "./scale.js";
import { svgDocument, svgElement, svgPolygon, svgPolyline, svgText } from "./svg.js";

/** A labelled extreme on a diagram: a value and where along the member it occurs. */
export interface DiagramPeak {
  /** Distance from the left end, in the diagram's length unit. */
  readonly at: number;
  /** The value there, in the diagram's value unit, with the sign convention of the quantity drawn. */
  readonly value: number;
  /** A short name shown before the value, such as `"max"` or `"min"`. */
  readonly name: string;
}

/**
 * What a diagram along the member shows: one quantity (shear, moment, slope or deflection)
 * sampled as points in order of x. Two points with the same x draw a jump (a point load under
 * a shear diagram, a couple under a moment diagram).
 */
export interface LineDiagramData {
  /** Heading drawn above the diagram, such as `"Bending moment (positive = sagging)"`. */
  readonly title: string;
  /** Member length, in `lengthUnit`; the horizontal axis runs from 0 to this. */
  readonly length: number;
  /** Name of the length unit, such as `"m"`. */
  readonly lengthUnit: string;
  /** Name of the value unit, such as `"kN*m"`. */
  readonly valueUnit: string;
  /** Points `[x, value]` in order of x, x in `lengthUnit` and value in `valueUnit`. */
  readonly points: readonly (readonly [number, number])[];
  /** Extremes to mark and label. */
  readonly peaks: readonly DiagramPeak[];
  /** Colour of the curve and its fill (any SVG colour); default a dark blue. */
  readonly colour?: string;
}

/** Size of a diagram drawing, in pixels. */
export interface LineDiagramOptions {
  /** Width in pixels; default 760. */
  readonly width?: number;
  /** Height in pixels; default 280. */
  readonly height?: number;
}

const MARGIN = { left: 78, right: 28, top: 40, bottom: 46 } as const;

/**
 * Draws a quantity along the member as a standalone SVG document: the curve with the area to
 * the zero line shaded, round ticks on both axes, the zero line, and each peak marked with a dot
 * and labelled with its value and location. The horizontal scale is the member's length; the
 * vertical scale always includes zero. Positive values are drawn upward.
 *
 * @param data - The sampled quantity and its peaks.
 * @param options - Size of the drawing.
 * @returns SVG markup (UTF-8 XML).
 * @example
 * ```ts
 * const svg = lineDiagramSvg({
 *   title: "Shear", length: 4, lengthUnit: "m", valueUnit: "kN",
 *   points: [[0, 5], [2, 5], [2, -5], [4, -5]],
 *   peaks: [{ name: "max", at: 0, value: 5 }],
 * });
 * ```
 */
export function lineDiagramSvg(data: LineDiagramData, options: LineDiagramOptions = {}): string {
  const width = options.width ?? 760;
  const height = options.height ?? 280;
  const colour = data.colour ?? "#1f4e8c";
  const plot = { x0: MARGIN.left, x1: width - MARGIN.right, y0: MARGIN.top, y1: height - MARGIN.bottom };
  const points = data.points.filter(([x, v]) => Number.isFinite(x) && Number.isFinite(v));
  const [lo, hi] = valueExtent([...points.map((p) => p[1]), ...data.peaks.map((p) => p.value)]);
  const pad = (hi - lo) * 0.12;
  const sx = linearScale([0, data.length], [plot.x0, plot.x1]);
  const sy = linearScale([lo - pad, hi + pad], [plot.y1, plot.y0]);
  const parts: string[] = [];
  parts.push(svgText(width / 2, 22, data.title, { "text-anchor": "middle", "font-size": 15, "font-weight": "bold" }));
  parts.push(axes(data, plot, sx, sy, [lo, hi]));
  if (points.length > 0) {
    const first = points[0] ?? [0, 0];
    const last = points[points.length - 1] ?? [0, 0];
    const drawn = points.map(([x, v]) => [sx(x), sy(v)] as const);
    const area = [[sx(first[0]), sy(0)] as const, ...drawn, [sx(last[0]), sy(0)] as const];
    parts.push(svgPolygon(area, { fill: colour, "fill-opacity": 0.18, stroke: "none" }));
    parts.push(svgPolyline(drawn, { fill: "none", stroke: colour, "stroke-width": 2, "stroke-linejoin": "round" }));
  }
  parts.push(svgElement("line", { x1: plot.x0, y1: sy(0), x2: plot.x1, y2: sy(0), stroke: "#222", "stroke-width": 1.2 }));
  // A zero peak (the unloaded end of a moment diagram, a support's deflection) says nothing; label it
  // only when the whole diagram is zero.
  const labelled = data.peaks.filter((p) => p.value !== 0 || (lo === -1 && hi === 1 && !points.some((q) => q[1] !== 0)));
  for (const peak of labelled) parts.push(peakMark(peak, data, plot, sx, sy, colour));
  return svgDocument(width, height, data.title, parts.join(""));
}

interface Plot {
  readonly x0: number;
  readonly x1: number;
  readonly y0: number;
  readonly y1: number;
}

function axes(
  data: LineDiagramData,
  plot: Plot,
  sx: (v: number) => number,
  sy: (v: number) => number,
  extent: readonly [number, number],
): string {
  const parts: string[] = [];
  const grid = { stroke: "#d8d8d8", "stroke-width": 1 };
  for (const t of niceTicks(0, data.length, 8)) {
    const x = sx(t);
    parts.push(svgElement("line", { x1: x, y1: plot.y0, x2: x, y2: plot.y1, ...grid }));
    parts.push(svgText(x, plot.y1 + 16, formatReportNumber(t), { "text-anchor": "middle", fill: "#444" }));
  }
  for (const t of niceTicks(extent[0], extent[1], 5)) {
    const y = sy(t);
    parts.push(svgElement("line", { x1: plot.x0, y1: y, x2: plot.x1, y2: y, ...grid }));
    parts.push(svgText(plot.x0 - 6, y + 4, formatReportNumber(t), { "text-anchor": "end", fill: "#444" }));
  }
  parts.push(svgElement("rect", { x: plot.x0, y: plot.y0, width: plot.x1 - plot.x0, height: plot.y1 - plot.y0, fill: "none", stroke: "#888" }));
  parts.push(svgText((plot.x0 + plot.x1) / 2, plot.y1 + 36, `x (${data.lengthUnit})`, { "text-anchor": "middle" }));
  const yMid = (plot.y0 + plot.y1) / 2;
  parts.push(svgText(18, yMid, data.valueUnit, { "text-anchor": "middle", transform: `rotate(-90 18 ${yMid.toFixed(2)})` }));
  return parts.join("");
}

function peakMark(
  peak: DiagramPeak,
  data: LineDiagramData,
  plot: Plot,
  sx: (v: number) => number,
  sy: (v: number) => number,
  colour: string,
): string {
  if (!Number.isFinite(peak.at) || !Number.isFinite(peak.value)) return "";
  const x = sx(peak.at);
  const y = sy(peak.value);
  const label = `${peak.name} ${formatReportNumber(peak.value)} ${data.valueUnit} at x = ${formatReportNumber(peak.at)} ${data.lengthUnit}`;
  const below = peak.value < 0;
  const anchor = x < plot.x0 + 120 ? "start" : x > plot.x1 - 120 ? "end" : "middle";
  const ly = Math.min(plot.y1 - 4, Math.max(plot.y0 + 12, below ? y + 18 : y - 9));
  return (
    svgElement("circle", { cx: x, cy: y, r: 4, fill: colour, stroke: "white", "stroke-width": 1 }) +
    svgText(x, ly, label, { "text-anchor": anchor, "font-weight": "bold", fill: "#111", stroke: "white", "stroke-width": 3, "paint-order": "stroke" })
  );
}
