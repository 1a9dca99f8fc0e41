import fc from "fast-check";
import { describe, expect, it } from "vitest";
import { analyzeModel, parseModel } from "../../../src/model/index.js";
import { boxesOverlap, calculationFigure, placeLabels, textBox, type LabelBox } from "../../../src/report/index.js";
import { examples, memberArbitrary, overlappingPairs, textBoxesOf } from "./helpers.js";

const boxArbitrary = fc.record({
  x: fc.double({ min: 0, max: 400, noNaN: true }),
  y: fc.double({ min: 0, max: 300, noNaN: true }),
  width: fc.double({ min: 0, max: 80, noNaN: true }),
  height: fc.double({ min: 0, max: 40, noNaN: true }),
});

describe("placeLabels", () => {
  it("never lets two placed labels, or a label and an obstacle, overlap, and keeps every label inside the bounds (law)", () => {
    fc.assert(
      fc.property(
        fc.array(fc.record({ x: fc.double({ min: 0, max: 400, noNaN: true }), y: fc.double({ min: 0, max: 300, noNaN: true }), text: fc.string({ minLength: 1, maxLength: 14 }) }), { maxLength: 40 }),
        fc.array(boxArbitrary, { maxLength: 20 }),
        (labels, obstacles) => {
          const bounds: LabelBox = { x: 0, y: 0, width: 400, height: 300 };
          const requests = labels.map((l, i) => ({ id: String(i), text: l.text, x: l.x, y: l.y, fontSize: 9 }));
          const { placed, unplaced } = placeLabels(requests, obstacles, bounds);
          expect(placed.length + unplaced.length).toBe(requests.length);
          for (let i = 0; i < placed.length; i++) {
            const a = placed[i]!.box;
            expect(a.x).toBeGreaterThanOrEqual(0);
            expect(a.y).toBeGreaterThanOrEqual(0);
            expect(a.x + a.width).toBeLessThanOrEqual(400);
            expect(a.y + a.height).toBeLessThanOrEqual(300);
            for (const o of obstacles) expect(boxesOverlap(a, o)).toBe(false);
            for (let j = i + 1; j < placed.length; j++) expect(boxesOverlap(a, placed[j]!.box)).toBe(false);
          }
        },
      ),
      { numRuns: 150, seed: 5 },
    );
  });

  it("puts a lone label at its first candidate, and reports a label with no room as unplaced instead of overlapping", () => {
    const bounds: LabelBox = { x: 0, y: 0, width: 200, height: 100 };
    const one = placeLabels([{ id: "a", text: "10 kN", x: 100, y: 50, fontSize: 10, candidates: [{ dx: 0, dy: -12, anchor: "middle" }] }], [], bounds);
    expect(one.placed[0]!.box).toEqual(textBox("10 kN", 10, 100, 38, "middle"));
    const blocked = placeLabels([{ id: "a", text: "10 kN", x: 100, y: 50, fontSize: 10 }], [bounds], bounds);
    expect(blocked.placed).toHaveLength(0);
    expect(blocked.unplaced.map((r) => r.id)).toEqual(["a"]);
  });
});

describe("calculationFigure: labels never collide", () => {
  const check = (svg: string, figure: ReturnType<typeof calculationFigure>): void => {
    // Every text drawn (titles, axis values and placed labels), measured from the SVG itself.
    const texts = textBoxesOf(svg);
    expect(overlappingPairs(texts).map(([a, b]) => `${a.text} / ${b.text}`)).toEqual([]);
    // Placed labels against every obstacle: arrows, symbols, the member, the dimension chain, marked points.
    for (const l of figure.labels) for (const o of figure.obstacles) expect(boxesOverlap(l.box, o), `${l.text} overlaps an obstacle`).toBe(false);
  };

  it("on every example model", () => {
    for (const e of examples()) {
      const figure = calculationFigure(e.analysis);
      check(figure.svg, figure);
      expect(figure.labels.length).toBeGreaterThan(0);
    }
  });

  it("on random members with point, distributed and couple loads (property)", () => {
    fc.assert(
      fc.property(memberArbitrary, (json) => {
        const figure = calculationFigure(analyzeModel(parseModel(json)));
        check(figure.svg, figure);
      }),
      { numRuns: 40, seed: 11 },
    );
  });

  it("labels the peaks, the values either side of a shear jump and the points of zero moment", () => {
    // Simple span 6 m, 10 kN at midspan, w = 2 kN/m on an overhang of 2 m: the moment changes sign between the supports.
    const a = analyzeModel(
      parseModel({
        format: 1,
        length: 8,
        E: 200000,
        I: 8e7,
        supports: [{ type: "pin", at: 0 }, { type: "roller", at: 6 }],
        loads: [{ type: "point", at: 3, value: 10 }, { type: "distributed", from: 6, to: 8, start: 8, end: 8 }],
      }),
    );
    const figure = calculationFigure(a);
    const texts = [...figure.labels.map((l) => l.text), ...figure.unplaced];
    // Reactions by statics (common practice): R_right = (10*3 + 16*7) / 6 = 23.667 kN, R_left = 26 - 23.667 = 2.333 kN.
    expect(texts).toContain("2.333");
    expect(texts).toContain("-7.667");
    // M(x) = 2.333 x - 10 (x - 3) = 0 at x = 30 / 7.667 = 3.913 m.
    expect(texts).toContain("0 at x = 3.913");
    expect(texts.some((t) => t.startsWith("min -16 at x = 6"))).toBe(true);
  });
});
