import { describe, expect, it } from "vitest";
import { fc, test } from "@fast-check/vitest";
import {
  cutAt,
  peakShearStress,
  shearFlow,
  shearStress,
  shearStressAt,
  shearStressProfile,
  tryCutAt,
  tryPeakShearStress,
  tryShearFlow,
  tryShearStress,
  tryShearStressAt,
  tryShearStressProfile,
  type DepthBand,
} from "../../src/stress/index.js";
import { close, simpson, stackBands, stackProperties } from "./helpers.js";

const rect = (b: number, h: number): DepthBand[] => [{ kind: "trapezoid", yBottom: -h / 2, yTop: h / 2, widthBottom: b, widthTop: b }];

describe("shear stress: published values", () => {
  it("peakShearStress(rectangle) = 1.5 V / A at the neutral axis", () => {
    // Rectangle: tau_max = 3 V / (2 A) at the neutral axis (Roark's Formulas for Stress and Strain, 8th ed., Sec. 8.1, from memory).
    const [b, h, v] = [80, 240, 36e3];
    const peak = peakShearStress(v, rect(b, h), { secondMomentZ: (b * h ** 3) / 12 });
    expect(peak.stress).toBeCloseTo((1.5 * v) / (b * h), 12);
    expect(peak.y).toBeCloseTo(0, 9);
    expect(shearStress(v, cutAt(rect(b, h), 0), { secondMomentZ: (b * h ** 3) / 12 })).toBeCloseTo((1.5 * v) / (b * h), 12);
  });

  it("peakShearStress(solid circle) = 4 V / (3 A) at the neutral axis", () => {
    // Solid circle: tau_max = 4 V / (3 A) (Roark's Formulas for Stress and Strain, 8th ed., Sec. 8.1, from memory).
    const [r, v] = [30, -12e3];
    const a = Math.PI * r * r;
    const peak = peakShearStress(v, [{ kind: "circle", centreY: 0, radius: r }], { secondMomentZ: (Math.PI * r ** 4) / 4 });
    expect(peak.stress).toBeCloseTo((4 * v) / (3 * a), 12);
    expect(peak.y).toBeCloseTo(0, 9);
  });

  it("shearStressAt(tube) matches the closed form at the neutral axis and tends to 2 V / A when thin", () => {
    // Q = (2/3)(R^3 - r^3), b = 2 (R - r), I = pi (R^4 - r^4) / 4 (closed form, tau = V Q / (I b));
    // thin tube tau_max -> 2 V / A (Roark's Formulas for Stress and Strain, 8th ed., Sec. 8.1, from memory).
    const tube = (R: number, r: number): DepthBand[] => [
      { kind: "circle", centreY: 0, radius: R },
      { kind: "circle", centreY: 0, radius: r, hole: true },
    ];
    const [R, r, v] = [60, 45, 1e4];
    const inertia = (Math.PI * (R ** 4 - r ** 4)) / 4;
    const at = shearStressAt(v, 0, tube(R, r), { secondMomentZ: inertia });
    expect(at.stress).toBeCloseTo((v * (2 / 3) * (R ** 3 - r ** 3)) / (inertia * 2 * (R - r)), 12);
    const thin = peakShearStress(v, tube(100, 99.9), { secondMomentZ: (Math.PI * (100 ** 4 - 99.9 ** 4)) / 4 });
    expect(thin.stress / ((2 * v) / (Math.PI * (100 ** 2 - 99.9 ** 2)))).toBeCloseTo(1, 3);
  });

  it("shearStressAt(I section) in the web at the neutral axis and at the flange junction", () => {
    // Web at NA: Q = b_f t_f (d - t_f) / 2 + t_w (d/2 - t_f)^2 / 2 (closed form, tau = V Q / (I t_w); Roark's 8th ed., Sec. 8.1, from memory).
    const [bf, tf, tw, d, v] = [180, 12, 8, 360, 150e3];
    const stack = [
      { b: bf, h: tf, y0: 0 },
      { b: tw, h: d - 2 * tf, y0: tf },
      { b: bf, h: tf, y0: d - tf },
    ];
    const inertia = (bf * d ** 3 - (bf - tw) * (d - 2 * tf) ** 3) / 12;
    const bands = stackBands(stack);
    const qFlange = (bf * tf * (d - tf)) / 2;
    const qNA = qFlange + (tw * (d / 2 - tf) ** 2) / 2;
    const peak = peakShearStress(v, bands, { secondMomentZ: inertia });
    expect(peak.stress).toBeCloseTo((v * qNA) / (inertia * tw), 10);
    expect(peak.width).toBe(tw);
    const junction = cutAt(bands, d / 2 - tf);
    expect(junction.firstMoment).toBeCloseTo(qFlange, 8);
    expect(junction.width).toBe(tw); // the narrower side of the step
    // shear flow at the flange-to-web connection: q = V Q_f / I (force per length the welds carry)
    expect(shearFlow(v, qFlange, { secondMomentZ: inertia })).toBeCloseTo((v * qFlange) / inertia, 12);
    const profile = shearStressProfile(v, bands, { secondMomentZ: inertia });
    const atJunction = profile.points.filter((p) => Math.abs(p.y - (d / 2 - tf)) < 1e-9);
    expect(atJunction.map((p) => p.width)).toEqual([tw, bf]); // below then above the step
    expect(atJunction[0]!.stress / atJunction[1]!.stress).toBeCloseTo(bf / tw, 10);
  });

  it("peakShearStress(square with a vertical diagonal) = 9 V / (8 A), an eighth of the diagonal from the neutral axis", () => {
    // Closed form from tau = V Q / (I b): Q / b = (a - y)(a + 2 y) / 6 peaks at y = a / 4, tau = 9 V / (8 A);
    // the classic result in Timoshenko, Strength of Materials, Part I (from memory).
    const [a, v] = [50, 1e4];
    const bands: DepthBand[] = [
      { kind: "trapezoid", yBottom: -a, yTop: 0, widthBottom: 0, widthTop: 2 * a },
      { kind: "trapezoid", yBottom: 0, yTop: a, widthBottom: 2 * a, widthTop: 0 },
    ];
    const section = { secondMomentZ: a ** 4 / 3 };
    const peak = peakShearStress(v, bands, section);
    expect(peak.stress).toBeCloseTo((9 * v) / (8 * 2 * a * a), 10);
    expect(Math.abs(peak.y)).toBeCloseTo(a / 4, 5);
    expect(shearStressAt(v, 0, bands, section).stress).toBeCloseTo(v / (2 * a * a), 12); // V / A at the neutral axis
  });

  it("shearStressAt(timber with a steel plate) uses the transformed Q and the actual width", () => {
    // Transformed section (Gere and Goodno, Mechanics of Materials, Sec. 6.3, from memory): q = V Q_t / I_t, tau = q / b.
    const stack = [
      { b: 150, h: 10, y0: 0, n: 20 },
      { b: 150, h: 300, y0: 10 },
    ];
    const t = stackProperties(stack);
    const bands = stackBands(stack);
    const yi = 10 - t.centroid;
    const qPlate = 20 * 150 * 10 * (5 - t.centroid); // plate below the cut: Q above = -Q below
    const at = shearStressAt(25e3, yi, bands, { secondMomentZ: t.inertia });
    expect(at.firstMoment).toBeCloseTo(-qPlate, 6);
    expect(at.stress).toBeCloseTo((25e3 * -qPlate) / (t.inertia * 150), 10);
  });
});

const stack = fc.array(fc.record({ b: fc.double({ min: 1, max: 300, noNaN: true }), h: fc.double({ min: 1, max: 200, noNaN: true }) }), { minLength: 1, maxLength: 5 });

describe("shear laws", () => {
  test.prop([stack, fc.double({ min: -1e6, max: 1e6, noNaN: true })], { numRuns: 100 })(
    "the shear stress integrated over the depth gives back V, and the peak is no less than any cut",
    (parts, v) => {
      let y = 0;
      const rects = parts.map((p) => {
        const r = { b: p.b, h: p.h, y0: y };
        y += p.h;
        return r;
      });
      const t = stackProperties(rects);
      const bands = stackBands(rects);
      const section = { secondMomentZ: t.inertia };
      let total = 0;
      for (const band of bands) {
        if (band.kind !== "trapezoid") continue;
        total += simpson((yy) => {
          const at = shearStressAt(v, yy, bands, section);
          return at.stress * at.width; // the shear flow V Q / I
        }, band.yBottom, band.yTop);
      }
      expect(close(total, v, 1e-8, 1e-9)).toBe(true);
      const profile = shearStressProfile(v, bands, section);
      for (const p of profile.points) expect(Math.abs(p.stress)).toBeLessThanOrEqual(Math.abs(profile.peak.stress) * (1 + 1e-12) + 1e-300);
    },
  );
});

describe("shear errors", () => {
  it("bad bands are reported together with their paths", () => {
    const r = tryShearStressProfile(
      1,
      [
        { kind: "trapezoid", yBottom: 1, yTop: -1, widthBottom: -2, widthTop: 1, modularRatio: 0 },
        { kind: "circle", centreY: 0, radius: 0 },
        { kind: "hexagon" } as unknown as DepthBand,
      ],
      { secondMomentZ: 0 },
      { pointsPerBand: 0 },
    );
    expect(r.ok || r.error.issues.map((i) => `${i.code} ${i.path.join(".")}`)).toMatchInlineSnapshot(`
      [
        "second-moment-not-positive section.secondMomentZ",
        "modular-ratio-not-positive bands.0.modularRatio",
        "layer-upside-down bands.0",
        "width-negative bands.0.widthBottom",
        "radius-not-positive bands.1.radius",
        "unknown-band-kind bands.2.kind",
        "points-per-band-invalid options.pointsPerBand",
      ]
    `);
  });

  it("bands off the centroid, a gap, no area and a cut outside the section are reported", () => {
    const codes = (r: { ok: boolean; error?: { issues: readonly { code: string }[] } }): string[] => (r.ok ? [] : r.error!.issues.map((i) => i.code));
    const section = { secondMomentZ: 1 };
    expect(codes(tryShearStressAt(1, 0, [{ kind: "trapezoid", yBottom: 0, yTop: 2, widthBottom: 1, widthTop: 1 }], section))).toEqual(["bands-not-about-centroid"]);
    const gap: DepthBand[] = [
      { kind: "trapezoid", yBottom: -3, yTop: -1, widthBottom: 1, widthTop: 1 },
      { kind: "trapezoid", yBottom: 1, yTop: 3, widthBottom: 1, widthTop: 1 },
    ];
    expect(codes(tryShearStressAt(1, 0, gap, section))).toEqual(["width-not-positive"]);
    expect(codes(tryShearStressAt(1, 4, gap, section))).toEqual(["fibre-outside-section"]);
    expect(codes(tryPeakShearStress(1, [{ kind: "circle", centreY: 0, radius: 1, hole: true }], section))).toEqual(["bands-no-area"]);
    expect(codes(tryPeakShearStress(1, [], section))).toEqual(["no-bands"]);
    expect(codes(tryCutAt(rect(1, 1), Number.NaN))).toEqual(["not-finite"]);
    expect(codes(tryShearStress(1, { firstMoment: 1, width: 0 }, section))).toEqual(["width-not-positive"]);
    expect(codes(tryShearFlow(1, 1, { secondMomentZ: -1 }))).toEqual(["second-moment-not-positive"]);
    expect(shearStressProfile(1, rect(1, 1), { secondMomentZ: 1 / 12 }, { pointsPerBand: 2 }).points).toHaveLength(3);
  });
});
