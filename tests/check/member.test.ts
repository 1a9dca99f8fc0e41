import { describe, expect, it } from "vitest";
import { fc, test } from "@fast-check/vitest";
import { solveBeam, type BeamInput } from "../../src/beam/index.js";
import { rectangle, section } from "../../src/section/index.js";
import { checkMember, commonDeflectionRatios, memberSection, memberStresses, spanDeflections, tryCheckMember, tryMemberStresses, type MemberSection } from "../../src/check/index.js";
import type { DepthBand } from "../../src/stress/index.js";

// Units: N and mm throughout (invented members).
const E = 200_000;

function rectangleSection(b: number, h: number): MemberSection {
  const bands: DepthBand[] = [{ kind: "trapezoid", yBottom: -h / 2, yTop: h / 2, widthBottom: b, widthTop: b }];
  return { properties: { secondMomentZ: (b * h ** 3) / 12, extremes: { top: h / 2, bottom: -h / 2 } }, shear: bands };
}

/** T: flange bf x tf on a stem tw x (d - tf); centroid and I by the parallel-axis theorem (closed form). */
function teeSection(bf: number, tf: number, tw: number, d: number): MemberSection & { c: number } {
  const af = bf * tf;
  const aw = tw * (d - tf);
  const c = (af * (d - tf / 2) + (aw * (d - tf)) / 2) / (af + aw); // centroid above the bottom
  const i = (bf * tf ** 3) / 12 + af * (d - tf / 2 - c) ** 2 + (tw * (d - tf) ** 3) / 12 + aw * ((d - tf) / 2 - c) ** 2;
  return { properties: { secondMomentZ: i, extremes: { top: d - c, bottom: -c } }, c };
}

function simpleSpan(length: number, ei: number, w: number): BeamInput {
  return {
    length,
    stiffness: ei,
    supports: [{ kind: "pin", at: 0 }, { kind: "roller", at: length }],
    loads: [{ kind: "distributed", from: 0, to: length, start: w, end: w }],
  };
}

describe("checkMember: published beam formulas", () => {
  it("checkMember(simple span, uniform load): sigma = (w L^2 / 8) / S, delta = 5 w L^4 / (384 E I), tau = 1.5 (w L / 2) / A", () => {
    // M_max = w L^2 / 8 at midspan, delta_max = 5 w L^4 / (384 E I), V_max = w L / 2
    // (AISC Steel Construction Manual 15th ed., Table 3-23 case 1, from memory); rectangle S = b h^2 / 6, tau = 1.5 V / A.
    const [b, h, L, w] = [200, 400, 6000, 12];
    const sec = rectangleSection(b, h);
    const I = sec.properties.secondMomentZ;
    const solution = solveBeam(simpleSpan(L, E * I, w));
    const r = checkMember(solution, sec, { bendingStress: 20, shearStress: 1.0, deflection: { kind: "ratio", ratio: commonDeflectionRatios.floorLive } });
    const sigma = (w * L * L) / 8 / ((b * h * h) / 6);
    expect(r.stresses.tension.stress).toBeCloseTo(sigma, 9);
    expect(r.stresses.tension.fibre).toBe("bottom");
    expect(r.stresses.tension.x).toBeCloseTo(L / 2, 6);
    expect(r.stresses.compression.stress).toBeCloseTo(-sigma, 9);
    expect(r.stresses.compression.fibre).toBe("top");
    expect(r.stresses.shear!.stress).toBeCloseTo((1.5 * (w * L) / 2) / (b * h), 9);
    const delta = (5 * w * L ** 4) / (384 * E * I);
    expect(r.deflections[0]!.deflection).toBeCloseTo(-delta, 9);
    const byKind = Object.fromEntries(r.checks.map((c) => [c.check, c]));
    expect(byKind["deflection"]!.capacity).toBeCloseTo(L / 360, 12);
    expect(byKind["deflection"]!.utilisation).toBeCloseTo(delta / (L / 360), 9);
    expect(byKind["bending-tension"]!.utilisation).toBeCloseTo(sigma / 20, 9);
    expect(byKind["shear-stress"]!.at.y).toBeCloseTo(0, 6);
    const top = r.checks.reduce((a, c) => (c.utilisation > a.utilisation ? c : a));
    expect(r.governing).toBe(top);
    expect(r.pass).toBe(r.checks.every((c) => c.utilisation <= 1));
  });

  it("checkMember(cantilever, tip load, T section): hogging puts the top in tension; the deflection limit is 2 L / n", () => {
    // Cantilever with a tip load P: M = -P L at the support, delta_tip = P L^3 / (3 E I)
    // (AISC Steel Construction Manual 15th ed., Table 3-23 case 22, from memory).
    const tee = teeSection(150, 20, 20, 200);
    const I = tee.properties.secondMomentZ;
    const [L, P] = [1500, 8000];
    const solution = solveBeam({ length: L, stiffness: E * I, supports: [{ kind: "fixed", at: 0 }], loads: [{ kind: "point", at: L, value: P }] });
    const r = checkMember(solution, tee, { bendingStress: { tension: 150, compression: 100 }, deflection: { kind: "ratio", ratio: 180 } });
    expect(r.stresses.tension.fibre).toBe("top");
    expect(r.stresses.tension.stress).toBeCloseTo((P * L * (200 - tee.c)) / I, 8);
    expect(r.stresses.compression.fibre).toBe("bottom");
    expect(r.stresses.compression.stress).toBeCloseTo((-P * L * tee.c) / I, 8);
    expect(r.stresses.tension.x).toBe(0);
    const d = r.checks.find((c) => c.check === "deflection")!;
    expect(d.demand).toBeCloseTo((P * L ** 3) / (3 * E * I), 9);
    expect(d.capacity).toBeCloseTo((2 * L) / 180, 12); // common practice: a cantilever as half of a span of 2 L
    expect(d.formula).toContain("2 L / 180");
    expect(r.checks.find((c) => c.check === "bending-compression")!.capacity).toBe(100);
  });

  it("checkMember(overhanging beam, T section): sagging and hogging peaks act on different fibres", () => {
    // Beam overhanging one support, uniform load on the whole length: M at the support = -w a^2 / 2,
    // largest sagging M = w (L + a)^2 (L - a)^2 / (8 L^2) (AISC Steel Construction Manual 15th ed., Table 3-23 case 24, from memory).
    const tee = teeSection(150, 20, 20, 200);
    const I = tee.properties.secondMomentZ;
    const [L, a, w] = [5000, 2000, 10];
    const solution = solveBeam({
      length: L + a,
      stiffness: E * I,
      supports: [{ kind: "pin", at: 0 }, { kind: "roller", at: L }],
      loads: [{ kind: "distributed", from: 0, to: L + a, start: w, end: w }],
    });
    const mSag = (w * (L + a) ** 2 * (L - a) ** 2) / (8 * L * L);
    const mHog = (-w * a * a) / 2;
    const s = memberStresses(solution, tee);
    const ct = 200 - tee.c;
    const cb = tee.c;
    const tensionBottom = (mSag * cb) / I;
    const tensionTop = (-mHog * ct) / I;
    expect(s.tension.stress).toBeCloseTo(Math.max(tensionBottom, tensionTop), 8);
    expect(s.compression.stress).toBeCloseTo(Math.min((-mSag * ct) / I, (mHog * cb) / I), 8);
    expect(s.tension.fibre).toBe(tensionBottom > tensionTop ? "bottom" : "top");
    // the compression peak here is the bottom fibre over the support (hogging), not the top at midspan
    expect(s.compression.fibre).toBe("bottom");
    expect(s.compression.x).toBeCloseTo(L, 6);
    const spans = spanDeflections(solution);
    expect(spans.map((x) => x.spanKind)).toEqual(["span", "cantilever"]);
  });

  it("checkMember(stepped member): each stretch's own section gives its stresses", () => {
    // Simple span, central point load P: M(x) = P x / 2 on the left half (AISC Table 3-23 case 7, from memory).
    const [L, P] = [4000, 20000];
    const deep = rectangleSection(100, 300);
    const shallow = rectangleSection(100, 200);
    const solution = solveBeam({
      length: L,
      stiffness: [
        { from: 0, to: 1000, stiffness: E * shallow.properties.secondMomentZ },
        { from: 1000, to: 3000, stiffness: E * deep.properties.secondMomentZ },
        { from: 3000, to: 4000, stiffness: E * shallow.properties.secondMomentZ },
      ],
      supports: [{ kind: "pin", at: 0 }, { kind: "roller", at: L }],
      loads: [{ kind: "point", at: L / 2, value: P }],
    });
    const s = memberStresses(solution, [
      { ...shallow, from: 0, to: 1000 },
      { ...deep, from: 1000, to: 3000 },
      { ...shallow, from: 3000, to: 4000 },
    ]);
    const atStep = (P * 1000) / 2 / ((100 * 200 ** 2) / 6);
    const atMid = (P * L) / 4 / ((100 * 300 ** 2) / 6);
    expect(s.tension.stress).toBeCloseTo(Math.max(atStep, atMid), 9);
    expect(s.tension.stretch).toBe(atStep > atMid ? 0 : 1);
  });

  it("memberSection(rectangle from the section module) gives the same peaks as depth bands", () => {
    const solution = solveBeam(simpleSpan(6000, E * ((200 * 400 ** 3) / 12), 12));
    const fromBands = memberStresses(solution, rectangleSection(200, 400));
    const fromSection = memberStresses(solution, memberSection(rectangle({ width: 200, depth: 400 })));
    expect(fromSection.tension.stress).toBeCloseTo(fromBands.tension.stress, 9);
    expect(fromSection.shear!.stress).toBeCloseTo(fromBands.shear!.stress, 9);
    // two materials: shear from the transformed section about the given reference modulus
    const wood = { elasticModulus: 10_000 };
    const twoWoods = section([
      { kind: "polygon", points: [{ z: 0, y: 0 }, { z: 200, y: 0 }, { z: 200, y: 200 }, { z: 0, y: 200 }], material: wood },
      { kind: "polygon", points: [{ z: 0, y: 200 }, { z: 200, y: 200 }, { z: 200, y: 400 }, { z: 0, y: 400 }], material: wood },
    ]);
    const same = memberStresses(solution, memberSection(twoWoods, { referenceModulus: 10_000 }));
    expect(same.shear!.stress).toBeCloseTo(fromBands.shear!.stress, 9);
  });

  it("checkMember(timber joist with a steel plate below): each material checked against its own allowable", () => {
    // Transformed section (Gere and Goodno, Mechanics of Materials, Sec. 6.3, from memory); M_max = w L^2 / 8 (AISC Table 3-23 case 1, from memory).
    const timber = { name: "timber", elasticModulus: 10_000 };
    const steel = { name: "steel", elasticModulus: 200_000 };
    const s = section([
      { kind: "polygon", points: [{ z: 0, y: 10 }, { z: 150, y: 10 }, { z: 150, y: 310 }, { z: 0, y: 310 }], material: timber },
      { kind: "polygon", points: [{ z: 0, y: 0 }, { z: 150, y: 0 }, { z: 150, y: 10 }, { z: 0, y: 10 }], material: steel },
    ]);
    const ms = memberSection(s);
    const [L, w] = [5000, 20];
    const solution = solveBeam(simpleSpan(L, 10_000 * ms.properties.secondMomentZ, w));
    const r = checkMember(solution, ms, { bendingStressByPart: [12, { tension: 165, compression: 165 }] });
    const m = (w * L * L) / 8;
    // transformed section by the parallel-axis theorem (closed form)
    const nA = 20 * 1500;
    const c = (nA * 5 + 45000 * 160) / (nA + 45000);
    const it = (150 * 300 ** 3) / 12 + 45000 * (160 - c) ** 2 + 20 * ((150 * 10 ** 3) / 12 + 1500 * (5 - c) ** 2);
    const steelT = r.checks.find((x) => x.label === "bending stress, tension, part 1")!;
    expect(steelT.demand).toBeCloseTo((20 * m * c) / it, 6);
    const timberC = r.checks.find((x) => x.label === "bending stress, compression, part 0")!;
    expect(timberC.demand).toBeCloseTo((m * (310 - c)) / it, 6);
    expect(r.stresses.parts.map((p) => p.part)).toEqual([0, 1]);
    expect(r.stresses.tension.part).toBe(1);
    const missing = tryCheckMember(solution, rectangleSection(100, 100), { bendingStressByPart: [10] });
    expect(missing.ok || missing.error.code).toBe("part-not-found");
  });

  it("checkMember(flitch beam, uniform load): each part's own shear stress against its own allowable", () => {
    // Transformed-section derivation (Gere and Goodno, Mechanics of Materials, Sec. 6.3, from memory): with the timber as
    // the reference material, n = E_steel / E_timber, the two 50 x 200 timbers and the 10 x 200 plate between them form a
    // rectangle of transformed width b* = 2 x 50 + n x 10 over the full depth h = 200, so at the neutral axis
    // V Q* / (I* b*) = 1.5 V / (b* h) (rectangle), the stress in the timber, and n times it in the steel. V_max = w L / 2
    // at the supports of a simple span under uniform load (AISC Steel Construction Manual 15th ed., Table 3-23 case 1,
    // from memory). Invented member: L = 4 m, w = 10 N/mm; timber E = 12000 N/mm^2, steel E = 200000 N/mm^2.
    const timber = { name: "timber", elasticModulus: 12_000 };
    const steel = { name: "steel", elasticModulus: 200_000 };
    const box = (z0: number, z1: number) => [{ z: z0, y: 0 }, { z: z1, y: 0 }, { z: z1, y: 200 }, { z: z0, y: 200 }];
    const s = section([
      { kind: "polygon", points: box(-55, -5), material: timber },
      { kind: "polygon", points: box(-5, 5), material: steel },
      { kind: "polygon", points: box(5, 55), material: timber },
    ]);
    const ms = memberSection(s);
    const [L, w] = [4000, 10];
    const solution = solveBeam(simpleSpan(L, 12_000 * ms.properties.secondMomentZ, w));
    const v = (w * L) / 2;
    const n = 200_000 / 12_000;
    const tauTimber = (1.5 * v) / ((100 + 10 * n) * 200); // 0.5625 N/mm^2
    const tauSteel = n * tauTimber; // 9.375 N/mm^2
    const r = checkMember(solution, ms, { shearStressByPart: [1.2, 100, 0.9] });
    const byPart = r.checks.filter((c) => c.check === "shear-stress");
    expect(byPart.map((c) => c.at.part)).toEqual([0, 1, 2]);
    expect(byPart[0]!.demand).toBeCloseTo(tauTimber, 9);
    expect(byPart[1]!.demand).toBeCloseTo(tauSteel, 9);
    expect(byPart[2]!.utilisation).toBeCloseTo(tauTimber / 0.9, 9);
    expect(byPart[1]!.utilisation).toBeCloseTo(tauSteel / 100, 9);
    expect(byPart[1]!.at.y).toBeCloseTo(0, 9);
    expect(r.governing.at.part).toBe(2);
    // the peaks in memberStresses: per material and per part, and `shear` the largest material's own stress
    expect(r.stresses.shearByMaterial.map((m) => [m.modularRatio, m.parts, m.stress])).toEqual([
      [1, [0, 2], expect.closeTo(tauTimber, 9)],
      [n, [1], expect.closeTo(tauSteel, 9)],
    ]);
    expect(r.stresses.shearByPart.map((p) => p.part)).toEqual([0, 1, 2]);
    expect(r.stresses.shear!.stress).toBeCloseTo(tauSteel, 9);
    expect(Math.abs(r.stresses.shear!.shear)).toBeCloseTo(v, 6);
    // one allowable for the whole section is checked against the largest material's own stress, not the transformed one
    const one = checkMember(solution, ms, { shearStress: 5 });
    expect(one.checks[0]!.demand).toBeCloseTo(tauSteel, 9);
    expect(one.pass).toBe(false);
    // a part with no allowable is not checked; a part that is not there, or a section without materials, is refused
    expect(checkMember(solution, ms, { shearStressByPart: [null, 100] }).checks.map((c) => c.at.part)).toEqual([1]);
    const missing = tryCheckMember(solution, rectangleSection(100, 100), { shearStressByPart: [1] });
    expect(missing.ok || missing.error.code).toBe("part-not-found");
    const unknown = tryCheckMember(solution, ms, { shearStressByPart: [1, 1, 1, 1] });
    expect(unknown.ok || unknown.error.issues.map((i) => [i.code, i.path])).toEqual([["part-not-found", ["limits", "shearStressByPart", 3]]]);
    const bad = tryCheckMember(solution, ms, { shearStressByPart: [0, "x"] as never });
    expect(bad.ok || bad.error.issues.map((i) => i.path.join("."))).toEqual(["limits.shearStressByPart.0", "limits.shearStressByPart.1"]);
    const notList = tryCheckMember(solution, ms, { shearStressByPart: 3 as never });
    expect(notList.ok || notList.error.code).toBe("not-a-list");
    // one material: no per-material peaks
    const plain = memberStresses(solution, memberSection(rectangle({ width: 100, depth: 200 })));
    expect([plain.shearByMaterial, plain.shearByPart]).toEqual([[], []]);
  });

  it("spanDeflections measures a settled span from its chord", () => {
    const solution = solveBeam({ length: 5000, stiffness: 1e12, supports: [{ kind: "pin", at: 0 }, { kind: "roller", at: 5000, settlement: 10 }], loads: [] });
    expect(Math.abs(spanDeflections(solution)[0]!.deflection)).toBeLessThan(1e-9);
  });
});

const loads = fc.array(fc.record({ at: fc.integer({ min: 0, max: 64 }).map((i) => i / 64), value: fc.double({ min: -5e4, max: 5e4, noNaN: true }).map((v) => Math.round(v * 1000) / 1000) }), { minLength: 1, maxLength: 4 });

describe("check laws", () => {
  test.prop([loads, fc.double({ min: 0.1, max: 10, noNaN: true })], { numRuns: 60 })(
    "peak stress = peak moment / section modulus, and utilisation scales linearly with the load",
    (pts, k) => {
      const L = 5000;
      const sec = rectangleSection(150, 300);
      const S = (150 * 300 ** 2) / 6;
      const beam = (f: number): BeamInput => ({
        length: L,
        stiffness: E * sec.properties.secondMomentZ,
        supports: [{ kind: "pin", at: 0 }, { kind: "roller", at: 0.7 * L }],
        loads: pts.map((p) => ({ kind: "point", at: p.at * L, value: p.value * f })),
      });
      const limits = { bendingStress: 100, shearStress: 10, deflection: [{ kind: "ratio", ratio: 240 }, { kind: "absolute", limit: 20 }] } as const;
      const one = solveBeam(beam(1));
      const r1 = checkMember(one, sec, limits);
      const peakM = Math.max(Math.abs(one.peaks.moment.max.value), Math.abs(one.peaks.moment.min.value));
      expect(r1.stresses.tension.stress).toBeCloseTo(peakM / S, 6);
      expect(-r1.stresses.compression.stress).toBeCloseTo(peakM / S, 6);
      const rk = checkMember(solveBeam(beam(k)), sec, limits);
      expect(rk.checks).toHaveLength(r1.checks.length);
      // Rounding in the solve is relative to the load scale, not to the result: a load a hair from
      // a support gives a near-zero utilisation whose rounding is set by the loads' size. So the
      // bound is relative to the utilisation and to that of the whole load at midspan (common practice).
      const total = pts.reduce((sum, p) => sum + Math.abs(p.value), 0);
      const reference = checkMember(
        solveBeam({ ...beam(1), loads: [{ kind: "point", at: 0.35 * L, value: total }] }),
        sec,
        limits,
      );
      rk.checks.forEach((c, i) => {
        const u = r1.checks[i]!.utilisation;
        const uScale = reference.checks[i]!.utilisation;
        expect(Math.abs(c.utilisation - k * u)).toBeLessThanOrEqual(1e-7 * k * u + 1e-9 * k * uScale + 1e-300);
      });
    },
  );
});

describe("check errors", () => {
  const solution = solveBeam(simpleSpan(3000, 1e12, 1));
  it("allowable values not positive, missing shear bands and bad stretches are reported together", () => {
    const r = tryCheckMember(
      solution,
      [
        { properties: { secondMomentZ: 0, extremes: { top: 10, bottom: -10 } }, from: 0, to: 1000 },
        { properties: { secondMomentZ: 1e6, extremes: { top: 10, bottom: -10 } }, from: 1200, to: 3000 },
      ],
      { bendingStress: { tension: 0, compression: -5 }, shearStress: Number.NaN, deflection: [{ kind: "ratio", ratio: -1, cantileverFactor: 0 }, { kind: "absolute", limit: 0 }] },
    );
    expect(r.ok || r.error.issues.map((i) => `${i.code} ${i.path.join(".")}`)).toMatchInlineSnapshot(`
      [
        "second-moment-not-positive sections.0.properties.secondMomentZ",
        "stretches-not-tiling sections.1",
        "allowable-not-positive limits.bendingStress.tension",
        "allowable-not-positive limits.bendingStress.compression",
        "not-finite limits.shearStress",
        "allowable-not-positive limits.deflection.0.ratio",
        "allowable-not-positive limits.deflection.0.cantileverFactor",
        "allowable-not-positive limits.deflection.1.limit",
      ]
    `);
  });

  it("a shear limit without the section's bands reports shear-section-missing", () => {
    const r = tryCheckMember(solution, { properties: { secondMomentZ: 1e6, extremes: { top: 10, bottom: -10 } } }, { shearStress: 5 });
    expect(r.ok || r.error.issues.map((i) => `${i.code} ${i.path.join(".")}`)).toEqual(["shear-section-missing sections.shear"]);
    const bad = tryMemberStresses(solution, { properties: { secondMomentZ: 1e6, extremes: { top: 10, bottom: -10 } }, shear: [] });
    expect(bad.ok || bad.error.issues.map((i) => `${i.code} ${i.path.join(".")}`)).toEqual(["no-bands sections.shear"]);
    expect(tryMemberStresses(solution, []).ok).toBe(false);
    // No limits: no verdict (never a pass by default).
    const noLimits = tryCheckMember(solution, { properties: { secondMomentZ: 1e6, extremes: { top: 10, bottom: -10 } } }, {});
    expect(noLimits.ok || noLimits.error.code).toBe("limits-empty");
  });
});
