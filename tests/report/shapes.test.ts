import { describe, expect, test } from "vitest";
import { analyzeModel, parseModel } from "../../src/model/index.js";
import { reportDiagrams, textReport } from "../../src/report/index.js";
import { expectWellFormedSvg, renderSvg } from "./svg-check.js";

// An invented 4 m simple span with a 10 kN point load at midspan (kN, m, mm, MPa).
const span = {
  name: "Shape check",
  length: 4,
  material: { name: "steel", E: "200 GPa" },
  supports: [{ at: 0, type: "pin" }, { at: 4, type: "roller" }],
  loads: [{ type: "point", at: 2, value: 10 }],
};

const box = (z0: number, z1: number, y0: number, y1: number) => ({ type: "polygon", points: [{ y: y0, z: z0 }, { y: y0, z: z1 }, { y: y1, z: z1 }, { y: y1, z: z0 }] });

const sections: Record<string, Record<string, unknown>> = {
  channel: { shape: "channel", depth: 200, flangeWidth: 75, flangeThickness: 11, webThickness: 7, rootRadius: 12 },
  angle: { shape: "angle", verticalLeg: 150, horizontalLeg: 90, thickness: 10, rootRadius: 11 },
  "rectangular-hollow": { shape: "rectangular-hollow", width: 100, depth: 200, wallThickness: 8, cornerRadius: 16 },
  "plate-girder": { shape: "plate-girder", topFlange: { width: 250, thickness: 20 }, web: { depth: 600, thickness: 10 }, bottomFlange: { width: 350, thickness: 25 } },
  "built-up": {
    shape: "built-up",
    parts: [
      box(0, 50, 0, 300),
      { ...box(50, 60, 0, 300), material: { name: "steel plate", E: "200 GPa" } },
      box(60, 110, 0, 300),
      { type: "circle", centre: { y: 150, z: 25 }, radius: 8, hole: true },
      { type: "sector", centre: { y: 300, z: 85 }, radius: 25, startAngle: 0, sweep: Math.PI },
      { type: "fillet", corner: { y: 300, z: 60 }, radius: 10, orientation: Math.PI / 2, modularRatio: 1 },
    ],
  },
};

describe("the report draws every section shape of the model format", () => {
  test.each(Object.entries(sections))("%s: the section drawing is well-formed SVG with ink, and the text report names the shape", (shape, section) => {
    const extra = shape === "built-up" ? { material: { name: "timber", E: "11 GPa" } } : {};
    const analysis = analyzeModel(parseModel({ ...span, ...extra, section }));
    const drawing = reportDiagrams(analysis).find((d) => d.name === "section");
    expect(drawing).toBeDefined();
    const tree = expectWellFormedSvg(drawing!.svg);
    expect(JSON.stringify(tree)).toContain("polygon");
    expect(renderSvg(drawing!.svg, `section-${shape}`).inked).toBeGreaterThan(0.02);
    expect(drawing!.svg).toContain(`(${shape})`);
    expect(textReport(analysis)).toContain(`Section: ${shape}`);
  });

  test("the built-up section's drawing names both materials and draws the reference material's profile", () => {
    const analysis = analyzeModel(parseModel({ ...span, material: { name: "timber", E: "11 GPa" }, section: sections["built-up"] }));
    const svg = reportDiagrams(analysis).find((d) => d.name === "section")!.svg;
    expect(svg).toContain("timber");
    expect(svg).toContain("steel plate");
    expect(svg).toContain("reference material");
    // Sagging: the reference material's profile -M y / I_t runs from tension at the bottom to compression at the top (common practice).
    const labels = [...svg.matchAll(/>(-?[0-9.]+) MPa</g)].map((m) => Number(m[1]));
    const s = analysis.section!;
    const bottom = (10e6 * (-s.extremes.bottom)) / s.secondMomentZ; // M = P L / 4 = 10 kN*m (AISC Manual 15th ed., Table 3-23 case 7), sigma = M y / I_t
    const top = (-10e6 * s.extremes.top) / s.secondMomentZ;
    expect(labels.some((v) => Math.abs(v - bottom) <= 1e-3 * bottom)).toBe(true);
    expect(labels.some((v) => Math.abs(v - top) <= -1e-3 * top)).toBe(true);
    expect(textReport(analysis)).toContain("Section: built-up (6 parts, 1 of them hole)");
  });
});
