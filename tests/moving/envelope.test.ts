// Envelopes under moving trains: laws on random determinate members (simple spans with overhangs,
// members with a hinge), checked against the exact worst placement at random points and against
// the train standing at random positions; and the adapter that adds a standing load.
import { describe, expect, it } from "vitest";
import { fc, test } from "@fast-check/vitest";
import { solveBeam, type BeamInput } from "../../src/beam/index.js";
import { evaluatePiecewise } from "../../src/math/index.js";
import { envelopeAt, movingEnvelopes, trainEffect, tryMovingEnvelopes, withFixedDiagram, worstPlacements, type Train } from "../../src/moving/index.js";

const arbDeterminate = fc
  .record({
    L: fc.integer({ min: 20, max: 120 }).map((v) => v / 4),
    a: fc.integer({ min: 0, max: 10 }),
    b: fc.integer({ min: 30, max: 40 }),
    hinged: fc.boolean(),
  })
  .map(({ L, a, b, hinged }): BeamInput =>
    hinged
      ? { length: L, stiffness: 1e4, supports: [{ kind: "pin", at: 0 }, { kind: "roller", at: (a / 40 + 0.3) * L }, { kind: "roller", at: L }], hinges: [(a / 40 + 0.45) * L] }
      : { length: L, stiffness: 1e4, supports: [{ kind: "pin", at: (a / 40) * L }, { kind: "roller", at: (b / 40) * L }] },
  );
const arbTrain = fc
  .record({ loads: fc.array(fc.integer({ min: 1, max: 80 }), { minLength: 1, maxLength: 4 }), gaps: fc.array(fc.integer({ min: 0, max: 40 }).map((v) => v / 8), { minLength: 3, maxLength: 3 }) })
  .map(({ loads, gaps }): Train => ({ loads, spacings: gaps.slice(0, loads.length - 1) }));

describe("movingEnvelopes laws (determinate members)", () => {
  test.prop([arbDeterminate, arbTrain, fc.double({ min: 0.001, max: 0.999, noNaN: true }), fc.boolean()], { numRuns: 40 })(
    "each bound equals the exact worst placement at x, and lies beyond the train standing anywhere",
    (beam, train, u, partlyOn) => {
      const T = train.spacings.reduce((s, d) => s + d, 0);
      if (!partlyOn && T > beam.length) return;
      const e = movingEnvelopes(beam, train, { partlyOn });
      const x = u * beam.length;
      const scale = train.loads.reduce((s, p) => s + p, 0) * beam.length;
      for (const [diagram, env] of [["moment", e.moment], ["shear", e.shear]] as const) {
        const q = diagram === "moment" ? ({ kind: "moment", at: x } as const) : ({ kind: "shear", at: x, side: "right" } as const);
        const w = worstPlacements(beam, q, train, { partlyOn });
        const up = evaluatePiecewise(env.upper.curve, x);
        const lo = evaluatePiecewise(env.lower.curve, x);
        expect(Math.abs(up - w.max.value)).toBeLessThanOrEqual(1e-10 * scale);
        expect(Math.abs(lo - w.min.value)).toBeLessThanOrEqual(1e-10 * scale);
        for (const reversed of [false, true]) {
          const f = trainEffect(beam, q, train, { partlyOn, reversed });
          const b = f.breaks;
          for (const t of [0.13, 0.5, 0.77]) {
            const v = evaluatePiecewise(f, b[0]! + t * (b[b.length - 1]! - b[0]!));
            expect(v).toBeLessThanOrEqual(up + 1e-10 * scale);
            expect(v).toBeGreaterThanOrEqual(lo - 1e-10 * scale);
          }
        }
      }
      expect(e.moment.upper.governing.length).toBe(e.moment.upper.curve.breaks.length - 1);
    },
  );
});

describe("movingEnvelopes and envelopeAt on published cases", () => {
  const simple: BeamInput = { length: 10, stiffness: 1e4, supports: [{ kind: "pin", at: 0 }, { kind: "roller", at: 10 }] };
  it("two equal loads on a simple span: the moment envelope peaks at (P / 2L)(L - a/2)^2, the shear envelope at P (2 - a/L) at the ends (AISC Manual Table 3-23, from memory)", () => {
    const e = movingEnvelopes(simple, { loads: [10, 10], spacings: [2] });
    expect(e.moment.upper.peak.value).toBeCloseTo((10 / 20) * 9 ** 2, 10);
    expect(e.shear.upper.peak.value).toBeCloseTo(10 * (2 - 0.2), 10);
    expect(e.shear.lower.peak.value).toBeCloseTo(-10 * (2 - 0.2), 10);
    expect(e.placements[e.moment.upper.peak.arrangement]!.kind).toBe("axle-at-point");
    // a single load: the envelope at x is P x (L - x) / L
    const one = movingEnvelopes(simple, { loads: [10], spacings: [] });
    for (const x of [1, 3.3, 5, 8.2]) expect(evaluatePiecewise(one.moment.upper.curve, x)).toBeCloseTo((10 * x * (10 - x)) / 10, 10);
  });
  it("members with curved lines and trains with a uniform part are refused, with the exact route named", () => {
    const two: BeamInput = { length: 12, stiffness: 42000, supports: [{ kind: "pin", at: 0 }, { kind: "roller", at: 6 }, { kind: "roller", at: 12 }] };
    const r = tryMovingEnvelopes(two, { loads: [10], spacings: [] });
    expect(r.ok ? "" : r.error.issues[0]?.code).toBe("envelope-curved-lines-not-covered");
    const u = tryMovingEnvelopes(simple, { loads: [10], spacings: [], uniform: { intensity: 1, start: 0, length: 2 } });
    expect(u.ok ? "" : u.error.issues[0]?.code).toBe("envelope-uniform-not-covered");
    // envelopeAt is exact on any member: one load over the middle support of two equal spans gives no moment there
    const at = envelopeAt(two, { loads: [10], spacings: [] }, "moment", [6, 2.4]);
    expect(at.max[0]!.value).toBeCloseTo(0, 10);
    // the largest hogging moment over the support under one load: 10 (L/4) max xi (1 - xi^2) at xi = 1/sqrt 3 (three-moment equation)
    const xi = 1 / Math.sqrt(3);
    expect(at.min[0]!.value).toBeCloseTo(-10 * (6 / 4) * xi * (1 - xi * xi), 10);
  });
  it("withFixedDiagram adds a standing load to every placement: dead + moving live", () => {
    const live = movingEnvelopes(simple, { loads: [10, 10], spacings: [2] });
    const dead = solveBeam({ ...simple, loads: [{ kind: "distributed", from: 0, to: 10, start: 2, end: 2 }] });
    const design = withFixedDiagram(live.moment, dead.moment, 1.2, 1.6, live.placements.map((p) => p.name));
    for (const x of [1, 4.5, 5, 7.7]) {
      const expected = 1.2 * evaluatePiecewise(dead.moment, x) + 1.6 * evaluatePiecewise(live.moment.upper.curve, x);
      expect(evaluatePiecewise(design.upper.curve, x)).toBeCloseTo(expected, 10);
    }
    // a negative factor on the moving load swaps the bounds
    const swapped = withFixedDiagram(live.moment, dead.moment, 1, -1);
    expect(evaluatePiecewise(swapped.lower.curve, 5)).toBeCloseTo(evaluatePiecewise(dead.moment, 5) - evaluatePiecewise(live.moment.upper.curve, 5), 10);
    expect(design.upper.peak.name).toMatch(/axle|train/);
  });
});
