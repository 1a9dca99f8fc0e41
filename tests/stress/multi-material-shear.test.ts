import { describe, expect, it } from "vitest";
import { fc, test } from "@fast-check/vitest";
import { builtUp, firstMomentAbove, rectangle, section, sectionProperties, translateSection, type Section } from "../../src/section/index.js";
import { sectionPeakShearStress, sectionShearStressAt, sectionShearStressProfile } from "../../src/stress/index.js";

const timber = { name: "timber", elasticModulus: 12_000 };
const steel = { name: "steel", elasticModulus: 200_000 };

/** An invented flitch beam: two 50 x 200 timbers either side of a 10 x 200 steel plate (mm, N/mm^2). */
function flitch(): Section {
  return builtUp([
    translateSection(rectangle({ width: 50, depth: 200 }, { material: timber }), { y: 0, z: -30 }),
    rectangle({ width: 10, depth: 200 }, { material: steel }),
    translateSection(rectangle({ width: 50, depth: 200 }, { material: timber }), { y: 0, z: 30 }),
  ]);
}

describe("shear on a multi-material section: each material's own stress", () => {
  it("flitch beam: timber 1.5 V / (b* h), steel n times that, not V Q* / (I* b) with b the whole width", () => {
    // Transformed-section method (Gere and Goodno, Mechanics of Materials, Sec. 6.3, from memory): with timber as the
    // reference, n = 200000 / 12000 and the section is a rectangle of transformed width b* = 100 + 10 n over the full depth,
    // so at the neutral axis V Q* / (I* b*) = 1.5 V / (b* h) (rectangle, common practice) in the timber and n times it in
    // the steel. Independently: members side by side bend together and share V in proportion to E I (common practice):
    // V_timber = V E_t I_t / sum E I, tau = 1.5 V_timber / A_timber: the same number.
    const v = 20e3;
    const n = 200_000 / 12_000;
    const bStar = 100 + 10 * n;
    const tauTimber = (1.5 * v) / (bStar * 200);
    const shareTimber = (v * 12_000 * (100 * 200 ** 3)) / (12_000 * 100 * 200 ** 3 + 200_000 * 10 * 200 ** 3);
    expect(tauTimber).toBeCloseTo((1.5 * shareTimber) / (100 * 200), 12);

    const s = flitch();
    const at = sectionShearStressAt(v, s, 0);
    expect(at.stress).toBeCloseTo(tauTimber, 12);
    expect(at.width).toBeCloseTo(110, 12);
    expect(at.transformedWidth).toBeCloseTo(bStar, 9);
    const byName = new Map(at.materials?.map((m) => [m.modularRatio, m]));
    expect(byName.get(1)?.stress).toBeCloseTo(tauTimber, 12); // about 0.56 N/mm^2
    expect(byName.get(n)?.stress).toBeCloseTo(n * tauTimber, 9); // about 9.4 N/mm^2
    expect(byName.get(1)?.parts).toEqual([0, 2]);
    expect(byName.get(1)?.width).toBeCloseTo(100, 12);
    // the width average once reported: V Q* / (I* b), about 1.36 N/mm^2, neither material's stress
    const p = sectionProperties(s);
    const average = (v * firstMomentAbove(s, 0).firstMoment) / (p.secondMomentZ * 110);
    expect(Math.abs(at.stress - average)).toBeGreaterThan(0.5);

    const peak = sectionPeakShearStress(v, s);
    expect(peak.stress).toBeCloseTo(tauTimber, 12);
    expect(peak.materials?.map((m) => m.stress)).toEqual([expect.closeTo(tauTimber, 12), expect.closeTo(n * tauTimber, 9)]);
    const profile = sectionShearStressProfile(v, s);
    expect(profile.points.every((q) => q.materials !== undefined)).toBe(true);
  });

  it("a steel plate on the underside of a timber: each material's peak within its own depth", () => {
    // invented: 100 x 200 timber on a 100 x 10 steel plate; the steel's own peak is at its top, where it meets the timber
    const s = builtUp([
      translateSection(rectangle({ width: 100, depth: 200 }, { material: timber }), { y: 105, z: 0 }),
      rectangle({ width: 100, depth: 10 }, { material: steel }),
    ]);
    const peak = sectionPeakShearStress(1e4, s);
    const p = sectionProperties(s);
    const steelPeak = peak.materials?.find((m) => m.modularRatio > 1);
    expect(steelPeak?.y).toBeCloseTo(5 - p.centroid.y, 9);
    // at the interface the cut is steel below, timber above; the steel side: b* = n 100 (transformed), tau = n V Q* / (I* b*)
    const q = firstMomentAbove(s, 5).firstMoment;
    const n = 200_000 / 12_000;
    expect(steelPeak?.stress).toBeCloseTo((n * 1e4 * q) / (p.secondMomentZ * n * 100), 9);
  });

  test.prop([fc.double({ min: 5, max: 200, noNaN: true }), fc.double({ min: 5, max: 300, noNaN: true }), fc.double({ min: -0.49, max: 0.49, noNaN: true }), fc.double({ min: -1e5, max: 1e5, noNaN: true })], { numRuns: 40 })(
    "one material: the stress at any cut is V Q / (I b), with no materials listed",
    (b, h, at, v) => {
      const s = section([{ kind: "polygon", points: [{ y: 0, z: 0 }, { y: 0, z: b }, { y: h, z: b * 0.7 }, { y: h, z: 0.2 * b }] }]);
      const p = sectionProperties(s);
      const y = (0.5 + at) * h - p.centroid.y;
      const r = firstMomentAbove(s, y + p.centroid.y);
      const point = sectionShearStressAt(v, s, y);
      expect(point.materials).toBeUndefined();
      expect(point.stress).toBeCloseTo((v * r.firstMoment) / (p.secondMomentZ * r.width), 9);
      expect(point.transformedWidth).toBeCloseTo(r.width, 9);
    },
  );

  test.prop([fc.double({ min: 1.5, max: 40, noNaN: true }), fc.double({ min: 0.1, max: 0.9, noNaN: true }), fc.double({ min: -0.45, max: 0.45, noNaN: true })], { numRuns: 40 })(
    "several materials: the stresses times their widths add up to the shear flow V Q* / I* at every cut",
    (ratio, split, at) => {
      // two materials side by side and one stacked below (invented)
      const s = builtUp([
        { kind: "polygon", points: [{ y: 0, z: 0 }, { y: 0, z: 60 * split }, { y: 100, z: 60 * split }, { y: 100, z: 0 }], material: { elasticModulus: 1000 } },
        { kind: "polygon", points: [{ y: 0, z: 60 * split }, { y: 0, z: 60 }, { y: 100, z: 60 }, { y: 100, z: 60 * split }], material: { elasticModulus: 1000 * ratio } },
        { kind: "polygon", points: [{ y: -20, z: 10 }, { y: -20, z: 50 }, { y: 0, z: 50 }, { y: 0, z: 10 }], material: { elasticModulus: 1000 / ratio } },
      ]);
      const p = sectionProperties(s);
      const y = 40 + at * 100 - p.centroid.y;
      const point = sectionShearStressAt(1e4, s, y);
      const flow = (1e4 * firstMomentAbove(s, y + p.centroid.y).firstMoment) / p.secondMomentZ;
      const sum = (point.materials ?? []).reduce((acc, m) => acc + m.stress * m.width, 0);
      expect(sum / flow).toBeCloseTo(1, 9);
    },
  );
});
