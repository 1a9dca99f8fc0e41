// AISC 360-16 (Specification for Structural Steel Buildings) Chapter F beyond F2 and F3: F7 (rectangular HSS
// and boxes), F8 (round HSS), F9 (tees), F11 (solid bars). The clause is named beside each check; shape
// properties quoted from the Manual's tables are marked "from memory" (no copy at hand).
import { describe, expect, it } from "vitest";
import { fc } from "@fast-check/vitest";
import {
  availableFlexuralStrength,
  bucklingLengths,
  nominalFlexure,
  nominalShear,
  type IShapeForDesign,
  nominalFlexureRectangularHss,
  nominalFlexureRoundHss,
  nominalFlexureSolidBar,
  nominalFlexureTee,
  type RectangularHssForDesign,
  type TeeForDesign,
} from "../../src/design/index.js";
import { channel as channelSection, openSectionProperties, sectionProperties, plasticProperties, tee, torsionConstantRolledTee, torsionConstantThinWalled } from "../../src/section/index.js";
import { issueCodes } from "./helpers.js";

const E = 29000;
const steel = (Fy: number) => ({ elasticModulus: E, yieldStrength: Fy });
const rel = (a: number, b: number, tol: number) => expect(Math.abs(a / b - 1)).toBeLessThan(tol);

// HSS8x8x1/4 (Manual Table 1-12, from memory): t = 0.233, b/t = h/t = 31.3, A = 6.76, S = 17.7, Z = 20.5, J = 111, r = 3.23 (in)
const hss8x8: RectangularHssForDesign = { axis: "major", flangeWidth: 31.3 * 0.233, webHeight: 31.3 * 0.233, wallThickness: 0.233, sectionModulus: 17.7, plasticModulus: 20.5, area: 6.76, torsionConstant: 111, minorRadiusOfGyration: 3.23 };

describe("F7: rectangular HSS and boxes", () => {
  it("HSS8x8x1/4, F_y = 50 ksi: a noncompact flange (Table B4.1b case 17) governs by F7-2, by hand", () => {
    const r = nominalFlexureRectangularHss(hss8x8, steel(50), 60, 1);
    // lambda_p = 1.12 sqrt(E/F_y) = 26.97 < b/t = 31.3 <= lambda_r = 1.40 sqrt(E/F_y) = 33.72
    const Mp = 50 * 20.5;
    const byHand = Mp - (Mp - 50 * 17.7) * (3.57 * 31.3 * Math.sqrt(50 / E) - 4.0);
    expect(r.section).toBe("F7");
    expect(r.governs).toBe("flange-local-buckling");
    expect(r.equation).toBe("F7-2");
    rel(r.nominal, byHand, 1e-12);
    rel(r.nominal, 935.4, 1e-3);
    // the square tube's web, h/t = 31.3 <= 2.42 sqrt(E/F_y) = 58.3, is compact: no web limit state
    expect(r.limitStates.map((s) => s.limitState)).toEqual(["yielding", "flange-local-buckling"]);
    // F1: phi_b = 0.90, Omega_b = 1.67
    expect(availableFlexuralStrength(r.nominal, "lrfd")).toBeCloseTo(0.9 * byHand, 9);
    expect(availableFlexuralStrength(r.nominal, "asd")).toBeCloseTo(byHand / 1.67, 9);
  });

  it("F7.4: lateral-torsional buckling of a deep, narrow box only beyond L_p = 0.13 E r_y sqrt(J A) / M_p", () => {
    // an invented 20 x 4 box of 0.5 plates about its major axis, F_y = 50 ksi (properties by hand, centre-line J)
    const box: RectangularHssForDesign = { axis: "major", flangeWidth: 3, webHeight: 19, wallThickness: 0.5, sectionModulus: 85.8, plasticModulus: 108, area: 23, torsionConstant: 121, minorRadiusOfGyration: 1.62 };
    const Mp = 50 * 108;
    const sqrtJA = Math.sqrt(121 * 23);
    const lp = (0.13 * E * 1.62 * sqrtJA) / Mp;
    const lr = (2 * E * 1.62 * sqrtJA) / (0.7 * 50 * 85.8);
    expect(nominalFlexureRectangularHss(box, steel(50), lp * 0.99, 1).limitStates.map((s) => s.limitState)).toEqual(["yielding"]);
    const mid = nominalFlexureRectangularHss(box, steel(50), (lp + lr) / 2, 1);
    expect(mid.equation).toBe("F7-10");
    rel(mid.nominal, Mp - (Mp - 0.7 * 50 * 85.8) * 0.5, 1e-12);
    const far = nominalFlexureRectangularHss(box, steel(50), lr * 1.5, 1.2);
    expect(far.equation).toBe("F7-11");
    rel(far.nominal, (2 * E * 1.2 * sqrtJA) / ((lr * 1.5) / 1.62), 1e-12);
    // bent about its minor axis, F7.4 does not apply
    expect(nominalFlexureRectangularHss({ ...box, axis: "minor" }, steel(50), lr * 1.5, 1).governs).not.toBe("lateral-torsional-buckling");
  });

  it("F7 laws: M_n <= M_p, not rising with L_b, continuous at L_p and L_r, and equal to M_p at lambda_p (F7-2 reaches M_p there)", () => {
    fc.assert(
      fc.property(fc.double({ min: 1, max: 2000, noNaN: true }), fc.double({ min: 1, max: 2000, noNaN: true }), (a, b) => {
        const [l1, l2] = a < b ? [a, b] : [b, a];
        const box = { ...hss8x8, flangeWidth: 3, webHeight: 19, wallThickness: 0.5, sectionModulus: 85.8, plasticModulus: 108, area: 23, torsionConstant: 121, minorRadiusOfGyration: 1.62 };
        const m1 = nominalFlexureRectangularHss(box, steel(50), l1, 1).nominal;
        const m2 = nominalFlexureRectangularHss(box, steel(50), l2, 1).nominal;
        expect(m1).toBeLessThanOrEqual(50 * 108 * (1 + 1e-12));
        expect(m2).toBeLessThanOrEqual(m1 * (1 + 1e-12));
      }),
      { numRuns: 200 },
    );
    const at = (bt: number) => nominalFlexureRectangularHss({ ...hss8x8, flangeWidth: bt * 0.233 }, steel(50), 1, 1).nominal;
    const root = Math.sqrt(E / 50);
    rel(at(1.12 * root * (1 + 1e-9)), 50 * 20.5, 2e-3);
    rel(at(1.4 * root), 50 * 17.7, 3e-3);
  });

  it("a slender flange or web is refused, naming F7.2(c) or F7.3(c)", () => {
    expect(issueCodes(() => nominalFlexureRectangularHss({ ...hss8x8, flangeWidth: 40 * 0.233 }, steel(50), 60, 1))).toEqual(["rule-not-covered@shape.flangeWidth"]);
    expect(issueCodes(() => nominalFlexureRectangularHss({ ...hss8x8, webHeight: 150 * 0.233 }, steel(50), 60, 1))).toEqual(["rule-not-covered@shape.webHeight"]);
    expect(issueCodes(() => nominalFlexureRectangularHss({ ...hss8x8, axis: "strong" as "major", area: -1 }, steel(50), 0, 1))).toEqual(["value-not-positive@shape.area", "missing-field@shape.axis"]);
  });
});

describe("F8: round HSS", () => {
  // Pipe 10 Std (Manual Table 1-14, from memory): D = 10.8, t (design) = 0.340, S = 29.9, Z = 39.3 (in)
  const pipe10 = { outsideDiameter: 10.8, wallThickness: 0.34, sectionModulus: 29.9, plasticModulus: 39.3 };
  it("Pipe 10 Std at F_y = 35 ksi: compact (D/t = 31.8 <= 0.07 E/F_y = 58), M_n = M_p = F_y Z (F8-1)", () => {
    const r = nominalFlexureRoundHss(pipe10, steel(35));
    expect(r.equation).toBe("F8-1");
    rel(r.nominal, 35 * 39.3, 1e-12);
  });
  it("noncompact (F8-2) and slender (F8-3, F8-4) walls by hand; refused at D/t >= 0.45 E/F_y", () => {
    const thin = { outsideDiameter: 20, wallThickness: 0.1, sectionModulus: 31, plasticModulus: 40 }; // D/t = 200
    const nonc = nominalFlexureRoundHss(thin, steel(50)); // 0.07 E/F_y = 40.6 < 200 <= 0.31 E/F_y = 179.8? no: slender
    expect(nonc.equation).toBe("F8-3");
    rel(nonc.nominal, ((0.33 * E) / 200) * 31, 1e-12);
    const mid = nominalFlexureRoundHss({ ...thin, wallThickness: 0.2 }, steel(50)); // D/t = 100: noncompact
    expect(mid.equation).toBe("F8-2");
    rel(mid.nominal, ((0.021 * E) / 100 + 50) * 31, 1e-12);
    expect(issueCodes(() => nominalFlexureRoundHss({ ...thin, wallThickness: 0.07 }, steel(50)))).toEqual(["rule-not-covered@shape.wallThickness"]);
  });
});

describe("F11: solid rectangular bars and rounds", () => {
  it("yielding F11-1 caps a round at 1.6 M_y (Z / S = 1.70) and leaves a rectangle at F_y Z (Z / S = 1.5)", () => {
    const round = nominalFlexureSolidBar({ kind: "round", diameter: 2 }, steel(36), 100, 1);
    rel(round.nominal, 1.6 * 36 * ((Math.PI * 8) / 32), 1e-12);
    const flat = nominalFlexureSolidBar({ kind: "rectangular", depth: 1, width: 4 }, steel(36), 1000, 1);
    rel(flat.nominal, (36 * 4 * 1) / 4, 1e-12);
    expect(flat.limitStates).toHaveLength(1); // bent about its minor axis: no lateral-torsional buckling (F11.2)
  });
  it("lateral-torsional buckling of a 6 x 1 bar at F_y = 36 ksi by L_b d / t^2 (F11-2, F11-3), by hand", () => {
    const bar = { kind: "rectangular", depth: 6, width: 1 } as const;
    const My = (36 * 6 * 6) / 6;
    // L_b d / t^2 = 48 * 6 = 288: between 0.08 E/F_y = 64.4 and 1.9 E/F_y = 1531
    const inel = nominalFlexureSolidBar(bar, steel(36), 48, 1);
    expect(inel.equation).toBe("F11-2");
    rel(inel.nominal, (1.52 - 0.274 * 288 * (36 / E)) * My, 1e-12);
    // L_b = 300: 1800 > 1531, F_cr = 1.9 E C_b / 1800
    const el = nominalFlexureSolidBar(bar, steel(36), 300, 1.1);
    expect(el.equation).toBe("F11-3");
    rel(el.nominal, ((1.9 * E * 1.1) / 1800) * 6, 1e-12);
    // continuity at 1.9 E/F_y (F11-2 and F11-3 meet to 0.1 %) and at 0.08 E/F_y (F11-2 gives 1.498 M_y ~ M_p)
    const edge = (1.9 * E) / 36 / 6;
    rel(nominalFlexureSolidBar(bar, steel(36), edge * (1 - 1e-9), 1).nominal, nominalFlexureSolidBar(bar, steel(36), edge * (1 + 1e-9), 1).nominal, 1e-3);
    rel(nominalFlexureSolidBar(bar, steel(36), ((0.08 * E) / 36 / 6) * 1.000001, 1).nominal, 1.5 * My, 2e-3);
  });
  it("bad bars: unknown kind, missing and negative dimensions", () => {
    expect(issueCodes(() => nominalFlexureSolidBar({ kind: "square" } as never, steel(36), 10, 1))).toEqual(["options-invalid@bar.kind"]);
    expect(issueCodes(() => nominalFlexureSolidBar({ kind: "rectangular", depth: -6 } as never, steel(36), 10, 1))).toEqual(["value-not-positive@bar.depth", "missing-field@bar.width"]);
    expect(issueCodes(() => nominalFlexureSolidBar({ kind: "round", diameter: 1 }, steel(36), Number.NaN, 1))).toEqual(["value-not-positive@unbracedLength"]);
  });
});

describe("F9: tees in the plane of the stem", () => {
  // a WT9x17.5 computed with flexura/section from its W18x35 parent (Manual Table 1-1 dimensions, from memory;
  // R = k_des - t_f): d = 8.85, b_f = 6.00, t_f = 0.425, t_w = 0.300
  const dims = { depth: 8.85, flangeWidth: 6, flangeThickness: 0.425, webThickness: 0.3, rootRadius: 0.402 };
  const s = tee(dims);
  const p = sectionProperties(s);
  const wt: TeeForDesign = {
    stem: "tension",
    depth: 8.85,
    flangeWidth: 6,
    flangeThickness: 0.425,
    stemThickness: 0.3,
    sectionModulus: p.sectionModulus.bottom,
    flangeSectionModulus: p.sectionModulus.top,
    plasticModulus: plasticProperties(s).plasticModulusZ,
    minorMomentOfInertia: p.secondMomentY,
    minorRadiusOfGyration: p.radiusOfGyration.y,
    torsionConstant: torsionConstantRolledTee(dims),
  };

  it("the WT's computed properties are those tabulated for WT9x17.5 (Manual Table 1-8, from memory: I_y 7.67, J 0.252)", () => {
    rel(wt.minorMomentOfInertia, 7.67, 0.01);
    rel(wt.torsionConstant, 0.252, 0.01);
  });

  it("stem in tension: yielding F9-2 capped at 1.6 M_y, then F9-6 past L_p = 1.76 r_y sqrt(E/F_y), then M_cr (F9-7, F9-10)", () => {
    const Fy = 50;
    const My = Fy * wt.sectionModulus;
    const Mp = Math.min(Fy * wt.plasticModulus, 1.6 * My);
    const lp = 1.76 * wt.minorRadiusOfGyration * Math.sqrt(E / Fy);
    expect(nominalFlexureTee(wt, steel(Fy), lp * 0.99).nominal).toBeCloseTo(Mp, 9);
    const lr = 1.95 * (E / Fy) * (Math.sqrt(wt.minorMomentOfInertia * wt.torsionConstant) / wt.sectionModulus) * Math.sqrt(2.36 * (Fy / E) * ((8.85 * wt.sectionModulus) / wt.torsionConstant) + 1);
    const mid = nominalFlexureTee(wt, steel(Fy), (lp + lr) / 2);
    expect(mid.equation).toBe("F9-6");
    rel(mid.nominal, (Mp + My) / 2, 1e-12);
    const Lb = lr * 2;
    const B = 2.3 * (8.85 / Lb) * Math.sqrt(wt.minorMomentOfInertia / wt.torsionConstant);
    const far = nominalFlexureTee(wt, steel(Fy), Lb);
    expect(far.equation).toBe("F9-7");
    rel(far.nominal, ((1.95 * E) / Lb) * Math.sqrt(wt.minorMomentOfInertia * wt.torsionConstant) * (B + Math.sqrt(1 + B * B)), 1e-12);
    // F9-6 meets F9-7 at L_r: M_cr(L_r) = M_y (the definition of L_r), to the rounding of F9-9's constants
    rel(nominalFlexureTee(wt, steel(Fy), lr * (1 + 1e-9)).nominal, My, 0.01);
  });

  it("stem in compression: M_p = M_y (F9-4), M_n = M_cr with B negative (F9-12, F9-13); a slender stem is refused (F9.4)", () => {
    const stocky = { ...wt, stem: "compression" as const, stemThickness: 0.5, depth: 8.85 }; // d/t_w = 17.7 <= 0.84 sqrt(E/F_y) = 20.2
    const Lb = 120;
    const B = -2.3 * (8.85 / Lb) * Math.sqrt(wt.minorMomentOfInertia / wt.torsionConstant);
    const r = nominalFlexureTee(stocky, steel(50), Lb);
    expect(r.equation).toBe("F9-12");
    rel(r.nominal, Math.min(50 * wt.sectionModulus, ((1.95 * E) / Lb) * Math.sqrt(wt.minorMomentOfInertia * wt.torsionConstant) * (B + Math.sqrt(1 + B * B))), 1e-12);
    expect(r.nominal).toBeLessThan(nominalFlexureTee(wt, steel(50), Lb).nominal);
    expect(issueCodes(() => nominalFlexureTee({ ...wt, stem: "compression" }, steel(50), Lb))).toEqual(["rule-not-covered@shape.stemThickness"]);
  });

  it("flange local buckling with the flange in compression (F9.3, Table B4.1b case 10), by hand", () => {
    const wide = { ...wt, flangeWidth: 11, stemThickness: 0.3 }; // b_f / 2 t_f = 12.9: between 0.38 and 1.0 sqrt(E/F_y) = 9.15, 24.1
    const Fy = 50;
    const My = Fy * wt.sectionModulus;
    const Mp = Math.min(Fy * wt.plasticModulus, 1.6 * My);
    const lam = 11 / 0.85, lpf = 0.38 * Math.sqrt(E / Fy), lrf = Math.sqrt(E / Fy);
    const r = nominalFlexureTee(wide, steel(Fy), 1);
    const flb = r.limitStates.find((x) => x.limitState === "flange-local-buckling")!;
    expect(flb.equation).toBe("F9-14");
    rel(flb.nominal, Math.min(1.6 * My, Mp - (Mp - 0.7 * Fy * wt.flangeSectionModulus) * ((lam - lpf) / (lrf - lpf))), 1e-12);
  });
});

describe("F2 for channels (c = (h_0 / 2) sqrt(I_y / C_w), F2-8b)", () => {
  // an invented rolled-proportion channel, its properties computed with flexura/section (in): C_w by the
  // sectorial coordinate, J by sum b t^3 / 3 (thin-walled), S_x, Z_x, I_y, r_y from the exact section
  const dims = { depth: 12, flangeWidth: 3, flangeThickness: 0.5, webThickness: 0.3 };
  const c = channelSection(dims);
  const p = sectionProperties(c);
  const shape: IShapeForDesign = {
    form: "channel",
    rolled: true,
    depth: 12,
    flangeWidth: 3,
    flangeThickness: 0.5,
    webThickness: 0.3,
    webHeight: 11,
    sectionModulus: p.sectionModulus.top,
    plasticModulus: plasticProperties(c).plasticModulusZ,
    minorMomentOfInertia: p.secondMomentY,
    minorRadiusOfGyration: p.radiusOfGyration.y,
    torsionConstant: torsionConstantThinWalled(c),
    warpingConstant: openSectionProperties(c).warpingConstant,
  };

  it("bucklingLengths(channel): c and L_r by F2-8b and F2-6, by hand", () => {
    const h0 = 11.5;
    const cc = (h0 / 2) * Math.sqrt(shape.minorMomentOfInertia / shape.warpingConstant);
    const rts = Math.sqrt(Math.sqrt(shape.minorMomentOfInertia * shape.warpingConstant) / shape.sectionModulus);
    const j = (shape.torsionConstant * cc) / (shape.sectionModulus * h0);
    const lr = 1.95 * rts * (E / 35) * Math.sqrt(j + Math.sqrt(j * j + 6.76 * (35 / E) ** 2));
    const b = bucklingLengths(shape, steel(50));
    expect(b.torsionCoefficient).toBeCloseTo(cc, 12);
    expect(cc).toBeGreaterThan(1);
    rel(b.inelastic, lr, 1e-12);
  });

  it("a doubly symmetric I described as a channel with C_w = I_y h_0^2 / 4 has c = 1: the same L_r and M_n as the I", () => {
    const asI: IShapeForDesign = { ...shape, form: "i-shape", flangeWidth: 6, warpingConstant: (shape.minorMomentOfInertia * 11.5 ** 2) / 4 };
    const asChannel: IShapeForDesign = { ...asI, form: "channel", flangeWidth: 3 };
    expect(bucklingLengths(asChannel, steel(50)).torsionCoefficient).toBeCloseTo(1, 12);
    rel(bucklingLengths(asChannel, steel(50)).inelastic, bucklingLengths(asI, steel(50)).inelastic, 1e-12);
    rel(nominalFlexure(asChannel, steel(50), 300, 1.1).nominal, nominalFlexure(asI, steel(50), 300, 1.1).nominal, 1e-12);
  });

  it("elastic lateral-torsional buckling F2-3, F2-4 with c, by hand; shear by G2.1(b) (not the rolled-I rule)", () => {
    const Lb = 400;
    const b = bucklingLengths(shape, steel(50));
    const slender = Lb / b.effectiveRadius;
    const fcr = ((1.2 * Math.PI ** 2 * E) / slender ** 2) * Math.sqrt(1 + 0.078 * ((shape.torsionConstant * b.torsionCoefficient) / (shape.sectionModulus * 11.5)) * slender ** 2);
    const r = nominalFlexure(shape, steel(50), Lb, 1.2);
    expect(r.equation).toBe("F2-3");
    rel(r.nominal, Math.min(fcr * shape.sectionModulus, r.plasticMoment), 1e-12);
    const v = nominalShear(shape, steel(50));
    expect(v.clause).toBe("G2.1(b)");
    expect(v.resistanceFactor).toBe(0.9);
  });

  it("a channel with a noncompact flange, or welded, is refused (F2 covers compact rolled channels; F3 is for I-shapes)", () => {
    expect(issueCodes(() => nominalFlexure({ ...shape, flangeWidth: 6, flangeThickness: 0.25 }, steel(50), 100, 1))).toEqual(["rule-not-covered@shape.flangeWidth"]);
    expect(issueCodes(() => nominalFlexure({ ...shape, rolled: false }, steel(50), 100, 1))).toEqual(["rule-not-covered@shape.rolled"]);
    expect(issueCodes(() => nominalFlexure({ ...shape, form: "zed" as "channel" }, steel(50), 100, 1))).toEqual(["options-invalid@shape.form"]);
  });
});
