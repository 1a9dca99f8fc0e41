// Shared fixtures for the calculation-sheet tests: every example model analysed, and a builder of
// random valid members for the label-placement properties.
import { readFileSync, readdirSync } from "node:fs";
import { join, resolve } from "node:path";
import fc from "fast-check";
import { analyzeModel, parseModel, type ModelAnalysis } from "../../../src/model/index.js";
import { boxesOverlap, CHARACTER_ADVANCE, type LabelBox } from "../../../src/report/index.js";

export const ROOT = resolve(import.meta.dirname, "..", "..", "..");
export const EXAMPLES = join(ROOT, "examples", "models");

export interface Example {
  readonly file: string;
  readonly text: string;
  readonly analysis: ModelAnalysis;
}

export function examples(): readonly Example[] {
  return readdirSync(EXAMPLES)
    .filter((f) => f.endsWith(".json"))
    .sort()
    .map((file) => {
      const text = readFileSync(join(EXAMPLES, file), "utf8");
      return { file, text, analysis: analyzeModel(parseModel(JSON.parse(text) as unknown)) };
    });
}

/** A random member of 1 to 4 spans, with point, distributed and couple loads, in the default units. */
export const memberArbitrary = fc
  .record({
    spans: fc.array(fc.integer({ min: 2, max: 9 }), { minLength: 1, maxLength: 4 }),
    overhang: fc.constantFrom(0, 0, 1, 2),
    points: fc.array(fc.record({ t: fc.double({ min: 0, max: 1, noNaN: true }), value: fc.integer({ min: -40, max: 60 }) }), { maxLength: 6 }),
    distributed: fc.array(
      fc.record({ a: fc.double({ min: 0, max: 1, noNaN: true }), b: fc.double({ min: 0, max: 1, noNaN: true }), start: fc.integer({ min: -5, max: 15 }), end: fc.integer({ min: -5, max: 15 }) }),
      { maxLength: 3 },
    ),
    couples: fc.array(fc.record({ t: fc.double({ min: 0, max: 1, noNaN: true }), value: fc.integer({ min: -20, max: 20 }) }), { maxLength: 2 }),
    fixedLeft: fc.boolean(),
  })
  .map((r) => {
    const supportsAt: number[] = [0];
    for (const s of r.spans) supportsAt.push((supportsAt[supportsAt.length - 1] as number) + s);
    const length = (supportsAt[supportsAt.length - 1] as number) + r.overhang;
    const round = (v: number): number => Math.round(v * 100) / 100;
    return {
      format: 1,
      name: "Random member",
      length,
      E: 200000,
      I: 8e7,
      supports: supportsAt.map((at, i) => ({ type: i === 0 ? (r.fixedLeft ? "fixed" : "pin") : "roller", at })),
      loads: [
        ...r.points.filter((p) => p.value !== 0).map((p) => ({ type: "point", at: round(p.t * length), value: p.value })),
        ...r.distributed
          .map((d) => ({ from: round(Math.min(d.a, d.b) * length), to: round(Math.max(d.a, d.b) * length), start: d.start, end: d.end }))
          .filter((d) => d.to - d.from >= 0.05 && (d.start !== 0 || d.end !== 0))
          .map((d) => ({ type: "distributed", ...d })),
        ...r.couples.filter((c) => c.value !== 0).map((c) => ({ type: "moment", at: round(c.t * length), value: c.value })),
      ],
    };
  });

/** Every `<text>` of an SVG string, with the box its characters cover (monospace advance, 1.2 em high). */
export function textBoxesOf(svg: string): { text: string; box: LabelBox }[] {
  const out: { text: string; box: LabelBox }[] = [];
  for (const m of svg.matchAll(/<text ([^>]*)>([^<]*)<\/text>/g)) {
    const attrs: Record<string, string> = Object.fromEntries([...(m[1] as string).matchAll(/([\w-]+)="([^"]*)"/g)].map((a) => [a[1] as string, a[2] as string]));
    const text = (m[2] as string).replace(/&lt;/g, "<").replace(/&gt;/g, ">").replace(/&quot;/g, '"').replace(/&#39;/g, "'").replace(/&amp;/g, "&");
    const size = Number(attrs["font-size"]);
    const x = Number(attrs.x);
    const baseline = Number(attrs.y);
    const width = [...text].length * CHARACTER_ADVANCE * size;
    const anchor = attrs["text-anchor"] ?? "start";
    const left = anchor === "start" ? x : anchor === "end" ? x - width : x - width / 2;
    // Glyphs reach 0.95 em above the baseline and 0.25 em below it (DejaVu Sans Mono ascent and descent).
    out.push({ text, box: { x: left, y: baseline - 0.95 * size, width, height: 1.2 * size } });
  }
  return out;
}

/** Pairs of boxes that share area, shrunk by `slack` on every side (SVG coordinates are rounded to 0.01). */
export function overlappingPairs<T extends { box: LabelBox }>(items: readonly T[], slack = 0.05): [T, T][] {
  const shrink = (b: LabelBox): LabelBox => ({ x: b.x + slack, y: b.y + slack, width: Math.max(0, b.width - 2 * slack), height: Math.max(0, b.height - 2 * slack) });
  const out: [T, T][] = [];
  for (let i = 0; i < items.length; i++) for (let j = i + 1; j < items.length; j++) if (boxesOverlap(shrink((items[i] as T).box), shrink((items[j] as T).box))) out.push([items[i] as T, items[j] as T]);
  return out;
}
