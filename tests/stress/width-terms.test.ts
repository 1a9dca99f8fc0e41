import { expect } from "vitest";
import { fc, test } from "@fast-check/vitest";
import { firstMomentAbove, section, sectionProperties, type SectionPart } from "../../src/section/index.js";
import { sectionPeakShearStress } from "../../src/stress/index.js";
import { sectionWidthTerms } from "../../src/stress/section-width-terms.js";
import { bandWidth, depthBandTerms } from "../../src/stress/width-terms.js";
import { widthAt } from "../../src/stress/bands.js";
import { denseRatios, sectionOracle } from "./golden-oracle.js";

/** Actual and transformed width from the closed-form terms at y (y strictly inside a band). */
function termWidth(terms: ReturnType<typeof sectionWidthTerms>, y: number): { actual: number; transformed: number } {
  const w = bandWidth(terms, y);
  let actual = w.p0 + w.p1 * y;
  let transformed = w.q0 + w.q1 * y;
  for (const a of w.arcs) {
    const u = Math.sqrt(Math.max(a.radius ** 2 - (y - a.centre) ** 2, 0));
    actual += a.k * u;
    transformed += a.kt * u;
  }
  return { actual, transformed };
}

const angle = fc.double({ min: -7, max: 7, noNaN: true });
const part = fc.oneof(
  // (a sweep a hair short of a full turn leaves a slit whose edges cut a sliver thinner than 1e-12 of the depth, merged away)
  fc.record({ start: angle, sweep: fc.oneof(fc.double({ min: 0.1, max: 2 * Math.PI - 1e-3, noNaN: true }), fc.constant(2 * Math.PI)) }).map(
    ({ start, sweep }): SectionPart => ({ kind: "sector", centre: { y: 3, z: -2 }, radius: 40, startAngle: start, sweep }),
  ),
  angle.map((t): SectionPart => ({ kind: "fillet", corner: { y: -5, z: 8 }, radius: 25, orientation: t })),
  fc.constant<SectionPart>({ kind: "circle", centre: { y: 10, z: 0 }, radius: 30 }),
  fc.tuple(fc.double({ min: -50, max: 50, noNaN: true }), fc.double({ min: -50, max: 50, noNaN: true }), fc.boolean()).map(([dz, dy, clockwise]): SectionPart => {
    const points = [
      { y: -20, z: -30 },
      { y: -25, z: 30 },
      { y: 30 + dy, z: 10 + dz },
    ];
    return { kind: "polygon", points: clockwise ? points.reverse() : points };
  }),
);

test.prop([part, fc.double({ min: 0.001, max: 0.999, noNaN: true })], { numRuns: 150 })(
  "sectionWidthTerms(any part, any orientation) gives the section module's width at every height",
  (p, at) => {
    const s = section([p]);
    const props = sectionProperties(s);
    const { top, bottom } = props.extremes;
    const y = bottom + at * (top - bottom);
    const terms = sectionWidthTerms(s, props.centroid.y, [1]);
    const { actual } = termWidth(terms, y - props.centroid.y);
    const cut = firstMomentAbove(s, y);
    expect(actual).toBeCloseTo(cut.widthAbove, 9);
    // the peak found from roots is no less than Q / b anywhere on a dense set
    const peak = sectionPeakShearStress(1, s);
    const ratio = peak.stress * props.secondMomentZ;
    const largest = Math.max(...denseRatios(sectionOracle(s), 100).map((d) => d.ratio));
    expect(ratio).toBeGreaterThanOrEqual(largest * (1 - 1e-12));
  },
);

test.prop([fc.double({ min: 0.05, max: 20, noNaN: true }), fc.double({ min: -0.99, max: 0.99, noNaN: true }).filter((a) => Math.abs(a) > 0.01)], { numRuns: 60 })(
  "sectionWidthTerms(bored two-material plate) carries the actual width and the width times n (transformed)",
  (n, at) => {
    const steel = { elasticModulus: 200e3 };
    const other = { elasticModulus: 200e3 * n };
    const s = section([
      { kind: "polygon", points: [{ y: -60, z: -40 }, { y: -60, z: 40 }, { y: 0, z: 40 }, { y: 0, z: -40 }], material: steel },
      { kind: "polygon", points: [{ y: 0, z: -40 }, { y: 0, z: 40 }, { y: 60, z: 40 }, { y: 60, z: -40 }], material: other },
      { kind: "circle", centre: { y: 25, z: 5 }, radius: 20, hole: true },
    ]);
    const props = sectionProperties(s);
    const ratios = props.parts.map((p) => p.modularRatio);
    const terms = sectionWidthTerms(s, props.centroid.y, ratios);
    const y = 60 * at;
    const w = termWidth(terms, y - props.centroid.y);
    const hole = Math.abs(y - 25) < 20 ? 2 * Math.sqrt(400 - (y - 25) ** 2) : 0;
    const actual = 80 - (y > 0 ? hole : 0);
    expect(w.actual).toBeCloseTo(actual, 9);
    expect(w.transformed).toBeCloseTo(y > 0 ? n * actual : actual, 9);
  },
);

test.prop([fc.double({ min: -30, max: 30, noNaN: true }), fc.double({ min: 1, max: 20, noNaN: true }), fc.boolean()], { numRuns: 60 })(
  "depthBandTerms(trapezoid and circle bands) gives widthAt at every height",
  (centre, radius, hole) => {
    const bands = [
      { kind: "trapezoid" as const, yBottom: -60, yTop: 60, widthBottom: 50, widthTop: 80 },
      { kind: "circle" as const, centreY: centre, radius, hole, modularRatio: 3 },
    ];
    const terms = depthBandTerms(bands);
    for (const y of [-59, -30, centre - radius / 2, centre, centre + radius * 0.9, 45]) {
      const w = termWidth(terms, y === centre ? y + 1e-9 : y);
      expect(w.actual).toBeCloseTo(widthAt(bands, y === centre ? y + 1e-9 : y, "above"), 6);
    }
  },
);
