import { describe, expect, it } from "vitest";
import { formatPath } from "../../src/errors/index.js";
import { analyzeModel, modelToJson, parseModel, tryAnalyzeModel, tryParseModel, type ModelAnalysis } from "../../src/model/index.js";
import { reportSection } from "../../src/report/index.js";

/** |a - b| <= rel |b| */
const within = (a: number, b: number, rel: number): void => {
  expect(Math.abs(a - b)).toBeLessThanOrEqual(rel * Math.abs(b));
};

// An invented 10 ft simple span with a 2 kip point load at midspan, kip and inch units.
const usSpan = {
  units: { system: "usKipInch" },
  length: 120,
  material: { E: 29000 },
  supports: [{ at: 0, type: "pin" }, { at: 120, type: "roller" }],
  loads: [{ type: "point", at: 60, value: 2 }],
};
const us = (section: Record<string, unknown>): ModelAnalysis => analyzeModel(parseModel({ ...usSpan, section }));

// An invented 4 m simple span with a 10 kN point load at midspan, kN, m and mm.
const siSpan = {
  length: 4,
  material: { E: "200 GPa" },
  supports: [{ at: 0, type: "pin" }, { at: 4, type: "roller" }],
  loads: [{ type: "point", at: 2, value: 10 }],
};
const si = (section: Record<string, unknown>, extra: Record<string, unknown> = {}): ModelAnalysis => analyzeModel(parseModel({ ...siSpan, ...extra, section }));

describe("channel sections against tabulated rolled channels", () => {
  // AISC Steel Construction Manual 15th ed., Table 1-5 (C shapes), from memory. The tabulated shapes have
  // sloping flanges; the model's channel has parallel flanges of the mean thickness tf and no fillets, so
  // A, I_x and S_x agree to about 1% (I_y and the centroid do not, and are not compared).
  it.each([
    { name: "C12x20.7", d: 12, bf: 2.94, tf: 0.501, tw: 0.282, A: 6.08, Ix: 129, Sx: 21.5 },
    { name: "C10x15.3", d: 10, bf: 2.6, tf: 0.436, tw: 0.24, A: 4.48, Ix: 67.3, Sx: 13.5 },
  ])("$name: area, I_x and S_x", ({ d, bf, tf, tw, A, Ix, Sx }) => {
    const a = us({ shape: "channel", depth: d, flangeWidth: bf, flangeThickness: tf, webThickness: tw });
    within(a.section!.area, A, 0.01);
    within(a.section!.secondMomentZ, Ix, 0.01);
    within(a.section!.sectionModulus.top, Sx, 0.01);
    expect(a.section!.centroid.y).toBeCloseTo(0, 12); // symmetric about the bending axis
    expect(a.warnings).toEqual([]);
  });
});

describe("angle sections against tabulated rolled angles", () => {
  it("L6x4x1/2, long leg vertical: area, centroid, I_x, I_y and S_x", () => {
    const a = us({ shape: "angle", verticalLeg: 6, horizontalLeg: 4, thickness: 0.5 });
    // AISC Steel Construction Manual 15th ed., Table 1-7 (angles), from memory: A = 4.75 in^2, y = 1.99 in,
    // x = 0.987 in, I_x = 17.4 in^4, S_x = 4.33 in^3, I_y = 6.27 in^4 (toe and root radii not modelled).
    within(a.section!.area, 4.75, 0.002);
    within(a.section!.extremes.bottom * -1, 1.99, 0.005);
    within(a.section!.secondMomentZ, 17.4, 0.005);
    within(a.section!.sectionModulus.top, 4.33, 0.005);
    within(a.section!.secondMomentY, 6.27, 0.005);
    // The centroid lies x = 0.987 in from the back of the vertical leg; the model's angle has its bounding box centred.
    within(a.section!.centroid.z + 2, 0.987, 0.005);
    expect(a.warnings.map((w) => w.code)).toEqual(["section-axes-inclined"]);
  });

  it("L4x4x1/2 (equal legs, horizontalLeg defaulted): area, centroid and I_x", () => {
    const a = us({ shape: "angle", verticalLeg: 4, thickness: 0.5 });
    // AISC Steel Construction Manual 15th ed., Table 1-7, from memory: A = 3.75 in^2, y = 1.18 in, I_x = 5.52 in^4.
    within(a.section!.area, 3.75, 0.002);
    within(a.section!.extremes.bottom * -1, 1.18, 0.005);
    within(a.section!.secondMomentZ, 5.52, 0.01);
    expect(a.section!.secondMomentY).toBeCloseTo(a.section!.secondMomentZ, 10); // equal legs
  });
});

describe("rectangular hollow sections", () => {
  it("square corners: A = B D - b d, I = (B D^3 - b d^3) / 12, and the peak shear stress V Q / (I 2t) at the neutral axis", () => {
    const [B, D, t] = [100, 200, 8];
    const [b, d] = [B - 2 * t, D - 2 * t];
    const a = si({ shape: "rectangular-hollow", width: B, depth: D, wallThickness: t });
    // Roark's Formulas for Stress and Strain, 8th ed., Table A.1 (hollow rectangle), from memory.
    const I = (B * D ** 3 - b * d ** 3) / 12;
    within(a.section!.area, B * D - b * d, 1e-12);
    within(a.section!.secondMomentZ, I, 1e-12);
    within(a.section!.sectionModulus.top, I / (D / 2), 1e-12);
    // tau = V Q / (I b) with Q of the half section above the neutral axis (common practice).
    const Q = (B * D ** 2) / 8 - (b * d ** 2) / 8;
    within(a.stress!.shear!.value, (5e3 * Q) / (I * 2 * t), 1e-9);
    within(a.stress!.compression.value, -(10e6 * (D / 2)) / I, 1e-12); // M = P L / 4 = 10 kN*m
  });

  it.each([
    // AISC Steel Construction Manual 15th ed., Tables 1-11 and 1-12 (rectangular and square HSS), from memory:
    // design wall t = 0.93 t_nominal, outside corner radius 2 t.
    { name: "HSS8x4x1/4", B: 4, D: 8, t: 0.233, A: 5.24, Ix: 42.5, Sx: 10.6, Iy: 14.4 },
    { name: "HSS6x6x3/8", B: 6, D: 6, t: 0.349, A: 7.58, Ix: 39.5, Sx: 13.2, Iy: 39.5 },
  ])("$name with rounded corners: A, I_x, S_x, I_y", ({ B, D, t, A, Ix, Sx, Iy }) => {
    const a = us({ shape: "rectangular-hollow", width: B, depth: D, wallThickness: t, cornerRadius: 2 * t });
    within(a.section!.area, A, 0.005);
    within(a.section!.secondMomentZ, Ix, 0.005);
    within(a.section!.sectionModulus.top, Sx, 0.005);
    within(a.section!.secondMomentY, Iy, 0.005);
  });
});

describe("plate girders", () => {
  it("unequal flanges: centroid and I by composite areas and the parallel-axis theorem", () => {
    const a = si({ shape: "plate-girder", topFlange: { width: 300, thickness: 20 }, web: { depth: 800, thickness: 10 }, bottomFlange: { width: 400, thickness: 25 } });
    // Composite-area centroid and parallel-axis theorem (common practice), measured up from the bottom fibre.
    const parts = [
      { A: 400 * 25, y: 12.5, I: (400 * 25 ** 3) / 12 },
      { A: 800 * 10, y: 25 + 400, I: (10 * 800 ** 3) / 12 },
      { A: 300 * 20, y: 825 + 10, I: (300 * 20 ** 3) / 12 },
    ];
    const area = parts.reduce((s, p) => s + p.A, 0);
    const yc = parts.reduce((s, p) => s + p.A * p.y, 0) / area;
    within(a.section!.area, area, 1e-12);
    within(a.section!.extremes.bottom * -1, yc, 1e-12);
    within(a.section!.secondMomentZ, parts.reduce((s, p) => s + p.I + p.A * (p.y - yc) ** 2, 0), 1e-12);
  });

  it("equal flanges (bottomFlange defaulted) give the i-section of the same plates", () => {
    const g = si({ shape: "plate-girder", topFlange: { width: 250, thickness: 16 }, web: { depth: 568, thickness: 8 } });
    const i = si({ shape: "i-section", depth: 600, flangeWidth: 250, flangeThickness: 16, webThickness: 8 });
    within(g.section!.secondMomentZ, i.section!.secondMomentZ, 1e-12);
    within(g.stress!.shear!.value, i.stress!.shear!.value, 1e-12);
  });
});

describe("built-up sections", () => {
  it("a plate with a round hole at its centre: I = b d^3 / 12 - pi r^4 / 4", () => {
    const a = si({
      shape: "built-up",
      parts: [
        { type: "polygon", points: [{ y: 0, z: 0 }, { y: 0, z: 120 }, { y: 300, z: 120 }, { y: 300, z: 0 }] },
        { type: "circle", centre: { y: 150, z: 60 }, radius: 30, hole: true },
      ],
    });
    // Roark's Formulas for Stress and Strain, 8th ed., Table A.1 (rectangle; solid circle), composite by subtraction (common practice).
    within(a.section!.area, 120 * 300 - Math.PI * 900, 1e-12);
    within(a.section!.secondMomentZ, (120 * 300 ** 3) / 12 - (Math.PI * 30 ** 4) / 4, 1e-12);
    within(a.section!.centroid.y, 150, 1e-12);
  });

  it("a semicircle given as a sector (angles in radians, one as a string with its unit): area pi r^2 / 2, centroid 4 r / (3 pi) above the diameter", () => {
    const r = 50;
    const a = si({ shape: "built-up", parts: [{ type: "sector", centre: { y: 0, z: 0 }, radius: r, startAngle: "0 rad", sweep: Math.PI }] });
    // Roark's Formulas for Stress and Strain, 8th ed., Table A.1 (semicircle), from memory: I about the centroidal axis = 0.1098 r^4.
    within(a.section!.area, (Math.PI * r * r) / 2, 1e-12);
    within(a.section!.centroid.y, (4 * r) / (3 * Math.PI), 1e-12);
    within(a.section!.secondMomentZ, (Math.PI / 8 - 8 / (9 * Math.PI)) * r ** 4, 1e-12);
    within(a.section!.secondMomentZ / r ** 4, 0.1098, 1e-3);
  });

  it("a fillet's area is (1 - pi/4) r^2", () => {
    const a = si({ shape: "built-up", parts: [{ type: "fillet", corner: { y: 0, z: 0 }, radius: 20, orientation: 0 }] });
    // The square less the quarter disc (common practice).
    within(a.section!.area, (1 - Math.PI / 4) * 400, 1e-12);
  });

  // A flitch beam: two timber plies either side of a steel plate (an invented lintel).
  const flitch = (steel: Record<string, unknown>): Record<string, unknown> => ({
    shape: "built-up",
    parts: [
      { type: "polygon", points: [{ y: 0, z: 0 }, { y: 0, z: 50 }, { y: 300, z: 50 }, { y: 300, z: 0 }] },
      { type: "polygon", points: [{ y: 0, z: 50 }, { y: 0, z: 60 }, { y: 300, z: 60 }, { y: 300, z: 50 }], ...steel },
      { type: "polygon", points: [{ y: 0, z: 60 }, { y: 0, z: 110 }, { y: 300, z: 110 }, { y: 300, z: 60 }] },
    ],
  });

  it("a timber and steel flitch beam: the transformed section, sigma = n M y / I_t in each material", () => {
    const timber = { material: { name: "timber", E: "11 GPa" } };
    const a = si(flitch({ material: { name: "steel", E: "200 GPa" } }), timber);
    const n = 200 / 11;
    // Transformed section by the modular ratio (Gere and Goodno, Mechanics of Materials, composite beams; from memory).
    const It = ((100 + n * 10) * 300 ** 3) / 12;
    within(a.section!.secondMomentZ, It, 1e-12);
    // M = P L / 4 = 10 kN*m; the steel's extreme fibres carry n M c / I_t, the timber's M c / I_t.
    within(a.stress!.tension.value, (n * 10e6 * 150) / It, 1e-12);
    expect(a.stress!.tension.part).toBe(1);
    within(a.stress!.compression.value, -(n * 10e6 * 150) / It, 1e-12);
    // Stiffness is E_timber I_t: midspan deflection P L^3 / (48 E I) (AISC Steel Construction Manual 15th ed., Table 3-23 case 7).
    within(-a.deflection.min.value, (10e3 * 4000 ** 3) / (48 * 11e3 * It), 1e-9);
    const byRatio = si(flitch({ modularRatio: n }), timber);
    within(byRatio.section!.secondMomentZ, It, 1e-12);
    within(byRatio.stress!.tension.value, a.stress!.tension.value, 1e-12);
    // Each material against its own allowable: the plies (parts 0 and 2) against limits.bendingStress, the plate against its own.
    const checked = si(flitch({ material: { E: "200 GPa" }, bendingStress: "165 MPa" }), { ...timber, limits: { bendingStress: 10 } });
    expect(checked.checks.map((c) => c.description)).toEqual([
      "extreme-fibre bending stress (tension) in part 1 against 10 MPa",
      "extreme-fibre bending stress (compression) in part 1 against 10 MPa",
      "extreme-fibre bending stress (tension) in part 2 against 165 MPa",
      "extreme-fibre bending stress (compression) in part 2 against 165 MPa",
      "extreme-fibre bending stress (tension) in part 3 against 10 MPa",
      "extreme-fibre bending stress (compression) in part 3 against 10 MPa",
    ]);
    within(checked.checks[0]!.demand, (10e6 * 150) / It, 1e-12);
    within(checked.checks[2]!.demand, (n * 10e6 * 150) / It, 1e-12);
    expect(checked.warnings).toEqual([]);
    const unchecked = si(flitch({ modularRatio: n }), { ...timber, limits: { bendingStress: 10 } });
    expect(unchecked.checks.map((c) => c.description.replace(/ against.*/, ""))).toEqual([1, 1, 3, 3].map((p, i) => `extreme-fibre bending stress (${i % 2 === 0 ? "tension" : "compression"}) in part ${p}`));
    expect(unchecked.warnings.map((w) => w.code)).toEqual(["part-bending-stress-not-checked"]);
    // Shear, each material against its own allowable: by the transformed-section derivation (Gere and Goodno, Mechanics of
    // Materials, Sec. 6.3, from memory) the cut at the neutral axis carries V Q* / (I* b*) = 1.5 V / (b* h) in the timber,
    // b* = 100 + 10 n, and n times that in the plate; V = P / 2 = 5 kN beside the midspan load.
    const tauTimber = (1.5 * 5e3) / ((100 + 10 * n) * 300);
    const sheared = si(flitch({ material: { E: "200 GPa" }, shearStress: "100 MPa" }), { ...timber, limits: { shearStress: 1 } });
    expect(sheared.checks.map((c) => [c.description, c.part])).toEqual([
      ["peak shear stress in part 1 against 1 MPa", 0],
      ["peak shear stress in part 2 against 100 MPa", 1],
      ["peak shear stress in part 3 against 1 MPa", 2],
    ]);
    within(sheared.checks[0]!.demand, tauTimber, 1e-9);
    within(sheared.checks[1]!.demand, n * tauTimber, 1e-9);
    within(sheared.stress!.shear!.value, n * tauTimber, 1e-9);
    expect(sheared.stress!.shearByPart!.map((p) => p.part)).toEqual([0, 1, 2]);
    within(sheared.stress!.shearByPart![2]!.value, tauTimber, 1e-9);
    const shearUnchecked = si(flitch({ material: { E: "200 GPa" } }), { ...timber, limits: { shearStress: 1 } });
    expect(shearUnchecked.checks.map((c) => c.part)).toEqual([0, 2]);
    expect(shearUnchecked.warnings.map((w) => w.code)).toEqual(["part-shear-stress-not-checked"]);
    expect(reportSection(sheared)).toMatch(/largest shear stress, part 2\s+1\.61\d* MPa/);
  });
});

describe("the new shapes in files", () => {
  const shapes: Record<string, unknown>[] = [
    { shape: "channel", depth: 200, flangeWidth: 75, flangeThickness: 11, webThickness: 7, rootRadius: 12 },
    { shape: "angle", verticalLeg: 100, horizontalLeg: "75 mm", thickness: 8, rootRadius: 0 },
    { shape: "rectangular-hollow", width: 100, depth: 200, wallThickness: 8, cornerRadius: 16, innerCornerRadius: 8 },
    { shape: "i-section", depth: 310, flangeWidth: 165, flangeThickness: 9.7, webThickness: 5.8, rootRadius: 8.9 },
    { shape: "tee", depth: 200, flangeWidth: 150, flangeThickness: 12, webThickness: 10, rootRadius: 10 },
    { shape: "plate-girder", topFlange: { width: 300, thickness: 20 }, web: { depth: 800, thickness: 10 }, bottomFlange: { width: 400, thickness: "1 in" } },
    {
      shape: "built-up",
      parts: [
        { type: "polygon", points: [{ y: 0, z: 0 }, { y: 0, z: 100 }, { y: 100, z: 100 }, { y: 100, z: 0 }], material: { E: 200000 } },
        { type: "fillet", corner: { y: 100, z: 100 }, radius: 10, orientation: Math.PI, hole: true },
        { type: "sector", centre: { y: 100, z: 50 }, radius: 50, startAngle: 0, sweep: 3.141592653589793, modularRatio: 2 },
      ],
    },
  ];

  it.each(shapes)("$shape survives modelToJson and JSON text round trips", (section) => {
    const model = parseModel({ ...siSpan, section });
    expect(parseModel(JSON.parse(JSON.stringify(modelToJson(model))))).toEqual(model);
    expect(analyzeModel(model).section!.area).toBeGreaterThan(0);
  });

  it("reports bad dimensions at parse time and bad geometry at analysis, each with its path", () => {
    const parsed = tryParseModel({
      ...siSpan,
      section: { shape: "built-up", parts: [{ type: "polygon", points: [{ y: 0, z: 0 }, { y: 1, z: 0 }] }, { type: "circle", centre: { y: 0 }, radius: -3, material: { E: 1 }, modularRatio: 2 }] },
    });
    expect(parsed.ok).toBe(false);
    if (!parsed.ok) {
      expect(parsed.error.issues.map((i) => `${formatPath(i.path)} [${i.code}]`)).toMatchInlineSnapshot(`
        [
          "section.parts[0].points [too-few-items]",
          "section.parts[1].centre.z [missing-field]",
          "section.parts[1].modularRatio [field-not-allowed]",
          "section.parts[1].radius [value-not-positive]",
        ]
      `);
    }
    const negative = tryParseModel({ ...siSpan, section: { shape: "channel", depth: 200, flangeWidth: 75, flangeThickness: 11, webThickness: 7, rootRadius: -1 } });
    expect(negative.ok ? [] : negative.error.issues.map((i) => `${formatPath(i.path)} [${i.code}]`)).toEqual(["section.rootRadius [value-negative]"]);
    const geometry = (section: Record<string, unknown>): string[] => {
      const r = tryAnalyzeModel(parseModel({ ...siSpan, section }));
      return r.ok ? [] : r.error.issues.map((i) => `${formatPath(i.path)} [${i.code}]`);
    };
    expect(geometry({ shape: "channel", depth: 200, flangeWidth: 75, flangeThickness: 11, webThickness: 80 })).toEqual(["section.webThickness [web-too-thick]"]);
    expect(geometry({ shape: "angle", verticalLeg: 50, thickness: 60 })).toEqual(["section.thickness [thickness-too-large]"]);
    expect(geometry({ shape: "rectangular-hollow", width: 20, depth: 40, wallThickness: 10 })).toEqual(["section.wallThickness [wall-too-thick]"]);
    expect(geometry({ shape: "plate-girder", topFlange: { width: 100, thickness: 10 }, web: { depth: 300, thickness: 120 } })).toEqual(["section.web.thickness [web-too-thick]"]);
    expect(
      geometry({
        shape: "built-up",
        parts: [
          { type: "polygon", points: [{ y: 0, z: 0 }, { y: 0, z: 10 }, { y: 10, z: 10 }, { y: 10, z: 0 }] },
          { type: "circle", centre: { y: 20, z: 5 }, radius: 2, hole: true },
          { type: "sector", centre: { y: 0, z: 0 }, radius: 5, startAngle: 0, sweep: 7 },
        ],
      }),
    ).toMatchInlineSnapshot(`
      [
        "section.parts[2].sweep [sector-sweep-out-of-range]",
      ]
    `);
    const square = { type: "polygon", points: [{ y: 0, z: 0 }, { y: 0, z: 10 }, { y: 10, z: 10 }, { y: 10, z: 0 }] };
    expect(geometry({ shape: "built-up", parts: [square, { type: "circle", centre: { y: 20, z: 5 }, radius: 2, hole: true }] })).toMatchInlineSnapshot(`
      [
        "section.parts[1] [hole-outside-solid]",
      ]
    `);
  });
});
