import { formatReportNumber } from "./format.js";
import { linearScale, valueExtent } from "./scale.js";
import { svgDocument, svgElement, svgPolygon, svgPolyline, svgText } from "./svg.js";

/** One closed outline of a cross-section, as points `[z, y]` (z horizontal, y up) in the drawing's length unit. */
export interface DrawnSectionPart {
  /** Corners in order (either winding); at least three. */
  readonly points: readonly (readonly [number, number])[];
  /** True for a hole (drawn white, over the solids). */
  readonly hole: boolean;
  /** Name of the material, shown in the legend when the section has more than one. */
  readonly material: string;
}

/** Everything the cross-section drawing shows, in the units it names. */
export interface SectionDrawing {
  /** Heading drawn above the section. */
  readonly title: string;
  /** Name of the unit of the section's dimensions, such as `"mm"`. */
  readonly lengthUnit: string;
  /** Name of the stress unit, such as `"MPa"`. */
  readonly stressUnit: string;
  /** Outlines of solids and holes. */
  readonly parts: readonly DrawnSectionPart[];
  /** The elastic centroid (of the transformed section when materials differ), `y` up and `z` across. */
  readonly centroid: {
    /** Height of the centroid, in the length unit. */
    readonly y: number;
    /** Horizontal position of the centroid, in the length unit. */
    readonly z: number;
  };
  /**
   * The bending-stress profile over the depth as points `[y, stress]` in order of y (two points
   * at the same y draw a jump, as at a change of material). Tension positive.
   */
  readonly stress: readonly (readonly [number, number])[];
  /** A line saying where the profile is taken, such as `"at x = 3 m, M = 42 kN*m"`. */
  readonly stressNote: string;
}

const WIDTH = 760;
const HEIGHT = 420;
const MATERIAL_FILLS = ["#9aa5b1", "#d9b779", "#8fb996", "#c49bbb"] as const;
const TENSION = "#b3261e";
const COMPRESSION = "#1f4e8c";

/**
 * Draws a cross-section and its bending-stress profile side by side as a standalone SVG
 * document: the outlines to scale (holes white, one fill per material), the centroid, the neutral
 * axis (a dashed line through the centroid, for bending about z) carried across to the stress
 * profile, and the profile sigma = -M y / I over the depth with the extreme-fibre values labelled.
 *
 * @param section - What to draw, in the units it names.
 * @returns SVG markup (UTF-8 XML).
 * @example
 * ```ts
 * sectionSvg({
 *   title: "Rectangle 100 x 200", lengthUnit: "mm", stressUnit: "MPa",
 *   parts: [{ points: [[-50, -100], [50, -100], [50, 100], [-50, 100]], hole: false, material: "steel" }],
 *   centroid: { y: 0, z: 0 },
 *   stress: [[-100, 60], [100, -60]],
 *   stressNote: "at x = 3 m, M = 40 kN*m",
 * });
 * ```
 */
export function sectionSvg(section: SectionDrawing): string {
  const all = section.parts.flatMap((p) => p.points).filter(([z, y]) => Number.isFinite(z) && Number.isFinite(y));
  const zs = all.map((p) => p[0]);
  const ys = all.map((p) => p[1]);
  const zMin = Math.min(section.centroid.z, ...zs);
  const zMax = Math.max(section.centroid.z, ...zs);
  const yMin = Math.min(section.centroid.y, ...ys);
  const yMax = Math.max(section.centroid.y, ...ys);
  const box = { left: 60, right: 340, top: 84, bottom: HEIGHT - 60 };
  const size = Math.max(zMax - zMin, yMax - yMin) || 1;
  const k = Math.min(box.right - box.left, box.bottom - box.top) / size;
  const zMid = (zMin + zMax) / 2;
  const yMid = (yMin + yMax) / 2;
  const cx = (box.left + box.right) / 2;
  const cy = (box.top + box.bottom) / 2;
  const px = (z: number): number => cx + (z - zMid) * k;
  const py = (y: number): number => cy - (y - yMid) * k;
  const parts: string[] = [];
  parts.push(svgText(WIDTH / 2, 24, section.title, { "text-anchor": "middle", "font-size": 15, "font-weight": "bold" }));
  const materials = [...new Set(section.parts.map((p) => p.material))];
  const fill = (m: string): string => MATERIAL_FILLS[materials.indexOf(m) % MATERIAL_FILLS.length] ?? "#9aa5b1";
  for (const part of [...section.parts.filter((p) => !p.hole), ...section.parts.filter((p) => p.hole)]) {
    const pts = part.points.map(([z, y]) => [px(z), py(y)] as const);
    parts.push(svgPolygon(pts, { fill: part.hole ? "white" : fill(part.material), stroke: "#222", "stroke-width": 1.2, "stroke-linejoin": "round" }));
  }
  if (materials.length > 1) {
    materials.forEach((m, i) => {
      parts.push(svgElement("rect", { x: 20 + i * 140, y: HEIGHT - 30, width: 14, height: 14, fill: fill(m), stroke: "#222" }));
      parts.push(svgText(40 + i * 140, HEIGHT - 18, m));
    });
  }
  const gx = px(section.centroid.z);
  const gy = py(section.centroid.y);
  parts.push(svgElement("line", { x1: 30, y1: gy, x2: WIDTH - 30, y2: gy, stroke: "#333", "stroke-width": 1.2, "stroke-dasharray": "8 5" }));
  parts.push(svgText(WIDTH - 30, gy - 6, "neutral axis", { "text-anchor": "end", fill: "#333" }));
  parts.push(svgElement("circle", { cx: gx, cy: gy, r: 7, fill: "white", stroke: "#000", "stroke-width": 1.5 }));
  parts.push(svgPolygon([[gx, gy], [gx + 7, gy], [gx, gy - 7]], { fill: "#000" }));
  parts.push(svgPolygon([[gx, gy], [gx - 7, gy], [gx, gy + 7]], { fill: "#000" }));
  parts.push(svgText(gx + 10, gy + 18, "centroid", { fill: "#000", stroke: "white", "stroke-width": 3, "paint-order": "stroke" }));
  parts.push(depthLabels(section, yMin, yMax, py, box.left - 14));
  parts.push(stressProfile(section, py, yMin, yMax));
  return svgDocument(WIDTH, HEIGHT, section.title, parts.join(""));
}

function depthLabels(section: SectionDrawing, yMin: number, yMax: number, py: (y: number) => number, x: number): string {
  const c = section.centroid.y;
  const style = { stroke: "#555", "stroke-width": 1 };
  const label = (v: number): string => `${formatReportNumber(v)} ${section.lengthUnit}`;
  const parts = [
    svgElement("line", { x1: x, y1: py(yMax), x2: x, y2: py(yMin), ...style }),
    ...[yMax, c, yMin].map((y) => svgElement("line", { x1: x - 5, y1: py(y), x2: x + 5, y2: py(y), ...style })),
  ];
  const text = (y: number, t: string): string =>
    svgText(x - 4, y, t, { "text-anchor": "middle", "font-size": 11, fill: "#333", transform: `rotate(-90 ${(x - 4).toFixed(2)} ${y.toFixed(2)})` });
  if (py(yMax) < py(c) - 30) parts.push(text((py(yMax) + py(c)) / 2, label(yMax - c)));
  if (py(c) < py(yMin) - 30) parts.push(text((py(c) + py(yMin)) / 2, label(c - yMin)));
  return parts.join("");
}

function stressProfile(section: SectionDrawing, py: (y: number) => number, yMin: number, yMax: number): string {
  const points = section.stress.filter(([y, s]) => Number.isFinite(y) && Number.isFinite(s));
  const [lo, hi] = valueExtent(points.map((p) => p[1]));
  const reach = Math.max(Math.abs(lo), Math.abs(hi));
  const sx = linearScale([-reach, reach], [430, 700]);
  const parts: string[] = [];
  const x0 = sx(0);
  parts.push(svgText(565, 46, `Bending stress (${section.stressUnit}), tension positive`, { "text-anchor": "middle", "font-weight": "bold" }));
  parts.push(svgText(565, 62, section.stressNote, { "text-anchor": "middle", "font-size": 11, fill: "#444" }));
  parts.push(svgElement("line", { x1: x0, y1: py(yMax) - 10, x2: x0, y2: py(yMin) + 10, stroke: "#222", "stroke-width": 1.2 }));
  parts.push(svgText(sx(-reach), py(yMin) + 34, "compression", { "text-anchor": "start", fill: COMPRESSION }));
  parts.push(svgText(sx(reach), py(yMin) + 34, "tension", { "text-anchor": "end", fill: TENSION }));
  if (points.length < 2) return parts.join("");
  for (let i = 1; i < points.length; i++) {
    const [ya, sa] = points[i - 1] ?? [0, 0];
    const [yb, sb] = points[i] ?? [0, 0];
    if (ya === yb) continue;
    // Split a band that crosses zero stress so each piece takes the colour of its sign.
    const pieces: (readonly [number, number])[][] = [];
    if (sa * sb < 0) {
      const yz = ya + ((yb - ya) * sa) / (sa - sb);
      pieces.push([[ya, sa], [yz, 0]], [[yz, 0], [yb, sb]]);
    } else pieces.push([[ya, sa], [yb, sb]]);
    for (const [[y1, s1], [y2, s2]] of pieces as [[number, number], [number, number]][]) {
      const colour = s1 + s2 >= 0 ? TENSION : COMPRESSION;
      parts.push(svgPolygon([[x0, py(y1)], [sx(s1), py(y1)], [sx(s2), py(y2)], [x0, py(y2)]], { fill: colour, "fill-opacity": 0.25, stroke: "none" }));
    }
  }
  parts.push(svgPolyline(points.map(([y, s]) => [sx(s), py(y)] as const), { fill: "none", stroke: "#222", "stroke-width": 1.8 }));
  const first = points[0];
  const last = points[points.length - 1];
  for (const p of [first, last]) {
    if (p === undefined) continue;
    const [y, s] = p;
    const above = p === last;
    parts.push(
      svgText(Math.min(WIDTH - 60, Math.max(460, sx(s))), py(y) + (above ? -6 : 16), `${formatReportNumber(s)} ${section.stressUnit}`, {
        "text-anchor": "middle",
        "font-weight": "bold",
        fill: s >= 0 ? TENSION : COMPRESSION,
      }),
    );
  }
  return parts.join("");
}
