// Steel I-sections by EN 1993-1-1:2005 (Eurocode 3: Design of steel structures, Part 1-1): Table 5.2,
// 6.2.5, 6.2.6, 6.2.8, 6.3.2.2, 6.3.2.3, Tables 6.3 to 6.5. Section properties of IPE 300 as listed in
// producers' section tables to EN 10365 (from memory: h 300, b 150, t_w 7.1, t_f 10.7, r 15 mm,
// A 53.81 cm^2, W_el,y 557.1 cm^3, W_pl,y 628.4 cm^3, I_z 603.8 cm^4, I_t 20.12 cm^4, I_w 125.9e3 cm^6,
// A_v,z 25.68 cm^2). Other expected values are hand calculations from the clauses, shown in comments.
import fc from "fast-check";
import { describe, expect, it } from "vitest";
import {
  bendingWithShear,
  bucklingResistance,
  classifyEurocodeIShape,
  criticalMoment,
  eurocodeResistance,
  type IShapeForEurocode,
} from "../../src/design/index.js";
import { issueCodes } from "./helpers.js";

const ipe300: IShapeForEurocode = {
  rolled: true,
  depth: 300,
  flangeWidth: 150,
  flangeThickness: 10.7,
  webThickness: 7.1,
  rootRadius: 15,
  area: 5381,
  elasticModulus: 557.1e3,
  plasticModulus: 628.4e3,
  minorMomentOfInertia: 603.8e4,
  torsionConstant: 20.12e4,
  warpingConstant: 125.9e9,
};
const s235 = { elasticModulus: 210_000, shearModulus: 81_000, yieldStrength: 235 }; // 3.2.6 and Table 3.1
const rel = (a: number, b: number, tol: number): void => expect(Math.abs(a - b) / Math.abs(b)).toBeLessThan(tol);

describe("IPE 300 in S235", () => {
  it("classifyEurocodeIShape: class 1 (web c/t = 35.0 <= 72; flange c/t = 5.28 <= 9)", () => {
    const c = classifyEurocodeIShape(ipe300, s235);
    expect(c.class).toBe(1);
    rel(c.web.ratio, 248.6 / 7.1, 1e-12);
    rel(c.flange.ratio, 56.45 / 10.7, 1e-12);
  });
  it("eurocodeResistance: M_c,Rd = W_pl f_y = 147.7 kN m; A_v = 25.68 cm^2 (table), V_pl,Rd = 348.4 kN", () => {
    const r = eurocodeResistance(ipe300, s235);
    rel(r.bending / 1e6, 147.67, 1e-4);
    rel(r.shearArea, 2568, 1e-3); // the tables' A_v,z
    rel(r.shear / 1e3, 348.4, 1e-3); // 2568 x 235 / sqrt 3
  });
  it("an S355 section is class by epsilon = sqrt(235/355) = 0.81 (Table 5.2)", () => {
    rel(classifyEurocodeIShape(ipe300, { ...s235, yieldStrength: 355 }).epsilon, Math.sqrt(235 / 355), 1e-15);
  });
  it("criticalMoment, 6 m, uniform moment (C_1 = 1): 90.5 kN m by hand", () => {
    // pi^2 E I_z / L^2 = 347.6 kN; sqrt(I_w/I_z + L^2 G I_t / (pi^2 E I_z)) = sqrt(20851 + 46882) = 260.3 mm
    rel(criticalMoment(ipe300, s235, 6000, { momentShapeFactor: 1 }) / 1e6, 90.47, 1e-3);
  });
  it("bucklingResistance, general case, curve a (h/b = 2): lambda_LT = 1.278, chi_LT = 0.483, M_b,Rd = 71.3 kN m by hand", () => {
    const mcr = criticalMoment(ipe300, s235, 6000, { momentShapeFactor: 1 });
    const b = bucklingResistance(ipe300, s235, mcr, "general");
    expect(b.curve).toBe("a");
    rel(b.slenderness, 1.2776, 1e-3);
    rel(b.reduction, 0.4829, 1e-3);
    rel(b.resistance / 1e6, 71.3, 2e-3);
  });
  it("bucklingResistance, rolled sections 6.3.2.3, curve b: chi = 1/(Phi + sqrt(Phi^2 - 0.75 lambda^2)) by hand", () => {
    const mcr = criticalMoment(ipe300, s235, 6000, { momentShapeFactor: 1 });
    const b = bucklingResistance(ipe300, s235, mcr, "rolled");
    expect(b.curve).toBe("b");
    const lam = b.slenderness;
    const phi = 0.5 * (1 + 0.34 * (lam - 0.4) + 0.75 * lam * lam);
    rel(b.reduction, 1 / (phi + Math.sqrt(phi * phi - 0.75 * lam * lam)), 1e-12);
    expect(b.reduction).toBeGreaterThan(bucklingResistance(ipe300, s235, mcr, "general").reduction); // 6.3.2.3 is the less conservative route for rolled sections (common practice)
  });
  it("bendingWithShear: none up to 0.5 V_pl,Rd; at V_pl,Rd, W_pl - A_w^2 / (4 t_w) (6.30)", () => {
    const r = eurocodeResistance(ipe300, s235);
    expect(bendingWithShear(ipe300, s235, r, 0.5 * r.shear)).toBe(r.bending);
    const aw = 278.6 * 7.1;
    rel(bendingWithShear(ipe300, s235, r, r.shear), ((628.4e3 - (aw * aw) / (4 * 7.1)) * 235) / 1, 1e-12);
  });
});

describe("laws (fast-check)", () => {
  it("chi_LT is at most 1, falls as the segment gets longer, and curve a >= b >= c >= d (Table 6.3, common practice)", () => {
    fc.assert(
      fc.property(fc.double({ min: 500, max: 20000, noNaN: true }), fc.double({ min: 500, max: 20000, noNaN: true }), (a, b) => {
        const [lo, hi] = a < b ? [a, b] : [b, a];
        const short = bucklingResistance(ipe300, s235, criticalMoment(ipe300, s235, lo, { momentShapeFactor: 1 }), "general").reduction;
        const long = bucklingResistance(ipe300, s235, criticalMoment(ipe300, s235, hi, { momentShapeFactor: 1 }), "general").reduction;
        expect(short).toBeLessThanOrEqual(1);
        expect(long).toBeLessThanOrEqual(short + 1e-15);
        const welded = bucklingResistance({ ...ipe300, rolled: false }, s235, criticalMoment(ipe300, s235, lo, { momentShapeFactor: 1 }), "general").reduction; // curve c
        expect(welded).toBeLessThanOrEqual(short + 1e-15);
      }),
      { numRuns: 150 },
    );
  });
  it("M_cr is proportional to C_1 and falls with a destabilising load height (common practice)", () => {
    fc.assert(
      fc.property(fc.double({ min: 1, max: 2.5, noNaN: true }), fc.double({ min: 1, max: 150, noNaN: true }), (c1, zg) => {
        const base = criticalMoment(ipe300, s235, 5000, { momentShapeFactor: 1 });
        rel(criticalMoment(ipe300, s235, 5000, { momentShapeFactor: c1 }), c1 * base, 1e-12);
        expect(criticalMoment(ipe300, s235, 5000, { momentShapeFactor: 1, loadHeightFactor: 0.45, loadHeight: zg })).toBeLessThan(base);
      }),
      { numRuns: 100 },
    );
  });
  it("the shear reduction is continuous at 0.5 V_pl,Rd and never raises M_c,Rd", () => {
    const r = eurocodeResistance(ipe300, s235);
    rel(bendingWithShear(ipe300, s235, r, 0.5 * r.shear * (1 + 1e-9)), r.bending, 1e-6);
    fc.assert(fc.property(fc.double({ min: 0, max: 1, noNaN: true }), (f) => void expect(bendingWithShear(ipe300, s235, r, f * r.shear)).toBeLessThanOrEqual(r.bending)));
  });
});

describe("bad input", () => {
  it("steel in ksi is refused: epsilon needs N/mm^2", () => {
    expect(issueCodes(() => classifyEurocodeIShape(ipe300, { elasticModulus: 29000, shearModulus: 11200, yieldStrength: 50 }))).toEqual(["units-not-newton-millimetre@steel.elasticModulus"]);
  });
  it("a class 4 section and a web that needs a shear buckling check are refused, naming EN 1993-1-5", () => {
    const thinFlange = { ...ipe300, flangeWidth: 400, flangeThickness: 8 };
    expect(issueCodes(() => eurocodeResistance(thinFlange, s235))).toEqual(["rule-not-covered@shape"]);
    const deep = { ...ipe300, depth: 900, webThickness: 6, area: 8600, elasticModulus: 2.0e6, plasticModulus: 2.4e6 };
    expect(() => eurocodeResistance(deep, s235)).toThrow(/EN 1993-1-5/);
  });
  it("missing G, a partial factor below 1, shear above V_pl,Rd, an unknown method", () => {
    expect(issueCodes(() => criticalMoment(ipe300, { elasticModulus: 210000, yieldStrength: 235 } as never, 5000, { momentShapeFactor: 1 }))).toEqual(["missing-field@steel.shearModulus"]);
    expect(issueCodes(() => eurocodeResistance(ipe300, s235, { crossSection: 0.9, instability: 1 }))).toEqual(["partial-factor-invalid@factors.crossSection"]);
    const r = eurocodeResistance(ipe300, s235);
    expect(issueCodes(() => bendingWithShear(ipe300, s235, r, 1.01 * r.shear))).toEqual(["shear-exceeds-resistance@shear"]);
    expect(issueCodes(() => bucklingResistance(ipe300, s235, 1e8, "lazy" as never))).toEqual(["options-invalid@method"]);
  });
});

describe("bad input that must not give NaN", () => {
  const code = (fn: () => unknown): string | undefined => issueCodes(fn)[0];
  const r = eurocodeResistance(ipe300, s235);
  it("bendingWithShear with V_Ed NaN, resistances that are not numbers, or factors that are null", () => {
    expect(code(() => bendingWithShear(ipe300, s235, r, Number.NaN))).toBe("not-finite@shear");
    expect(code(() => bendingWithShear(ipe300, s235, {} as never, 1))).toBe("options-invalid@resistance");
    expect(code(() => eurocodeResistance(ipe300, s235, null as never))).toBe("partial-factor-invalid@factors");
  });
  it("criticalMoment without options", () => {
    expect(code(() => criticalMoment(ipe300, s235, 5000, null as never))).toBe("options-invalid@options");
  });
});
