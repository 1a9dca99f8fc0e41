// Moving trains against published values and brute force.
// - Simple span L, two equal loads P at spacing a (AISC Steel Construction Manual, 15th ed., Table 3-23,
//   "two equal concentrated moving loads"; from memory): the largest moment is (P / 2L)(L - a/2)^2, under a
//   load placed so that midspan bisects the distance between it and the train's resultant, while
//   a < (2 - sqrt 2) L; beyond that P L / 4 with one load alone at midspan. The largest end shear
//   (reaction) is P (2 - a / L).
// - Two unequal loads P1 > P2 at spacing a (same table, "two unequal concentrated moving loads"; from memory):
//   the largest moment is (P1 + P2) x^2 / L under P1 with x = (L - P2 a / (P1 + P2)) / 2, or P1 L / 4
//   with P1 alone when that is larger; the largest end shear is P1 + P2 (L - a) / L.
// - A three-axle train on a simple span and on two continuous spans against a brute-force search written here.
import { describe, expect, it } from "vitest";
import { solveBeam, type BeamInput } from "../../src/beam/index.js";
import { evaluatePiecewise } from "../../src/math/index.js";
import { absoluteMoments, ASCE7_16_CRANE_IMPACT, memberInfluence, movingDeflections, reactionPlacements, trainEffect, worstPlacements, type Train } from "../../src/moving/index.js";

const simple = (L: number): BeamInput => ({ length: L, stiffness: 2.0e4, supports: [{ kind: "pin", at: 0 }, { kind: "roller", at: L }] });
const near = (actual: number, expected: number, scale = Math.abs(expected)): void => {
  if (!(Math.abs(actual - expected) <= 1e-12 * Math.max(scale, 1))) expect.fail(`${actual} is not ${expected}`);
};

describe("two equal moving loads on a simple span (AISC Manual Table 3-23, from memory)", () => {
  const L = 10;
  const P = 45;
  it.each([1, 2, 4, 5.5])("a = %s m < (2 - sqrt 2) L: the largest moment is (P / 2L)(L - a/2)^2, under a load at L/2 - a/4", (a) => {
    const r = absoluteMoments(simple(L), { loads: [P, P], spacings: [a] });
    near(r.max.value, (P / (2 * L)) * (L - a / 2) ** 2);
    expect(Math.min(Math.abs(r.max.at - (L / 2 - a / 4)), Math.abs(r.max.at - (L / 2 + a / 4)))).toBeLessThan(1e-9 * L);
    near(r.min.value, 0, P * L);
  });
  it.each([6, 7.5, 9.9])("a = %s m > (2 - sqrt 2) L: the largest moment is P L / 4 with one load alone at midspan", (a) => {
    const r = absoluteMoments(simple(L), { loads: [P, P], spacings: [a] });
    near(r.max.value, (P * L) / 4);
    near(r.max.at, L / 2, L);
  });
  it.each([1, 3.5, 8])("a = %s m: the largest end reaction is P (2 - a / L), with a load over the support", (a) => {
    const [left, right] = reactionPlacements(simple(L), { loads: [P, P], spacings: [a] });
    near(left!.force!.max.value, P * (2 - a / L));
    near(right!.force!.max.value, P * (2 - a / L));
    near(left!.force!.min.value, 0, P);
  });
});

describe("two unequal moving loads on a simple span (AISC Manual Table 3-23, from memory)", () => {
  const L = 12;
  it("P1 = 30, P2 = 12, a = 3: the largest moment (P1 + P2) x^2 / L under P1, x = (L - P2 a / (P1 + P2)) / 2; end shear P1 + P2 (L - a) / L", () => {
    const [P1, P2, a] = [30, 12, 3];
    const x = (L - (P2 * a) / (P1 + P2)) / 2;
    const r = absoluteMoments(simple(L), { loads: [P1, P2], spacings: [a] });
    near(r.max.value, ((P1 + P2) * x * x) / L);
    expect(r.max.axleAtPoint).toBe(0);
    near(Math.min(r.max.at, L - r.max.at), x, L);
    near(reactionPlacements(simple(L), { loads: [P1, P2], spacings: [a] })[0]!.force!.max.value, P1 + (P2 * (L - a)) / L);
  });
  it("P1 = 30, P2 = 6, a = 9: P1 L / 4 with P1 alone governs", () => {
    const r = absoluteMoments(simple(L), { loads: [30, 6], spacings: [9] });
    const x = (L - (6 * 9) / 36) / 2;
    expect((30 * L) / 4).toBeGreaterThan((36 * x * x) / L);
    near(r.max.value, (30 * L) / 4);
  });
});

/** Brute force: the first axle at `count` + 1 positions, each way round, each solved directly; then a ternary search around the best. */
function bruteForce(beam: BeamInput, train: Train, read: (s: ReturnType<typeof solveBeam>) => number, count: number): number {
  const L = beam.length;
  const T = train.spacings.reduce((x, y) => x + y, 0);
  const value = (s: number, o: 1 | -1): number => {
    let t = 0;
    const loads = train.loads.flatMap((p, i) => {
      if (i > 0) t += train.spacings[i - 1]!;
      const x = s + o * t;
      return x >= 0 && x <= L ? [{ kind: "point" as const, at: x, value: p }] : [];
    });
    return read(solveBeam({ ...beam, loads }));
  };
  let best = -Infinity;
  let where = { s: 0, o: 1 as 1 | -1 };
  for (const o of [1, -1] as const) {
    const lo = o === 1 ? -T : 0;
    for (let i = 0; i <= count; i++) {
      const s = lo + ((L + T) * i) / count;
      const v = value(s, o);
      if (v > best) [best, where] = [v, { s, o }];
    }
  }
  // the best neighbourhood: a ternary search over one step either side (the effect is unimodal there)
  const step = (L + T) / count;
  let [a, b] = [where.s - step, where.s + step];
  for (let k = 0; k < 120 && b - a > 1e-15 * L; k++) {
    const m1 = a + (b - a) / 3;
    const m2 = b - (b - a) / 3;
    if (value(m1, where.o) < value(m2, where.o)) a = m1;
    else b = m2;
  }
  return Math.max(best, value(a, where.o), value(b, where.o));
}

describe("a three-axle train against a brute-force search", () => {
  const train: Train = { loads: [35, 60, 60], spacings: [1.8, 1.3] };
  it("simple span: the moment at 0.4 L and the absolute largest moment are at least the brute force's best and within 1e-9 of it", () => {
    const beam = simple(9);
    const at = 3.6;
    const exact = worstPlacements(beam, { kind: "moment", at }, train).max.value;
    const brute = bruteForce(beam, train, (s) => evaluatePiecewise(s.moment, at), 2000);
    expect(exact).toBeGreaterThanOrEqual(brute - 1e-12 * exact);
    expect(exact - brute).toBeLessThanOrEqual(1e-9 * exact);
    const abs = absoluteMoments(beam, train).max.value;
    const bruteAbs = bruteForce(beam, train, (s) => s.peaks.moment.max.value, 2000);
    expect(abs).toBeGreaterThanOrEqual(bruteAbs - 1e-12 * abs);
    expect(abs - bruteAbs).toBeLessThanOrEqual(1e-9 * abs);
  });
  it("two continuous spans: sagging at 0.42 L1, hogging over the middle support, the absolute moments and the middle reaction", () => {
    const beam: BeamInput = { length: 14, stiffness: 3.1e4, supports: [{ kind: "pin", at: 0 }, { kind: "roller", at: 6 }, { kind: "roller", at: 14 }] };
    const member = memberInfluence(beam);
    const checks: [number, number][] = [
      [worstPlacements(member, { kind: "moment", at: 2.52 }, train).max.value, bruteForce(beam, train, (s) => evaluatePiecewise(s.moment, 2.52), 2000)],
      [-worstPlacements(member, { kind: "moment", at: 6 }, train).min.value, bruteForce(beam, train, (s) => -evaluatePiecewise(s.moment, 6), 2000)],
      [absoluteMoments(member, train).max.value, bruteForce(beam, train, (s) => s.peaks.moment.max.value, 2000)],
      [-absoluteMoments(member, train).min.value, bruteForce(beam, train, (s) => -s.peaks.moment.min.value, 2000)],
      [reactionPlacements(member, train)[1]!.force!.max.value, bruteForce(beam, train, (s) => s.reactions[1]!.force, 2000)],
    ];
    for (const [exact, brute] of checks) {
      expect(exact).toBeGreaterThanOrEqual(brute - 1e-12 * Math.abs(exact));
      expect(exact - brute).toBeLessThanOrEqual(1e-9 * Math.abs(exact));
    }
  });
});

describe("the train's effect and its worst placement", () => {
  const beam: BeamInput = { length: 14, stiffness: 3.1e4, supports: [{ kind: "pin", at: 0 }, { kind: "roller", at: 6 }, { kind: "roller", at: 14 }] };
  const train: Train = { loads: [35, 60], spacings: [2.5], uniform: { intensity: 4, start: -1, length: 4.5 } };
  it("trainEffect at a placement equals a direct solve with the axles and the uniform part there", () => {
    for (const reversed of [false, true]) {
      const f = trainEffect(beam, { kind: "moment", at: 4.1 }, train, { reversed });
      for (const s of [-2, 0.7, 3.3, 9.9, 13]) {
        const o = reversed ? -1 : 1;
        const axles = [0, 2.5].map((t, i) => ({ x: s + o * t, p: train.loads[i]! })).filter((a) => a.x >= 0 && a.x <= 14);
        const [u0, u1] = reversed ? [s - 3.5, s + 1] : [s - 1, s + 3.5];
        const from = Math.max(0, u0);
        const to = Math.min(14, u1);
        const loads = [
          ...axles.map((a) => ({ kind: "point" as const, at: a.x, value: a.p })),
          ...(to > from ? [{ kind: "distributed" as const, from, to, start: 4, end: 4 }] : []),
        ];
        const direct = evaluatePiecewise(solveBeam({ ...beam, loads }).moment, 4.1);
        const sLo = f.breaks[0]!;
        const sHi = f.breaks[f.breaks.length - 1]!;
        if (s < sLo || s > sHi) continue;
        near(evaluatePiecewise(f, s), direct, 100);
      }
    }
  });
  it("the dynamic allowance multiplies the axle loads: ASCE 7-16 4.9.3 pendant-operated bridge cranes, 10 %", () => {
    const axlesOnly: Train = { loads: [35, 60], spacings: [2.5] };
    const plain = worstPlacements(beam, { kind: "moment", at: 2.5 }, axlesOnly).max.value;
    const impact = worstPlacements(beam, { kind: "moment", at: 2.5 }, axlesOnly, { dynamic: "bridge-pendant" }).max.value;
    near(impact, plain * 1.1);
    near(worstPlacements(beam, { kind: "moment", at: 2.5 }, axlesOnly, { dynamic: 0.25 }).max.value, plain * 1.25);
    expect(ASCE7_16_CRANE_IMPACT.map((r) => [r.kind, r.fraction])).toEqual([
      ["monorail-powered", 0.25],
      ["bridge-cab-or-remote", 0.25],
      ["bridge-pendant", 0.1],
      ["hand-geared", 0],
    ]);
  });
  it("wholly on the member (partlyOn false) never does better than partly on, and names the axle over the point", () => {
    const q = { kind: "moment", at: 3 } as const;
    const partly = worstPlacements(beam, q, train);
    const whole = worstPlacements(beam, q, train, { partlyOn: false });
    expect(whole.max.value).toBeLessThanOrEqual(partly.max.value + 1e-12 * partly.max.value);
    const axles = worstPlacements(beam, q, { loads: [35, 60], spacings: [2.5] });
    expect(axles.max.axleAtPoint).toBeDefined();
  });
});

describe("deflection under the moving load against the user's limit", () => {
  it("one load on a simple span: the largest midspan deflection is P L^3 / (48 E I) with the load at midspan (AISC Manual Table 3-23, case 7; from memory)", () => {
    const L = 6;
    const EI = 42000;
    const beam: BeamInput = { length: L, stiffness: EI, supports: [{ kind: "pin", at: 0 }, { kind: "roller", at: L }] };
    const [c] = movingDeflections(beam, { loads: [48], spacings: [] }, [3], { ratio: 600 });
    near(c!.demand, (48 * L ** 3) / (48 * EI), 1e-3);
    expect(c!.sense).toBe("down");
    near(c!.limit, L / 600, 1e-3);
    near(c!.placement.firstAxleAt, 3, L);
    expect(c!.pass).toBe(c!.demand <= L / 600);
    const [abs] = movingDeflections(beam, { loads: [48], spacings: [] }, [3], { absolute: 0.001 });
    near(abs!.utilisation, abs!.demand / 0.001);
  });
});
