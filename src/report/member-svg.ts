import { formatReportNumber } from "./format.js";
import type { DrawnLoad, DrawnSupport, MemberDrawing } from "./member-drawing.js";
import { linearScale } from "./scale.js";
import { svgDocument, svgElement, svgPolygon, svgPolyline, svgText } from "./svg.js";

/** Size of the member drawing, in pixels. */
export interface MemberSvgOptions {
  /** Width in pixels; default 760. */
  readonly width?: number;
}

const HEIGHT = 350;
const BEAM_Y = 170;
const LOAD_COLOUR = "#b3261e";
const INK = "#222";

/**
 * Draws the member to scale along its length as a standalone SVG document: the member, its
 * supports (pin, roller, fixed, guided, spring), hinges, point loads, couples and distributed
 * loads (arrows sized by magnitude, labelled with their values and units), and a chain of
 * dimensions between the ends and the supports.
 *
 * @param member - What to draw, in the units it names.
 * @param options - Size of the drawing.
 * @returns SVG markup (UTF-8 XML).
 * @example
 * ```ts
 * memberSvg({
 *   title: "Simple span", length: 6, lengthUnit: "m", forceUnit: "kN", momentUnit: "kN*m",
 *   distributedUnit: "kN/m", hinges: [],
 *   supports: [{ at: 0, type: "pin" }, { at: 6, type: "roller" }],
 *   loads: [{ kind: "point", at: 3, value: 10 }],
 * });
 * ```
 */
export function memberSvg(member: MemberDrawing, options: MemberSvgOptions = {}): string {
  const width = options.width ?? 760;
  const sx = linearScale([0, member.length], [70, width - 70]);
  const parts: string[] = [];
  parts.push(svgText(width / 2, 24, member.title, { "text-anchor": "middle", "font-size": 15, "font-weight": "bold" }));
  parts.push(distributedLoads(member, sx));
  parts.push(svgElement("rect", { x: sx(0), y: BEAM_Y - 4, width: sx(member.length) - sx(0), height: 8, fill: "#9aa5b1", stroke: INK, "stroke-width": 1.2 }));
  for (const s of member.supports) parts.push(supportMark(s, member.length, sx(s.at)));
  for (const h of member.hinges) parts.push(svgElement("circle", { cx: sx(h), cy: BEAM_Y, r: 5, fill: "white", stroke: INK, "stroke-width": 1.5 }));
  parts.push(pointLoads(member, sx));
  parts.push(dimensions(member, sx));
  parts.push(
    svgText(width / 2, HEIGHT - 12, "Drawn to scale along the member; arrows sized by load. Forces positive downward, couples positive counterclockwise.", {
      "text-anchor": "middle",
      "font-size": 11,
      fill: "#555",
    }),
  );
  return svgDocument(width, HEIGHT, member.title, parts.join(""));
}

type Scale = (v: number) => number;

function arrow(x: number, yTail: number, yTip: number): string {
  const dir = yTip > yTail ? 1 : -1;
  return (
    svgElement("line", { x1: x, y1: yTail, x2: x, y2: yTip - dir * 7, stroke: LOAD_COLOUR, "stroke-width": 2 }) +
    svgPolygon(
      [
        [x, yTip],
        [x - 4.5, yTip - dir * 9],
        [x + 4.5, yTip - dir * 9],
      ],
      { fill: LOAD_COLOUR },
    )
  );
}

function pointLoads(member: MemberDrawing, sx: Scale): string {
  const loads = member.loads;
  const biggest = Math.max(0, ...loads.map((l) => (l.kind === "point" ? Math.abs(l.value) : 0)));
  const parts: string[] = [];
  for (const load of loads) parts.push(pointOrCouple(load, member, sx, biggest));
  return parts.join("");
}

function pointOrCouple(load: DrawnLoad, member: MemberDrawing, sx: Scale, biggest: number): string {
  switch (load.kind) {
    case "distributed":
      return "";
    case "point": {
      const x = sx(load.at);
      const size = 40 + 60 * (biggest > 0 ? Math.abs(load.value) / biggest : 1);
      const down = load.value >= 0;
      const yTip = down ? BEAM_Y - 5 : BEAM_Y - 5 - size;
      const yTail = down ? BEAM_Y - 5 - size : BEAM_Y - 5;
      const label = `${formatReportNumber(Math.abs(load.value))} ${member.forceUnit}${down ? "" : " up"}`;
      return arrow(x, yTail, yTip) + svgText(x, BEAM_Y - size - 12, label, { "text-anchor": "middle", fill: LOAD_COLOUR, "font-weight": "bold" });
    }
    case "moment": {
      const x = sx(load.at);
      const r = 20;
      const ccw = load.value >= 0;
      // An arc of three quarters of a turn around the point, open at the bottom, arrowhead at its end.
      const start: readonly [number, number] = [x - r * Math.SQRT1_2, BEAM_Y + r * Math.SQRT1_2];
      const end: readonly [number, number] = [x + r * Math.SQRT1_2, BEAM_Y + r * Math.SQRT1_2];
      const [from, to] = ccw ? [end, start] : [start, end];
      const sweep = ccw ? 0 : 1;
      const path = `M ${from[0].toFixed(2)} ${from[1].toFixed(2)} A ${r} ${r} 0 1 ${sweep} ${to[0].toFixed(2)} ${to[1].toFixed(2)}`;
      const head = ccw
        ? [to, [to[0] + 9, to[1] - 1], [to[0] + 3, to[1] - 8]]
        : [to, [to[0] - 9, to[1] - 1], [to[0] - 3, to[1] - 8]];
      const label = `${formatReportNumber(Math.abs(load.value))} ${member.momentUnit} ${ccw ? "ccw" : "cw"}`;
      return (
        svgElement("path", { d: path, fill: "none", stroke: LOAD_COLOUR, "stroke-width": 2 }) +
        svgPolygon(head as readonly (readonly [number, number])[], { fill: LOAD_COLOUR }) +
        svgText(x, BEAM_Y + r + 30, label, { "text-anchor": "middle", fill: LOAD_COLOUR, "font-weight": "bold" })
      );
    }
  }
}

function distributedLoads(member: MemberDrawing, sx: Scale): string {
  const loads = member.loads.filter((l): l is Extract<DrawnLoad, { kind: "distributed" }> => l.kind === "distributed");
  const biggest = Math.max(0, ...loads.map((l) => Math.max(Math.abs(l.start), Math.abs(l.end))));
  // Bands are stacked one above the other so that none hides another; the whole stack stays
  // within about 80 pixels, each band at least 12 pixels high, sized by its intensity.
  const room = Math.max(40, 80 / Math.max(1, loads.length));
  const height = (w: number): number => (biggest > 0 ? 12 + (room - 12) * (Math.abs(w) / biggest) : 12);
  const parts: string[] = [];
  let base = BEAM_Y - 6;
  for (const l of loads) {
    const x0 = sx(l.from);
    const x1 = sx(l.to);
    const top0 = base - height(l.start);
    const top1 = base - height(l.end);
    parts.push(svgPolygon([[x0, base], [x0, top0], [x1, top1], [x1, base]], { fill: LOAD_COLOUR, "fill-opacity": 0.12, stroke: LOAD_COLOUR, "stroke-width": 1 }));
    const count = Math.max(2, Math.round((x1 - x0) / 28) + 1);
    for (let i = 0; i < count; i++) {
      const t = i / (count - 1);
      const x = x0 + t * (x1 - x0);
      const w = l.start + t * (l.end - l.start);
      const top = top0 + t * (top1 - top0);
      if (Math.abs(w) > 0) parts.push(w >= 0 ? arrow(x, top, base) : arrow(x, base, top));
    }
    const same = l.start === l.end;
    const label = same
      ? `${formatReportNumber(l.start)} ${member.distributedUnit}`
      : `${formatReportNumber(l.start)} to ${formatReportNumber(l.end)} ${member.distributedUnit}`;
    parts.push(
      svgText((x0 + x1) / 2, Math.min(top0, top1) - 4, label, { "text-anchor": "middle", fill: LOAD_COLOUR, stroke: "white", "stroke-width": 3, "paint-order": "stroke" }),
    );
    base = Math.min(top0, top1) - 16;
  }
  return parts.join("");
}

function ground(x: number, y: number, half: number): string {
  const parts = [svgElement("line", { x1: x - half, y1: y, x2: x + half, y2: y, stroke: INK, "stroke-width": 1.5 })];
  for (let hx = x - half + 4; hx <= x + half; hx += 6) parts.push(svgElement("line", { x1: hx, y1: y, x2: hx - 5, y2: y + 6, stroke: INK }));
  return parts.join("");
}

function wall(x: number, side: -1 | 1): string {
  const parts = [svgElement("line", { x1: x, y1: BEAM_Y - 26, x2: x, y2: BEAM_Y + 26, stroke: INK, "stroke-width": 2 })];
  for (let y = BEAM_Y - 24; y <= BEAM_Y + 26; y += 6) parts.push(svgElement("line", { x1: x, y1: y, x2: x + side * 6, y2: y - 5, stroke: INK }));
  return parts.join("");
}

function supportMark(support: DrawnSupport, length: number, x: number): string {
  const top = BEAM_Y + 4;
  const side: -1 | 1 = support.at < length / 2 ? -1 : 1;
  switch (support.type) {
    case "pin":
      return svgPolygon([[x, top], [x - 12, top + 22], [x + 12, top + 22]], { fill: "white", stroke: INK, "stroke-width": 1.5 }) + ground(x, top + 22, 18);
    case "roller":
      return (
        svgPolygon([[x, top], [x - 12, top + 18], [x + 12, top + 18]], { fill: "white", stroke: INK, "stroke-width": 1.5 }) +
        svgElement("circle", { cx: x - 6, cy: top + 22, r: 3.5, fill: "white", stroke: INK }) +
        svgElement("circle", { cx: x + 6, cy: top + 22, r: 3.5, fill: "white", stroke: INK }) +
        ground(x, top + 26, 18)
      );
    case "fixed":
      return wall(x, side);
    case "guided":
      return (
        wall(x + side * 10, side) +
        svgElement("circle", { cx: x + side * 5, cy: BEAM_Y - 9, r: 4, fill: "white", stroke: INK }) +
        svgElement("circle", { cx: x + side * 5, cy: BEAM_Y + 9, r: 4, fill: "white", stroke: INK })
      );
    case "spring": {
      const zig: [number, number][] = [[x, top]];
      for (let i = 1; i <= 6; i++) zig.push([x + (i % 2 === 0 ? -7 : 7), top + 4 * i]);
      zig.push([x, top + 28]);
      return svgPolyline(zig, { fill: "none", stroke: INK, "stroke-width": 1.5 }) + ground(x, top + 28, 14);
    }
  }
}

function dimensions(member: MemberDrawing, sx: Scale): string {
  const y = BEAM_Y + 95;
  const stations = [...new Set([0, member.length, ...member.supports.map((s) => s.at)])].sort((a, b) => a - b);
  const parts: string[] = [];
  const style = { stroke: "#555", "stroke-width": 1 };
  parts.push(svgElement("line", { x1: sx(0), y1: y, x2: sx(member.length), y2: y, ...style }));
  for (const s of stations) parts.push(svgElement("line", { x1: sx(s), y1: y - 6, x2: sx(s), y2: y + 6, ...style }));
  for (let i = 1; i < stations.length; i++) {
    const a = stations[i - 1] ?? 0;
    const b = stations[i] ?? 0;
    parts.push(svgText((sx(a) + sx(b)) / 2, y - 5, `${formatReportNumber(b - a)} ${member.lengthUnit}`, { "text-anchor": "middle", fill: "#333" }));
  }
  parts.push(svgElement("line", { x1: sx(0), y1: y + 28, x2: sx(member.length), y2: y + 28, ...style }));
  parts.push(svgElement("line", { x1: sx(0), y1: y + 22, x2: sx(0), y2: y + 34, ...style }));
  parts.push(svgElement("line", { x1: sx(member.length), y1: y + 22, x2: sx(member.length), y2: y + 34, ...style }));
  parts.push(svgText((sx(0) + sx(member.length)) / 2, y + 23, `L = ${formatReportNumber(member.length)} ${member.lengthUnit}`, { "text-anchor": "middle", fill: "#333", "font-weight": "bold" }));
  return parts.join("");
}
