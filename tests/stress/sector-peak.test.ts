import { describe, expect, it } from "vitest";
import { fc, test } from "@fast-check/vitest";
import { firstMomentAbove, section, sectionProperties, type Section } from "../../src/section/index.js";
import { sectionPeakShearStress } from "../../src/stress/index.js";

/** The largest |V Q / (I b)| over `samples` cuts strictly between the section's bottom and top (none at a corner). */
function denseMax(shear: number, s: Section, samples: number): number {
  const p = sectionProperties(s);
  const lo = p.boundingBox.yMin;
  const hi = p.boundingBox.yMax;
  let best = 0;
  for (let k = 0; k < samples; k++) {
    const y = lo + ((hi - lo) * (k + 0.5 + 0.123456789 * Math.sin(k))) / samples;
    const r = firstMomentAbove(s, y);
    if (r.width > 0) best = Math.max(best, Math.abs((shear * r.firstMoment) / (p.secondMomentZ * r.width)));
  }
  return best;
}

describe("peak shear stress where a straight edge meets an arc", () => {
  it("a sector with a notch: the peak at the corner where the notch's edge meets the arc", () => {
    // Found by the property below: the corner where a sector's straight edge meets its arc, seen at two
    // heights a rounding apart, once made the width there count both edges (82.8 instead of 43.0).
    const s = section([{ kind: "sector", centre: { y: 3, z: -2 }, radius: 40, startAngle: 4, sweep: 5.5164 }]);
    const peak = sectionPeakShearStress(1e6, s);
    const dense = denseMax(1e6, s, 4000);
    expect(peak.stress).toBeGreaterThanOrEqual(dense * (1 - 1e-9));
    expect(peak.stress).toBeCloseTo(466.67, 1);
    const p = sectionProperties(s);
    // the width is continuous through the corner: both one-sided limits agree with the width just beside it
    const at = firstMomentAbove(s, peak.y + p.centroid.y);
    const beside = firstMomentAbove(s, peak.y + p.centroid.y - 1e-7);
    expect(at.widthBelow).toBeCloseTo(beside.width, 4);
    expect(at.widthAbove).toBeCloseTo(beside.width, 4);
  });

  test.prop(
    [
      fc.double({ min: -50, max: 50, noNaN: true }),
      fc.double({ min: -50, max: 50, noNaN: true }),
      fc.double({ min: 1, max: 100, noNaN: true }),
      fc.double({ min: -7, max: 7, noNaN: true }),
      fc.double({ min: 0.2, max: 2 * Math.PI, noNaN: true }),
    ],
    { numRuns: 400 },
  )("sectionPeakShearStress(any sector) is at least the densely sampled |V Q / (I b)|", (y, z, radius, startAngle, sweep) => {
    const s = section([{ kind: "sector", centre: { y, z }, radius, startAngle, sweep }]);
    const peak = sectionPeakShearStress(1e3, s);
    expect(Math.abs(peak.stress)).toBeGreaterThanOrEqual(denseMax(1e3, s, 600) * (1 - 1e-9));
  });
});
