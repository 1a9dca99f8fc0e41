import { fc, test } from "@fast-check/vitest";
import { describe, expect } from "vitest";
import { diagramValueAt, SAMPLE_BUDGET, sampleDiagram } from "../../src/report/index.js";
import { evaluatePolynomial } from "../../src/report/sample.js";

// Shear under a point load P = 10 at midspan of a 4 m simple span: +5 then -5
// (AISC Steel Construction Manual 15th ed., Table 3-23 case 7).
const shear = { unit: "kN", pieces: [{ from: 0, to: 2, coefficients: [5] }, { from: 2, to: 4, coefficients: [-5] }] };

describe("sampleDiagram", () => {
  test("sampleDiagram includes every breakpoint and both sides of a jump", () => {
    const pts = sampleDiagram(shear, { pointsPerPiece: 3 });
    expect(pts).toEqual([[0, 5], [1, 5], [2, 5], [2, -5], [3, -5], [4, -5]]);
  });
  test("sampleDiagram keeps a continuous breakpoint once", () => {
    const moment = { unit: "kN*m", pieces: [{ from: 0, to: 2, coefficients: [0, 5] }, { from: 2, to: 4, coefficients: [10, -5] }] };
    const pts = sampleDiagram(moment, { pointsPerPiece: 2 });
    expect(pts).toEqual([[0, 0], [2, 10], [4, 0]]);
  });
  test("sampleDiagram of a zero-width piece gives its start", () => {
    expect(sampleDiagram({ unit: "", pieces: [{ from: 1, to: 1, coefficients: [2] }] })).toEqual([[1, 2]]);
  });
  test.prop([fc.array(fc.double({ min: -100, max: 100, noNaN: true }), { minLength: 1, maxLength: 6 }), fc.double({ min: 0.1, max: 10, noNaN: true })])(
    "sampleDiagram samples lie on the polynomial and end exactly at the piece's ends",
    (coefficients, to) => {
      const pts = sampleDiagram({ unit: "", pieces: [{ from: 0, to, coefficients }] });
      expect(pts[0]![0]).toBe(0);
      expect(pts[pts.length - 1]![0]).toBe(to);
      for (const [x, v] of pts) expect(v).toBe(evaluatePolynomial(coefficients, x));
    },
  );
});

describe("sampleDiagram on a diagram of many pieces", () => {
  // 5,000 pieces of a cubic (a deflection under 5,000 point loads) and of a straight line (its moment).
  const many = (coefficients: readonly number[]) => ({ unit: "", pieces: Array.from({ length: 5000 }, (_, i) => ({ from: i, to: i + 1, coefficients })) });
  test("at most about SAMPLE_BUDGET points, and never fewer than every piece's ends", () => {
    const pts = sampleDiagram(many([1, 2, 3, 4]));
    expect(pts.length).toBeLessThanOrEqual(2 * 5000 + SAMPLE_BUDGET);
    for (let i = 0; i <= 5000; i++) expect(pts.some(([x]) => x === i)).toBe(true);
  });
  test("a straight piece is drawn by its two ends alone (exact for a line)", () => {
    expect(sampleDiagram({ unit: "", pieces: [{ from: 0, to: 4, coefficients: [1, 2, 0, 0] }] })).toEqual([[0, 1], [4, 9]]);
    expect(sampleDiagram(many([0, 1])).length).toBe(2 * 5000);
  });
  test("a few curved pieces still get 48 points each", () => {
    expect(sampleDiagram({ unit: "", pieces: [{ from: 0, to: 1, coefficients: [0, 0, 1] }] })).toHaveLength(48);
  });
});

describe("evaluatePolynomial and diagramValueAt", () => {
  test("evaluatePolynomial sums c_k u^k", () => {
    expect(evaluatePolynomial([1, 0, 2], 3)).toBe(19);
    expect(evaluatePolynomial([], 3)).toBe(0);
  });
  test("diagramValueAt takes the left or right limit at a jump, 0 off the member at an end, and refuses beyond", () => {
    expect(diagramValueAt(shear, 2, "left")).toBe(5);
    expect(diagramValueAt(shear, 2)).toBe(-5);
    expect(diagramValueAt(shear, 4)).toBe(-5);
    expect(diagramValueAt(shear, 4, "right")).toBe(0);
    expect(diagramValueAt(shear, 0, "left")).toBe(0);
    expect(diagramValueAt(shear, -1e-12)).toBe(5);
    expect(() => diagramValueAt(shear, -1)).toThrow(expect.objectContaining({ issues: [expect.objectContaining({ code: "outside-domain" })] }));
    expect(() => diagramValueAt(shear, 9)).toThrow(expect.objectContaining({ issues: [expect.objectContaining({ code: "outside-domain" })] }));
    expect(() => diagramValueAt({ unit: "", pieces: [] }, 1)).toThrow(expect.objectContaining({ issues: [expect.objectContaining({ code: "diagram-invalid" })] }));
  });
});
