import { fc, test } from "@fast-check/vitest";
import { describe, expect } from "vitest";
import { escapeXml, svgDocument, svgElement, svgNumber, svgPolygon, svgPolyline, svgText } from "../../src/report/index.js";
import { expectWellFormedSvg } from "./svg-check.js";

describe("escapeXml", () => {
  test("escapeXml replaces the five XML special characters with entities", () => {
    // XML 1.0 (5th ed.) section 4.6: the predefined entities lt, gt, amp, apos, quot.
    expect(escapeXml(`a<b>&"c'`)).toBe("a&lt;b&gt;&amp;&quot;c&apos;");
  });
  test("escapeXml drops characters XML 1.0 forbids and keeps tab, line feed and other text", () => {
    // XML 1.0 (5th ed.) production [2] Char.
    expect(escapeXml("a\u0000b\u0007c\td\ne\uFFFEf\uD800g σ·m²")).toBe("abc\td\nefg σ·m²");
  });
  test.prop([fc.string({ unit: "binary" })], { numRuns: 200 })("escapeXml(any string) inside an element is well-formed XML", (s) => {
    expectWellFormedSvg(`<svg xmlns="http://www.w3.org/2000/svg"><text a="${escapeXml(s)}">${escapeXml(s)}</text></svg>`);
  });
});

describe("svg builders", () => {
  test("svgNumber rounds to two decimals and never writes -0 or NaN", () => {
    expect(svgNumber(12.3456)).toBe("12.35");
    expect(svgNumber(-0.001)).toBe("0");
    expect(svgNumber(Number.NaN)).toBe("0");
    expect(svgNumber(-3.5)).toBe("-3.5");
  });
  test("svgElement self-closes without children, skips undefined attributes and escapes values", () => {
    expect(svgElement("line", { x1: 0, y1: 1.005, stroke: 'a"b', fill: undefined })).toBe('<line x1="0" y1="1" stroke="a&quot;b"/>');
    expect(svgElement("g", {}, "<x/>", "<y/>")).toBe("<g><x/><y/></g>");
  });
  test("svgText escapes its text", () => {
    expect(svgText(1, 2, "M < 0 & V > 0")).toBe('<text x="1" y="2">M &lt; 0 &amp; V &gt; 0</text>');
  });
  test("svgPolyline and svgPolygon list points as x,y pairs", () => {
    expect(svgPolyline([[0, 0], [1.234, 5]], { fill: "none" })).toBe('<polyline points="0,0 1.23,5" fill="none"/>');
    expect(svgPolygon([[0, 0], [1, 0], [0, 1]], {})).toBe('<polygon points="0,0 1,0 0,1"/>');
  });
  test("svgDocument is a well-formed standalone SVG with a title", () => {
    const doc = svgDocument(200, 100, "A & B", svgText(5, 5, "x"));
    const tree = expectWellFormedSvg(doc);
    expect((tree.svg as { title: string }).title).toBe("A & B");
    expect(doc.startsWith('<?xml version="1.0" encoding="UTF-8"?>')).toBe(true);
  });
});
