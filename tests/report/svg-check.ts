// Test helpers: well-formedness with a general-purpose XML parser, and rendering to PNG with a
// general-purpose SVG renderer, so a drawing is checked by tools that are not ours.
import { mkdirSync, writeFileSync } from "node:fs";
import { join, resolve } from "node:path";
import { Resvg } from "@resvg/resvg-js";
import { XMLParser, XMLValidator } from "fast-xml-parser";
import { expect } from "vitest";

/** Fails the test unless `svg` is well-formed XML whose root is an `<svg>` element; returns the parsed tree. */
export function expectWellFormedSvg(svg: string): Record<string, unknown> {
  const verdict = XMLValidator.validate(svg);
  expect(verdict, typeof verdict === "object" ? JSON.stringify(verdict.err) : "").toBe(true);
  const tree = new XMLParser({ ignoreAttributes: false }).parse(svg) as Record<string, unknown>;
  expect(tree).toHaveProperty("svg");
  return tree;
}

/** Renders `svg` to PNG; returns the PNG bytes and the share of pixels that are not white. */
export function renderSvg(svg: string, name?: string): { png: Buffer; inked: number; width: number; height: number } {
  const image = new Resvg(svg, { font: { loadSystemFonts: true, defaultFontFamily: "DejaVu Sans" } }).render();
  const pixels = image.pixels;
  let inked = 0;
  for (let i = 0; i < pixels.length; i += 4) {
    if ((pixels[i] ?? 255) < 240 || (pixels[i + 1] ?? 255) < 240 || (pixels[i + 2] ?? 255) < 240) inked++;
  }
  const png = image.asPng();
  if (name !== undefined) {
    const dir = resolve(import.meta.dirname, "..", "..", ".tmp", "report-png");
    mkdirSync(dir, { recursive: true });
    writeFileSync(join(dir, `${name}.png`), png);
  }
  return { png, inked: inked / (pixels.length / 4), width: image.width, height: image.height };
}
