import { escapeXml } from "./escape.js";

/**
 * Attributes of one SVG element. A number is written with at most two decimals; `undefined`
 * leaves the attribute out. Every value is escaped.
 */
export type SvgAttributes = Readonly<Record<string, string | number | undefined>>;

/**
 * Formats a coordinate or length for SVG: rounded to two decimals, trailing zeros dropped,
 * never `-0`. A value that is not finite is written as `0` (a drawing never places anything
 * at infinity; the data drawn is checked before it gets here).
 *
 * @example
 * ```ts
 * svgNumber(12.3456); // "12.35"
 * svgNumber(-0.001);  // "0"
 * ```
 */
export function svgNumber(value: number): string {
  if (!Number.isFinite(value)) return "0";
  const rounded = Math.round(value * 100) / 100;
  if (Object.is(rounded, -0) || rounded === 0) return "0";
  return String(rounded);
}

/**
 * Writes one SVG (or any XML) element as a string. Children are strings already written by this
 * module (elements or {@link escapeXml}d text); an element with no children is self-closed.
 *
 * @param name - The tag name, such as `"line"`.
 * @param attributes - Attribute values, escaped here.
 * @param children - Child markup, placed as given.
 * @example
 * ```ts
 * svgElement("line", { x1: 0, y1: 0, x2: 10, y2: 5, stroke: "black" });
 * // '<line x1="0" y1="0" x2="10" y2="5" stroke="black"/>'
 * ```
 */
export function svgElement(name: string, attributes: SvgAttributes, ...children: readonly string[]): string {
  let open = `<${name}`;
  for (const [key, value] of Object.entries(attributes)) {
    if (value === undefined) continue;
    open += ` ${key}="${typeof value === "number" ? svgNumber(value) : escapeXml(value)}"`;
  }
  if (children.length === 0) return `${open}/>`;
  return `${open}>${children.join("")}</${name}>`;
}

/**
 * Writes a text element whose content is escaped.
 *
 * @param x - Anchor x in SVG user units (pixels, x to the right).
 * @param y - Baseline y in SVG user units (y down).
 * @param text - The words to show; escaped here.
 * @param attributes - More attributes, such as `text-anchor`.
 * @example
 * ```ts
 * svgText(10, 20, "M < 0"); // '<text x="10" y="20">M &lt; 0</text>'
 * ```
 */
export function svgText(x: number, y: number, text: string, attributes: SvgAttributes = {}): string {
  return svgElement("text", { x, y, ...attributes }, escapeXml(text));
}

/**
 * Writes a polyline through points given in SVG user units.
 *
 * @example
 * ```ts
 * svgPolyline([[0, 0], [10, 5]], { stroke: "black", fill: "none" });
 * ```
 */
export function svgPolyline(points: readonly (readonly [number, number])[], attributes: SvgAttributes): string {
  return svgElement("polyline", { points: pointList(points), ...attributes });
}

/**
 * Writes a closed polygon through points given in SVG user units.
 *
 * @example
 * ```ts
 * svgPolygon([[0, 0], [10, 0], [5, 8]], { fill: "grey" });
 * ```
 */
export function svgPolygon(points: readonly (readonly [number, number])[], attributes: SvgAttributes): string {
  return svgElement("polygon", { points: pointList(points), ...attributes });
}

function pointList(points: readonly (readonly [number, number])[]): string {
  return points.map(([x, y]) => `${svgNumber(x)},${svgNumber(y)}`).join(" ");
}

/**
 * Wraps drawn markup in a standalone SVG document with an XML declaration, a white background,
 * a `<title>` (shown by viewers and read by screen readers) and the default font.
 *
 * @param width - Width in pixels.
 * @param height - Height in pixels.
 * @param title - The document title (escaped).
 * @param body - Markup drawn by this module.
 * @example
 * ```ts
 * svgDocument(200, 100, "Empty", "");
 * ```
 */
export function svgDocument(width: number, height: number, title: string, body: string): string {
  const attributes = {
    xmlns: "http://www.w3.org/2000/svg",
    width,
    height,
    viewBox: `0 0 ${svgNumber(width)} ${svgNumber(height)}`,
    "font-family": "DejaVu Sans, Arial, Helvetica, sans-serif",
    "font-size": 12,
  };
  return `<?xml version="1.0" encoding="UTF-8"?>\n${svgElement(
    "svg",
    attributes,
    svgElement("title", {}, escapeXml(title)),
    svgElement("rect", { x: 0, y: 0, width, height, fill: "white" }),
    body,
  )}\n`;
}
