import { describe, expect, it } from "vitest";
import { fc, test } from "@fast-check/vitest";
import {
  bendingStress,
  bendingStressFromModulus,
  bendingStressProfile,
  extremeBendingStresses,
  materialBendingStress,
  tryBendingStress,
  tryBendingStressFromModulus,
  tryBendingStressProfile,
  tryExtremeBendingStresses,
  tryMaterialBendingStress,
} from "../../src/stress/index.js";
import { close, simpson, stackBands, stackProperties, type Rect } from "./helpers.js";

describe("bendingStress and extremeBendingStresses: published values", () => {
  it("extremeBendingStresses(rectangle) gives sigma = 6 M / (b h^2) at both fibres", () => {
    // Rectangle b x h: I = b h^3 / 12, S = b h^2 / 6 (Roark's Formulas for Stress and Strain, 8th ed., Table A.1 case 1, from memory).
    const b = 120;
    const h = 300;
    const m = 45e6; // invented: 45 kN m in N mm, sagging
    const s = extremeBendingStresses(m, { secondMomentZ: (b * h ** 3) / 12, extremes: { top: h / 2, bottom: -h / 2 } });
    expect(s.top.stress).toBeCloseTo((-6 * m) / (b * h * h), 12);
    expect(s.bottom.stress).toBeCloseTo((6 * m) / (b * h * h), 12);
    expect(s.tension.fibre).toBe("bottom");
    expect(s.compression.fibre).toBe("top");
    expect(bendingStressFromModulus(m, (b * h * h) / 6, "bottom")).toBeCloseTo((6 * m) / (b * h * h), 12);
  });

  it("extremeBendingStresses(W18x50) matches M / S_x from the tabulated section modulus", () => {
    // AISC Steel Construction Manual 15th ed., Table 1-1, W18x50: d = 18.0 in, I_x = 800 in^4, S_x = 88.9 in^3 (from memory).
    const m = 100 * 12; // 100 kip ft in kip in (invented)
    const s = extremeBendingStresses(m, { secondMomentZ: 800, extremes: { top: 9, bottom: -9 } });
    expect(Math.abs(s.bottom.stress - m / 88.9) / (m / 88.9)).toBeLessThan(1e-3); // table values are rounded to 3 figures
    expect(s.top.stress).toBe(-s.bottom.stress);
    expect(bendingStressFromModulus(m, 88.9, "top")).toBeCloseTo(-m / 88.9, 12);
  });

  it("extremeBendingStresses(three-plate I section) matches the closed form I = [B H^3 - (B - t_w) h_w^3] / 12", () => {
    // Doubly symmetric I: I = [B H^3 - (B - t_w)(H - 2 t_f)^3] / 12 (Roark's Formulas for Stress and Strain, 8th ed., Table A.1, from memory).
    const [bf, tf, tw, d] = [200, 15, 10, 400];
    const closed = (bf * d ** 3 - (bf - tw) * (d - 2 * tf) ** 3) / 12;
    const props = stackProperties([
      { b: bf, h: tf, y0: 0 },
      { b: tw, h: d - 2 * tf, y0: tf },
      { b: bf, h: tf, y0: d - tf },
    ]);
    expect(close(props.inertia, closed)).toBe(true);
    const m = 150e6; // invented
    const s = extremeBendingStresses(m, { secondMomentZ: closed, extremes: { top: d / 2, bottom: -d / 2 } });
    expect(s.tension.stress).toBeCloseTo((m * d) / 2 / closed, 10);
  });

  it("extremeBendingStresses(T section) gives unequal fibre stresses, and a hogging moment swaps them", () => {
    // T: flange 150 x 20 on a 20 x 180 stem. Centroid and I by the parallel-axis theorem (closed form).
    const t = stackProperties([
      { b: 20, h: 180, y0: 0 },
      { b: 150, h: 20, y0: 180 },
    ]);
    expect(t.centroid).toBeCloseTo((3000 * 190 + 3600 * 90) / 6600, 10); // sum A y / sum A
    const section = { secondMomentZ: t.inertia, extremes: { top: t.top, bottom: t.bottom } };
    const sag = extremeBendingStresses(20e6, section);
    expect(sag.top.stress).toBeCloseTo((-20e6 * (200 - t.centroid)) / t.inertia, 10);
    expect(sag.bottom.stress).toBeCloseTo((20e6 * t.centroid) / t.inertia, 10);
    expect(sag.tension.fibre).toBe("bottom");
    expect(Math.abs(sag.tension.stress / sag.compression.stress)).toBeCloseTo(t.centroid / (200 - t.centroid), 12);
    const hog = extremeBendingStresses(-20e6, section);
    expect(hog.tension.fibre).toBe("top");
    expect(hog.compression.fibre).toBe("bottom");
    expect(hog.tension.stress).toBeCloseTo(-sag.top.stress, 10);
  });

  it("extremeBendingStresses(0) is zero at both fibres", () => {
    const s = extremeBendingStresses(0, { secondMomentZ: 1, extremes: { top: 1, bottom: -2 } });
    expect(s.tension.stress).toBe(0);
    expect(s.compression.stress).toBe(0);
    expect(Object.is(s.top.stress, -0)).toBe(false);
  });
});

describe("materialBendingStress and bendingStressProfile: transformed section", () => {
  // Invented timber beam 150 x 300 (E = 10 GPa) with a 150 x 10 steel plate under it (E = 200 GPa):
  // n = 20; transformed section by the modular ratio (Gere and Goodno, Mechanics of Materials, Sec. 6.3, from memory);
  // centroid and I_t by the parallel-axis theorem (closed form).
  const n = 20;
  const rects: Rect[] = [
    { b: 150, h: 10, y0: 0, n },
    { b: 150, h: 300, y0: 10 },
  ];
  const t = stackProperties(rects);
  const m = 30e6;
  const section = { secondMomentZ: t.inertia, extremes: { top: t.top, bottom: t.bottom } };

  it("materialBendingStress(timber top, steel bottom) follows sigma = -n M y / I_t", () => {
    expect(t.centroid).toBeCloseTo((20 * 1500 * 5 + 45000 * 160) / (20 * 1500 + 45000), 10);
    expect(materialBendingStress(m, t.top, 1, section)).toBeCloseTo((-m * (310 - t.centroid)) / t.inertia, 10);
    expect(materialBendingStress(m, t.bottom, n, section)).toBeCloseTo((n * m * t.centroid) / t.inertia, 10);
  });

  it("bendingStressProfile(two materials) jumps by n at the interface", () => {
    const yInterface = 10 - t.centroid;
    const p = bendingStressProfile(m, section, {
      layers: [
        { yBottom: t.bottom, yTop: yInterface, modularRatio: n, label: "steel" },
        { yBottom: yInterface, yTop: t.top, label: "timber" },
      ],
    });
    const [steel, timber] = p.segments;
    expect(steel?.label).toBe("steel");
    expect(steel!.stressTop / timber!.stressBottom).toBeCloseTo(n, 12);
    expect(timber!.stressTop).toBeCloseTo(materialBendingStress(m, t.top, 1, section), 12);
  });

  it("bendingStressProfile(one material) runs straight from bottom to top fibre", () => {
    const p = bendingStressProfile(1e7, { secondMomentZ: 1e8, extremes: { top: 100, bottom: -100 } });
    expect(p.segments).toEqual([{ yBottom: -100, yTop: 100, modularRatio: 1, stressBottom: 10, stressTop: -10 }]);
  });
});

const stack = fc.array(fc.record({ b: fc.double({ min: 1, max: 500, noNaN: true }), h: fc.double({ min: 1, max: 200, noNaN: true }) }), {
  minLength: 1,
  maxLength: 5,
});

function toRects(parts: readonly { b: number; h: number }[]): Rect[] {
  let y = 0;
  return parts.map((p) => {
    const r = { b: p.b, h: p.h, y0: y };
    y += p.h;
    return r;
  });
}

describe("flexure laws", () => {
  test.prop([fc.double({ min: -1e9, max: 1e9, noNaN: true }), fc.double({ min: -1e9, max: 1e9, noNaN: true }), fc.double({ min: -100, max: 100, noNaN: true }), fc.double({ min: 1, max: 1e9, noNaN: true })], { numRuns: 150 })(
    "bendingStress is linear in M and zero at the centroid",
    (m1, m2, y, i) => {
      const s = { secondMomentZ: i };
      const sum = bendingStress(m1 + m2, y, s);
      expect(Math.abs(sum - (bendingStress(m1, y, s) + bendingStress(m2, y, s)))).toBeLessThanOrEqual(1e-9 * (Math.abs(m1) + Math.abs(m2)) * (Math.abs(y) / i + 1e-300) + 1e-300);
      expect(bendingStress(m1, 0, s)).toBe(0);
    },
  );

  test.prop([stack, fc.double({ min: -1e8, max: 1e8, noNaN: true })], { numRuns: 150 })(
    "bendingStressProfile over a stack of rectangles: zero axial force and the applied moment",
    (parts, m) => {
      const rects = toRects(parts);
      const t = stackProperties(rects);
      const bands = stackBands(rects);
      const p = bendingStressProfile(m, { secondMomentZ: t.inertia, extremes: { top: t.top, bottom: t.bottom } }, {
        layers: bands.map((b) => (b.kind === "trapezoid" ? { yBottom: b.yBottom, yTop: b.yTop } : { yBottom: 0, yTop: 0 })),
      });
      let force = 0;
      let moment = 0;
      p.segments.forEach((seg, i) => {
        const width = rects[i]!.b;
        const sigma = (y: number): number => seg.stressBottom + ((seg.stressTop - seg.stressBottom) * (y - seg.yBottom)) / (seg.yTop - seg.yBottom);
        force += simpson((y) => sigma(y) * width, seg.yBottom, seg.yTop);
        moment += simpson((y) => -sigma(y) * y * width, seg.yBottom, seg.yTop);
      });
      const scale = Math.abs(m) / (t.top - t.bottom) + 1e-300;
      expect(Math.abs(force)).toBeLessThanOrEqual(1e-9 * scale);
      expect(Math.abs(moment - m)).toBeLessThanOrEqual(1e-9 * Math.abs(m) + 1e-300);
    },
  );
});

describe("flexure errors", () => {
  it("bendingStress(section with zero I) reports second-moment-not-positive with its path", () => {
    const r = tryBendingStress(1, 0, { secondMomentZ: 0 });
    expect(r.ok).toBe(false);
    if (!r.ok) expect(r.error.issues).toMatchInlineSnapshot(`
      [
        {
          "code": "second-moment-not-positive",
          "message": "The second moment of area must be above zero; got 0: check the section's dimensions.",
          "path": [
            "section",
            "secondMomentZ",
          ],
          "value": 0,
        },
      ]
    `);
  });

  it("bendingStress(fibre outside the section) reports fibre-outside-section", () => {
    const r = tryBendingStress(1, 150, { secondMomentZ: 1e6, extremes: { top: 100, bottom: -100 } });
    expect(r.ok || r.error.issues.map((i) => i.code)).toEqual(["fibre-outside-section"]);
    expect(bendingStress(1, 100, { secondMomentZ: 1e6, extremes: { top: 100, bottom: -100 } })).toBe(-1e-4);
  });

  it("bad numbers are all reported at once", () => {
    const r = tryBendingStress(Number.NaN, Number.POSITIVE_INFINITY, { secondMomentZ: -1, extremes: { top: -1, bottom: 1 } });
    expect(r.ok || r.error.issues.map((i) => `${i.code} ${i.path.join(".")}`)).toMatchInlineSnapshot(`
      [
        "not-finite moment",
        "not-finite y",
        "second-moment-not-positive section.secondMomentZ",
        "extremes-not-about-centroid section.extremes",
      ]
    `);
  });

  it("the other entry points report their codes", () => {
    const codes = (r: { ok: boolean; error?: { issues: readonly { code: string }[] } }): string[] => (r.ok ? [] : r.error!.issues.map((i) => i.code));
    expect(codes(tryBendingStressFromModulus(1, 0, "top"))).toEqual(["section-modulus-not-positive"]);
    expect(codes(tryBendingStressFromModulus(1, 1, "middle" as "top"))).toEqual(["unknown-fibre"]);
    expect(codes(tryExtremeBendingStresses(1, { secondMomentZ: 1 } as never))).toEqual(["extremes-missing"]);
    expect(codes(tryExtremeBendingStresses(1, { secondMomentZ: 1, extremes: { top: "1", bottom: -1 } } as never))).toEqual(["not-a-number"]);
    expect(codes(tryMaterialBendingStress(1, 0, -2, { secondMomentZ: 1 }))).toEqual(["modular-ratio-not-positive"]);
    expect(codes(tryMaterialBendingStress(1, 5, 1, { secondMomentZ: 1, extremes: { top: 1, bottom: -1 } }))).toEqual(["fibre-outside-section"]);
    expect(codes(tryBendingStressProfile(1, { secondMomentZ: 1, extremes: { top: 1, bottom: -1 } }, { layers: [{ yBottom: 1, yTop: -1, modularRatio: 0 }] }))).toEqual([
      "modular-ratio-not-positive",
      "layer-upside-down",
    ]);
    expect(codes(tryBendingStressProfile(1, { secondMomentZ: 1, extremes: { top: 1, bottom: -1 } }, { layers: [{ yBottom: -2, yTop: 3 }] }))).toEqual([
      "fibre-outside-section",
      "fibre-outside-section",
    ]);
  });
});
